package org.lpzplanner.engine.envelope;

/**
 * A single solid point (a rod or mast tip): D(c) = z + √(R² − d²) for plan distance d ≤ R.
 */
public final class PointSupport implements Support {

    private final double x;
    private final double y;
    private final double z;
    private final double r2;
    private final double radius;

    public PointSupport(double x, double y, double z, double radius) {
        this.x = x;
        this.y = y;
        this.z = z;
        this.radius = radius;
        this.r2 = radius * radius;
    }

    @Override
    public double centreHeight(double cx, double cy) {
        double dx = cx - x, dy = cy - y;
        return at(z, r2, dx * dx + dy * dy);
    }

    @Override
    public double lowerBound(double cx, double cy, double half) {
        double dx = Math.abs(cx - x) + half, dy = Math.abs(cy - y) + half;
        return at(z, r2, dx * dx + dy * dy);
    }

    @Override
    public double upperBound(double cx, double cy, double half) {
        double dx = Math.max(0, Math.abs(cx - x) - half), dy = Math.max(0, Math.abs(cy - y) - half);
        return at(z, r2, dx * dx + dy * dy);
    }

    @Override
    public double[] reach() {
        return new double[] {x - radius, y - radius, x + radius, y + radius};
    }

    static double at(double z, double r2, double d2) {
        return d2 > r2 ? Double.NEGATIVE_INFINITY : z + Math.sqrt(r2 - d2);
    }
}
