package org.lpzplanner.engine.risk;

/**
 * The surroundings of an incoming line, giving the environmental factor C_E of the flashes to it
 * [IEC 62305-2:2010 Table A.4].
 */
public enum LineEnvironment {
    /** C_E = 1 [Table A.4; from memory — check against the standard]. */
    RURAL(1, "rural"),
    /** C_E = 0.5 [Table A.4; from memory — check against the standard]. */
    SUBURBAN(0.5, "suburban"),
    /** C_E = 0.1 [Table A.4; from memory — check against the standard]. */
    URBAN(0.1, "urban"),
    /** Buildings higher than 20 m. C_E = 0.01 [Table A.4; from memory — check against the standard]. */
    URBAN_WITH_TALL_BUILDINGS(0.01, "urban with buildings higher than 20 m");

    private final double ce;
    private final String description;

    LineEnvironment(double ce, String description) {
        this.ce = ce;
        this.description = description;
    }

    /** C_E. */
    public double ce() {
        return ce;
    }

    /** Plain-words name for reports. */
    public String description() {
        return description;
    }
}
