package org.lpzplanner.risk;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.lpzplanner.engine.risk.DangerousEvents;
import org.lpzplanner.engine.risk.FireProvisions;
import org.lpzplanner.engine.risk.FireRisk;
import org.lpzplanner.engine.risk.IncomingLine;
import org.lpzplanner.engine.risk.LifeRiskInputs;
import org.lpzplanner.engine.risk.LocationFactor;
import org.lpzplanner.engine.risk.Occupancy;
import org.lpzplanner.engine.risk.SpecialHazard;
import org.lpzplanner.engine.risk.StructureUse;
import org.lpzplanner.engine.risk.SurfaceType;
import org.lpzplanner.engine.risk.TouchStepProtection;

/**
 * The risk inputs of one site as the user chose them (checked by {@link RiskSettingsParser}).
 * Inputs whose table has no value that is safe to assume for every structure have no default and
 * stay null until the user chooses them; while any is null the estimate gives no result
 * ({@link #missing()}). The others default to the most conservative value of their table
 * ({@link #initial()}).
 *
 * @param flashDensitySource  which of the two next values gives N_G; null while neither is entered
 * @param flashDensity        N_G from lightning-location data, flashes/km²/year; null unless measured
 * @param thunderstormDays    T_d per year; null unless N_G is estimated from it
 * @param location            C_D class chosen by the user; null when the suggestion is used or nothing is chosen
 * @param useSuggestedLocation whether the user chose the app's suggestion for C_D
 * @param fireRisk            r_f; null until chosen
 * @param specialHazard       h_z; null until chosen
 * @param use                 L_T and L_F; null until chosen
 * @param lifeCriticalSystems whether a failure of internal systems immediately endangers life; null until answered
 * @param lines               the incoming lines (power, telecom), empty for none; null until the user says how many
 */
public record RiskSettings(FlashDensitySource flashDensitySource, Double flashDensity, Double thunderstormDays,
        LocationFactor location, boolean useSuggestedLocation, SurfaceType surface, FireRisk fireRisk,
        FireProvisions fireProvisions, SpecialHazard specialHazard, StructureUse use, TouchStepProtection touchStep,
        Occupancy occupancy, Boolean lifeCriticalSystems, List<IncomingLine> lines) {

    /** The stored and typed value meaning "the user chose the app's suggestion" for the location factor. */
    public static final String SUGGESTED_LOCATION = "SUGGESTED";

    /** The most incoming lines the inputs hold. */
    public static final int MAX_LINES = 20;

    /** The longest line section taken, metres. */
    public static final double MAX_LINE_LENGTH = 100_000;

    /** L_L assumed when the length of a line is not known, metres [IEC 62305-2:2010 Annex A; from memory]. */
    public static final double DEFAULT_LINE_LENGTH = 1000;

    public RiskSettings {
        if (location != null && useSuggestedLocation) {
            throw new IllegalArgumentException("either a location class or the suggestion, not both");
        }
        lines = lines == null ? null : List.copyOf(lines);
    }

    /**
     * The inputs before the user saves any: nothing chosen where no default is safe (N_G, C_D, fire
     * risk, special hazard, type of structure, whether internal systems are life-critical, how many
     * lines enter); elsewhere each table's most conservative value: the most conducting ground
     * (r_t = 10⁻²), no fire provisions (r_p = 1), no touch and step protection (P_TA = 1), everyone
     * present all year round (n_z/n_t · t_z/8760 = 1). A line, once counted, starts at
     * {@link StoredLine#conservative(double)}.
     */
    public static RiskSettings initial() {
        return new RiskSettings(null, null, null, null, false, SurfaceType.AGRICULTURAL_OR_CONCRETE, null,
                FireProvisions.NONE, null, null, TouchStepProtection.NONE, Occupancy.always(), null, null);
    }

    /** The number of incoming lines entered; null until the user says. */
    public Integer lineCount() {
        return lines == null ? null : lines.size();
    }

    /**
     * The inputs the estimate still needs, by the field names the form and the API use, in the form's
     * order; empty when the estimate can be made. A ground flash density that is neither measured
     * nor estimated is named {@code flashDensity}.
     */
    public List<String> missing() {
        List<String> missing = new ArrayList<>();
        groundFlashDensityField().ifPresent(missing::add);
        if (location == null && !useSuggestedLocation) {
            missing.add("location");
        }
        if (fireRisk == null) {
            missing.add("fireRisk");
        }
        if (specialHazard == null) {
            missing.add("specialHazard");
        }
        if (use == null) {
            missing.add("structureUse");
        }
        if (lifeCriticalSystems == null) {
            missing.add("lifeCriticalSystems");
        }
        if (lines == null) {
            missing.add("lineCount");
        }
        return missing;
    }

    /** Whether every input the estimate needs is entered. */
    public boolean complete() {
        return missing().isEmpty();
    }

    private Optional<String> groundFlashDensityField() {
        if (flashDensitySource == FlashDensitySource.MEASURED) {
            return flashDensity == null ? Optional.of("flashDensity") : Optional.empty();
        }
        if (flashDensitySource == FlashDensitySource.THUNDERSTORM_DAYS) {
            return thunderstormDays == null ? Optional.of("thunderstormDays") : Optional.empty();
        }
        return Optional.of("flashDensity");
    }

    /** Whether N_G is known, measured or estimated. */
    public boolean hasGroundFlashDensity() {
        return groundFlashDensityField().isEmpty();
    }

    /**
     * N_G in flashes per km² per year.
     *
     * @throws IllegalStateException when it is not entered ({@link #hasGroundFlashDensity()})
     */
    public double groundFlashDensity() {
        if (!hasGroundFlashDensity()) {
            throw new IllegalStateException("the ground flash density is not entered");
        }
        return flashDensitySource == FlashDensitySource.MEASURED ? flashDensity
                : DangerousEvents.flashDensityFromThunderstormDays(thunderstormDays);
    }

    /**
     * The engine's inputs for the dangerous events to the structure (N_G, A_D, C_D).
     *
     * @throws IllegalStateException when an input is missing ({@link #missing()})
     */
    public LifeRiskInputs lifeRiskInputs(DangerousEvents events) {
        if (!complete()) {
            throw new IllegalStateException("risk inputs missing: " + String.join(", ", missing()));
        }
        return new LifeRiskInputs(events, surface, fireRisk, fireProvisions, specialHazard, use, touchStep, occupancy,
                lines, lifeCriticalSystems);
    }
}
