package org.lpzplanner.risk;

import java.util.List;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.risk.CollectionArea;
import org.lpzplanner.engine.risk.DangerousEvents;
import org.lpzplanner.engine.risk.IncomingLine;
import org.lpzplanner.engine.risk.LevelChoice;
import org.lpzplanner.engine.risk.LifeRisk;
import org.lpzplanner.engine.risk.LocationFactor;
import org.lpzplanner.engine.risk.OutsideEstimate;
import org.lpzplanner.sites.StoredSite;

/**
 * Everything the risk page, the API and the report show for one site.
 *
 * @param site        the stored site
 * @param geometry    the site read from its file, local metres
 * @param settings    the inputs used: the saved ones, or {@link RiskSettings#initial()} while none are saved
 * @param saved       whether {@code settings} were saved by a user
 * @param area        A_D with its outline
 * @param suggestion  the app's suggestion for C_D
 * @param events      N_G, A_D and the C_D used, giving N_D; null while N_G or C_D is not chosen
 * @param outside     why the structure is outside the estimate (explosion, life-critical systems);
 *                    empty when it is covered or not yet known
 * @param choice      R1 for no LPS and levels IV to I, and the lowest sufficient option; null while
 *                    an input is missing ({@link #missing()}) or the structure is {@code outside}:
 *                    no verdict is given then
 * @param lines       flashes to and near each incoming line; empty while N_G or the lines are not entered
 */
public record RiskAssessment(StoredSite site, Site geometry, RiskSettings settings, boolean saved,
        CollectionArea area, LocationSuggestion suggestion, DangerousEvents events, List<OutsideEstimate> outside,
        LevelChoice choice, List<LineFlashes> lines) {

    public RiskAssessment {
        outside = List.copyOf(outside);
        lines = List.copyOf(lines);
    }

    /** Whether there is a verdict: every input entered and the structure within the estimate. */
    public boolean hasVerdict() {
        return choice != null;
    }

    /** Whether every input is entered (the structure may still be outside the estimate). */
    public boolean complete() {
        return settings.complete();
    }

    /** The inputs still to be entered, by field name; empty when {@link #complete()}. */
    public List<String> missing() {
        return settings.missing();
    }

    /** The C_D used: the user's choice, or the suggestion when the user chose it; null when neither. */
    public LocationFactor location() {
        return settings.location() != null ? settings.location()
                : settings.useSuggestedLocation() ? suggestion.factor() : null;
    }

    /**
     * R1 without an LPS (the first option tried).
     *
     * @throws IllegalStateException while there is no verdict
     */
    public LifeRisk withoutLps() {
        if (choice == null) {
            throw new IllegalStateException("no estimate: missing " + missing() + ", outside " + outside);
        }
        return choice.options().get(0);
    }

    /**
     * Flashes to one incoming line and to the ground near it [IEC 62305-2:2010 Annex A; from memory —
     * check against the standard]: A_L = 40·L_L m², N_L = N_G·A_L·C_I·C_E·C_T·10⁻⁶ per year (they
     * enter R_U and R_V); A_I = 4000·L_L m², N_I = N_G·A_I·C_I·C_E·C_T·10⁻⁶ per year (for information:
     * they enter only R_W and R_Z, which count for the structures outside this estimate).
     *
     * @param line the line's inputs
     * @param collectionArea A_L in m²
     * @param flashesPerYear N_L per year
     * @param nearArea A_I in m²
     * @param flashesNearPerYear N_I per year
     */
    public record LineFlashes(IncomingLine line, double collectionArea, double flashesPerYear, double nearArea,
            double flashesNearPerYear) {

        static LineFlashes of(IncomingLine line, double flashDensity) {
            return new LineFlashes(line, line.collectionArea(), line.flashesPerYear(flashDensity), line.nearArea(),
                    line.flashesNearPerYear(flashDensity));
        }
    }
}
