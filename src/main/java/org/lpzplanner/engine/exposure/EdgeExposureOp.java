package org.lpzplanner.engine.exposure;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.Set;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.locationtech.jts.geom.Coordinate;
import org.lpzplanner.engine.envelope.Target;
import org.lpzplanner.engine.geom.RoofEdge;
import org.lpzplanner.engine.geom.SiteSurface;

/**
 * Exposed stretches of roof edges, parapets, ridges, hips and object edges, and exposed corners.
 * Each edge is cut into pieces no longer than the grid spacing; a piece is exposed when the
 * envelope's least value along it is at or below the piece's highest point. Consecutive exposed
 * pieces merge into one stretch.
 */
final class EdgeExposureOp {

    private EdgeExposureOp() {
    }

    /** The exposed stretches of one edge, in order along it. */
    static List<EdgeExposure> edge(ExposureContext ctx, RoofEdge e) {
        Coordinate a = e.p0(), b = e.p1();
        int n = Math.max(1, (int) Math.ceil(e.planLength() / ctx.grid.h()));
        boolean[] exposed = new boolean[n];
        decide(ctx, a, b, 0, n, n, exposed);
        List<EdgeExposure> out = new ArrayList<>();
        int runStart = -1;
        for (int k = 0; k <= n; k++) {
            boolean on = k < n && exposed[k];
            if (on && runStart < 0) {
                runStart = k;
            } else if (!on && runStart >= 0) {
                Coordinate p = lerp(a, b, (double) runStart / n), q = lerp(a, b, (double) k / n);
                out.add(new EdgeExposure(e.ownerId(), e.ownerName(), e.kind(),
                        ctx.gf.createLineString(new Coordinate[] {p, q}), p.distance3D(q)));
                runStart = -1;
            }
        }
        return out;
    }

    /**
     * Decides pieces [k0, k1) of n. A stretch proven protected as a whole (the envelope's least value
     * along it above its highest point) settles all its pieces in one query; otherwise it is halved
     * down to single pieces, so long protected edges cost a few queries instead of one per piece.
     */
    private static void decide(ExposureContext ctx, Coordinate a, Coordinate b, int k0, int k1, int n, boolean[] out) {
        Coordinate p = lerp(a, b, (double) k0 / n), q = lerp(a, b, (double) k1 / n);
        double top = Math.max(p.getZ(), q.getZ());
        if (k1 - k0 == 1) {
            double mx = (p.x + q.x) / 2, my = (p.y + q.y) / 2;
            if (ctx.surface.topHeight(mx, my) > top + 1e-6) {
                return; // inside a higher solid: not a surface
            }
            // the sphere resting straight above the piece's middle touches it unless held up
            double middle = (p.getZ() + q.getZ()) / 2;
            out[k0] = middle + ExposureContext.MARGIN >= ctx.field.refiner().centreHeight(mx, my) - ctx.field.radius()
                    || ctx.isExposed(Target.segment(p.x, p.y, q.x, q.y), top);
            return;
        }
        if (!ctx.isExposed(Target.segment(p.x, p.y, q.x, q.y), top)) {
            return;
        }
        int mid = (k0 + k1) / 2;
        decide(ctx, a, b, k0, mid, n, out);
        decide(ctx, a, b, mid, k1, n, out);
    }

    /** Grid cells each owner's exposed edge stretches pass through, keyed by owner id. */
    static Map<String, Set<Integer>> cellsByOwner(ExposureContext ctx, List<EdgeExposure> exposed) {
        Map<String, Set<Integer>> out = new HashMap<>();
        var g = ctx.grid;
        for (EdgeExposure e : exposed) {
            Coordinate a = e.line().getCoordinateN(0), b = e.line().getCoordinateN(1);
            int n = Math.max(1, (int) Math.ceil(a.distance(b) / (g.h() / 4)));
            Set<Integer> cells = out.computeIfAbsent(e.ownerId(), k -> new HashSet<>());
            for (int k = 0; k <= n; k++) {
                Coordinate p = lerp(a, b, (double) k / n);
                // a line on a cell border belongs to the cells on both sides
                for (double d : new double[] {-1e-6, 1e-6}) {
                    for (double e2 : new double[] {-1e-6, 1e-6}) {
                        cells.add(g.row(p.y + e2) * g.nx() + g.column(p.x + d));
                    }
                }
            }
        }
        return out;
    }

    /** The surface's corners, each place once (the first owner's). */
    static List<SiteSurface.Corner> uniqueCorners(SiteSurface surface) {
        Map<String, SiteSurface.Corner> unique = new LinkedHashMap<>();
        for (SiteSurface.Corner c : surface.corners()) {
            unique.putIfAbsent(String.format("%.4f|%.4f|%.4f", c.point().x, c.point().y, c.point().getZ()), c);
        }
        return List.copyOf(unique.values());
    }

    /** The corner as exposed, or null when it is protected or inside a higher solid. */
    static CornerExposure corner(ExposureContext ctx, SiteSurface.Corner c) {
        if (ctx.surface.topHeight(c.point().x, c.point().y) > c.point().getZ() + 1e-6
                || !ctx.isExposed(Target.point(c.point().x, c.point().y), c.point().getZ())) {
            return null;
        }
        return new CornerExposure(c.ownerId(), c.ownerName(), c.point());
    }

    static Coordinate lerp(Coordinate a, Coordinate b, double t) {
        return new Coordinate(a.x + t * (b.x - a.x), a.y + t * (b.y - a.y), a.getZ() + t * (b.getZ() - a.getZ()));
    }
}
