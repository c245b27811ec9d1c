package org.lpzplanner.risk;

import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.risk.CollectionArea;
import org.lpzplanner.engine.risk.DangerousEvents;
import org.lpzplanner.engine.risk.LevelChoice;
import org.lpzplanner.engine.risk.LifeRisk;
import org.lpzplanner.engine.risk.LocationFactor;
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
 * @param choice      R1 for no LPS and levels IV to I, and the lowest sufficient option; null while
 *                    an input is missing ({@link #missing()}): no verdict is given then
 * @param lines       flashes to the connected lines, or null when none are entered (or N_G is not)
 */
public record RiskAssessment(StoredSite site, Site geometry, RiskSettings settings, boolean saved,
        CollectionArea area, LocationSuggestion suggestion, DangerousEvents events, LevelChoice choice,
        LineFlashes lines) {

    /** Whether every input is entered, so that {@link #choice()} holds a verdict. */
    public boolean complete() {
        return choice != null;
    }

    /** The inputs still to be entered, by field name; empty when {@link #complete()}. */
    public java.util.List<String> missing() {
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
     * @throws IllegalStateException while an input is missing
     */
    public LifeRisk withoutLps() {
        if (choice == null) {
            throw new IllegalStateException("no estimate while risk inputs are missing: " + missing());
        }
        return choice.options().get(0);
    }

    /**
     * Flashes to the incoming lines, shown for information only (R1 here does not count them):
     * A_L = 40·L_L m² per line and N_L = N_G·A_L·10⁻⁶ per year; and the ground near each line,
     * A_I = 4000·L_L m², with N_I = N_G·A_I·10⁻⁶ flashes per year near it; the installation,
     * environment and transformer factors at their largest value 1 [IEC 62305-2:2010 Annex A; from
     * memory — check against the standard].
     *
     * @param count  number of lines
     * @param length L_L of each line, metres
     * @param collectionAreaPerLine A_L in m²
     * @param flashesPerLine N_L per year and line
     * @param nearAreaPerLine A_I in m²: ground where a flash induces overvoltage on the line
     * @param flashesNearLine N_I per year and line
     */
    public record LineFlashes(int count, double length, double collectionAreaPerLine, double flashesPerLine,
            double nearAreaPerLine, double flashesNearLine) {

        static LineFlashes of(int count, double length, double flashDensity) {
            double area = 40 * length;
            double near = 4000 * length;
            return new LineFlashes(count, length, area, flashDensity * area * 1e-6, near, flashDensity * near * 1e-6);
        }
    }
}
