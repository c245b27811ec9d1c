package org.lpzplanner.plan;

import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.lpzplanner.analysis.AnalysisRevision;
import org.lpzplanner.analysis.AnalysisSummary;
import org.lpzplanner.analysis.ParsedResults;
import org.lpzplanner.analysis.PlanSvg;
import org.lpzplanner.analysis.ResultGeoJson;
import org.lpzplanner.common.Cautions;
import org.lpzplanner.common.Formats;
import org.lpzplanner.editing.AnalysisUpdate;
import org.lpzplanner.keepout.KeepOutAreaService;
import org.springframework.context.MessageSource;
import org.springframework.stereotype.Component;

/**
 * Words an analysed site for its plan, the one place that does: the drawing (with the site's stored
 * keep-out areas), the basis line (method, level, radius, when) and the status line, on the plan
 * page and in the answer to a change, which the plan editor puts in place of the page's. A revision's
 * stored result is read once ({@link ParsedResults}).
 */
@Component
public class PlanPresenter {

    private final ParsedResults results;
    private final MessageSource messages;
    private final KeepOutAreaService keepOut;

    public PlanPresenter(ParsedResults results, MessageSource messages, KeepOutAreaService keepOut) {
        this.results = results;
        this.messages = messages;
        this.keepOut = keepOut;
    }

    /**
     * What the plan page shows anew after a change: the new analysis's summary, drawing, basis and
     * status lines and the cautions; or, while the analysis is pending, no drawing, a status line
     * giving no verdict and the reason.
     */
    public record Refresh(AnalysisSummary summary, String svg, String basis, String status, String statusClass,
            List<String> cautions, boolean analysisPending, String pendingReason) {
    }

    /** The plan after a change of the site, from the pipeline's analysis update. */
    public Refresh afterChange(long siteId, AnalysisUpdate update, Locale locale) {
        if (update.isPending()) {
            return new Refresh(null, null, null, PlanStatus.pendingText(update.pendingReason(), messages, locale),
                    "exposed", Cautions.lines(), true, update.pendingReason());
        }
        AnalysisRevision revision = update.revision();
        // drawn without acceptance marks, as the plan editor has always swapped it in
        return new Refresh(update.summary(), drawing(siteId, revision, Map.of(), locale), basis(revision, locale),
                status(revision, locale), statusClass(revision), Cautions.lines(), false, null);
    }

    /** The plan drawing of a revision, with the accepted items marked (reason by item key). */
    public String drawing(long siteId, AnalysisRevision revision, Map<String, String> accepted, Locale locale) {
        return PlanSvg.render(results.of(revision).root(), (key, args) -> messages.getMessage(key, args, locale),
                accepted, keepOut.forPlan(siteId));
    }

    /** "Method: rolling sphere method. Protection level II, sphere radius 30 m. Analysed ...". */
    public String basis(AnalysisRevision revision, Locale locale) {
        return messages.getMessage("plan.basis", new Object[] {ResultGeoJson.METHOD, revision.level().name(),
                Formats.radius(revision.sphereRadius()), Formats.dateTime(revision.createdAt())}, locale);
    }

    /** The status line of a revision of the site's current file ({@link PlanStatus}). */
    public String status(AnalysisRevision revision, Locale locale) {
        return PlanStatus.text(revision, results.of(revision).items(), messages, locale);
    }

    public String statusClass(AnalysisRevision revision) {
        return PlanStatus.cssClass(revision, results.of(revision).items());
    }
}
