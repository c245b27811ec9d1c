package org.lpzplanner.plan;

import java.util.List;
import java.util.Locale;
import org.lpzplanner.analysis.AnalysisRevision;
import org.lpzplanner.analysis.ReviewItems;
import org.springframework.context.MessageSource;

/**
 * The status line of the plan page for a revision, the same on the page and in the answer to an
 * edit: protected, exposed, or, while a model warning stands (accepted or not), no verdict of full
 * protection, naming the parts the warnings are about. A revision of an earlier file of the site
 * (the analysis after a change is pending) gives no verdict either: what it found may no longer hold.
 */
public final class PlanStatus {

    private PlanStatus() {
    }

    /** The parts named by the model warnings among a revision's review items, in the result's order. */
    public static List<String> warnedParts(List<ReviewItems.Item> items) {
        return items.stream().filter(ReviewItems.Item::isModelWarning).map(ReviewItems.Item::owner).distinct().toList();
    }

    /** @param items the revision's review items */
    public static String text(AnalysisRevision revision, List<ReviewItems.Item> items, MessageSource messages,
            Locale locale) {
        List<String> parts = warnedParts(items);
        if (!parts.isEmpty()) {
            return messages.getMessage("summary.warningStands", new Object[] {parts.size(), String.join(", ", parts)},
                    locale);
        }
        return messages.getMessage(revision.fullyProtected() ? "summary.fullyProtected" : "summary.notFullyProtected",
                null, locale);
    }

    /** The line while the latest revision analysed an earlier file of the site. */
    public static String pendingText(String reason, MessageSource messages, Locale locale) {
        return messages.getMessage("summary.analysisPending", new Object[] {reason}, locale);
    }

    /** The page's class for the status line: {@code clear} only with a verdict of protection. */
    public static String cssClass(AnalysisRevision revision, List<ReviewItems.Item> items) {
        return revision.fullyProtected() && warnedParts(items).isEmpty() ? "clear" : "exposed";
    }
}
