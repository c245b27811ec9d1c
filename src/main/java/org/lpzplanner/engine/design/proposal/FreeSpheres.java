package org.lpzplanner.engine.design.proposal;

import org.lpzplanner.engine.envelope.CentreSurface;
import org.lpzplanner.engine.envelope.EnvelopeField;
import org.lpzplanner.engine.envelope.EnvelopeRefiner;
import org.lpzplanner.engine.envelope.Grid;

/**
 * The spheres that touch a point of the structure from above without entering the solid, sampled
 * on rings round the point.
 *
 * <p>A sphere of radius R whose centre stands over column c at plan distance d ≤ R from p touches
 * p when its centre is at height z<sub>p</sub> + √(R² − d²); it is free when that is not below the
 * centre surface D(c) (domain model: the lowest free centre over each column). p is exposed exactly
 * when such a free centre exists. Here D is taken from the grid cells' lower bounds, so a sphere may
 * count as free that is not (a part then has to block more than it needs to: the safe side).
 *
 * <p>Sampling: n rings ({@value #RINGS} at first, more for what a first choice left) at d = R·k/n,
 * k = 0..n, with about one sample per R/n of circumference. Free spheres between samples can be missed; the proposal's
 * final check by the full analysis is what decides, this only guides the choice of parts.
 */
final class FreeSpheres {

    static final int RINGS = 10;

    /** Half the spacing of points sampled along a line: the stretch each point stands for, metres. */
    static final double STRETCH = ExposedPoints.LINE_SPACING / 2;

    /** Finest step of the search for a free sphere between the samples, metres. */
    static final double SEARCH_STEP = 0.01;

    /**
     * A sphere within this much of being free counts as free, metres: the analysis counts a point
     * within its 1 mm margin (plus the 1 mm tolerance of exact queries) of the envelope as exposed.
     */
    static final double FREE_SLACK = 0.003;

    private final int rings;

    private final CentreSurface surface;
    private final EnvelopeRefiner exact;
    private final Grid grid;
    private final double radius;

    FreeSpheres(EnvelopeField field, int rings) {
        this.rings = rings;
        this.surface = field.centres();
        this.exact = field.refiner();
        this.grid = surface.grid();
        this.radius = surface.radius();
    }

    /**
     * Free centres touching (x, y, z), as x, y, z triples, the centre straight above first; null
     * when no sample is free (the free spheres, if any, fall between the samples).
     */
    double[] at(ExposedPoints.Point p) {
        double x = p.x(), y = p.y(), z = p.z();
        double[] out = new double[3 * 512];
        int n = 0;
        // spheres in the plane across a line (edge, wall top, facade) and the sphere on a sloped
        // roof's normal: where the free spheres lie on a straight edge or plane, so they are
        // sampled finely on purpose rather than met by chance on the rings
        int fine = 4 * rings;
        if (p.dx() != 0 || p.dy() != 0) {
            for (int side = -1; side <= 1; side += 2) {
                double nx = -p.dy() * side, ny = p.dx() * side;
                for (int k = 1; k <= fine; k++) {
                    double d = radius * (k == fine ? 0.995 : (double) k / fine);
                    double cx = x + d * nx, cy = y + d * ny, cz = z + Math.sqrt(radius * radius - d * d);
                    if (isFree(cx, cy, cz)) {
                        out = put(out, n++, cx, cy, cz);
                    }
                }
                // the sphere grazing the line level with it (beside a wall taller than R), at both ends
                // of the stretch the point stands for: only a part along the line stops those, not
                // one standing at the point itself
                double d = radius * (1 - 1e-9), lift = Math.sqrt(radius * radius - d * d);
                for (int end = -1; end <= 1; end += 2) {
                    double ax = x + end * STRETCH * p.dx(), ay = y + end * STRETCH * p.dy();
                    if (isFree(ax + d * nx, ay + d * ny, z + lift)) {
                        out = put(out, n++, ax + d * nx, ay + d * ny, z + lift);
                    }
                }
            }
        }
        if (p.a() != 0 || p.b() != 0) {
            double s = Math.sqrt(1 + p.a() * p.a() + p.b() * p.b());
            double cx = x - radius * p.a() / s, cy = y - radius * p.b() / s, cz = z + radius / s;
            if (isFree(cx, cy, cz)) {
                out = put(out, n++, cx, cy, cz);
            }
        }
        for (int k = 0; k <= rings; k++) {
            double d = radius * (k == rings ? 0.995 : (double) k / rings);
            double s = Math.sqrt(radius * radius - d * d);
            int count = k == 0 ? 1 : Math.max(6, (int) Math.ceil(2 * Math.PI * k));
            for (int a = 0; a < count; a++) {
                double angle = 2 * Math.PI * (a + 0.5 * (k % 2)) / count;
                double cx = x + d * Math.cos(angle), cy = y + d * Math.sin(angle);
                double cz = z + s;
                if (isFree(cx, cy, cz)) {
                    out = put(out, n++, cx, cy, cz);
                }
            }
        }
        if (n == 0) {
            return nearestFree(x, y, z);
        }
        return java.util.Arrays.copyOf(out, 3 * n);
    }

    /**
     * When no sample is free, the free spheres (if any) fill a sliver between the samples, as at the
     * rim of an exposed piece of roof or at the foot of a higher wall. The sphere touching p that
     * enters the solid least, f(c) = D(c) − (z + √(R² − d²)) over centres c within R of p, is sought
     * from the best ring sample by a compass search (step R/rings halved down to
     * {@value #SEARCH_STEP} m); when it is free, it and the free centres round it are returned.
     */
    private double[] nearestFree(double x, double y, double z) {
        double bestX = x, bestY = y;
        double best = depth(x, y, z, x, y);
        for (int k = 1; k <= rings; k++) {
            double d = radius * (k == rings ? 0.995 : (double) k / rings);
            int count = Math.max(6, (int) Math.ceil(2 * Math.PI * k));
            for (int a = 0; a < count; a++) {
                double angle = 2 * Math.PI * (a + 0.5 * (k % 2)) / count;
                double cx = x + d * Math.cos(angle), cy = y + d * Math.sin(angle);
                double f = depth(x, y, z, cx, cy);
                if (f < best) {
                    best = f;
                    bestX = cx;
                    bestY = cy;
                }
            }
        }
        double step = radius / rings;
        while (step >= SEARCH_STEP && best > FREE_SLACK) {
            boolean moved = false;
            for (int a = 0; a < 8; a++) {
                double angle = Math.PI / 4 * a;
                double cx = bestX + step * Math.cos(angle), cy = bestY + step * Math.sin(angle);
                double f = depth(x, y, z, cx, cy);
                if (f < best) {
                    best = f;
                    bestX = cx;
                    bestY = cy;
                    moved = true;
                }
            }
            if (!moved) {
                step /= 2;
            }
        }
        if (best > FREE_SLACK) {
            return null;
        }
        double[] out = new double[3 * 9];
        int n = 0;
        out = put(out, n++, bestX, bestY, z + lift(x, y, bestX, bestY));
        for (int a = 0; a < 8; a++) {
            double angle = Math.PI / 4 * a;
            double cx = bestX + SEARCH_STEP * Math.cos(angle), cy = bestY + SEARCH_STEP * Math.sin(angle);
            if (Math.hypot(cx - x, cy - y) < radius && depth(x, y, z, cx, cy) <= FREE_SLACK) {
                out = put(out, n++, cx, cy, z + lift(x, y, cx, cy));
            }
        }
        return java.util.Arrays.copyOf(out, 3 * n);
    }

    /** How far the sphere centred over (cx, cy) and touching (x, y, z) enters the solid; ≤ 0 when free. */
    private double depth(double x, double y, double z, double cx, double cy) {
        double d2 = (cx - x) * (cx - x) + (cy - y) * (cy - y);
        if (d2 >= radius * radius * 0.995 * 0.995) {
            return Double.POSITIVE_INFINITY;
        }
        double cz = z + Math.sqrt(radius * radius - d2);
        double lower = lowestCentre(cx, cy) - cz;
        if (lower > FREE_SLACK) {
            return lower;
        }
        double depth = Math.max(lower, exact.centreHeight(cx, cy) - cz);
        // at or above the lowest free centre, but inside the space a wire keeps clear
        return depth <= FREE_SLACK && !exact.isFree(cx, cy, cz, FREE_SLACK) ? 2 * FREE_SLACK : depth;
    }

    private double lift(double x, double y, double cx, double cy) {
        return Math.sqrt(radius * radius - (cx - x) * (cx - x) - (cy - y) * (cy - y));
    }

    private boolean isFree(double cx, double cy, double cz) {
        return lowestCentre(cx, cy) - cz <= FREE_SLACK && exact.isFree(cx, cy, cz, FREE_SLACK);
    }

    private static double[] put(double[] out, int n, double cx, double cy, double cz) {
        double[] o = n * 3 + 3 > out.length ? java.util.Arrays.copyOf(out, out.length * 2) : out;
        o[3 * n] = cx;
        o[3 * n + 1] = cy;
        o[3 * n + 2] = cz;
        return o;
    }

    /** A value ≤ D at (x, y): the cell's lower bound; open ground (R) outside the grid. */
    private double lowestCentre(double x, double y) {
        if (!grid.contains(x, y)) {
            return radius;
        }
        return surface.cellLower(grid.column(x), grid.row(y));
    }
}
