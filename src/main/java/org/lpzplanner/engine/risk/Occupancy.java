package org.lpzplanner.engine.risk;

/**
 * Who is exposed and for how long: persons in the zone n_z, persons in the structure n_t and hours
 * per year the persons are present t_z. The structure is treated as one zone unless the caller
 * splits it. {@link #fraction()} = (n_z / n_t) · (t_z / 8760) [IEC 62305-2:2010 Annex C].
 */
public record Occupancy(double personsInZone, double personsTotal, double hoursPerYear) {

    /** Hours in a year, the denominator of the time fraction. */
    public static final double HOURS_PER_YEAR = 8760;

    public Occupancy {
        if (!(personsTotal > 0) || Double.isInfinite(personsTotal)) {
            throw new IllegalArgumentException("total persons must be a positive number, got " + personsTotal);
        }
        if (!(personsInZone >= 0) || personsInZone > personsTotal) {
            throw new IllegalArgumentException("persons in the zone must be between 0 and the total " + personsTotal + ", got " + personsInZone);
        }
        if (!(hoursPerYear >= 0) || hoursPerYear > HOURS_PER_YEAR) {
            throw new IllegalArgumentException("hours per year must be between 0 and 8760, got " + hoursPerYear);
        }
    }

    /** Everyone, all year round: fraction 1. */
    public static Occupancy always() {
        return new Occupancy(1, 1, HOURS_PER_YEAR);
    }

    /** (n_z / n_t) · (t_z / 8760). */
    public double fraction() {
        return personsInZone / personsTotal * (hoursPerYear / HOURS_PER_YEAR);
    }
}
