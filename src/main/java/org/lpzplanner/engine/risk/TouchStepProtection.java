package org.lpzplanner.engine.risk;

/**
 * Protection measures against injury by touch and step voltage near the down-conductors, giving
 * P_TA [IEC 62305-2:2010 Table B.1]. The probability of injury is P_A = P_TA · P_B
 * [IEC 62305-2:2010 Annex B; from memory — check against the standard].
 */
public enum TouchStepProtection {
    /** P_TA = 1 [Table B.1; from memory — check against the standard]. */
    NONE(1, "no protection measures"),
    /** P_TA = 10⁻¹ [Table B.1; from memory — check against the standard]. */
    WARNING_NOTICES(1e-1, "warning notices"),
    /** E.g. at least 3 mm of cross-linked polyethylene. P_TA = 10⁻² [Table B.1; from memory — check against the standard]. */
    INSULATED_DOWN_CONDUCTORS(1e-2, "electrical insulation of exposed down-conductors"),
    /** P_TA = 10⁻² [Table B.1; from memory — check against the standard]. */
    SOIL_EQUIPOTENTIALISATION(1e-2, "effective soil equipotentialisation"),
    /** Physical restrictions, or the structure's framework used as the down-conductor system. P_TA = 0 [Table B.1; from memory — check against the standard]. */
    PHYSICAL_RESTRICTIONS(0, "physical restrictions or structural framework as down-conductors");

    private final double pta;
    private final String description;

    TouchStepProtection(double pta, String description) {
        this.pta = pta;
        this.description = description;
    }

    /** P_TA. */
    public double pta() {
        return pta;
    }

    /** Plain-words name for reports. */
    public String description() {
        return description;
    }
}
