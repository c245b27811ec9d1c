package org.lpzplanner.engine.risk;

/**
 * Expected number of dangerous events due to flashes to the structure,
 * N_D = N_G · A_D · C_D · 10⁻⁶ per year [IEC 62305-2:2010 Annex A].
 *
 * @param flashDensity N_G, ground flash density in flashes per km² per year
 * @param collectionArea A_D in m² (hence the 10⁻⁶)
 * @param location location factor C_D
 */
public record DangerousEvents(double flashDensity, double collectionArea, LocationFactor location) {

    public DangerousEvents {
        if (!(flashDensity >= 0) || Double.isInfinite(flashDensity)) {
            throw new IllegalArgumentException("ground flash density must be a finite number of flashes/km²/year >= 0, got " + flashDensity);
        }
        if (!(collectionArea >= 0) || Double.isInfinite(collectionArea)) {
            throw new IllegalArgumentException("collection area must be a finite number of m² >= 0, got " + collectionArea);
        }
        if (location == null) {
            throw new IllegalArgumentException("a location factor is required");
        }
    }

    /**
     * Ground flash density estimated from thunderstorm days, N_G ≈ 0.1·T_d flashes/km²/year
     * [IEC 62305-2:2010 Annex A; from memory — check against the standard]. Approximate: the relation scatters widely by region;
     * prefer measured lightning-location data when available.
     */
    public static double flashDensityFromThunderstormDays(double thunderstormDaysPerYear) {
        if (!(thunderstormDaysPerYear >= 0) || thunderstormDaysPerYear > 366) {
            throw new IllegalArgumentException("thunderstorm days per year must be between 0 and 366, got " + thunderstormDaysPerYear);
        }
        return 0.1 * thunderstormDaysPerYear;
    }

    /** N_D in dangerous events per year. */
    public double perYear() {
        return flashDensity * collectionArea * location.value() * 1e-6;
    }
}
