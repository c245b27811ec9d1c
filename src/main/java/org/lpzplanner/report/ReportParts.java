package org.lpzplanner.report;

import java.util.List;

/**
 * The schedules and sections printed after the drawings, in order. A new schedule built from the
 * revision is one more entry here: a {@link ReportPart} that
 * reads the {@link ReportFacts} and returns its {@link Schedule}s. Sections built from other stored
 * data (the risk estimate) come in as {@link org.lpzplanner.common.ReportSection}s through
 * {@link ReportService#pdf}.
 */
public final class ReportParts {

    public static final List<ReportPart> SCHEDULES = List.of(
            AirTerminationSchedule::blocks,
            ModelWarningSchedule::blocks,
            ExposedItemSchedule::blocks,
            SideFlashSchedule::blocks,
            DownConductorSchedule::blocks,
            SeparationSchedule::blocks,
            KeepOutSchedule::blocks,
            QuantitySchedule::blocks
    );

    private ReportParts() {
    }
}
