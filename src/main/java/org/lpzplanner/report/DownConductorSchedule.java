package org.lpzplanner.report;

import java.util.ArrayList;
import java.util.List;
import org.locationtech.jts.geom.Coordinate;
import org.lpzplanner.common.Formats;
import org.lpzplanner.engine.design.DownConductorLayout;

/**
 * Down-conductors per building (structures whose footprints overlap or touch, on the outline of the
 * whole): the designer's edited positions where the site stores them, else
 * {@link org.lpzplanner.engine.design.DownConductorPlan} at the level's typical spacing, exposed
 * corners first; their positions numbered D1, D2, … as on the plan and the design page.
 */
final class DownConductorSchedule {

    static final String TITLE = "Schedule of down-conductors";
    static final String POSITIONS_TITLE = "Down-conductor positions";

    private DownConductorSchedule() {
    }

    static List<ReportBlock> blocks(ReportFacts facts) {
        List<List<String>> summary = new ArrayList<>();
        List<List<String>> positions = new ArrayList<>();
        int number = 0;
        boolean anyEdited = false;
        for (int i = 0; i < facts.downConductors().size(); i++) {
            DownConductorLayout layout = facts.downConductors().get(i);
            String name = layout.building().name();
            boolean edited = facts.edited(i);
            anyEdited |= edited;
            int required = layout.required();
            summary.add(List.of(name, edited ? "edited" : "planned", Formats.length(layout.perimeter()),
                    Formats.length(layout.typicalSpacing()), layout.count()
                            + (layout.count() < required ? " (fewer than " + required + ": check)" : ""),
                    Formats.length(layout.meanSpacing()), Formats.length(layout.largestSpacing()) + overTypical(layout)));
            for (Coordinate c : layout.positions()) {
                number++;
                positions.add(List.of("D" + number, name, Formats.coordinate(c.x), Formats.coordinate(c.y)));
            }
        }
        List<String> notes = new ArrayList<>();
        notes.add("Per building: structures whose footprints overlap or touch are one building, with its"
                + " down-conductors on the outline of the whole (none on a wall between its parts). At least two, no"
                + " further apart than the typical spacing of the level (IEC 62305-3:2010 5.3 and Table 4); a courtyard"
                + " of more than 30 m perimeter gets its own at that spacing (IEC 62305-3:2010 Annex E, from memory)."
                + " Planned: outside corners the sphere reaches on the bare structures first. Routes, access and"
                + " fixings are for the designer.");
        if (anyEdited) {
            notes.add("Edited: the designer's positions, " + facts.design().asStored() + "; they belong to the"
                    + " site, not to this revision, and print as they stand whenever the revision is printed. Positions"
                    + " stored for any structure of a building count for the building; one more than 2 m from the"
                    + " outline of the whole (by a wall now inside it) is left out.");
        }
        return List.of(
                new Schedule(TITLE, List.of("Building", "Positions", "Perimeter (m)", "Typical spacing (m)",
                        "Count", "Mean spacing (m)", "Largest gap (m)"), List.of(2.0, 0.8, 1.0, 1.0, 1.0, 1.0, 1.4),
                        summary, notes),
                new Schedule(POSITIONS_TITLE, List.of("No.", "Building", "x (m)", "y (m)"),
                        List.of(0.6, 2.6, 1.0, 1.0), positions, List.of()));
    }

    /**
     * The flag of a largest gap over the typical spacing. A gap over it by less than the printed
     * precision would read "10.00 (over typical)" beside a typical 10.00, so it says by how little;
     * it is still flagged (the check errs toward "check").
     */
    static String overTypical(DownConductorLayout layout) {
        if (!layout.exceedsTypicalSpacing()) {
            return "";
        }
        return layout.largestSpacing() - layout.typicalSpacing() < 0.005 ? " (over typical by less than 0.01: check)"
                : " (over typical: check)";
    }
}
