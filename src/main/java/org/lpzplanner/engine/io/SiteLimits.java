package org.lpzplanner.engine.io;

/**
 * Bounds beyond which input is taken to be a mistake (wrong units, a stray coordinate) rather than
 * a real site, and the fixed resolution of circles.
 */
final class SiteLimits {

    /** Largest height, elevation or radius accepted, metres: taller than any building. */
    static final double MAX_HEIGHT = 1000;

    /** Largest east-west or north-south extent of a site, metres. */
    static final double MAX_EXTENT = 20_000;

    /** Smallest footprint of a structure, m²: anything smaller is a unit mistake, not a building. */
    static final double MIN_FOOTPRINT_AREA = 1;

    /** Vertices of the regular polygon inscribed in a circle given as centre and radius. */
    static final int CIRCLE_VERTICES = 32;

    private SiteLimits() {}
}
