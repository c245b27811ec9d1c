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

    @Override
    public double[] reach() {
        return new double[] {polygon.minX() - offsetX, polygon.minY() - offsetY,
            polygon.maxX() - offsetX, polygon.maxY() - offsetY};
    }
}
