package org.lpzplanner.engine.risk;

/**
 * Risk of fire of the structure, giving the reduction factor r_f of physical damage
 * [IEC 62305-2:2010 Table C.5]. Structures with a risk of explosion (explosive zones or solid
 * explosives) are outside this estimate ({@link OutsideEstimate#EXPLOSION_RISK}): they need the
 * full method of the standard.
 */
public enum FireRisk {
    /**
     * Explosive zones (0, 20, 1, 21, 2, 22) or solid explosives. The estimate refuses such a
     * structure; r_f is the largest of the explosion rows, 1 [Table C.5; from memory — check
     * against the standard], should any caller use it.
     */
    EXPLOSION(1, "risk of explosion (explosive zones or solid explosives)"),
    /** r_f = 10⁻¹ [Table C.5; from memory — check against the standard]. */
    HIGH(1e-1, "high fire risk"),
    /** r_f = 10⁻² [Table C.5; from memory — check against the standard]. */
    ORDINARY(1e-2, "ordinary fire risk"),
    /** r_f = 10⁻³ [Table C.5; from memory — check against the standard]. */
    LOW(1e-3, "low fire risk"),
    /** r_f = 0 [Table C.5; from memory — check against the standard]. */
    NONE(0, "no fire risk");

    private final double rf;
    private final String description;

    FireRisk(double rf, String description) {
        this.rf = rf;
        this.description = description;
    }

    /** r_f. */
    public double rf() {
        return rf;
    }

    /** Plain-words name for reports. */
    public String description() {
        return description;
    }
}
