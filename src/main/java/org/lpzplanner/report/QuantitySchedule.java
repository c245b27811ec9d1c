package org.lpzplanner.report;

import java.util.ArrayList;
import java.util.List;
import org.locationtech.jts.geom.Coordinate;
import org.lpzplanner.common.Formats;
import org.lpzplanner.engine.design.DownConductorLayout;
import org.lpzplanner.engine.design.quantities.BillOfQuantities;
import org.lpzplanner.engine.design.quantities.QuantityTable;

/**
 * The bill of quantities of the revision's site file and the report's down-conductors (edited where
 * the site stores them, else planned), by the same {@link BillOfQuantities} the design page uses, at
 * the page's default of one fixing per metre.
 */
final class QuantitySchedule {

    /** Fixings per metre of roof, ridge and down-conductor (the design page's default; common practice). */
    static final double FIXINGS_PER_METRE = 1.0;

    private QuantitySchedule() {
    }

    static List<ReportBlock> blocks(ReportFacts facts) {
        List<Coordinate> positions = new ArrayList<>();
        for (DownConductorLayout layout : facts.downConductors()) {
            positions.addAll(layout.positions());
        }
        QuantityTable table = BillOfQuantities.table(BillOfQuantities.compute(facts.site(), positions,
                FIXINGS_PER_METRE));
        List<String> notes = new ArrayList<>();
        notes.add("Counted from the parts of the site file of this revision and the down-conductors of the schedule"
                + " above (D1…), at " + Formats.oneDecimal(FIXINGS_PER_METRE) + " fixing per metre.");
        notes.add("Down-conductor lengths run from the air-termination level at the top of the wall (parapet, eaves or"
                + " verge) straight down to ground level; the installed route may be longer, and the connection to the"
                + " earth termination is not included.");
        notes.add("Test joints and earth terminations: one per down-conductor (common practice).");
        if (hasEdited(facts)) {
            notes.add("Down-conductors include the designer's edited positions, " + facts.design().asStored() + ".");
        }
        return List.of(new Schedule(table.title(), table.columns(), List.of(2.2, 0.6, 0.9, 3.2), table.rows(), notes));
    }

    private static boolean hasEdited(ReportFacts facts) {
        for (int i = 0; i < facts.downConductors().size(); i++) {
            if (facts.edited(i)) {
                return true;
            }
        }
        return false;
    }
}
