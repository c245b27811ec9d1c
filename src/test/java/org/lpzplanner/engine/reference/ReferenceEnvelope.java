package org.lpzplanner.engine.reference;

import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleUnaryOperator;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Polygon;
import org.lpzplanner.engine.model.Conductor;
import org.lpzplanner.engine.model.RoofShape;
import org.lpzplanner.engine.model.Rod;
import org.lpzplanner.engine.model.RooftopObject;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.Structure;

/**
 * A slow, independent reference for the rolling-sphere protection envelope, written to be checked
 * by reading rather than to be fast. It shares no code with the engine: it reads the {@link Site}
 * model directly (not the engine's surface builder, supports, grids or refiner).
 *
 * <h2>What it computes</h2>
 *
 * Structures are solid down to flat ground at z = 0; conductors are thin lines in the air with
 * free space beneath them. With R the sphere radius:
 * <ul>
 *   <li>D(c), the lowest admissible sphere-centre height over column c, is the lowest z ≥
 *       max(R, max over solid points q with plan distance |c − q| ≤ R of z(q) + √(R² − |c − q|²))
 *       that lies at least R from every conductor (see {@link #centreHeight}).
 *   <li>E(p) = inf over columns c with |c − p| ≤ R of F(c), F(c) = D(c) − √(R² − |c − p|²): the
 *       lowest point over column p of any admissible sphere.
 * </ul>
 *
 * <h2>Method</h2>
 *
 * <b>D, exactly.</b> The solid's top is decomposed into pieces of constant height: each flat roof
 * is its footprint polygon at wall-top height, a parapet is the footprint boundary at parapet
 * height, a rooftop object is its footprint at its top, a rod is its tip (base = top of whatever
 * it stands on, read from the footprints here), a horizontal conductor leg (with free space beneath it) is a plan segment at
 * its height. Solid points below these pieces never matter, because for a fixed plan position the
 * highest point gives the largest z(q) + √(R² − d²). For a piece at constant height z over a plan
 * set A the maximum over A is reached at A's point nearest to c, so D<sub>A</sub>(c) =
 * z + √(R² − dist(c, A)²) when dist(c, A) ≤ R: one plan distance per piece (0 inside a
 * polygon), computed here with textbook point-in-polygon and point-to-segment code. A sloping
 * conductor leg is maximised by golden-section search on the part of the leg within reach, where
 * z(s) + √(R² − |c − q(s)|²) is concave in the arc parameter s. Only flat roofs are supported
 * (other roof forms throw), which is all the tests use.
 *
 * <p><b>E, by nested one-dimensional searches in polar coordinates around p.</b> For a direction
 * θ, g(θ) = min over ρ ∈ [0, R] of F(p + ρ·(cos θ, sin θ)) is found by sampling ρ at R/200
 * steps and refining the two lowest local minima of the samples by golden-section search on the
 * bracket between their neighbouring samples. E is then min over θ of g(θ), found the same way:
 * 360 directions (1° apart), the six lowest local minima refined by golden-section search on their
 * ±1° brackets. Each search stops after {@value #GOLDEN_ITERATIONS} golden-section steps. Searching
 * along rays rather than on a square lattice matters: at the optimum F typically has a sharp
 * V-shaped valley (where the sphere starts touching a second support, e.g. rod and ground), and
 * a lattice search stalls on such a valley when it is not aligned with the lattice, while a
 * one-dimensional search crosses it exactly.
 *
 * <h2>Error bound</h2>
 *
 * <ul>
 *   <li><b>Never below the true envelope, except for rounding.</b> Every evaluated F(c) is the
 *       lowest point over p of a sphere that really is admissible, so the smallest F found is
 *       ≥ E(p) in exact arithmetic. Floating point loses most near the rim of a support's reach,
 *       where √(R² − d²) turns the rounding of d² (about 1e-14·d with coordinates below 100 m)
 *       into up to √(1e-14·d), some 1e-6 m, in D and again in the sphere term; observed: 2.4e-7 m
 *       (at a rod of height R, queried at the rod). Hence E<sub>ref</sub> ≥ E<sub>true</sub> −
 *       {@value #STATED_DEFICIT} m holds unconditionally: an engine value above E<sub>ref</sub> +
 *       {@value #STATED_DEFICIT} m (plus the engine's own rounding) is above the true envelope.
 *   <li><b>Above the true envelope by at most {@value #STATED_EXCESS} m</b>, provided F along a ray,
 *       and g over the directions, has a single minimum within one sample spacing of each refined
 *       local minimum (no dip narrower than R/200 in distance or 1° in direction is missed). Then
 *       the final golden-section brackets are narrower than 2·0.618<sup>45</sup> ≈ 8e-10 of the
 *       sample spacing: below 4e-10 m along a ray and 3e-11 rad (3e-9 m at 80 m) across, and F
 *       exceeds its minimum over them by at most its slope times that width. F's slope is below
 *       100 at points 0.01 m or more from a wall line for R ≤ 80 m (beside a wall higher than R it
 *       grows like √(R/2x) at distance x: 63 at x = 0.01 m, R = 80 m), so the excess is below
 *       5e-7 m. The stated {@value #STATED_EXCESS} m leaves a wide margin for the one unproven
 *       step. Checked in {@code ReferenceEnvelopeTest} against closed-form envelopes (down to
 *       0.01 m from walls, R up to 80 m) and against a four-times denser search; against the
 *       closed forms the largest excess seen was 1.2e-9 m.
 * </ul>
 *
 * Together: E<sub>true</sub> − {@value #STATED_DEFICIT} ≤ E<sub>ref</sub> ≤ E<sub>true</sub> +
 * {@value #STATED_EXCESS} (metres) at points not within 0.01 m of a wall line. Cost: about 200 000
 * evaluations of D per query, some 10–40 ms for scenes of a few pieces.
 */
public final class ReferenceEnvelope {

    /** Directions sampled around p. */
    static final int DIRECTIONS = 360;

    /** Local minima over the directions that are refined. */
    static final int CANDIDATES = 6;

    /** Distances sampled along each direction, from 0 to R. */
    static final int RAY_STEPS = 200;

    /** Local minima along one direction that are refined. */
    static final int RAY_CANDIDATES = 2;

    /** Golden-section iterations per refinement: shrinks a bracket by 0.618^45 ≈ 4e-10. */
    static final int GOLDEN_ITERATIONS = 45;

    /**
     * How far above the true envelope a reference value may be, metres (see the class comment):
     * the golden-section bound with a wide margin for the unproven single-minimum step.
     */
    public static final double STATED_EXCESS = 1e-5;

    /** How far below the true envelope a reference value may be, metres: floating-point rounding only. */
    public static final double STATED_DEFICIT = 1e-5;

    private final double radius;
    private final double r2;
    private final List<Piece> pieces;
    private final List<Piece> spans;
    private final List<FlatSet> footprints;
    private final int directions;
    private final int candidates;

    private ReferenceEnvelope(double radius, List<Piece> pieces, List<Piece> spans, List<FlatSet> footprints,
            int directions, int candidates) {
        this.radius = radius;
        this.r2 = radius * radius;
        this.pieces = List.copyOf(pieces);
        this.spans = List.copyOf(spans);
        this.footprints = List.copyOf(footprints);
        this.directions = directions;
        this.candidates = candidates;
    }

    /**
     * The same reference with a different search effort (directions sampled, local minima over the
     * directions refined): used to check that the default effort has converged.
     */
    public ReferenceEnvelope withSearch(int sampledDirections, int refinedMinima) {
        return new ReferenceEnvelope(radius, pieces, spans, footprints, sampledDirections, refinedMinima);
    }

    /** The reference for a site with flat roofs, rooftop objects, rods and conductors. */
    public static ReferenceEnvelope of(Site site, double radius) {
        if (!(radius > 0)) {
            throw new IllegalArgumentException("radius must be positive");
        }
        List<Piece> pieces = new ArrayList<>();
        List<FlatSet> footprints = new ArrayList<>();
        for (Structure s : site.structures()) {
            if (!(s.roof() instanceof RoofShape.Flat flat)) {
                throw new UnsupportedOperationException("the reference handles flat roofs only: " + s.id());
            }
            for (int k = 0; k < s.footprint().getNumGeometries(); k++) {
                Polygon part = (Polygon) s.footprint().getGeometryN(k);
                FlatSet roof = new FlatSet(PlanShape.area(part), s.height());
                footprints.add(roof);
                pieces.add(roof);
                if (flat.parapet() > 0) {
                    pieces.add(new FlatSet(PlanShape.outline(part), s.height() + flat.parapet()));
                }
            }
        }
        for (RooftopObject o : site.rooftopObjects()) {
            FlatSet top = new FlatSet(PlanShape.area(o.footprint()), o.top());
            footprints.add(top);
            pieces.add(top);
        }
        ReferenceEnvelope ground = new ReferenceEnvelope(radius, List.of(), List.of(), footprints, DIRECTIONS, CANDIDATES);
        for (Rod r : site.rods()) {
            double tip = ground.solidTop(r.x(), r.y()) + r.height();
            pieces.add(new FlatSet(PlanShape.point(r.x(), r.y()), tip));
        }
        List<Piece> spans = new ArrayList<>();
        for (Conductor c : site.conductors()) {
            List<double[]> path = new ArrayList<>();
            for (Coordinate v : c.path()) {
                double z = c.followsSurface() ? ground.solidTop(v.x, v.y) + c.heightAboveRoof() : v.getZ();
                if (Double.isNaN(z)) {
                    throw new IllegalArgumentException("conductor " + c.id() + " has a vertex without elevation");
                }
                path.add(new double[] {v.x, v.y, z});
            }
            for (int i = 1; i < path.size(); i++) {
                double[] a = path.get(i - 1), b = path.get(i);
                if (c.followsSurface() && (ground.solidTop(a[0], a[1]) != ground.solidTop(b[0], b[1])
                        || ground.solidTop((a[0] + b[0]) / 2, (a[1] + b[1]) / 2) != ground.solidTop(a[0], a[1]))) {
                    throw new UnsupportedOperationException("the reference lays conductors only on one flat surface: "
                            + c.id());
                }
                if (a[2] == b[2]) {
                    spans.add(new FlatSet(PlanShape.segment(a[0], a[1], b[0], b[1]), a[2]));
                } else if (a[0] == b[0] && a[1] == b[1]) {
                    spans.add(new FlatSet(PlanShape.point(a[0], a[1]), Math.max(a[2], b[2])));
                } else {
                    spans.add(new SlopedSegment(a, b));
                }
            }
        }
        return new ReferenceEnvelope(radius, pieces, spans, footprints, DIRECTIONS, CANDIDATES);
    }

    public double radius() {
        return radius;
    }

    /** Height of the solid's top at (x, y) from the footprints alone (rods and conductors excluded); 0 on open ground. */
    public double solidTop(double x, double y) {
        double top = 0;
        for (FlatSet f : footprints) {
            if (f.shape.distance(x, y) <= 1e-9) {
                top = Math.max(top, f.z);
            }
        }
        return top;
    }

    /**
     * D(c): the lowest admissible sphere-centre height over column (cx, cy). The solid (ground,
     * roofs, parapets, rods) demands z ≥ its D; a conductor, a thin line in the air, only keeps
     * centres out of the heights within R of it, one open interval (lo, hi) per leg over the column
     * (the R-neighbourhood of a segment is convex). The lowest admissible height is found by starting
     * at the solid's D and moving to the top of every interval it falls in, until none holds it.
     */
    public double centreHeight(double cx, double cy) {
        double d = radius;
        for (Piece piece : pieces) {
            d = Math.max(d, piece.centreHeight(cx, cy, radius, r2));
        }
        boolean moved = true;
        while (moved) {
            moved = false;
            for (Piece span : spans) {
                double hi = span.centreHeight(cx, cy, radius, r2);
                if (hi > d && span.lowestClear(cx, cy, radius, r2) < d) {
                    d = hi;
                    moved = true;
                }
            }
        }
        return d;
    }

    /** F(c) for target p: the lowest point over p of the sphere resting at column c; +∞ when c is out of reach. */
    public double sphereBottomOver(double px, double py, double cx, double cy) {
        double dx = cx - px, dy = cy - py;
        double d2 = dx * dx + dy * dy;
        if (d2 > r2) {
            return Double.POSITIVE_INFINITY;
        }
        return centreHeight(cx, cy) - Math.sqrt(r2 - d2);
    }

    /** E(p), within the bounds stated in the class comment. */
    public double heightAt(double px, double py) {
        return minimise(theta -> lowestAlongRay(px, py, Math.cos(theta), Math.sin(theta)),
                0, 2 * Math.PI, directions, true, candidates);
    }

    /** min over ρ ∈ [0, R] of F(p + ρ·u) for the unit direction u. */
    private double lowestAlongRay(double px, double py, double ux, double uy) {
        return minimise(rho -> sphereBottomOver(px, py, px + rho * ux, py + rho * uy),
                0, radius, RAY_STEPS, false, RAY_CANDIDATES);
    }

    /**
     * Minimum of f on [a, b]: f is sampled at n + 1 evenly spaced points (n points around the
     * circle when periodic); the lowest of the samples' local minima (at most k of them) are each
     * refined by golden-section search on the bracket between their two neighbouring samples.
     */
    static double minimise(DoubleUnaryOperator f, double a, double b, int n, boolean periodic, int k) {
        int m = periodic ? n : n + 1;
        double step = (b - a) / n;
        double[] v = new double[m];
        for (int i = 0; i < m; i++) {
            v[i] = f.applyAsDouble(a + i * step);
        }
        List<double[]> minima = new ArrayList<>();
        for (int i = 0; i < m; i++) {
            double left = i > 0 ? v[i - 1] : periodic ? v[m - 1] : Double.POSITIVE_INFINITY;
            double right = i < m - 1 ? v[i + 1] : periodic ? v[0] : Double.POSITIVE_INFINITY;
            if (v[i] < Double.POSITIVE_INFINITY && v[i] <= left && v[i] <= right) {
                minima.add(new double[] {v[i], i});
            }
        }
        minima.sort((x, y) -> Double.compare(x[0], y[0]));
        double best = minima.isEmpty() ? Double.POSITIVE_INFINITY : minima.get(0)[0];
        for (int j = 0; j < Math.min(k, minima.size()); j++) {
            double centre = a + minima.get(j)[1] * step;
            double lo = periodic ? centre - step : Math.max(a, centre - step);
            double hi = periodic ? centre + step : Math.min(b, centre + step);
            best = Math.min(best, goldenSection(f, lo, hi));
        }
        return best;
    }

    /** Golden-section search for the minimum of f on [lo, hi], {@value #GOLDEN_ITERATIONS} iterations. */
    private static double goldenSection(DoubleUnaryOperator f, double lo, double hi) {
        double g = (Math.sqrt(5) - 1) / 2;
        double x1 = hi - g * (hi - lo), x2 = lo + g * (hi - lo);
        double f1 = f.applyAsDouble(x1), f2 = f.applyAsDouble(x2);
        double best = Math.min(f1, f2);
        for (int i = 0; i < GOLDEN_ITERATIONS; i++) {
            if (f1 <= f2) {
                hi = x2;
                x2 = x1;
                f2 = f1;
                x1 = hi - g * (hi - lo);
                f1 = f.applyAsDouble(x1);
                best = Math.min(best, f1);
            } else {
                lo = x1;
                x1 = x2;
                f1 = f2;
                x2 = lo + g * (hi - lo);
                f2 = f.applyAsDouble(x2);
                best = Math.min(best, f2);
            }
        }
        return best;
    }

    /** A part of the solid's top, seen from a sphere centre. */
    private interface Piece {
        /** Lowest centre height over (cx, cy) that keeps the sphere out of this piece; −∞ when out of reach. */
        double centreHeight(double cx, double cy, double radius, double r2);

        /** Highest centre height over (cx, cy) that keeps the sphere under this piece; +∞ when out of reach. */
        double lowestClear(double cx, double cy, double radius, double r2);
    }

    /** A plan set (area, outline, segment or point) at one constant height. */
    private record FlatSet(PlanShape shape, double z) implements Piece {
        @Override
        public double centreHeight(double cx, double cy, double radius, double r2) {
            double d = shape.distance(cx, cy);
            return d <= radius ? z + Math.sqrt(r2 - d * d) : Double.NEGATIVE_INFINITY;
        }

        @Override
        public double lowestClear(double cx, double cy, double radius, double r2) {
            double d = shape.distance(cx, cy);
            return d <= radius ? z - Math.sqrt(r2 - d * d) : Double.POSITIVE_INFINITY;
        }
    }

    /** A conductor leg whose ends differ in height: maximise z(s) + √(R² − |c − q(s)|²) over the leg. */
    private record SlopedSegment(double[] a, double[] b) implements Piece {
        /** The highest point below the leg is the lowest point above the leg mirrored in z = 0, negated. */
        @Override
        public double lowestClear(double cx, double cy, double radius, double r2) {
            double[] ma = {a[0], a[1], -a[2]}, mb = {b[0], b[1], -b[2]};
            return -new SlopedSegment(ma, mb).centreHeight(cx, cy, radius, r2);
        }

        @Override
        public double centreHeight(double cx, double cy, double radius, double r2) {
            double vx = b[0] - a[0], vy = b[1] - a[1];
            double ux = cx - a[0], uy = cy - a[1];
            double vv = vx * vx + vy * vy, uv = ux * vx + uy * vy, uu = ux * ux + uy * uy;
            // |c − q(s)|² = uu − 2 s uv + s² vv ≤ R² on [lo, hi]
            double disc = uv * uv - vv * (uu - r2);
            if (disc < 0) {
                return Double.NEGATIVE_INFINITY;
            }
            double lo = Math.max(0, (uv - Math.sqrt(disc)) / vv), hi = Math.min(1, (uv + Math.sqrt(disc)) / vv);
            if (lo > hi) {
                return Double.NEGATIVE_INFINITY;
            }
            double best = Math.max(value(lo, uu, uv, vv, r2), value(hi, uu, uv, vv, r2));
            double g = (Math.sqrt(5) - 1) / 2;
            double x1 = hi - g * (hi - lo), x2 = lo + g * (hi - lo);
            double f1 = value(x1, uu, uv, vv, r2), f2 = value(x2, uu, uv, vv, r2);
            for (int k = 0; k < 100; k++) {
                if (f1 < f2) {
                    lo = x1;
                    x1 = x2;
                    f1 = f2;
                    x2 = lo + g * (hi - lo);
                    f2 = value(x2, uu, uv, vv, r2);
                } else {
                    hi = x2;
                    x2 = x1;
                    f2 = f1;
                    x1 = hi - g * (hi - lo);
                    f1 = value(x1, uu, uv, vv, r2);
                }
            }
            return Math.max(best, Math.max(f1, f2));
        }

        private double value(double s, double uu, double uv, double vv, double r2) {
            double d2 = uu - 2 * s * uv + s * s * vv;
            return a[2] + s * (b[2] - a[2]) + Math.sqrt(Math.max(0, r2 - d2));
        }
    }

    /**
     * A plan set given by rings of vertices: a filled polygon (even-odd over its rings), the rings
     * alone (an outline), one segment or one point. Distance is 0 inside a filled polygon and the
     * distance to the nearest ring segment otherwise.
     */
    static final class PlanShape {
        private final double[][] xs;
        private final double[][] ys;
        private final boolean filled;

        private PlanShape(double[][] xs, double[][] ys, boolean filled) {
            this.xs = xs;
            this.ys = ys;
            this.filled = filled;
        }

        static PlanShape area(Polygon p) {
            return fromRings(p, true);
        }

        static PlanShape outline(Polygon p) {
            return fromRings(p, false);
        }

        static PlanShape segment(double x0, double y0, double x1, double y1) {
            return new PlanShape(new double[][] {{x0, x1}}, new double[][] {{y0, y1}}, false);
        }

        static PlanShape point(double x, double y) {
            return new PlanShape(new double[][] {{x, x}}, new double[][] {{y, y}}, false);
        }

        private static PlanShape fromRings(Polygon p, boolean filled) {
            int n = 1 + p.getNumInteriorRing();
            double[][] xs = new double[n][], ys = new double[n][];
            for (int r = 0; r < n; r++) {
                LineString ring = r == 0 ? p.getExteriorRing() : p.getInteriorRingN(r - 1);
                Coordinate[] cs = ring.getCoordinates();
                xs[r] = new double[cs.length];
                ys[r] = new double[cs.length];
                for (int i = 0; i < cs.length; i++) {
                    xs[r][i] = cs[i].x;
                    ys[r][i] = cs[i].y;
                }
            }
            return new PlanShape(xs, ys, filled);
        }

        double distance(double x, double y) {
            if (filled && inside(x, y)) {
                return 0;
            }
            double best = Double.POSITIVE_INFINITY;
            for (int r = 0; r < xs.length; r++) {
                for (int i = 1; i < xs[r].length; i++) {
                    best = Math.min(best, segmentDistance(x, y, xs[r][i - 1], ys[r][i - 1], xs[r][i], ys[r][i]));
                }
            }
            return best;
        }

        /** Crossing-number test over all rings: a horizontal ray to +x crosses the boundary an odd number of times. */
        private boolean inside(double x, double y) {
            boolean in = false;
            for (int r = 0; r < xs.length; r++) {
                double[] rx = xs[r], ry = ys[r];
                for (int i = 1; i < rx.length; i++) {
                    double x0 = rx[i - 1], y0 = ry[i - 1], x1 = rx[i], y1 = ry[i];
                    if ((y0 > y) != (y1 > y)) {
                        double xc = x0 + (y - y0) / (y1 - y0) * (x1 - x0);
                        if (xc > x) {
                            in = !in;
                        }
                    }
                }
            }
            return in;
        }

        private static double segmentDistance(double px, double py, double ax, double ay, double bx, double by) {
            double vx = bx - ax, vy = by - ay;
            double len2 = vx * vx + vy * vy;
            double t = len2 == 0 ? 0 : Math.max(0, Math.min(1, ((px - ax) * vx + (py - ay) * vy) / len2));
            double dx = px - (ax + t * vx), dy = py - (ay + t * vy);
            return Math.sqrt(dx * dx + dy * dy);
        }
    }
}
