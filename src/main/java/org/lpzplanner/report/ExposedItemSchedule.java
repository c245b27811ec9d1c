package org.lpzplanner.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.lpzplanner.analysis.ReviewItems;
import org.lpzplanner.common.Formats;

/**
 * The exposed items of the stored result: roof areas by structure, then every exposed edge, corner
 * and facade band numbered as in the review list, with its status (exposed, or accepted with the
 * designer's reason), and the counts before and after the acceptances. Model warnings, also review
 * items, have their own schedule ({@link ModelWarningSchedule}).
 */
final class ExposedItemSchedule {

    static final String ROOF_TITLE = "Exposed roof areas (LPZ 0A)";
    static final String TITLE = "Schedule of exposed edges, corners and facade bands";

    private ExposedItemSchedule() {
    }

    static List<ReportBlock> blocks(ReportFacts facts) {
        List<ReportBlock> out = new ArrayList<>();
        Map<String, Double> areas = facts.stored().roofAreas();
        if (!areas.isEmpty()) {
            List<List<String>> rows = new ArrayList<>();
            areas.forEach((owner, area) -> rows.add(List.of(owner, Formats.area(area))));
            out.add(new Schedule(ROOF_TITLE, List.of("Structure or object", "Exposed plan area (m²)"),
                    List.of(3.0, 1.5), rows, List.of()));
        }
        List<ReviewItems.Item> items = facts.exposedItems();
        int total = items.size();
        int accepted = facts.acceptedExposedCount();
        String counts = "Before review: " + total + " exposed item" + (total == 1 ? "" : "s") + ". Accepted by the"
                + " designer: " + accepted + ". Remaining: " + (total - accepted) + ".";
        if (items.isEmpty()) {
            out.add(new ReportBlock.Heading(TITLE, 2));
            out.add(new ReportBlock.Paragraph("No edge, corner or facade band is exposed. " + counts));
            return out;
        }
        List<List<String>> rows = new ArrayList<>();
        for (ReviewItems.Item item : items) {
            String reason = facts.source().accepted().get(item.key());
            rows.add(List.of("E" + item.number(), item.owner(), item.kind(),
                    item.length() == null ? "" : Formats.length(item.length()),
                    item.bottom() == null ? "" : Formats.height(item.bottom()),
                    item.top() == null ? "" : Formats.height(item.top()),
                    reason == null ? "exposed" : "accepted: " + reason));
        }
        out.add(new Schedule(TITLE, List.of("No.", "Structure", "Kind", "Length (m)", "From (m)", "Top (m)", "Status"),
                List.of(0.5, 1.6, 1.1, 0.8, 0.7, 0.7, 2.6), rows,
                List.of(counts, "Heights above ground; \"From\" is the lowest point of a facade band a sphere"
                        + " reaches from the side. Numbers as on the plan and in the review list.",
                        "Facade bands listed here need lateral air-termination (IEC 62305-3:2010 5.2.3: the upper"
                                + " 20 % of a structure taller than 60 m, and everything above 120 m); those where"
                                + " flashes to the side are negligible are listed apart and are not exposed items.")));
        return out;
    }
}
