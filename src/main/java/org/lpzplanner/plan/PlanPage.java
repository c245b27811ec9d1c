package org.lpzplanner.plan;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.lpzplanner.accounts.CurrentAccount;
import org.lpzplanner.analysis.AnalysisRevision;
import org.lpzplanner.analysis.AnalysisService;
import org.lpzplanner.analysis.ParsedResults;
import org.lpzplanner.analysis.ResultGeoJson;
import org.lpzplanner.analysis.ReviewItems;
import org.lpzplanner.analysis.ReviewService;
import org.lpzplanner.audit.AuditTrail;
import org.lpzplanner.comments.CommentService;
import org.lpzplanner.common.Cautions;
import org.lpzplanner.common.Formats;
import org.lpzplanner.editing.Edit;
import org.lpzplanner.engine.model.ProtectionLevel;
import org.lpzplanner.engine.model.SettingRange;
import org.lpzplanner.sections.SectionPage;
import org.lpzplanner.sites.PlanContribution;
import org.lpzplanner.sites.SiteService;
import org.lpzplanner.sites.StoredSite;
import org.springframework.context.MessageSource;
import org.springframework.stereotype.Component;
import org.springframework.web.servlet.mvc.support.RedirectAttributes;

/**
 * Everything the plan page shows of a site: its settings, the structures read from its file, the
 * earlier files, and the latest analysis with drawing, summary, method, level, radius and cautions.
 * Used both for the page itself and when a form on it is answered with an error.
 */
@Component
class PlanPage {

    /** Most recent changes shown in the page's history. */
    private static final int HISTORY_ROWS = 100;
    private static final List<String> ROOF_FORMS = List.of("flat", "gable", "hip", "shed");
    /** Heights offered for a new rod, in metres; any other value can be typed. */
    private static final List<String> ROD_HEIGHTS = List.of("0.5", "1", "1.5", "2", "3");

    private final SiteService sites;
    private final AnalysisService analyses;
    private final MessageSource messages;
    private final ReviewService reviews;
    private final SectionPage sectionPage;
    private final CommentService comments;
    private final AuditTrail audit;
    private final PlanPresenter presenter;
    private final ParsedResults results;
    private final List<PlanContribution> contributions;

    PlanPage(SiteService sites, AnalysisService analyses, MessageSource messages, ReviewService reviews,
            SectionPage sectionPage, CommentService comments, AuditTrail audit, PlanPresenter presenter,
            ParsedResults results, List<PlanContribution> contributions) {
        this.presenter = presenter;
        this.results = results;
        this.contributions = List.copyOf(contributions);
        this.comments = comments;
        this.audit = audit;
        this.sectionPage = sectionPage;
        this.sites = sites;
        this.analyses = analyses;
        this.messages = messages;
        this.reviews = reviews;
    }

    /** After a change from a page form: the plan page the browser is sent to says why the analysis is pending. */
    static void notePending(Edit<?> edit, RedirectAttributes redirect) {
        if (edit.analysis().isPending()) {
            redirect.addFlashAttribute("analysisPending", edit.analysis().pendingReason());
        }
    }

    /** @throws SiteNotFoundException when no site has this id */
    Map<String, Object> attributes(long id, Locale locale) {
        StoredSite site = sites.get(id);
        AnalysisRevision latest = analyses.latest(id).orElse(null);
        Map<String, Object> model = new LinkedHashMap<>();
        model.put("site", site);
        model.put("lastChange", Formats.dateTime(site.updatedAt()));
        model.put("latest", latest);
        model.put("method", ResultGeoJson.METHOD);
        model.put("cautions", Cautions.lines());
        model.put("levels", ProtectionLevel.values());
        model.put("radiusRule", SettingRange.RADIUS.rule());
        contributions.forEach(c -> model.putAll(c.attributes(site, locale)));
        model.put("structures", sites.structures(site));
        model.put("roofForms", ROOF_FORMS);
        model.put("rodHeights", ROD_HEIGHTS);
        model.put("sectionCut", sectionPage.suggestedCut(site,
                latest == null ? site.sphere().radius() : latest.sphereRadius()));
        model.put("fullCorrection", sites.isGeoJson(site));
        model.put("fileVersions", sites.fileVersions(id).stream()
                .map(v -> new EarlierFile(v.number(), v.sourceName(), Formats.dateTime(v.replacedAt())))
                .toList());
        model.put("comments", comments.comments(id).stream().map(c -> new CommentRow(c.author(), c.body(),
                Formats.dateTime(c.at()))).toList());
        var marks = comments.reviews(id);
        model.put("revisionReviews", marks.stream().map(r -> new ReviewedMark(r.revision(),
                r.reviewer(), Formats.dateTime(r.at()))).toList());
        String me = CurrentAccount.actorName();
        model.put("reviewedByMe", marks.stream().anyMatch(r -> r.reviewer().equals(me)));
        model.put("history", audit.forSite(id, HISTORY_ROWS).stream().map(e -> new HistoryRow(
                Formats.dateTime(e.at()), e.actor(),
                messages.getMessage("history.action." + e.action(), null, e.action(), locale), e.detail())).toList());
        if (latest != null) {
            model.put("basis", presenter.basis(latest, locale));
            model.put("radius", Formats.radius(latest.sphereRadius()));
            ReviewService.Review review = reviews.review(latest);
            List<SummaryRow> summary = new ArrayList<>(summary(latest));
            int negligible = results.of(latest).negligibleBands();
            summary.add(5, new SummaryRow("summary.negligibleBands", "negligibleFacadeBands", String.valueOf(negligible)));
            model.put("negligibleBands", negligible);
            summary.add(new SummaryRow("summary.review", null, messages.getMessage("review.counts",
                    new Object[] {review.items().size(), review.acceptedCount()}, locale)));
            model.put("summary", summary);
            model.put("reviewRows", review.items().stream()
                    .map(i -> ReviewRow.of(i, review.accepted().get(i.key()))).toList());
            model.put("warnings", review.items().stream().filter(ReviewItems.Item::isModelWarning)
                    .map(i -> WarningRow.of(i, latest.sphereRadius(), review.accepted().get(i.key()))).toList());
            boolean current = latest.inputsSha256().equals(AnalysisService.sha256(site.sourceText()));
            // a revision of an earlier file (the analysis after a change is pending) gives no verdict
            model.put("analysisStale", !current);
            model.put("statusText", current ? presenter.status(latest, locale)
                    : PlanStatus.pendingText(messages.getMessage("plan.stale", new Object[] {latest.revision()}, locale),
                            messages, locale));
            model.put("statusClass", current ? presenter.statusClass(latest) : "exposed");
            model.put("svg", presenter.drawing(id, latest, review.accepted(), locale));
        }
        return model;
    }

    /**
     * One line of the review list, numbers already written: {@code length} and {@code height} are
     * "-" where the result has none; {@code reason} is null while the item counts as exposed.
     */
    record ReviewRow(int number, String key, String owner, String kind, String length, String height,
            String reason, boolean warning) {

        static ReviewRow of(ReviewItems.Item item, String reason) {
            String length = item.length() == null ? "-" : Formats.oneDecimal(item.length());
            String height;
            if (item.isModelWarning()) {
                height = item.heightAboveSurface() == null ? "-" : Formats.height(item.heightAboveSurface());
            } else if (item.top() == null) {
                height = "-";
            } else if (item.bottom() != null) {
                height = Formats.height(item.bottom()) + "\u2013" + Formats.height(item.top());
            } else {
                height = Formats.height(item.top());
            }
            return new ReviewRow(item.number(), item.key(), item.owner(), item.kind(), length, height, reason,
                    item.isModelWarning());
        }

    }

    /**
     * A model warning as the page's warning box shows it: the part's name, its greatest height above
     * the surface beneath it and the sphere radius it exceeds, in metres as written; {@code reason}
     * is the designer's when accepted, else null.
     */
    record WarningRow(int number, String key, String kind, String part, String heightAboveSurface, String radius,
            String reason) {

        static WarningRow of(ReviewItems.Item item, double radius, String reason) {
            return new WarningRow(item.number(), item.key(), item.kind(), item.owner(),
                    item.heightAboveSurface() == null ? "-" : Formats.height(item.heightAboveSurface()),
                    Formats.radius(radius), reason);
        }
    }

    /** A comment as the page lists it. */
    record CommentRow(String author, String body, String at) {
    }

    /** A reviewed mark of the latest revision as the page lists it. */
    record ReviewedMark(int revision, String reviewer, String at) {
    }

    /** A line of the site's history (audit trail), action already worded. */
    record HistoryRow(String at, String actor, String action, String detail) {
    }

    /** An earlier file as the page lists it. */
    record EarlierFile(int number, String fileName, String replacedAt) {
    }

    /**
     * One summary table row: message key, the name of the value in the API's summary (the plan
     * editor fills the cell from it after a change) and the value as shown.
     */
    record SummaryRow(String key, String field, String value) {
    }

    private static List<SummaryRow> summary(AnalysisRevision r) {
        return List.of(
                new SummaryRow("summary.revision", "revision", String.valueOf(r.revision())),
                new SummaryRow("summary.exposedRoof", "exposedRoofArea", Formats.oneDecimal(r.exposedRoofArea())),
                new SummaryRow("summary.exposedEdges", "exposedEdgeLength",
                        Formats.oneDecimal(r.exposedEdgeLength())),
                new SummaryRow("summary.corners", "exposedCorners", String.valueOf(r.exposedCorners())),
                new SummaryRow("summary.facadeBands", "facadeBands", String.valueOf(r.facadeBands())),
                new SummaryRow("summary.protectedGround", "protectedGroundArea",
                        Formats.oneDecimal(r.protectedGroundArea())),
                new SummaryRow("summary.resolution", "resolution", Formats.length(r.resolution())),
                new SummaryRow("summary.engineTime", "engineMillis", String.valueOf(r.engineMillis())),
                new SummaryRow("summary.checksum", "inputsSha256", r.inputsSha256()));
    }
}
