package org.lpzplanner.risk;

import org.lpzplanner.engine.risk.DangerousEvents;
import org.lpzplanner.engine.risk.FireProvisions;
import org.lpzplanner.engine.risk.FireRisk;
import org.lpzplanner.engine.risk.LifeRiskInputs;
import org.lpzplanner.engine.risk.LocationFactor;
import org.lpzplanner.engine.risk.Occupancy;
import org.lpzplanner.engine.risk.SpecialHazard;
import org.lpzplanner.engine.risk.StructureUse;
import org.lpzplanner.engine.risk.SurfaceType;
import org.lpzplanner.engine.risk.TouchStepProtection;

/**
 * The risk inputs of one site as the user chose them (checked by {@link RiskSettingsParser}).
 *
 * @param flashDensitySource which of the two next values gives N_G
 * @param flashDensity       N_G from lightning-location data, flashes/km²/year; null unless measured
 * @param thunderstormDays   T_d per year; null unless N_G is estimated from it
 * @param location           C_D class chosen by the user, or null to follow the app's suggestion
 * @param lineCount          incoming lines (power, telecom) the user entered, or null when not entered
 * @param lineLength         length L_L of each line in metres, null when no lines are entered
 */
public record RiskSettings(FlashDensitySource flashDensitySource, Double flashDensity, Double thunderstormDays,
        LocationFactor location, SurfaceType surface, FireRisk fireRisk, FireProvisions fireProvisions,
        SpecialHazard specialHazard, StructureUse use, TouchStepProtection touchStep, Occupancy occupancy,
        Integer lineCount, Double lineLength) {

    /** Placeholder thunderstorm days used until the user enters the site's own value. */
    public static final double DEFAULT_THUNDERSTORM_DAYS = 25;

    /** L_L assumed when the length of a line is not known, metres [IEC 62305-2:2010 Annex A; from memory]. */
    public static final double DEFAULT_LINE_LENGTH = 1000;

    /**
     * The inputs before the user saves any: N_G from a placeholder of thunderstorm days, the
     * suggested location factor, no credit for measures that are not known to exist (no fire
     * provisions, no touch and step protection), the most conducting ground, persons present all
     * year round, ordinary fire risk, no special hazard, other structure, no lines.
     */
    public static RiskSettings defaults() {
        return new RiskSettings(FlashDensitySource.THUNDERSTORM_DAYS, null, DEFAULT_THUNDERSTORM_DAYS, null,
                SurfaceType.AGRICULTURAL_OR_CONCRETE, FireRisk.ORDINARY, FireProvisions.NONE, SpecialHazard.NONE,
                StructureUse.OTHER, TouchStepProtection.NONE, Occupancy.always(), null, null);
    }

    /** N_G in flashes per km² per year. */
    public double groundFlashDensity() {
        return flashDensitySource == FlashDensitySource.MEASURED ? flashDensity
                : DangerousEvents.flashDensityFromThunderstormDays(thunderstormDays);
    }

    /** The engine's inputs for the given number of dangerous events per year. */
    public LifeRiskInputs lifeRiskInputs(double dangerousEventsPerYear) {
        return new LifeRiskInputs(dangerousEventsPerYear, surface, fireRisk, fireProvisions, specialHazard, use,
                touchStep, occupancy);
    }
}
