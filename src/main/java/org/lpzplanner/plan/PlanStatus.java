package org.lpzplanner.plan;

import java.util.List;
import java.util.Locale;
import org.lpzplanner.analysis.AnalysisRevision;
import org.lpzplanner.analysis.ReviewItems;
import org.springframework.context.MessageSource;

/**
 * The status line of the plan page for a revision, the same on the page and in the answer to an
 * edit: protected, exposed, or, while a model warning stands (accepted or not), no verdict of full
 * protection, naming the parts the warnings are about.
 */
public final class PlanStatus {

    private PlanStatus() {
    }

    /** The parts named by the revision's model warnings, in the result's order. */
    public static List<String> warnedParts(AnalysisRevision revision) {
        if (revision.resultGeoJson() == null) {
            return List.of();
        }
        return ReviewItems.of(revision.resultGeoJson()).stream().filter(ReviewItems.Item::isModelWarning)
                .map(ReviewItems.Item::owner).distinct().toList();
    }

    public static String text(AnalysisRevision revision, MessageSource messages, Locale locale) {
        List<String> parts = warnedParts(revision);
        if (!parts.isEmpty()) {
            return messages.getMessage("summary.warningStands", new Object[] {parts.size(), String.join(", ", parts)},
                    locale);
        }
        return messages.getMessage(revision.fullyProtected() ? "summary.fullyProtected" : "summary.notFullyProtected",
                null, locale);
    }

    /** The page's class for the status line: {@code clear} only with a verdict of protection. */
    public static String cssClass(AnalysisRevision revision) {
        return revision.fullyProtected() && warnedParts(revision).isEmpty() ? "clear" : "exposed";
    }
}
