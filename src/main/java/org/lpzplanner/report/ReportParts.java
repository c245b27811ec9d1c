package org.lpzplanner.report;

import java.util.List;

/**
 * The schedules and sections printed after the drawings, in order. A new schedule (for example the
 * bill of quantities) or section (for example the risk estimate) is one more entry here: a
 * {@link ReportPart} that reads the {@link ReportFacts} and returns its {@link Schedule}s.
 */
public final class ReportParts {

    public static final List<ReportPart> SCHEDULES = List.of(
            AirTerminationSchedule::blocks,
            ExposedItemSchedule::blocks,
            DownConductorSchedule::blocks,
            SeparationSchedule::blocks
            // bill of quantities and risk estimate: add their ReportPart here, e.g. BillOfQuantities::blocks
    );

    private ReportParts() {
    }
}
