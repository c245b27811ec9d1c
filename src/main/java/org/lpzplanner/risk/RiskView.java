package org.lpzplanner.risk;

import java.util.List;
import org.lpzplanner.common.Cautions;
import org.lpzplanner.engine.risk.LifeRisk;
import org.lpzplanner.engine.risk.LifeRiskEstimate;
import org.lpzplanner.engine.risk.LineRisk;
import org.lpzplanner.engine.risk.OutsideEstimate;

/**
 * The risk of a site as the JSON API shows it: the inputs in use (field names as accepted by
 * {@code PUT}), the suggestion for the location factor, N_G, A_D, C_D, N_D, the flashes to each
 * line, R1 = R_A + R_B + R_U + R_V for each option, the lowest sufficient protection level and the
 * same sentences the page shows. There is no verdict while an input without a default is missing
 * ({@code complete} false, {@code missingInputs} names the fields) or while the structure is outside
 * the estimate ({@code notCovered} names why): then {@code options} is empty and every verdict field
 * is null.
 *
 * @param saved                  false while nothing is saved for the site
 * @param complete               whether every input the estimate needs is entered
 * @param missingInputs          the fields still to be entered (names as {@code PUT} takes them)
 * @param notCovered             why the estimate does not cover the structure (EXPLOSION_RISK,
 *                               LIFE_CRITICAL_SYSTEMS); empty when it does or inputs are missing
 * @param groundFlashDensity     N_G; null while not entered
 * @param locationFactor         C_D class used; null while not chosen
 * @param dangerousEventsPerYear N_D; null while N_G or C_D is missing
 * @param lowestSufficientLevel  "I".."IV"; null when no LPS is needed, none suffices or there is no verdict
 * @param tolerableWithoutLps    whether R1 is tolerable with no LPS at all; null without a verdict
 * @param anyOptionTolerable     false when even level I leaves R1 above the tolerable risk; null without a verdict
 * @param lines                  the flashes to and near each incoming line; empty while N_G or the lines are missing
 */
public record RiskView(long siteId, boolean saved, boolean complete, List<String> missingInputs,
        List<String> notCovered, Inputs inputs, Suggestion suggestedLocation, Double groundFlashDensity,
        double collectionArea, double collectionAreaMaxRelativeError, String locationFactor,
        Double locationFactorValue, Double dangerousEventsPerYear, double tolerableRisk, List<Option> options,
        String lowestSufficientLevel, Boolean tolerableWithoutLps, Boolean anyOptionTolerable, String outcome,
        String dominance, List<String> explanation, List<LineFigures> lines, List<String> cautions) {

    /**
     * The inputs in use, by the names {@code PUT} accepts; null where nothing is chosen yet;
     * {@code location} "SUGGESTED" when the user chose the app's suggestion; {@code lineCount} null
     * until the user says how many lines enter ({@code lines} then null too); {@code lineLength}
     * is only ever sent (the length of lines given by their count alone), never answered.
     */
    public record Inputs(String flashDensitySource, Double flashDensity, Double thunderstormDays, String location,
            String surface, String fireRisk, String fireProvisions, String specialHazard, String structureUse,
            String lifeCriticalSystems, String touchStep, double personsInZone, double personsTotal,
            double hoursPerYear, Integer lineCount, Double lineLength, List<StoredLine> lines) {

        static Inputs of(RiskSettings s) {
            return new Inputs(RiskView.name(s.flashDensitySource()), s.flashDensity(), s.thunderstormDays(),
                    s.useSuggestedLocation() ? RiskSettingsParser.SUGGESTED : RiskView.name(s.location()),
                    s.surface().name(), RiskView.name(s.fireRisk()), s.fireProvisions().name(),
                    RiskView.name(s.specialHazard()), RiskView.name(s.use()),
                    s.lifeCriticalSystems() == null ? null
                            : s.lifeCriticalSystems() ? RiskSettingsParser.YES : RiskSettingsParser.NO,
                    s.touchStep().name(), s.occupancy().personsInZone(), s.occupancy().personsTotal(),
                    s.occupancy().hoursPerYear(), s.lineCount(), null,
                    s.lines() == null ? null : s.lines().stream().map(StoredLine::of).toList());
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

    /** R1 for one option; {@code level} null means no LPS; {@code lines} R_U and R_V of each line. */
    public record Option(String level, double pb, double pa, double ra, double rb, double ru, double rv, double r1,
            boolean tolerable, String dominant, List<LineResult> lines) {

        static Option of(LifeRisk r) {
            return new Option(r.level() == null ? null : r.level().name(), r.pb(), r.pa(), r.ra(), r.rb(), r.ru(),
                    r.rv(), r.r1(), r.isTolerable(), r.dominant().name(),
                    r.lines().stream().map(LineResult::of).toList());
        }
    }

    /** One line's components for one option: P_EB of the option, P_U, P_V, R_U, R_V. */
    public record LineResult(double peb, double pu, double pv, double ru, double rv) {

        static LineResult of(LineRisk l) {
            return new LineResult(l.peb(), l.pu(), l.pv(), l.ru(), l.rv());
        }
    }

    /**
     * Flashes to one incoming line (A_L, N_L: they enter R_U and R_V) and near it (A_I, N_I: for
     * information), with C_I·C_E·C_T, P_LD and C_LD.
     */
    public record LineFigures(double collectionArea, double flashesPerYear, double nearArea,
            double flashesNearPerYear, double lineFactors, double pld, double cld) {

        static LineFigures of(RiskAssessment.LineFlashes f) {
            return new LineFigures(f.collectionArea(), f.flashesPerYear(), f.nearArea(), f.flashesNearPerYear(),
                    f.line().lineFactors(), f.line().pld(), f.line().cld());
        }
    }

    static RiskView of(RiskAssessment a, String outcome, String dominance) {
        LocationSuggestion s = a.suggestion();
        boolean verdict = a.hasVerdict();
        return new RiskView(a.site().id(), a.saved(), a.complete(), a.missing(),
                a.outside().stream().map(OutsideEstimate::name).toList(), Inputs.of(a.settings()),
                new Suggestion(s.factor().name(), s.factor().value(), s.structureName(), s.parts(), s.height(),
                        s.reach(), s.near(), s.higher()),
                a.settings().hasGroundFlashDensity() ? a.settings().groundFlashDensity() : null,
                a.area().upperBound(), a.area().maxRelativeError(),
                a.location() == null ? null : a.location().name(), a.location() == null ? null : a.location().value(),
                a.events() == null ? null : a.events().perYear(), LifeRiskEstimate.TOLERABLE_RISK,
                verdict ? a.choice().options().stream().map(Option::of).toList() : List.of(),
                verdict ? a.choice().level().map(Enum::name).orElse(null) : null,
                verdict ? a.withoutLps().isTolerable() : null, verdict ? a.choice().chosen().isPresent() : null,
                outcome, dominance, verdict ? a.choice().summary() : List.of(),
                a.lines().stream().map(LineFigures::of).toList(), Cautions.lines());
    }
}
