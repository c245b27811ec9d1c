package org.lpzplanner.engine.envelope;

/**
 * A piece of the solid (point, straight segment or planar face) seen from the sphere's centre.
 *
 * <p>For a sphere of radius R, {@link #centreHeight} is D<sub>k</sub>(c): the lowest height a
 * sphere centre may have over column c without the sphere entering this piece (everything is solid
 * down to the ground). The site's centre surface is D(c) = max(R, max<sub>k</sub> D<sub>k</sub>(c)).
 * {@code NEGATIVE_INFINITY} means "no constraint here". The two bound methods enclose D<sub>k</sub>
 * over an axis-aligned square and are what make the envelope conservative.
 */
public interface Support {

    /** D<sub>k</sub> at the column (x, y), exact up to rounding. */
    double centreHeight(double x, double y);

    /** A value ≤ D<sub>k</sub>(c) for every c in the square of half-side {@code half} around (x, y). */
    double lowerBound(double x, double y, double half);

    /** A value ≥ D<sub>k</sub>(c) for every c in the square. */
    double upperBound(double x, double y, double half);

    /** Plan bounding box of where this piece constrains centres: [minX, minY, maxX, maxY]. */
    double[] reach();
}
