package org.lpzplanner.analysis;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.time.Clock;
import java.time.temporal.ChronoUnit;
import java.util.HexFormat;
import java.util.Map;
import java.util.Optional;
import org.lpzplanner.audit.AuditTrail;
import org.lpzplanner.engine.exposure.AnalysisOptions;
import org.lpzplanner.engine.exposure.AnalysisProgress;
import org.lpzplanner.engine.exposure.AnalysisState;
import org.lpzplanner.engine.exposure.AnalysisResult;
import org.lpzplanner.engine.exposure.ExposureAnalysis;
import org.lpzplanner.engine.io.SiteDocument;
import org.lpzplanner.engine.model.ProtectionLevel;
import org.lpzplanner.engine.model.SphereSpec;
import org.lpzplanner.sites.SiteService;
import org.lpzplanner.sites.StoredSite;
import org.lpzplanner.heavywork.HeavyWorkCapacity;
import org.lpzplanner.system.InvalidInputException;
import org.lpzplanner.system.Settings;
import org.springframework.stereotype.Service;
import org.springframework.transaction.support.TransactionTemplate;

/**
 * Runs the rolling-sphere analysis of a stored site and keeps each run as a numbered revision.
 * The engine does the work; this class picks the settings, stores the summary and the result
 * GeoJSON, and marks the site as changed. Each run starts from the last analysis of the site kept
 * in memory ({@link AnalysisStateCache}) where there is one, so after an edit of the
 * air-termination only what the edit can change is decided again. Who asks: "analyse again" (page,
 * API, background job) with chosen settings, and the edit pipeline after every change of a site
 * ({@link #run(StoredSite)}).
 */
@Service
public class AnalysisService {

    private final SiteService sites;
    private final AnalysisRepository analyses;
    private final TransactionTemplate transactions;
    private final Clock clock;
    private final AnalysisStateCache kept;
    private final AcceptedItemRepository accepted;
    private final AuditTrail audit;
    private final HeavyWorkCapacity capacity;
    private final ParsedResults results;

    public AnalysisService(SiteService sites, AnalysisRepository analyses, TransactionTemplate transactions,
            Clock clock, AnalysisStateCache kept, AcceptedItemRepository accepted, AuditTrail audit,
            HeavyWorkCapacity capacity, ParsedResults results) {
        this.audit = audit;
        this.capacity = capacity;
        this.results = results;
        this.sites = sites;
        this.analyses = analyses;
        this.transactions = transactions;
        this.clock = clock;
        this.kept = kept;
        this.accepted = accepted;
    }

    /**
     * Analyses a site and stores the result as its next revision.
     *
     * @param levelText      "I".."IV", or blank for the site's own level (and custom radius)
     * @param radiusText     custom sphere radius in metres, or blank for the level's own radius
     * @param resolutionText grid spacing in metres, or blank to let the engine choose
     * @return the stored revision, with its result GeoJSON
     * @throws org.lpzplanner.sites.SiteNotFoundException when no site has this id
     * @throws InvalidInputException when a setting cannot be used
     * @throws org.springframework.dao.OptimisticLockingFailureException when the site changed or was
     *         deleted while the analysis ran
     */
    public AnalysisRevision run(long siteId, String levelText, String radiusText, String resolutionText) {
        return run(siteId, levelText, radiusText, resolutionText, AnalysisProgress.NONE);
    }

    /**
     * As {@link #run(long, String, String, String)}, reporting to {@code progress}.
     *
     * @throws org.lpzplanner.engine.exposure.AnalysisCancelledException when {@code progress} asked
     *         to stop; nothing is stored then
     * @throws org.lpzplanner.heavywork.HeavyWorkBusyException when the instance is already running as
     *         many long computations as it may and none finished within the wait (see
     *         {@link HeavyWorkCapacity})
     * @throws org.lpzplanner.heavywork.HeavyWorkOverBudgetException when the analysis ran past its time
     *         budget; nothing is stored then
     */
    public AnalysisRevision run(long siteId, String levelText, String radiusText, String resolutionText,
            AnalysisProgress progress) {
        return capacity.run("analysis", () -> runNow(siteId, levelText, radiusText, resolutionText, progress));
    }

    /**
     * Analyses the site as {@code site} holds it, at its own level and radius with the grid the engine
     * chooses, and stores the result as its next revision: the analysis after a change of the site.
     *
     * @throws org.lpzplanner.heavywork.HeavyWorkBusyException when no place came free within the wait
     *         (nothing is stored)
     * @throws org.lpzplanner.heavywork.HeavyWorkOverBudgetException when it ran past its time budget
     *         (nothing is stored)
     * @throws org.lpzplanner.engine.envelope.AnalysisTooLargeException when the grid would not fit
     * @throws InvalidInputException when the engine cannot analyse the site with its settings
     * @throws org.springframework.dao.OptimisticLockingFailureException when the site changed or was
     *         deleted while the analysis ran (nothing is stored)
     */
    public AnalysisRevision run(StoredSite site) {
        return capacity.run("analysis", () -> analyse(site, site.sphere(), null, AnalysisProgress.NONE));
    }

    private AnalysisRevision runNow(long siteId, String levelText, String radiusText, String resolutionText,
            AnalysisProgress progress) {
        StoredSite site = sites.get(siteId);
        SphereSpec sphere = sphere(site, levelText, radiusText);
        Double resolution = Settings.resolution(resolutionText);
        return analyse(site, sphere, resolution, progress);
    }

    private AnalysisRevision analyse(StoredSite site, SphereSpec sphere, Double resolution, AnalysisProgress progress) {
        SiteDocument document = sites.document(site);
        AnalysisResult result;
        try {
            AnalysisOptions options = new AnalysisOptions(sphere, resolution, AnalysisOptions.DEFAULT_TOLERANCE);
            Optional<AnalysisState> previous = kept.closest(site.id(), site.version());
            AnalysisProgress budgeted = capacity.budgeted(progress);
            AnalysisState state = previous.isPresent()
                    ? ExposureAnalysis.update(previous.get(), document.site(), options, budgeted)
                    : ExposureAnalysis.analyzeKeepingState(document.site(), options, budgeted);
            kept.keep(site.id(), site.version(), state);
            result = state.result();
        } catch (IllegalArgumentException e) {
            throw new InvalidInputException("site", "the analysis cannot run with these inputs: " + e.getMessage());
        }
        RevisionResult computed = RevisionResult.of(document, result);
        return transactions.execute(status -> {
            var now = clock.instant().truncatedTo(ChronoUnit.MILLIS);
            Optional<AnalysisRevision> previous = analyses.latest(site.id());
            AnalysisRevision revision = analyses.insert(new AnalysisRevision(0, site.id(),
                    analyses.nextRevision(site.id()), sphere.level(), sphere.radius(), computed.resolution(),
                    sha256(site.sourceText()), computed.exposedRoofArea(), computed.exposedEdgeLength(),
                    computed.exposedCorners(), computed.facadeBands(), computed.protectedGroundArea(),
                    computed.fullyProtected(), computed.resultGeoJson(), now, computed.engineMillis()),
                    new RevisionInputs(site.name(), site.sourceName(), site.sourceText(), computed.tolerance()));
            sites.markAnalysed(site, now);
            previous.ifPresent(p -> carryOverAcceptances(p, revision, now));
            audit.record(site.id(), "analysis", String.format(java.util.Locale.ROOT,
                    "revision %d at level %s, sphere radius %s m: %s", revision.revision(), sphere.level().name(),
                    ResultGeoJson.round(sphere.radius()), revision.fullyProtected() ? "no exposed items"
                            : "exposed items remain"));
            return revision;
        });
    }

    /**
     * The rolling-sphere analysis of a site as it stands ({@code model} read from {@code site}'s file),
     * at the site's own sphere with the grid the engine chooses, as {@link #run(StoredSite)} would
     * compute it, but not stored: for checks that need the sphere's result, such as the method checks.
     * It starts from the analysis kept in memory for the site ({@link AnalysisStateCache}): when the
     * site is unchanged since, every decision is taken over and nothing is computed again; otherwise
     * the engine decides again what the change can reach, or analyses afresh, so the result is the one
     * a fresh analysis gives. The state is kept for the next call. Runs within the instance's
     * {@link HeavyWorkCapacity} (in the caller's place when it holds one) and its time budget.
     *
     * @throws InvalidInputException when the engine cannot analyse the site with its settings
     */
    public AnalysisResult current(StoredSite site, org.lpzplanner.engine.model.Site model) {
        return capacity.run("analysis", () -> {
            try {
                AnalysisOptions options = AnalysisOptions.of(site.sphere());
                AnalysisProgress budgeted = capacity.budgeted(AnalysisProgress.NONE);
                Optional<AnalysisState> previous = kept.closest(site.id(), site.version());
                AnalysisState state = previous.isPresent()
                        ? ExposureAnalysis.update(previous.get(), model, options, budgeted)
                        : ExposureAnalysis.analyzeKeepingState(model, options, budgeted);
                kept.keep(site.id(), site.version(), state);
                return state.result();
            } catch (IllegalArgumentException e) {
                throw new InvalidInputException("site", "the analysis cannot run with these inputs: "
                        + e.getMessage());
            }
        });
    }

    /**
     * The result of a revision as the API hands it out (see {@link ResultGeoJson#published}): in
     * lon/lat when the site file it analysed was in lon/lat. Revisions stored before results kept
     * the site's local origin take it from the site file stored with the revision; without one
     * (or when that file no longer reads) the result stays in local metres, which it says.
     */
    public tools.jackson.databind.node.ObjectNode publishedResult(AnalysisRevision revision) {
        tools.jackson.databind.node.ObjectNode stored = ResultGeoJson.published(revision.resultGeoJson());
        if (stored.has("localOrigin") || !stored.has("coordinates")) {
            return stored;
        }
        Optional<org.lpzplanner.engine.io.LocalProjection> projection = analyses.inputs(revision.id()).flatMap(in -> {
            try {
                return Optional.ofNullable(org.lpzplanner.sites.SiteFiles.read(in.sourceText(), in.sourceName())
                        .projection());
            } catch (RuntimeException unreadable) {
                return Optional.empty();
            }
        });
        if (projection.isEmpty()) {
            return stored;
        }
        tools.jackson.databind.node.ObjectNode origin = stored.putObject("localOrigin");
        origin.put("longitude", projection.get().centreLon());
        origin.put("latitude", projection.get().centreLat());
        return ResultGeoJson.published(stored.toString());
    }

    /**
     * Checks a site id and settings as {@link #run} would, without analysing.
     *
     * @throws org.lpzplanner.sites.SiteNotFoundException when no site has this id
     * @throws InvalidInputException when a setting cannot be used
     * @throws org.lpzplanner.engine.envelope.AnalysisTooLargeException when the analysis would not fit
     */
    public void check(long siteId, String levelText, String radiusText, String resolutionText) {
        StoredSite site = sites.get(siteId);
        SphereSpec sphere = sphere(site, levelText, radiusText);
        Double resolution = Settings.resolution(resolutionText);
        try {
            ExposureAnalysis.checkSize(sites.document(site).site(),
                    new AnalysisOptions(sphere, resolution, AnalysisOptions.DEFAULT_TOLERANCE));
        } catch (IllegalArgumentException e) {
            throw new InvalidInputException("site", "the analysis cannot run with these inputs: " + e.getMessage());
        }
    }

    /**
     * Analyses a site file with the sphere and grid resolution a stored revision records, with the
     * engine options {@link #run} uses and within this instance's {@link HeavyWorkCapacity} and its time budget, and
     * stores nothing: for revisions whose results are computed again here, such as those of an
     * imported site export. Always a fresh analysis, so the result depends on nothing but the file
     * and the settings.
     *
     * @throws InvalidInputException when the engine cannot analyse with these settings
     * @throws org.lpzplanner.engine.envelope.AnalysisTooLargeException when the grid would not fit
     * @throws org.lpzplanner.heavywork.HeavyWorkBusyException when no place came free within the wait
     * @throws org.lpzplanner.heavywork.HeavyWorkOverBudgetException when it ran past its time budget
     */
    public RevisionResult analyse(SiteDocument document, SphereSpec sphere, double resolution) {
        AnalysisOptions options = options(sphere, resolution);
        return capacity.run("analysis", () -> {
            try {
                return RevisionResult.of(document, ExposureAnalysis.analyzeKeepingState(document.site(), options,
                        capacity.budgeted(AnalysisProgress.NONE)).result());
            } catch (IllegalArgumentException e) {
                throw new InvalidInputException("site", "the analysis cannot run with these inputs: "
                        + e.getMessage());
            }
        });
    }

    /**
     * Checks what {@link #analyse(SiteDocument, SphereSpec, double)} would analyse, without analysing.
     *
     * @throws InvalidInputException when the engine cannot analyse with these settings
     * @throws org.lpzplanner.engine.envelope.AnalysisTooLargeException when the grid would not fit
     */
    public void check(SiteDocument document, SphereSpec sphere, double resolution) {
        AnalysisOptions options = options(sphere, resolution);
        try {
            ExposureAnalysis.checkSize(document.site(), options);
        } catch (IllegalArgumentException e) {
            throw new InvalidInputException("site", "the analysis cannot run with these inputs: " + e.getMessage());
        }
    }

    private static AnalysisOptions options(SphereSpec sphere, double resolution) {
        try {
            return new AnalysisOptions(sphere, resolution, AnalysisOptions.DEFAULT_TOLERANCE);
        } catch (IllegalArgumentException e) {
            throw new InvalidInputException("resolution", "the analysis cannot run with these inputs: "
                    + e.getMessage());
        }
    }

    /**
     * Accepted review items stay accepted in the new revision where the same item (same key: kind,
     * owner and geometry to the decimetre) is still exposed; the others are dropped with the old
     * revision's review.
     */
    private void carryOverAcceptances(AnalysisRevision previous, AnalysisRevision next, java.time.Instant now) {
        Map<String, String> reasons = accepted.reasons(previous.id());
        if (reasons.isEmpty()) {
            return;
        }
        for (ReviewItems.Item item : results.of(next).items()) {
            String reason = reasons.get(item.key());
            if (reason != null) {
                accepted.accept(next.id(), item.key(), reason, now);
            }
        }
    }

    /** The site's latest revision with its result GeoJSON, empty when it was never analysed. */
    public Optional<AnalysisRevision> latest(long siteId) {
        sites.get(siteId);
        return analyses.latest(siteId);
    }

    /**
     * The latest revision of every analysed site, without result GeoJSON, by site id. Not limited
     * to a team: callers look up only the ids of sites they were allowed to list.
     */
    public Map<Long, AnalysisRevision> latestSummaries() {
        return analyses.latestSummaries();
    }

    private static SphereSpec sphere(StoredSite site, String levelText, String radiusText) {
        Double radius = Settings.radius(radiusText);
        if ((levelText == null || levelText.isBlank()) && radius == null) {
            return site.sphere();
        }
        ProtectionLevel level = Settings.level(levelText, site.level());
        return radius == null ? SphereSpec.of(level) : new SphereSpec(level, radius);
    }

    /** Hex SHA-256 of the text's UTF-8 bytes. */
    public static String sha256(String text) {
        try {
            return HexFormat.of().formatHex(
                    MessageDigest.getInstance("SHA-256").digest(text.getBytes(StandardCharsets.UTF_8)));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java runtime has SHA-256", e);
        }
    }

}
