package org.lpzplanner.engine.risk;

/**
 * Type of structure, giving the typical mean relative losses of human life: L_T (injury by touch and
 * step voltage) and L_F (physical damage) [IEC 62305-2:2010 Table C.2]. L_T = 10⁻² for every type
 * [Table C.2; from memory — check against the standard]. Structures with a risk of explosion
 * (L_F = 10⁻¹) are outside this estimate.
 */
public enum StructureUse {
    /** L_F = 10⁻¹ [Table C.2; from memory — check against the standard]. */
    HOSPITAL_HOTEL_SCHOOL_CIVIC(1e-2, 1e-1, "hospital, hotel, school or civic building"),
    /** L_F = 5·10⁻² [Table C.2; from memory — check against the standard]. */
    ENTERTAINMENT_CHURCH_MUSEUM(1e-2, 5e-2, "public entertainment, church or museum"),
    /** L_F = 2·10⁻² [Table C.2; from memory — check against the standard]. */
    INDUSTRIAL_COMMERCIAL(1e-2, 2e-2, "industrial or commercial building"),
    /** L_F = 10⁻² [Table C.2; from memory — check against the standard]. */
    OTHER(1e-2, 1e-2, "other structure");

    private final double lt;
    private final double lf;
    private final String description;

    StructureUse(double lt, double lf, String description) {
        this.lt = lt;
        this.lf = lf;
        this.description = description;
    }

    /** L_T. */
    public double lt() {
        return lt;
    }

    /** L_F. */
    public double lf() {
        return lf;
    }

    /** Plain-words name for reports. */
    public String description() {
        return description;
    }
}
