package org.lpzplanner.engine.model;

/**
 * The four lightning protection levels with every parameter the product uses, in one table.
 *
 * <p>Sources: sphere radius and mesh size IEC 62305-3:2010 Table 2; peak currents IEC 62305-1:2010
 * Tables 3-5; interception probability IEC 62305-1; typical down-conductor spacing IEC 62305-3
 * Table 4; k<sub>i</sub> IEC 62305-3 Table 10; P<sub>B</sub> IEC 62305-2 Table B.2 (recalled, not
 * re-checked against the text).
 */
public enum ProtectionLevel {
    I(20, 5, 3, 0.99, 200, 10, 0.08, 0.02),
    II(30, 10, 5, 0.97, 150, 10, 0.06, 0.05),
    III(45, 15, 10, 0.91, 100, 15, 0.04, 0.10),
    IV(60, 20, 16, 0.84, 100, 20, 0.04, 0.20);

    private final double sphereRadius;
    private final double meshSize;
    private final double minPeakCurrentKa;
    private final double interceptionProbability;
    private final double maxPeakCurrentKa;
    private final double downConductorSpacing;
    private final double ki;
    private final double damageProbabilityWithLps;

    ProtectionLevel(double sphereRadius, double meshSize, double minPeakCurrentKa, double interceptionProbability,
            double maxPeakCurrentKa, double downConductorSpacing, double ki, double damageProbabilityWithLps) {
        this.sphereRadius = sphereRadius;
        this.meshSize = meshSize;
        this.minPeakCurrentKa = minPeakCurrentKa;
        this.interceptionProbability = interceptionProbability;
        this.maxPeakCurrentKa = maxPeakCurrentKa;
        this.downConductorSpacing = downConductorSpacing;
        this.ki = ki;
        this.damageProbabilityWithLps = damageProbabilityWithLps;
    }

    /** Rolling sphere radius R in metres. */
    public double sphereRadius() { return sphereRadius; }

    /** Side of a square mesh for the mesh method, in metres. */
    public double meshSize() { return meshSize; }

    /** Smallest peak current the level intercepts, kA. */
    public double minPeakCurrentKa() { return minPeakCurrentKa; }

    /** Probability that a flash's peak current exceeds the minimum (is intercepted). */
    public double interceptionProbability() { return interceptionProbability; }

    /** Largest peak current the level is designed for, kA. */
    public double maxPeakCurrentKa() { return maxPeakCurrentKa; }

    /** Typical spacing between down-conductors along the perimeter, metres. */
    public double downConductorSpacing() { return downConductorSpacing; }

    /** Coefficient k<sub>i</sub> of the separation distance formula. */
    public double ki() { return ki; }

    /** Probability of physical damage with an LPS of this class fitted. */
    public double damageProbabilityWithLps() { return damageProbabilityWithLps; }

    /**
     * Striking distance from the electrogeometric model, R = 10 I^0.65 (R in m, I in kA),
     * IEC 62305-1 Annex A.
     */
    public static double strikingDistance(double peakCurrentKa) {
        return 10.0 * Math.pow(peakCurrentKa, 0.65);
    }

    /** Parses "I".."IV" (also "1".."4"), case-insensitive; null when it is none of those. */
    public static ProtectionLevel parse(String text) {
        if (text == null) {
            return null;
        }
        switch (text.trim().toUpperCase()) {
            case "I": case "1": return I;
            case "II": case "2": return II;
            case "III": case "3": return III;
            case "IV": case "4": return IV;
            default: return null;
        }
    }
}
