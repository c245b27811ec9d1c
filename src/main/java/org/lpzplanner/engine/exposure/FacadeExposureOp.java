package org.lpzplanner.engine.exposure;

import java.util.ArrayList;
import java.util.List;
import org.locationtech.jts.geom.Coordinate;
import org.lpzplanner.engine.envelope.CentreHeights;
import org.lpzplanner.engine.envelope.Support;
import org.lpzplanner.engine.geom.Wall;

/**
 * Exposed facade bands.
 *
 * <p>A sphere that touches a vertical wall at a point w (away from the wall's ends) without entering
 * the wall has its centre on the outward normal at distance R: c = w + R·n, at the height of the
 * touch. So the wall point at height z is exposed iff a centre at that height over w + R·n is free;
 * every free height is at least the lowest one, L(w + R·n) (D where nothing has space beneath), so
 * the band over a piece of wall runs from the least L along the offset piece (a rigorous lower bound, refined by halving the
 * piece until within {@link #BAND_TOLERANCE}) up to the wall top. Bands lower than
 * {@link #MIN_BAND} are left out: there the wall top is at or above the envelope and is reported
 * as an exposed edge. The vertical corner lines at wall ends are taken as the limit of their walls.
 */
final class FacadeExposureOp {

    /** Bands shorter than this (m) are carried by the exposed top edge. */
    static final double MIN_BAND = 0.1;

    /** Band bottoms are computed to this tolerance (m), toward the lower side. */
    static final double BAND_TOLERANCE = 0.05;

    private static final int MAX_HALVINGS = 12;

    private FacadeExposureOp() {
    }

    /** The exposed bands of one wall, in order along it. */
    static List<FacadeBand> wall(ExposureContext ctx, Wall w) {
        double len = w.length();
        List<FacadeBand> out = new ArrayList<>();
        if (len < 1e-6) {
            return out;
        }
        int n = Math.max(1, (int) Math.ceil(len / ctx.grid.h()));
        double ox = (w.p1().y - w.p0().y) / len, oy = -(w.p1().x - w.p0().x) / len; // outward: right of p0→p1
        int runStart = -1;
        double runBottom = Double.POSITIVE_INFINITY, runTop = 0;
        for (int k = 0; k <= n; k++) {
            double[] band = k < n ? piece(ctx, w, (double) k / n, (double) (k + 1) / n, ox, oy) : null;
            if (band != null) {
                if (runStart < 0) {
                    runStart = k;
                    runBottom = band[0];
                    runTop = band[1];
                } else {
                    runBottom = Math.min(runBottom, band[0]);
                    runTop = Math.max(runTop, band[1]);
                }
            } else if (runStart >= 0) {
                Coordinate p = plan(EdgeExposureOp.lerp(w.p0(), w.p1(), (double) runStart / n));
                Coordinate q = plan(EdgeExposureOp.lerp(w.p0(), w.p1(), (double) k / n));
                out.add(new FacadeBand(w.ownerId(), w.ownerName(), w.index(),
                        ctx.gf.createLineString(new Coordinate[] {p, q}), p.distance(q), runBottom, runTop));
                runStart = -1;
            }
        }
        return out;
    }

    /** [bottom, top] of the exposed band over the piece, or null when there is none. */
    private static double[] piece(ExposureContext ctx, Wall w, double t0, double t1, double ox, double oy) {
        Coordinate p = EdgeExposureOp.lerp(w.p0(), w.p1(), t0), q = EdgeExposureOp.lerp(w.p0(), w.p1(), t1);
        double top = Math.max(p.getZ(), q.getZ());
        double mx = (p.x + q.x) / 2, my = (p.y + q.y) / 2;
        // what stands against the wall outside (an adjacent solid, or the roof under a rooftop object)
        double outside = Math.max(w.base(), ctx.surface.topHeight(mx + ox * 0.01, my + oy * 0.01));
        if (outside >= top - MIN_BAND) {
            return null;
        }
        // a hair beyond R, so the wall's own columns (exactly R away) only touch the sphere
        double r = ctx.field.radius() + 1e-6;
        double ax = p.x + ox * r, ay = p.y + oy * r, bx = q.x + ox * r, by = q.y + oy * r;
        List<Support> near = ctx.field.refiner().supportsNear((ax + bx) / 2, (ay + by) / 2,
                Math.max(Math.abs(bx - ax), Math.abs(by - ay)) / 2);
        double bottom = Math.max(outside, leastCentreHeight(near, ctx.field.radius(), ax, ay, bx, by, top - MIN_BAND, 0));
        return top - bottom > MIN_BAND ? new double[] {bottom, top} : null;
    }

    /**
     * A lower bound of D along the segment a→b, within the band tolerance where it matters (below
     * {@code cutoff}; above it only "not below the cutoff" is needed).
     */
    private static double leastCentreHeight(List<Support> near, double radius, double ax, double ay, double bx,
            double by, double cutoff, int depth) {
        double mx = (ax + bx) / 2, my = (ay + by) / 2;
        double half = Math.max(Math.abs(bx - ax), Math.abs(by - ay)) / 2;
        double lower = CentreHeights.lowerBound(near, mx, my, half, radius);
        double exact = CentreHeights.lowest(near, mx, my, radius);
        if (lower >= cutoff || depth >= MAX_HALVINGS || exact - lower <= BAND_TOLERANCE) {
            return lower;
        }
        return Math.min(leastCentreHeight(near, radius, ax, ay, mx, my, cutoff, depth + 1),
                leastCentreHeight(near, radius, mx, my, bx, by, cutoff, depth + 1));
    }

    private static Coordinate plan(Coordinate c) {
        return new Coordinate(c.x, c.y);
    }
}
