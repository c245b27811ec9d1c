package org.lpzplanner.engine.reference;

/**
 * Closed-form protection envelopes of simple scenes, derived from the rolling-sphere geometry
 * (sphere of radius R rolled over everything, solid down to flat ground). Each method states its
 * derivation; they are the check values of the closed-form tests.
 */
public final class ClosedForms {

    private ClosedForms() {
    }

    /**
     * Protected radius at ground level of a rod (or, in section, of a horizontal edge or conductor)
     * of height h ≤ R: the sphere resting on the ground (centre at height R) and touching the tip
     * has its centre at plan distance d<sub>c</sub> with d<sub>c</sub>² + (R − h)² = R², so
     * d<sub>c</sub> = √(h(2R − h)). Rolling sphere geometry, closed form.
     */
    public static double protectedRadius(double radius, double h) {
        return Math.sqrt(h * (2 * radius - h));
    }

    /**
     * Envelope at plan distance x from a rod of height h ≤ R on open ground (or from a long
     * horizontal edge or conductor at height h, measured across it): the lowest point over x of the
     * sphere resting on the ground and touching the tip, R − √(R² − (d<sub>c</sub> − x)²) for
     * x &lt; d<sub>c</sub>, and 0 from d<sub>c</sub> on, where a sphere on the ground touches the
     * ground. At x = 0 it is h. Rolling sphere geometry, closed form.
     */
    public static double beside(double radius, double h, double x) {
        double dc = protectedRadius(radius, h);
        if (x >= dc) {
            return 0;
        }
        return radius - Math.sqrt(radius * radius - (dc - x) * (dc - x));
    }

    /**
     * Penetration depth of the sphere between two supports a plan distance d apart at equal height
     * when it rests on both: p = R − √(R² − (d/2)²). IEC 62305-3:2010 Annex A (rolling sphere
     * method), and rolling sphere geometry.
     */
    public static double penetrationDepth(double radius, double d) {
        return radius - Math.sqrt(radius * radius - d * d / 4);
    }

    /**
     * Envelope midway between two rods of height h ≤ R spaced d apart on open ground. The sphere
     * touching both tips with its centre above the midpoint reaches only h − p; the sphere that
     * rests on the ground and touches both tips, centred beside the line through the rods, reaches
     * lower: its centre is at height R and plan distance y from the midpoint with
     * (d/2)² + y² + (R − h)² = R², so its lowest point over the midpoint is
     * R − √(R² − y²) = R − √((d/2)² + (R − h)²). It exists while d/2 &lt; d<sub>c</sub>
     * (equivalently h &gt; p); otherwise a sphere on the ground reaches the midpoint and E = 0.
     * Rolling sphere geometry, closed form.
     */
    public static double midwayBetweenRods(double radius, double h, double d) {
        if (d / 2 >= protectedRadius(radius, h)) {
            return 0;
        }
        return radius - Math.sqrt(d * d / 4 + (radius - h) * (radius - h));
    }

    /**
     * Envelope midway between two long parallel horizontal conductors at height h spaced d apart:
     * no sphere can pass between them to the ground (a sphere touching both has its centre at
     * h + √(R² − (d/2)²) wherever it is along them), so E = h − p, or 0 when h ≤ p. IEC 62305-3
     * Annex A penetration depth; rolling sphere geometry.
     */
    public static double midwayBetweenConductors(double radius, double h, double d) {
        return Math.max(0, h - penetrationDepth(radius, d));
    }

    /**
     * Envelope at distance x (0 &lt; x &lt; R) outside a long wall higher than R: the sphere
     * resting on the ground against the wall (centre at height R, plan distance R from the wall)
     * has its lowest point over x at R − √(R² − (R − x)²); the facade is exposed from height R
     * up. Rolling sphere geometry, closed form.
     */
    public static double besideTallWall(double radius, double x) {
        if (x >= radius) {
            return 0;
        }
        return radius - Math.sqrt(radius * radius - (radius - x) * (radius - x));
    }

    /**
     * Envelope at plan distance x across a long horizontal wire at height H over open ground, the
     * wire a thin line with free space beneath it, for 4R/3 ≤ H. Over a column at plan distance u
     * from the wire, a sphere resting on the ground (centre at height R) clears the wire iff
     * u² + (H − R)² ≥ R², i.e. |u| ≥ u<sub>0</sub> = √(R² − (H − R)²) (H &lt; 2R); there the lowest
     * free centre is R, nearer the wire it rests on the wire, at H + √(R² − u²). The ground-resting
     * spheres reach R − √(R² − (u<sub>0</sub> − |x|)²) over x for |x| &lt; u<sub>0</sub> and the
     * ground itself beyond; those resting on the wire stay at or above H + √(R² − u<sub>0</sub>²) − R
     * = 2H − 2R, which is not below 2R − H (the ground-resting value at x = 0, its largest) when
     * 3H ≥ 4R. From H = 2R on, a sphere passes under the wire on the ground: E = 0 everywhere.
     * Rolling sphere geometry, closed form.
     */
    public static double underHighWire(double radius, double h, double x) {
        if (3 * h < 4 * radius) {
            throw new IllegalArgumentException("the closed form holds for H ≥ 4R/3");
        }
        if (h >= 2 * radius) {
            return 0;
        }
        double u0 = Math.sqrt(radius * radius - (h - radius) * (h - radius));
        double ax = Math.abs(x);
        return ax >= u0 ? 0 : radius - Math.sqrt(radius * radius - (u0 - ax) * (u0 - ax));
    }
}
