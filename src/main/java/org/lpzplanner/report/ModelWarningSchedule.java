package org.lpzplanner.report;

import java.util.ArrayList;
import java.util.List;
import org.lpzplanner.common.Formats;

/**
 * The model warnings of the stored result, numbered as in the review list and on the plan: the
 * part (name and id), the kind, its greatest height above the surface beneath it, the limit it
 * exceeds, the warning in plain words and its status (not yet accepted, or accepted with the
 * designer's reason). Left out when the result has none. An accepted warning still stands: the
 * notes say so.
 */
final class ModelWarningSchedule {

    static final String TITLE = "Schedule of model warnings";

    private ModelWarningSchedule() {
    }

    static List<ReportBlock> blocks(ReportFacts facts) {
        List<StoredResult.Warning> warnings = facts.stored().warnings();
        if (warnings.isEmpty()) {
            return List.of();
        }
        List<List<String>> rows = new ArrayList<>();
        for (StoredResult.Warning w : warnings) {
            String reason = facts.source().accepted().get(w.item().key());
            rows.add(List.of("E" + w.item().number(), w.item().owner() + " (" + w.partId() + ")", kind(w.item().kind()),
                    w.item().heightAboveSurface() == null ? "" : Formats.height(w.item().heightAboveSurface()),
                    Double.isNaN(w.limit()) ? "" : Formats.length(w.limit()), w.item().text(),
                    reason == null ? "not yet accepted" : "accepted: " + reason));
        }
        return List.of(new Schedule(TITLE, List.of("No.", "Part", "Kind", "Above surface (m)", "Limit R (m)",
                "Finding and what to do", "Status"), List.of(0.5, 1.3, 0.8, 0.8, 0.7, 3.2, 1.5), rows, List.of(
                "Where a part runs more than the sphere radius R above what lies beneath it, a sphere can pass"
                        + " under it (rolling sphere method, IEC 62305-3:2010 Annex A). The analysis models that free"
                        + " space: the part protects nothing directly beneath that stretch, and what lies there is"
                        + " judged without it. The warning asks the designer to confirm that this is what the design"
                        + " intends.",
                "While a model warning stands, accepted or not, this report gives no verdict of full protection:"
                        + " an acceptance records the designer's answer for the reviewer; only a change of the design"
                        + " (other air-termination beneath, or a lower part) removes the warning. \"Above surface\" is"
                        + " the part's greatest height above the surface beneath it. Numbers as on the plan and in the"
                        + " review list.")));
    }

    static String kind(String kind) {
        return kind.equals("free-span") ? "free span" : kind;
    }
}
