package org.lpzplanner.risk;

/** Where the ground flash density N_G of a site comes from. */
public enum FlashDensitySource {
    /** Entered from lightning-location data, in flashes per km² per year. */
    MEASURED,
    /** Estimated from thunderstorm days per year, N_G ≈ 0.1·T_d. */
    THUNDERSTORM_DAYS
}
