package org.lpzplanner.engine.geom;

import java.util.ArrayList;
import java.util.List;
import org.locationtech.jts.geom.Coordinate;

/**
 * The top of the solid under a straight plan segment a→b: the elevation of whatever lies beneath
 * each point (roof faces, rooftop objects, parapet tops, 0 on open ground), as a function of the
 * segment parameter t ∈ [0, 1].
 *
 * <p>The profile is exact and piecewise linear: it breaks wherever the segment crosses or meets the
 * boundary of a face, and where two overlapping faces' planes cross. Between breaks it is linear;
 * at a break it may jump (a step between roofs of different height, the wall of a structure) or
 * spike (a parapet's top, which has no width in the model). {@link #before}, {@link #at} and
 * {@link #after} give the left limit, the value at the break (the highest solid there, boundaries
 * included) and the right limit.
 *
 * <p>Immutable and thread-safe.
 */
public final class SurfaceProfile {

    /** Breaks closer than this in t are one. */
    private static final double SAME_T = 1e-12;

    /** A point this close to a parapet's line (metres) lies on it. */
    static final double ON_LINE = 1e-6;

    private final double[] t;
    private final double[] before;
    private final double[] at;
    private final double[] after;

    private SurfaceProfile(double[] t, double[] before, double[] at, double[] after) {
        this.t = t;
        this.before = before;
        this.at = at;
        this.after = after;
    }

    /** The profile under the plan segment from (ax, ay) to (bx, by). */
    static SurfaceProfile along(SiteSurface surface, double ax, double ay, double bx, double by) {
        List<Integer> faces = surface.facesNear(Math.min(ax, bx), Math.min(ay, by), Math.max(ax, bx), Math.max(ay, by));
        List<Double> breaks = new ArrayList<>(List.of(0.0, 1.0));
        for (int f : faces) {
            PlanPolygon p = surface.facePolygon(f);
            p.forEachSide((px, py, qx, qy) -> crossings(ax, ay, bx, by, px, py, qx, qy, breaks));
        }
        breaks.sort(Double::compare);
        List<Double> ts = new ArrayList<>();
        for (double v : breaks) {
            if (v >= 0 && v <= 1 && (ts.isEmpty() || v - ts.get(ts.size() - 1) > SAME_T)) {
                ts.add(v);
            }
        }
        // split each interval where the planes of the faces over it cross
        List<Double> all = new ArrayList<>();
        for (int i = 0; i < ts.size(); i++) {
            all.add(ts.get(i));
            if (i + 1 < ts.size()) {
                double t0 = ts.get(i), t1 = ts.get(i + 1);
                List<double[]> lines = linesOver(surface, faces, ax, ay, bx, by, (t0 + t1) / 2);
                List<Double> inner = new ArrayList<>();
                for (int a = 0; a < lines.size(); a++) {
                    for (int b = a + 1; b < lines.size(); b++) {
                        double dz = lines.get(a)[1] - lines.get(b)[1];
                        if (dz != 0) {
                            double tc = (lines.get(b)[0] - lines.get(a)[0]) / dz;
                            if (tc > t0 + SAME_T && tc < t1 - SAME_T) {
                                inner.add(tc);
                            }
                        }
                    }
                }
                inner.sort(Double::compare);
                all.addAll(inner);
            }
        }
        int n = all.size();
        double[] tt = new double[n], bef = new double[n], at = new double[n], aft = new double[n];
        for (int i = 0; i < n; i++) {
            tt[i] = all.get(i);
        }
        for (int i = 0; i < n; i++) {
            double ti = tt[i];
            at[i] = surface.solidTop(ax + ti * (bx - ax), ay + ti * (by - ay));
            bef[i] = i == 0 ? at[i] : upper(surface, faces, ax, ay, bx, by, (tt[i - 1] + ti) / 2, ti);
            aft[i] = i == n - 1 ? at[i] : upper(surface, faces, ax, ay, bx, by, (ti + tt[i + 1]) / 2, ti);
        }
        return new SurfaceProfile(tt, bef, at, aft);
    }

    /** Number of breaks, the ends included. */
    public int size() {
        return t.length;
    }

    /** Parameter of break i. */
    public double t(int i) {
        return t[i];
    }

    /** The limit from the left at break i (the value at it for the first break). */
    public double before(int i) {
        return before[i];
    }

    /** The highest solid exactly at break i. */
    public double at(int i) {
        return at[i];
    }

    /** The limit from the right at break i (the value at it for the last break). */
    public double after(int i) {
        return after[i];
    }

    /**
     * Each line over the interval containing parameter tm, as {intercept, slope} in t: the planes of
     * the faces containing that point and the parapets whose line runs through it.
     */
    private static List<double[]> linesOver(SiteSurface surface, List<Integer> faces, double ax, double ay, double bx,
            double by, double tm) {
        double mx = ax + tm * (bx - ax), my = ay + tm * (by - ay);
        List<double[]> out = new ArrayList<>();
        for (int f : faces) {
            if (surface.facePolygon(f).contains(mx, my)) {
                Plane p = surface.faces().get(f).plane();
                double z0 = p.z(ax, ay), z1 = p.z(bx, by);
                out.add(new double[] {z0, z1 - z0});
            }
        }
        for (RoofEdge e : surface.edges()) {
            if (e.kind() == EdgeKind.PARAPET && SiteSurface.distanceToLine(mx, my, e) <= ON_LINE) {
                double z0 = parapetTopAt(e, ax, ay), z1 = parapetTopAt(e, bx, by);
                out.add(new double[] {z0, z1 - z0});
            }
        }
        return out;
    }

    /** The highest of the lines over the interval containing tm, evaluated at t. */
    private static double upper(SiteSurface surface, List<Integer> faces, double ax, double ay, double bx, double by,
            double tm, double t) {
        double best = 0;
        for (double[] l : linesOver(surface, faces, ax, ay, bx, by, tm)) {
            best = Math.max(best, l[0] + l[1] * t);
        }
        return best;
    }

    /** The parapet's top height continued along its own line, at the projection of (x, y). */
    private static double parapetTopAt(RoofEdge e, double x, double y) {
        Coordinate a = e.p0(), b = e.p1();
        double vx = b.x - a.x, vy = b.y - a.y, len2 = vx * vx + vy * vy;
        double s = len2 == 0 ? 0 : ((x - a.x) * vx + (y - a.y) * vy) / len2;
        return a.getZ() + s * (b.getZ() - a.getZ());
    }

    /** Adds the parameters on a→b where it meets the segment p→q (both ends of a shared stretch when collinear). */
    private static void crossings(double ax, double ay, double bx, double by, double px, double py, double qx,
            double qy, List<Double> out) {
        double rx = bx - ax, ry = by - ay, sx = qx - px, sy = qy - py;
        double denom = rx * sy - ry * sx;
        double wx = px - ax, wy = py - ay;
        double rr = rx * rx + ry * ry;
        if (rr == 0) {
            return;
        }
        double scale = Math.sqrt(rr) * Math.sqrt(sx * sx + sy * sy);
        if (Math.abs(denom) <= 1e-12 * scale) {
            // parallel: collinear when p lies on the line of a→b
            if (Math.abs(wx * ry - wy * rx) / Math.sqrt(rr) > ON_LINE) {
                return;
            }
            double tp = (wx * rx + wy * ry) / rr, tq = ((qx - ax) * rx + (qy - ay) * ry) / rr;
            double lo = Math.max(0, Math.min(tp, tq)), hi = Math.min(1, Math.max(tp, tq));
            if (lo <= hi) {
                out.add(lo);
                out.add(hi);
            }
            return;
        }
        double t = (wx * sy - wy * sx) / denom;
        double u = (wx * ry - wy * rx) / denom;
        double slack = 1e-12;
        if (t >= -slack && t <= 1 + slack && u >= -slack && u <= 1 + slack) {
            out.add(Math.max(0, Math.min(1, t)));
        }
    }
}
