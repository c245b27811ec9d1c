package org.lpzplanner.risk;

import java.util.List;
import org.lpzplanner.common.Cautions;
import org.lpzplanner.engine.risk.LifeRisk;
import org.lpzplanner.engine.risk.LifeRiskEstimate;

/**
 * The risk of a site as the JSON API shows it: the inputs in use (field names as accepted by
 * {@code PUT}), the suggestion for the location factor, N_G, A_D, C_D, N_D, R1 for each option, the
 * lowest sufficient protection level and the same sentences the page shows.
 *
 * @param saved                  false while the defaults are in use
 * @param lowestSufficientLevel  "I".."IV"; null when no LPS is needed or none suffices
 * @param tolerableWithoutLps    whether R1 is tolerable with no LPS at all
 * @param anyOptionTolerable     false when even level I leaves R1 above the tolerable risk
 */
public record RiskView(long siteId, boolean saved, Inputs inputs, Suggestion suggestedLocation,
        double groundFlashDensity, double collectionArea, double collectionAreaMaxRelativeError,
        String locationFactor, double locationFactorValue, double dangerousEventsPerYear, double tolerableRisk,
        List<Option> options, String lowestSufficientLevel, boolean tolerableWithoutLps, boolean anyOptionTolerable,
        String outcome, String dominance, List<String> explanation, Lines lines, List<String> cautions) {

    /** The inputs in use, by the names {@code PUT} accepts; {@code location} null means the suggestion. */
    public record Inputs(String flashDensitySource, Double flashDensity, Double thunderstormDays, String location,
            String surface, String fireRisk, String fireProvisions, String specialHazard, String structureUse,
            String touchStep, double personsInZone, double personsTotal, double hoursPerYear, Integer lineCount,
            Double lineLength) {

        static Inputs of(RiskSettings s) {
            return new Inputs(s.flashDensitySource().name(), s.flashDensity(), s.thunderstormDays(),
                    s.location() == null ? null : s.location().name(), s.surface().name(), s.fireRisk().name(),
                    s.fireProvisions().name(), s.specialHazard().name(), s.use().name(), s.touchStep().name(),
                    s.occupancy().personsInZone(), s.occupancy().personsTotal(), s.occupancy().hoursPerYear(),
                    s.lineCount(), s.lineLength());
        }
    }

    /**
     * The suggested location class, and on what it rests: the building of the tallest structure
     * ({@code buildingParts} structures touching or overlapping) against the other buildings of the file.
     */
    public record Suggestion(String factor, double value, String structure, int buildingParts, double height,
            double reach, int buildingsNear, int buildingsHigher) {
    }

    /** R1 for one option; {@code level} null means no LPS. */
    public record Option(String level, double pb, double pa, double ra, double rb, double r1, boolean tolerable,
            String dominant) {

        static Option of(LifeRisk r) {
            return new Option(r.level() == null ? null : r.level().name(), r.pb(), r.pa(), r.ra(), r.rb(), r.r1(),
                    r.isTolerable(), r.dominant().name());
        }
    }

    /** Flashes to the entered lines, for information only (not counted in R1). */
    public record Lines(int count, double length, double collectionAreaPerLine, double flashesPerLinePerYear,
            double nearAreaPerLine, double flashesNearLinePerYear) {
    }

    static RiskView of(RiskAssessment a, String outcome, String dominance) {
        LocationSuggestion s = a.suggestion();
        RiskAssessment.LineFlashes l = a.lines();
        return new RiskView(a.site().id(), a.saved(), Inputs.of(a.settings()),
                new Suggestion(s.factor().name(), s.factor().value(), s.structureName(), s.parts(), s.height(),
                        s.reach(), s.near(), s.higher()),
                a.events().flashDensity(), a.area().upperBound(), a.area().maxRelativeError(), a.location().name(),
                a.location().value(), a.events().perYear(), LifeRiskEstimate.TOLERABLE_RISK,
                a.choice().options().stream().map(Option::of).toList(),
                a.choice().level().map(Enum::name).orElse(null),
                a.withoutLps().isTolerable(), a.choice().chosen().isPresent(), outcome, dominance,
                a.choice().summary(),
                l == null ? null : new Lines(l.count(), l.length(), l.collectionAreaPerLine(), l.flashesPerLine(),
                        l.nearAreaPerLine(), l.flashesNearLine()),
                Cautions.lines());
    }
}
