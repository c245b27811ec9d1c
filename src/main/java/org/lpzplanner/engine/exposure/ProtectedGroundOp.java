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

    /** Which cells lie under or beside a face ({@code covered}), and which are proven protected. */
    record GroundCells(boolean[] covered, boolean[] protectedCells) {
    }

    /** Ground decisions and what they add up to. */
    record GroundResult(GroundCells cells, ProtectedGround ground) {
    }

    /**
     * Decides the ground cells. With {@code previous} (the decisions before an edit of the parts,
     * on the same grid), only the cells the change window touches are decided again.
     */
    static GroundResult run(ExposureContext ctx, GroundCells previous, ChangeWindow window) {
        var g = ctx.grid;
        double half = g.h() / 2;
        boolean[] covered = previous != null ? previous.covered() : covered(ctx);
        boolean[] protectedCells = previous != null ? previous.protectedCells().clone() : new boolean[covered.length];
        int ci0 = 0, ci1 = g.nx() - 1, cj0 = 0, cj1 = g.ny() - 1;
        if (previous != null) {
            ci0 = clamp(g.column(window.minX()) - 1, g.nx());
            ci1 = clamp(g.column(window.maxX()) + 1, g.nx());
            cj0 = clamp(g.row(window.minY()) - 1, g.ny());
            cj1 = clamp(g.row(window.maxY()) + 1, g.ny());
        }
        for (int j = cj0; j <= cj1; j++) {
            for (int i = ci0; i <= ci1; i++) {
                if (previous == null || window.touchesCell(g.nodeX(i), g.nodeY(j), half)) {
                    protectedCells[j * g.nx() + i] = !covered[j * g.nx() + i]
                            && ctx.field.cellLower(i, j) > ExposureContext.MARGIN;
                }
            }
        }
        int count = 0;
        int i0 = g.nx(), j0 = g.ny(), i1 = -1, j1 = -1;
        for (int j = 0; j < g.ny(); j++) {
            for (int i = 0; i < g.nx(); i++) {
                if (protectedCells[j * g.nx() + i]) {
                    count++;
                    i0 = Math.min(i0, i);
                    j0 = Math.min(j0, j);
                    i1 = Math.max(i1, i);
                    j1 = Math.max(j1, j);
                }
            }
        }
        GroundCells cells = new GroundCells(covered, protectedCells);
        if (count == 0) {
            return new GroundResult(cells, new ProtectedGround(ctx.gf.createPolygon(), 0));
        }
        Geometry area = new CellRegions(g, ctx.gf).union(protectedCells, i0, j0, i1, j1);
        return new GroundResult(cells, new ProtectedGround(area, count * g.h() * g.h()));
    }

    private static int clamp(int index, int n) {
        return Math.max(0, Math.min(n - 1, index));
    }

    private static boolean[] covered(ExposureContext ctx) {
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
        return covered;
    }
}
