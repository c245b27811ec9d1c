package org.lpzplanner.report;

import static org.lpzplanner.report.ReportFacts.metres;

import java.util.ArrayList;
import java.util.List;
import org.locationtech.jts.geom.Coordinate;
import org.lpzplanner.engine.design.DownConductorLayout;
import org.lpzplanner.engine.model.Structure;

/**
 * Down-conductors per structure from {@link org.lpzplanner.engine.design.DownConductorPlan} at the
 * level's typical spacing, exposed corners first, and their positions numbered D1, D2, … as on the
 * plan.
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
        for (int i = 0; i < facts.downConductors().size(); i++) {
            Structure s = facts.site().structures().get(i);
            DownConductorLayout layout = facts.downConductors().get(i);
            summary.add(List.of(s.name(), metres(layout.perimeter()), metres(layout.typicalSpacing()),
                    String.valueOf(layout.count()), metres(layout.meanSpacing()), metres(layout.largestSpacing())
                            + (layout.exceedsTypicalSpacing() ? " (over typical: check)" : "")));
            for (Coordinate c : layout.positions()) {
                number++;
                positions.add(List.of("D" + number, s.name(), metres(c.x), metres(c.y)));
            }
        }
        return List.of(
                new Schedule(TITLE, List.of("Structure", "Perimeter (m)", "Typical spacing (m)", "Count",
                        "Mean spacing (m)", "Largest gap (m)"), List.of(2.2, 1.0, 1.1, 0.6, 1.0, 1.6), summary,
                        List.of("At least two per structure, no further apart than the typical spacing of the level"
                                + " (IEC 62305-3:2010 5.3 and Table 4), outside corners first. Courtyards get none"
                                + " here; routes, access and fixings are for the designer.")),
                new Schedule(POSITIONS_TITLE, List.of("No.", "Structure", "x (m)", "y (m)"),
                        List.of(0.6, 2.6, 1.0, 1.0), positions, List.of()));
    }
}
