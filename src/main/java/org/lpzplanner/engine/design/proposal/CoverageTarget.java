package org.lpzplanner.engine.design.proposal;

/**
 * A point of the structure that must be protected, with the sphere centres from which a free
 * sphere touches it: a part covers the point when it blocks every one of those spheres.
 *
 * @param centres free sphere centres as x, y, z triples; the first is the most nearly vertical one
 */
record CoverageTarget(double x, double y, double z, String ownerId, double[] centres) {

    int centreCount() {
        return centres.length / 3;
    }
}
