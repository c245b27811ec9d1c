package org.lpzplanner.engine.envelope;

import org.lpzplanner.engine.geom.PlanPolygon;
import org.lpzplanner.engine.geom.Plane;

/**
 * The interior of a planar face z = a·x + b·y + e over a plan polygon.
 *
 * <p>A sphere resting on the plane touches it at c + R·(a, b)/s, s = √(1 + a² + b²); when that
 * contact lies in the polygon, D = plane(c) + R·s. Otherwise the best contact lies on the face's
 * boundary, which its edges (separate {@link SegmentSupport}s) already cover, so this returns
 * "no constraint".
 */
public final class FaceSupport implements Support {

    private final PlanPolygon polygon;
    private final Plane plane;
    private final double offsetX;
    private final double offsetY;
    private final double lift;
    private final double radius;

    public FaceSupport(PlanPolygon polygon, Plane plane, double radius) {
        this.polygon = polygon;
        this.plane = plane;
        double s = plane.slopeFactor();
        this.offsetX = radius * plane.a() / s;
        this.offsetY = radius * plane.b() / s;
        this.lift = radius * s;
        this.radius = radius;
    }

    @Override
    public double centreHeight(double x, double y) {
        return polygon.contains(x + offsetX, y + offsetY) ? plane.z(x, y) + lift : Double.NEGATIVE_INFINITY;
    }

    @Override
    public double lowerBound(double x, double y, double half) {
        if (!polygon.containsSquare(x + offsetX, y + offsetY, half)) {
            return Double.NEGATIVE_INFINITY;
        }
        // D is linear on the square: its minimum is at a corner
        return plane.z(x, y) - (Math.abs(plane.a()) + Math.abs(plane.b())) * half + lift;
    }

    @Override
    public double upperBound(double x, double y, double half) {
        if (polygon.distance(x + offsetX, y + offsetY) > half * Math.sqrt(2)) {
            return Double.NEGATIVE_INFINITY;
        }
        return plane.z(x, y) + (Math.abs(plane.a()) + Math.abs(plane.b())) * half + lift;
    }

    /**
     * On a square whose contacts all lie in the face, D = plane(c) + R·s exactly, and
     * plane(c) − √(R² − b(c)²) is convex (linear plus the lower half of a circle), so it lies above
     * its tangent plane at the square's centre: a bound that is tight to second order near the
     * best centre.
     */
    @Override
    public double jointLowerBound(double cx, double cy, double half, double px, double py, double tx, double ty) {
        if (!polygon.containsSquare(cx + offsetX, cy + offsetY, half)) {
            return Double.NEGATIVE_INFINITY;
        }
        double signed, nx, ny, spread;
        if (tx == 0 && ty == 0) {
            double dx = cx - px, dy = cy - py;
            signed = Math.sqrt(dx * dx + dy * dy);
            nx = signed > 0 ? dx / signed : 0;
            ny = signed > 0 ? dy / signed : 0;
            spread = half * Math.sqrt(2);
        } else {
            nx = -ty;
            ny = tx;
            signed = nx * (cx - px) + ny * (cy - py);
            spread = half * (Math.abs(nx) + Math.abs(ny));
        }
        double r2 = radius * radius;
        if (Math.abs(signed) + spread >= radius) {
            return Double.NEGATIVE_INFINITY;
        }
        double s0 = Math.sqrt(r2 - signed * signed);
        double k = signed / s0;
        double gx = plane.a() + k * nx, gy = plane.b() + k * ny;
        return plane.z(cx, cy) + lift - s0 - half * (Math.abs(gx) + Math.abs(gy));
    }

    @Override
    public double[] reach() {
        return new double[] {polygon.minX() - offsetX, polygon.minY() - offsetY,
            polygon.maxX() - offsetX, polygon.maxY() - offsetY};
    }
}
