package org.lpzplanner.engine.risk;

/**
 * Structures whose R1 this estimate does not give. For them R1 also holds R_C and R_M (failure of
 * internal systems by flashes to and near the structure) and R_W and R_Z (by flashes to and near
 * the lines) [IEC 62305-2:2010, composition of R1: those four only for structures with a risk of
 * explosion, and for hospitals with life-saving electrical equipment or other structures where a
 * failure of internal systems immediately endangers human life]. They are not computed here, so
 * a result without them would understate R1: the estimate refuses instead.
 */
public enum OutsideEstimate {
    /** Explosive zones or solid explosives in the structure (r_f of the explosion rows of Table C.5). */
    EXPLOSION_RISK("the structure has a risk of explosion (R_C, R_M, R_W and R_Z count in R1, and the explosion"
            + " rows of r_f and L_F)"),
    /** Internal systems whose failure immediately endangers life, e.g. life-saving equipment in a hospital. */
    LIFE_CRITICAL_SYSTEMS("a failure of internal systems immediately endangers life, for example life-saving"
            + " equipment in a hospital (R_C, R_M, R_W and R_Z count in R1)");

    private final String description;

    OutsideEstimate(String description) {
        this.description = description;
    }

    /** Why the estimate does not cover it, in plain words. */
    public String description() {
        return description;
    }
}
