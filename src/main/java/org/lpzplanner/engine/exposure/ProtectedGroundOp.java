package org.lpzplanner.engine.exposure;

import org.locationtech.jts.geom.Geometry;
import org.lpzplanner.engine.geom.PlanPolygon;

/**
 * Open ground below the envelope. A cell counts only when it lies wholly outside every face and
 * the envelope's lower bound over the whole cell is above the ground (plus the margin), so the
 * area is never overstated.
 */
final class ProtectedGroundOp {

    private ProtectedGroundOp() {
    }

    static ProtectedGround run(ExposureContext ctx) {
        var g = ctx.grid;
        double half = g.h() / 2;
        boolean[] covered = new boolean[g.nx() * g.ny()];
        for (int k = 0; k < ctx.surface.faces().size(); k++) {
            PlanPolygon p = ctx.surface.facePolygon(k);
            for (int j = g.row(p.minY()); j <= g.row(p.maxY()); j++) {
                for (int i = g.column(p.minX()); i <= g.column(p.maxX()); i++) {
                    double x = g.nodeX(i), y = g.nodeY(j);
                    if (p.contains(x, y) || p.distanceToBoundary(x, y) <= half * Math.sqrt(2)) {
                        covered[j * g.nx() + i] = true;
                    }
                }
            }
        }
        boolean[] protectedCells = new boolean[covered.length];
        int count = 0;
        int i0 = g.nx(), j0 = g.ny(), i1 = -1, j1 = -1;
        for (int j = 0; j < g.ny(); j++) {
            for (int i = 0; i < g.nx(); i++) {
                if (!covered[j * g.nx() + i] && ctx.field.cellLower(i, j) > ExposureContext.MARGIN) {
                    protectedCells[j * g.nx() + i] = true;
                    count++;
                    i0 = Math.min(i0, i);
                    j0 = Math.min(j0, j);
                    i1 = Math.max(i1, i);
                    j1 = Math.max(j1, j);
                }
            }
        }
        if (count == 0) {
            return new ProtectedGround(ctx.gf.createPolygon(), 0);
        }
        Geometry area = new CellRegions(g, ctx.gf).union(protectedCells, i0, j0, i1, j1);
        return new ProtectedGround(area, count * g.h() * g.h());
    }
}
