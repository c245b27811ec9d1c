package org.lpzplanner.engine.risk;

/**
 * How an incoming line is laid, giving the installation factor C_I of the flashes to it
 * [IEC 62305-2:2010 Table A.2].
 */
public enum LineInstallation {
    /** C_I = 1 [Table A.2; from memory — check against the standard]. */
    OVERHEAD(1, "overhead"),
    /** C_I = 0.5 [Table A.2; from memory — check against the standard]. */
    BURIED(0.5, "buried"),
    /**
     * Buried cables running entirely within a meshed earth-termination (IEC 62305-4).
     * C_I = 0.01 [Table A.2; from memory — check against the standard].
     */
    BURIED_IN_MESHED_EARTH(0.01, "buried entirely within a meshed earth-termination");

    private final double ci;
    private final String description;

    LineInstallation(double ci, String description) {
        this.ci = ci;
        this.description = description;
    }

    /** C_I. */
    public double ci() {
        return ci;
    }

    /** Plain-words name for reports. */
    public String description() {
        return description;
    }
}
