package org.lpzplanner.engine.io;

import org.lpzplanner.engine.model.Conductor;

/**
 * Bounds beyond which input is taken to be a mistake (wrong units, a stray coordinate) rather than
 * a real site, and the fixed resolution of circles.
 */
final class SiteLimits {

    /**
     * Most structures in one site: 25 times a 200-building district. More is a city, not a site;
     * such a file is split into sites analysed one by one.
     */
    static final int MAX_STRUCTURES = 5_000;

    /** Most air-termination parts (rods and conductors together) in one site. */
    static final int MAX_PARTS = 5_000;

    /**
     * Most vertices of all geometries of one site together (every position of every ring, line and
     * point as written, closing positions included): a 200-building district has about 1,000, and the
     * 10 MB upload limit holds about 250,000 positions.
     */
    static final int MAX_VERTICES = 200_000;

    /** Largest height, elevation or radius accepted, metres: taller than any building. */
    static final double MAX_HEIGHT = 1000;

    /**
     * Smallest height, size or radius other than zero, metres: a value below a centimetre is a unit
     * mistake or noise (a rod of 1e-9 m, a rooftop circle of 1e-9 m), not a part of a building.
     */
    static final double MIN_LENGTH = 0.01;

    /** Most vertices of one conductor, the same as a conductor drawn or typed through the app may have. */
    static final int MAX_CONDUCTOR_POINTS = Conductor.MAX_POINTS;

    /** Largest east-west or north-south extent of a site, metres. */
    static final double MAX_EXTENT = 20_000;

    /** Smallest footprint of a structure, m²: anything smaller is a unit mistake, not a building. */
    static final double MIN_FOOTPRINT_AREA = 1;

    /** Vertices of the regular polygon inscribed in a circle given as centre and radius. */
    static final int CIRCLE_VERTICES = 32;

    private SiteLimits() {}
}
