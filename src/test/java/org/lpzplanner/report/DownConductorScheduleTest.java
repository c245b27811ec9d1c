package org.lpzplanner.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.lpzplanner.engine.design.DownConductorLayout;

/** How the schedule flags a largest gap over the typical spacing (IEC 62305-3:2010 Table 4: 10 m at level II). */
class DownConductorScheduleTest {

    private static DownConductorLayout largestGap(double metres) {
        return new DownConductorLayout("s", 60, 10, List.of(), metres);
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
