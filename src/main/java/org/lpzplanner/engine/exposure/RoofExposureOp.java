package org.lpzplanner.engine.exposure;

import java.util.List;
import java.util.stream.IntStream;
import org.locationtech.jts.geom.Geometry;
import org.lpzplanner.engine.envelope.Target;
import org.lpzplanner.engine.geom.PlanPolygon;
import org.lpzplanner.engine.geom.Plane;
import org.lpzplanner.engine.geom.RoofFace;

/**
 * Exposed part of every roof face. A grid cell of a face is exposed when the envelope's least value
 * over the cell is at or below the face's highest point in the cell (plus the margin); the exposed
 * part is the union of those cells clipped to the face. Parts of a face inside a higher solid
 * (overlapping structures) are not surfaces and are skipped.
 */
final class RoofExposureOp {

    private RoofExposureOp() {
    }

    static List<RoofExposure> run(ExposureContext ctx) {
        return IntStream.range(0, ctx.surface.faces().size()).parallel()
                .mapToObj(k -> face(ctx, k)).toList();
    }

    /**
     * E at node (i, j) from above, using the sphere that rests on the face's plane with its contact
     * at the node: its centre sits R·(a, b)/s up-slope of the node, and E ≤ D(c) − R/s, which
     * equals the roof height wherever nothing else holds that sphere up.
     */
    private static double restingUpper(ExposureContext ctx, Plane plane, int i, int j) {
        if (plane.isHorizontal()) {
            return ctx.field.nodeUpper(i, j);
        }
        double s = plane.slopeFactor(), r = ctx.field.radius();
        double cx = ctx.grid.nodeX(i) - r * plane.a() / s, cy = ctx.grid.nodeY(j) - r * plane.b() / s;
        return ctx.field.refiner().centreHeight(cx, cy) - r / s;
    }

    /** True when another owner's face shares some of this face's bounding box (overlapping solids). */
    private static boolean isOverlapped(ExposureContext ctx, int k, PlanPolygon poly) {
        RoofFace face = ctx.surface.faces().get(k);
        for (int m = 0; m < ctx.surface.faces().size(); m++) {
            PlanPolygon other = ctx.surface.facePolygon(m);
            if (m != k && !ctx.surface.faces().get(m).ownerId().equals(face.ownerId())
                    && other.minX() <= poly.maxX() && other.maxX() >= poly.minX()
                    && other.minY() <= poly.maxY() && other.maxY() >= poly.minY()) {
                return true;
            }
        }
        return false;
    }

    private static RoofExposure face(ExposureContext ctx, int k) {
        RoofFace face = ctx.surface.faces().get(k);
        PlanPolygon poly = ctx.surface.facePolygon(k);
        Plane plane = face.plane();
        var g = ctx.grid;
        double half = g.h() / 2;
        double rise = (Math.abs(plane.a()) + Math.abs(plane.b())) * half;
        int i0 = g.column(poly.minX()), i1 = g.column(poly.maxX()), j0 = g.row(poly.minY()), j1 = g.row(poly.maxY());
        boolean overlapped = isOverlapped(ctx, k, poly);
        boolean[] exposed = new boolean[g.nx() * g.ny()];
        int candidates = 0, exposedCount = 0, hidden = 0;
        double minClearance = Double.NaN;
        for (int j = j0; j <= j1; j++) {
            for (int i = i0; i <= i1; i++) {
                double x = g.nodeX(i), y = g.nodeY(j);
                boolean centreInside = poly.contains(x, y);
                if (!centreInside && poly.distanceToBoundary(x, y) > half * Math.sqrt(2)) {
                    continue;
                }
                if (overlapped && centreInside && ctx.surface.topHeight(x, y) > plane.z(x, y) + 1e-6) {
                    hidden++;
                    continue; // inside a higher solid
                }
                candidates++;
                double roofMax = plane.z(x, y) + rise;
                double lower = ctx.field.cellLower(i, j);
                boolean isExposed;
                if (roofMax + ExposureContext.MARGIN < lower) {
                    isExposed = false;
                } else if (centreInside && plane.z(x, y) + ExposureContext.MARGIN >= restingUpper(ctx, plane, i, j)) {
                    isExposed = true;
                } else {
                    isExposed = ctx.isExposed(Target.square(x, y, half), roofMax);
                }
                if (isExposed) {
                    exposed[j * g.nx() + i] = true;
                    exposedCount++;
                } else if (centreInside) {
                    double clearance = lower - roofMax;
                    minClearance = Double.isNaN(minClearance) ? clearance : Math.min(minClearance, clearance);
                }
            }
        }
        Geometry exposedArea;
        if (exposedCount == 0) {
            exposedArea = ctx.gf.createPolygon();
        } else if (exposedCount == candidates && hidden == 0) {
            exposedArea = face.polygon();
        } else {
            exposedArea = new CellRegions(g, ctx.gf).union(exposed, i0, j0, i1, j1).intersection(face.polygon());
        }
        if (!Double.isNaN(minClearance)) {
            minClearance = Math.max(0, minClearance);
        }
        return new RoofExposure(face.ownerId(), face.ownerName(), face.kind(), face.index(), face.polygon(),
                plane.slopeFactor(), exposedArea, face.polygon().getArea(), exposedArea.getArea(), minClearance);
    }
}
