package org.lpzplanner.engine.io;

/**
 * Independent check values for projection tests: lengths of one degree on the WGS84 ellipsoid from
 * its closed-form radii of curvature, computed here without proj4j.
 *
 * <p>Defining constants: semi-major axis a = 6,378,137 m and flattening f = 1/298.257223563 (the
 * WGS84 definition); e² = f(2 − f).
 */
final class Wgs84 {

    static final double A = 6_378_137.0;
    static final double F = 1 / 298.257223563;
    static final double E2 = F * (2 - F);

    private Wgs84() {}

    /**
     * Metres per degree of latitude at latitude φ: meridian radius of curvature
     * M = a(1 − e²)/(1 − e² sin²φ)^(3/2), times π/180.
     */
    static double metresPerDegreeLatitude(double latDeg) {
        double s = Math.sin(Math.toRadians(latDeg));
        return A * (1 - E2) / Math.pow(1 - E2 * s * s, 1.5) * Math.PI / 180;
    }

    /**
     * Metres per degree of longitude at latitude φ: prime-vertical radius of curvature
     * N = a/√(1 − e² sin²φ), times cos φ · π/180.
     */
    static double metresPerDegreeLongitude(double latDeg) {
        double s = Math.sin(Math.toRadians(latDeg));
        return A / Math.sqrt(1 - E2 * s * s) * Math.cos(Math.toRadians(latDeg)) * Math.PI / 180;
    }
}
