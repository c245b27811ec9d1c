package org.lpzplanner.engine.risk;

/**
 * Provisions that reduce the consequences of fire, giving the reduction factor r_p
 * [IEC 62305-2:2010 Table C.4].
 */
public enum FireProvisions {
    /** r_p = 1 [Table C.4; from memory — check against the standard]. */
    NONE(1, "no fire provisions"),
    /**
     * One of: extinguishers, fixed manually operated extinguishing installations, manual alarm
     * installations, hydrants, fire-proof compartments, protected escape routes. r_p = 0.5
     * [Table C.4; from memory — check against the standard].
     */
    MANUAL(0.5, "manual fire provisions (extinguishers, manual alarm, hydrants, fire compartments or escape routes)"),
    /**
     * One of: fixed automatically operated extinguishing installations or automatic alarm
     * installations, protected against overvoltages and other damage, with fire fighters able to
     * arrive in less than 10 minutes. r_p = 0.2 [Table C.4; from memory — check against the standard].
     */
    AUTOMATIC(0.2, "automatic fire provisions (automatic extinguishing or alarm)");

    private final double rp;
    private final String description;

    FireProvisions(double rp, String description) {
        this.rp = rp;
        this.description = description;
    }

    /** r_p. */
    public double rp() {
        return rp;
    }

    /** Plain-words name for reports. */
    public String description() {
        return description;
    }
}
