package org.lpzplanner.engine.envelope;

/**
 * A piece of the solid (point, straight segment or planar face) seen from the sphere's centre.
 *
 * <p>For a sphere of radius R, {@link #centreHeight} is D<sub>k</sub>(c): the lowest height a
 * sphere centre may have over column c without the sphere entering this piece (everything is solid
 * down to the ground). Without free spans the site's centre surface is
 * D(c) = max(R, max<sub>k</sub> D<sub>k</sub>(c)); {@link CentreHeights} combines supports in general.
 * {@code NEGATIVE_INFINITY} means "no constraint here". The two bound methods enclose D<sub>k</sub>
 * over an axis-aligned square and are what make the envelope conservative.
 *
 * <p>A support with {@link #hasSpaceBelow()} is a conductor with free space beneath it
 * ({@link SpanSupport}): a sphere may also pass under it, so it excludes only the centres between
 * {@link #floorHeight} and {@link #centreHeight} over each column.
 */
public interface Support {

    /** D<sub>k</sub> at the column (x, y), exact up to rounding. */
    double centreHeight(double x, double y);

    /** A value ≤ D<sub>k</sub>(c) for every c in the square of half-side {@code half} around (x, y). */
    double lowerBound(double x, double y, double half);

    /** A value ≥ D<sub>k</sub>(c) for every c in the square. */
    double upperBound(double x, double y, double half);

    /**
     * A value ≤ D<sub>k</sub>(c) − √(R² − b(c)²) for every c in the square whose target distance is
     * at most R, where b(c) is the plan distance from c to the point p = (px, py) when the tangent
     * (tx, ty) is zero, or to the line through p along the unit tangent otherwise (a lower bound of
     * the distance to a segment on that line). −∞ when this piece gives no joint bound. Bounding
     * the difference as one function keeps the bound tight where it is nearly constant (right at a
     * rod tip, or across an edge under a conductor), which separate bounds of the terms cannot do.
     */
    default double jointLowerBound(double x, double y, double half, double px, double py, double tx, double ty) {
        return Double.NEGATIVE_INFINITY;
    }

    /** Plan bounding box of where this piece constrains centres: [minX, minY, maxX, maxY]. */
    double[] reach();

    /** True for a conductor with free space beneath it: centres below {@link #floorHeight} are free of it. */
    default boolean hasSpaceBelow() {
        return false;
    }

    /**
     * For a support with space below: the highest centre height over column c at which a sphere
     * clears it from below (+∞ where it does not constrain the column); −∞ for solid supports.
     */
    default double floorHeight(double x, double y) {
        return Double.NEGATIVE_INFINITY;
    }

    /** A value ≥ {@link #floorHeight} for every column in the square; −∞ for solid supports. */
    default double floorUpperBound(double x, double y, double half) {
        return Double.NEGATIVE_INFINITY;
    }
}
