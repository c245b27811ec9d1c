package org.lpzplanner.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.lpzplanner.engine.design.Building;
import org.lpzplanner.engine.design.DownConductorLayout;
import org.lpzplanner.engine.model.RoofShape;
import org.lpzplanner.engine.model.Structure;

/** How the schedule flags a largest gap over the typical spacing (IEC 62305-3:2010 Table 4: 10 m at level II). */
class DownConductorScheduleTest {

    private static DownConductorLayout largestGap(double metres) {
        Building building = Building.of(new Structure("s", "Block", new GeometryFactory().createPolygon(new Coordinate[] {
                new Coordinate(0, 0), new Coordinate(20, 0), new Coordinate(20, 10), new Coordinate(0, 10),
                new Coordinate(0, 0)}), 6, new RoofShape.Flat(0)));
        return new DownConductorLayout(building, 60, 10, 6, List.of(), metres);
    }

    @Test
    void aGapAtTheTypicalSpacingIsNotFlagged() {
        assertThat(DownConductorSchedule.overTypical(largestGap(10.0))).isEmpty();
    }

    @Test
    void aGapOverByLessThanThePrintedPrecisionSaysSoAndIsStillFlagged() {
        // 10.004 prints as 10.00: without the words it would read as flagged for nothing
        assertThat(DownConductorSchedule.overTypical(largestGap(10.004)))
                .isEqualTo(" (over typical by less than 0.01: check)");
    }

    @Test
    void aGapClearlyOverIsFlagged() {
        assertThat(DownConductorSchedule.overTypical(largestGap(11.99))).isEqualTo(" (over typical: check)");
    }
}
