package org.lpzplanner.engine.risk;

/**
 * Special hazard to people in the structure, giving the factor h_z that increases the loss due to
 * physical damage [IEC 62305-2:2010 Table C.6].
 */
public enum SpecialHazard {
    /** h_z = 1 [Table C.6; from memory — check against the standard]. */
    NONE(1, "no special hazard"),
    /** Structures of at most two floors and at most 100 persons. h_z = 2 [Table C.6; from memory — check against the standard]. */
    LOW_PANIC(2, "low level of panic"),
    /** Cultural or sport events with 100 to 1000 participants. h_z = 5 [Table C.6; from memory — check against the standard]. */
    AVERAGE_PANIC(5, "average level of panic"),
    /** Persons who cannot move unaided, e.g. hospitals. h_z = 5 [Table C.6; from memory — check against the standard]. */
    DIFFICULT_EVACUATION(5, "difficulty of evacuation"),
    /** Cultural or sport events with more than 1000 participants. h_z = 10 [Table C.6; from memory — check against the standard]. */
    HIGH_PANIC(10, "high level of panic");

    private final double hz;
    private final String description;

    SpecialHazard(double hz, String description) {
        this.hz = hz;
        this.description = description;
    }

    /** h_z. */
    public double hz() {
        return hz;
    }

    /** Plain-words name for reports. */
    public String description() {
        return description;
    }
}
