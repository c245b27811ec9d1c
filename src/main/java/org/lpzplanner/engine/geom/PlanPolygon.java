package org.lpzplanner.engine.geom;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.LinearRing;
import org.locationtech.jts.geom.Polygon;

/**
 * A polygon with holes as flat coordinate arrays, for the point-in-polygon and distance-to-boundary
 * tests in the engine's inner loops (JTS objects are too heavy there).
 *
 * <p>Thread-safe (immutable). Boundary points count as inside.
 */
public final class PlanPolygon {

    private final double[][] xs;
    private final double[][] ys;
    private final double minX;
    private final double minY;
    private final double maxX;
    private final double maxY;

    public PlanPolygon(Polygon polygon) {
        int n = 1 + polygon.getNumInteriorRing();
        xs = new double[n][];
        ys = new double[n][];
        double x0 = Double.POSITIVE_INFINITY, y0 = Double.POSITIVE_INFINITY;
        double x1 = Double.NEGATIVE_INFINITY, y1 = Double.NEGATIVE_INFINITY;
        for (int r = 0; r < n; r++) {
            LinearRing ring = r == 0 ? polygon.getExteriorRing() : polygon.getInteriorRingN(r - 1);
            Coordinate[] cs = ring.getCoordinates();
            xs[r] = new double[cs.length];
            ys[r] = new double[cs.length];
            for (int i = 0; i < cs.length; i++) {
                xs[r][i] = cs[i].x;
                ys[r][i] = cs[i].y;
                x0 = Math.min(x0, cs[i].x);
                y0 = Math.min(y0, cs[i].y);
                x1 = Math.max(x1, cs[i].x);
                y1 = Math.max(y1, cs[i].y);
            }
        }
        minX = x0;
        minY = y0;
        maxX = x1;
        maxY = y1;
    }

    public double minX() { return minX; }
    public double minY() { return minY; }
    public double maxX() { return maxX; }
    public double maxY() { return maxY; }

    /** Even-odd crossing test over all rings. */
    public boolean contains(double x, double y) {
        if (x < minX || x > maxX || y < minY || y > maxY) {
            return false;
        }
        boolean inside = false;
        for (int r = 0; r < xs.length; r++) {
            double[] rx = xs[r], ry = ys[r];
            for (int i = 0, j = rx.length - 1; i < rx.length; j = i++) {
                if ((ry[i] > y) != (ry[j] > y)
                        && x < (rx[j] - rx[i]) * (y - ry[i]) / (ry[j] - ry[i]) + rx[i]) {
                    inside = !inside;
                }
            }
        }
        return inside || distanceToBoundary(x, y) < 1e-9;
    }

    /** Planar distance from (x, y) to the nearest point on any ring. */
    public double distanceToBoundary(double x, double y) {
        double best = Double.POSITIVE_INFINITY;
        for (int r = 0; r < xs.length; r++) {
            double[] rx = xs[r], ry = ys[r];
            for (int i = 1; i < rx.length; i++) {
                best = Math.min(best, segmentDistanceSq(x, y, rx[i - 1], ry[i - 1], rx[i], ry[i]));
            }
        }
        return Math.sqrt(best);
    }

    /** Planar distance from (x, y) to the polygon: 0 inside. */
    public double distance(double x, double y) {
        return contains(x, y) ? 0 : distanceToBoundary(x, y);
    }

    /** True when the whole axis-aligned square of half-side {@code half} around (x, y) lies in the polygon. */
    public boolean containsSquare(double x, double y, double half) {
        return x - half >= minX && x + half <= maxX && y - half >= minY && y + half <= maxY
                && contains(x, y) && distanceToBoundary(x, y) >= half * Math.sqrt(2);
    }

    /** One side of a ring, from (px, py) to (qx, qy). */
    @FunctionalInterface
    public interface SideVisitor {
        void side(double px, double py, double qx, double qy);
    }

    /** Visits every side of every ring. */
    public void forEachSide(SideVisitor visitor) {
        for (int r = 0; r < xs.length; r++) {
            double[] rx = xs[r], ry = ys[r];
            for (int i = 1; i < rx.length; i++) {
                visitor.side(rx[i - 1], ry[i - 1], rx[i], ry[i]);
            }
        }
    }

    static double segmentDistanceSq(double px, double py, double ax, double ay, double bx, double by) {
        double vx = bx - ax, vy = by - ay;
        double len2 = vx * vx + vy * vy;
        double t = len2 == 0 ? 0 : ((px - ax) * vx + (py - ay) * vy) / len2;
        t = t < 0 ? 0 : (t > 1 ? 1 : t);
        double dx = px - (ax + t * vx), dy = py - (ay + t * vy);
        return dx * dx + dy * dy;
    }
}
