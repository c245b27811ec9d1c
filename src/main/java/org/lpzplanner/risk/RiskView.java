package org.lpzplanner.risk;

import java.util.List;
import org.lpzplanner.common.Cautions;
import org.lpzplanner.engine.risk.LifeRisk;
import org.lpzplanner.engine.risk.LifeRiskEstimate;

/**
 * The risk of a site as the JSON API shows it: the inputs in use (field names as accepted by
 * {@code PUT}), the suggestion for the location factor, N_G, A_D, C_D, N_D, R1 for each option, the
 * lowest sufficient protection level and the same sentences the page shows. While an input without
 * a default is missing there is no verdict: {@code complete} is false, {@code missingInputs} names
 * the fields, {@code options} is empty and every verdict field is null.
 *
 * @param saved                  false while nothing is saved for the site
 * @param complete               whether every input the estimate needs is entered
 * @param missingInputs          the fields still to be entered (names as {@code PUT} takes them)
 * @param groundFlashDensity     N_G; null while not entered
 * @param locationFactor         C_D class used; null while not chosen
 * @param dangerousEventsPerYear N_D; null while N_G or C_D is missing
 * @param lowestSufficientLevel  "I".."IV"; null when no LPS is needed, none suffices or inputs are missing
 * @param tolerableWithoutLps    whether R1 is tolerable with no LPS at all; null while inputs are missing
 * @param anyOptionTolerable     false when even level I leaves R1 above the tolerable risk; null while inputs are missing
 */
public record RiskView(long siteId, boolean saved, boolean complete, List<String> missingInputs, Inputs inputs,
        Suggestion suggestedLocation, Double groundFlashDensity, double collectionArea,
        double collectionAreaMaxRelativeError, String locationFactor, Double locationFactorValue,
        Double dangerousEventsPerYear, double tolerableRisk, List<Option> options, String lowestSufficientLevel,
        Boolean tolerableWithoutLps, Boolean anyOptionTolerable, String outcome, String dominance,
        List<String> explanation, Lines lines, List<String> cautions) {

    /**
     * The inputs in use, by the names {@code PUT} accepts; null where nothing is chosen yet;
     * {@code location} "SUGGESTED" when the user chose the app's suggestion.
     */
    public record Inputs(String flashDensitySource, Double flashDensity, Double thunderstormDays, String location,
            String surface, String fireRisk, String fireProvisions, String specialHazard, String structureUse,
            String touchStep, double personsInZone, double personsTotal, double hoursPerYear, Integer lineCount,
            Double lineLength) {

        static Inputs of(RiskSettings s) {
            return new Inputs(RiskView.name(s.flashDensitySource()), s.flashDensity(), s.thunderstormDays(),
                    s.useSuggestedLocation() ? RiskSettingsParser.SUGGESTED : RiskView.name(s.location()), s.surface().name(),
                    RiskView.name(s.fireRisk()), s.fireProvisions().name(), RiskView.name(s.specialHazard()), RiskView.name(s.use()),
                    s.touchStep().name(),
                    s.occupancy().personsInZone(), s.occupancy().personsTotal(), s.occupancy().hoursPerYear(),
                    s.lineCount(), s.lineLength());
        }
    }

    static String name(Enum<?> choice) {
        return choice == null ? null : choice.name();
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
        boolean complete = a.complete();
        return new RiskView(a.site().id(), a.saved(), complete, a.missing(), Inputs.of(a.settings()),
                new Suggestion(s.factor().name(), s.factor().value(), s.structureName(), s.parts(), s.height(),
                        s.reach(), s.near(), s.higher()),
                a.settings().hasGroundFlashDensity() ? a.settings().groundFlashDensity() : null,
                a.area().upperBound(), a.area().maxRelativeError(),
                a.location() == null ? null : a.location().name(), a.location() == null ? null : a.location().value(),
                a.events() == null ? null : a.events().perYear(), LifeRiskEstimate.TOLERABLE_RISK,
                complete ? a.choice().options().stream().map(Option::of).toList() : List.of(),
                complete ? a.choice().level().map(Enum::name).orElse(null) : null,
                complete ? a.withoutLps().isTolerable() : null, complete ? a.choice().chosen().isPresent() : null,
                outcome, dominance, complete ? a.choice().summary() : List.of(),
                l == null ? null : new Lines(l.count(), l.length(), l.collectionAreaPerLine(), l.flashesPerLine(),
                        l.nearAreaPerLine(), l.flashesNearLine()),
                Cautions.lines());
    }
}
