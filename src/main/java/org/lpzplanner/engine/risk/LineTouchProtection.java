package org.lpzplanner.engine.risk;

/**
 * Protection measures against touch voltage where a line enters the structure, giving P_TU of
 * injury to people by flashes to the line [IEC 62305-2:2010 Table B.6].
 */
public enum LineTouchProtection {
    /** P_TU = 1 [Table B.6; from memory — check against the standard]. */
    NONE(1, "no protection measures"),
    /** P_TU = 10⁻¹ [Table B.6; from memory — check against the standard]. */
    WARNING_NOTICES(1e-1, "warning notices"),
    /** P_TU = 10⁻² [Table B.6; from memory — check against the standard]. */
    ELECTRICAL_INSULATION(1e-2, "electrical insulation"),
    /** P_TU = 0 [Table B.6; from memory — check against the standard]. */
    PHYSICAL_RESTRICTIONS(0, "physical restrictions");

    private final double ptu;
    private final String description;

    LineTouchProtection(double ptu, String description) {
        this.ptu = ptu;
        this.description = description;
    }

    /** P_TU. */
    public double ptu() {
        return ptu;
    }

    /** Plain-words name for reports. */
    public String description() {
        return description;
    }
}
