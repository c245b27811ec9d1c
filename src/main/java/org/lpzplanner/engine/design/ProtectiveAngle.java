package org.lpzplanner.engine.design;

/**
 * Protective angle α of a vertical rod, derived from the rolling sphere by the equal-area rule.
 *
 * <p><b>Formula.</b> Take the section through a rod of height h ≤ R standing on a reference plane.
 * The sphere of radius R that touches the rod tip and the plane has its centre at (d<sub>c</sub>, R),
 * d<sub>c</sub> = √(h(2R − h)); its arc from the tip down to the plane bounds the protected area
 * <pre>
 *   A = ∫₀^d<sub>c</sub> (R − √(R² − (d<sub>c</sub> − x)²)) dx
 *     = R·d<sub>c</sub> − ∫₀^d<sub>c</sub> √(R² − u²) du
 *     = R·d<sub>c</sub> − [ d<sub>c</sub>(R − h)/2 + (R²/2)·asin(d<sub>c</sub>/R) ]
 *     = d<sub>c</sub>(R + h)/2 − (R²/2)·asin(d<sub>c</sub>/R)
 * </pre>
 * (the bracket is the area under the full circle between u = 0 and d<sub>c</sub>: a right triangle
 * with legs d<sub>c</sub> and √(R² − d<sub>c</sub>²) = R − h, plus a circular sector of angle
 * asin(d<sub>c</sub>/R)). The protective angle makes the cone's section, a right triangle with legs
 * h and h·tan α, equal in area: tan α = 2A / h². At h = R this gives tan α = 2(1 − π/4), α ≈ 23.2°
 * for every radius. Source: the geometry of IEC 62305-3:2010 Annex A; the standard's Table 2 /
 * Figure 1 reads about 71° at 2 m for class I and about 23° at h = R.
 *
 * <p><b>Limits.</b> The angle is held constant below {@value #MIN_HEIGHT} m (α(2 m)), as Figure 1
 * does; the method does not apply to a rod more than R above its reference plane (the standard
 * leaves those heights to the rolling sphere and mesh methods), and {@link #degrees} throws there.
 *
 * <p>Exact to floating-point rounding (no tabulated curve is read). Stateless and thread-safe.
 */
public final class ProtectiveAngle {

    /** Below this height above the reference plane the angle no longer grows, metres. */
    public static final double MIN_HEIGHT = 2.0;

    private ProtectiveAngle() {
    }

    /** True when the protective angle method applies to a rod {@code height} metres above its reference plane. */
    public static boolean isApplicable(double sphereRadius, double height) {
        return sphereRadius >= MIN_HEIGHT && height > 0 && height <= sphereRadius;
    }

    /**
     * tan α for a rod {@code height} metres above its reference plane and sphere radius R.
     *
     * @throws IllegalArgumentException when the height is not positive or exceeds R (method not applicable)
     */
    public static double tangent(double sphereRadius, double height) {
        if (!(sphereRadius >= MIN_HEIGHT) || Double.isInfinite(sphereRadius)) {
            throw new IllegalArgumentException("the protective angle needs a sphere radius of at least "
                    + MIN_HEIGHT + " m, got " + sphereRadius);
        }
        if (!(height > 0)) {
            throw new IllegalArgumentException("rod height above the reference plane must be positive, got " + height);
        }
        if (height > sphereRadius) {
            throw new IllegalArgumentException("the protective angle method does not apply to a rod " + height
                    + " m above its reference plane: above the sphere radius " + sphereRadius
                    + " m use the rolling sphere or mesh method");
        }
        double h = Math.max(height, MIN_HEIGHT);
        double r = sphereRadius;
        double dc = Math.sqrt(h * (2 * r - h));
        double area = dc * (r + h) / 2 - r * r / 2 * Math.asin(Math.min(1.0, dc / r));
        return 2 * area / (h * h);
    }

    /** α in degrees; see {@link #tangent} for the contract. */
    public static double degrees(double sphereRadius, double height) {
        return Math.toDegrees(Math.atan(tangent(sphereRadius, height)));
    }

    /**
     * Radius of the protected circle at depth {@code depth} below the rod tip, for a rod whose tip is
     * {@code heightAboveReference} metres above its reference plane: depth · tan α.
     */
    public static double protectedRadius(double sphereRadius, double heightAboveReference, double depth) {
        return depth <= 0 ? 0 : depth * tangent(sphereRadius, heightAboveReference);
    }
}
