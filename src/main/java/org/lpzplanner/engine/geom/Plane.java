package org.lpzplanner.engine.geom;

/** A non-vertical plane z = a·x + b·y + e in local metres. */
public record Plane(double a, double b, double e) {

    public static Plane horizontal(double z) {
        return new Plane(0, 0, z);
    }

    public double z(double x, double y) {
        return a * x + b * y + e;
    }

    public boolean isHorizontal() {
        return a == 0 && b == 0;
    }

    /** Slope factor √(1 + a² + b²): the ratio of true area to plan area. */
    public double slopeFactor() {
        return Math.sqrt(1 + a * a + b * b);
    }
}
