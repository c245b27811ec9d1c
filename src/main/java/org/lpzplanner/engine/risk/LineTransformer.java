package org.lpzplanner.engine.risk;

/**
 * Whether a transformer separates the line from the structure, giving the line type factor C_T of
 * the flashes to it [IEC 62305-2:2010 Table A.3].
 */
public enum LineTransformer {
    /** Low-voltage power, telecommunication or data line. C_T = 1 [Table A.3; from memory — check against the standard]. */
    NONE(1, "low-voltage power, telecommunication or data line"),
    /** High-voltage power line with an HV/LV transformer. C_T = 0.2 [Table A.3; from memory — check against the standard]. */
    HV_LV_TRANSFORMER(0.2, "high-voltage power line with an HV/LV transformer");

    private final double ct;
    private final String description;

    LineTransformer(double ct, String description) {
        this.ct = ct;
        this.description = description;
    }

    /** C_T. */
    public double ct() {
        return ct;
    }

    /** Plain-words name for reports. */
    public String description() {
        return description;
    }
}
