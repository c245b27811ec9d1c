package org.lpzplanner.engine.risk;

import org.lpzplanner.engine.model.ProtectionLevel;

/**
 * Surge protective devices (SPDs) of the lightning equipotential bonding where a line enters the
 * structure, giving P_EB [IEC 62305-2:2010 Table B.7]: the LPL for which the SPDs are designed.
 */
public enum EntrySurgeProtection {
    /** No SPD. P_EB = 1 [Table B.7; from memory — check against the standard]. */
    NONE(1, "no SPD at the entry"),
    /** SPDs designed for LPL III or IV. P_EB = 0.05 [Table B.7; from memory — check against the standard]. */
    LPL_III_IV(0.05, "SPDs for LPL III or IV at the entry"),
    /** SPDs designed for LPL II. P_EB = 0.02 [Table B.7; from memory — check against the standard]. */
    LPL_II(0.02, "SPDs for LPL II at the entry"),
    /** SPDs designed for LPL I. P_EB = 0.01 [Table B.7; from memory — check against the standard]. */
    LPL_I(0.01, "SPDs for LPL I at the entry"),
    /**
     * SPDs with better protection characteristics than needed for LPL I (higher current rating,
     * lower protection level). The standard gives a range, 0.005 to 0.001; the upper end is taken,
     * P_EB = 0.005 [Table B.7, note; from memory — check against the standard].
     */
    BETTER_THAN_LPL_I(0.005, "SPDs better than needed for LPL I at the entry");

    private final double peb;
    private final String description;

    EntrySurgeProtection(double peb, String description) {
        this.peb = peb;
        this.description = description;
    }

    /** P_EB. */
    public double peb() {
        return peb;
    }

    /** Plain-words name for reports. */
    public String description() {
        return description;
    }

    /**
     * The SPDs the lightning equipotential bonding of an LPS of this protection level puts at each
     * line entry [IEC 62305-3:2010 6.2: bonding of incoming lines is part of the LPS; IEC 62305-2:2010
     * Table B.7]: LPL I for level I, II for II, III or IV for III and IV.
     */
    public static EntrySurgeProtection ofLevel(ProtectionLevel level) {
        return switch (level) {
            case I -> LPL_I;
            case II -> LPL_II;
            case III, IV -> LPL_III_IV;
        };
    }
}
