package org.lpzplanner.analysis;

import java.net.URI;
import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.media.Content;
import io.swagger.v3.oas.annotations.media.Schema;
import io.swagger.v3.oas.annotations.responses.ApiResponse;
import io.swagger.v3.oas.annotations.tags.Tag;
import java.util.List;
import org.lpzplanner.common.Cautions;
import org.lpzplanner.sites.SiteService;
import org.springframework.http.HttpStatus;
import org.springframework.http.ResponseEntity;
import org.springframework.web.bind.annotation.DeleteMapping;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.bind.annotation.RestController;
import tools.jackson.databind.JsonNode;

/**
 * JSON API for analyses of a site:
 * {@code POST /api/sites/{id}/analyses} runs one (parameters {@code level}, {@code radius},
 * {@code resolution}, all optional) and {@code GET /api/sites/{id}/analyses/latest} returns the
 * latest. Both answer with the summary, the result GeoJSON (see {@link ResultGeoJson}: in the site
 * file's coordinates) and the cautions. With {@code async=true}
 * the analysis runs in the background: {@code GET .../analyses/jobs/{jobId}} follows it and
 * {@code DELETE} cancels it.
 */
@RestController
@Tag(name = "Analyses", description = "Rolling sphere analyses of a site")
@RequestMapping("/api/sites/{siteId}/analyses")
public class AnalysisApiController {

    private final AnalysisService analyses;
    private final AnalysisJobs jobs;

    private final SiteService sites;

    public AnalysisApiController(AnalysisService analyses, AnalysisJobs jobs, SiteService sites) {
        this.sites = sites;
        this.analyses = analyses;
        this.jobs = jobs;
    }

    /** An analysis with everything a client needs to show it responsibly. */
    public record AnalysisView(long siteId, AnalysisSummary summary, JsonNode result, List<String> cautions) {

        static AnalysisView of(AnalysisRevision r, AnalysisService analyses) {
            return new AnalysisView(r.siteId(), AnalysisSummary.of(r), analyses.publishedResult(r), Cautions.lines());
        }
    }

    /**
     * Runs an analysis and answers 201 with it; with {@code async=true} queues it instead and
     * answers 202 with the job (its address in {@code Location}), or 429 with {@code Retry-After}
     * when the workers and their queue are full.
     */
    @Operation(summary = "Analyse a site",
            description = "Optional parameters level (I to IV, default the site's), radius (metres) and resolution (metres). Answers with the summary, the result GeoJSON and the cautions. With async=true the analysis is queued and the answer is the job.")
    @ApiResponse(responseCode = "201", description = "The new analysis revision",
            content = @Content(schema = @Schema(implementation = AnalysisView.class)))
    @ApiResponse(responseCode = "202", description = "Queued (async=true): the job, its address in Location",
            content = @Content(schema = @Schema(implementation = AnalysisJob.Snapshot.class)))
    @ApiResponse(responseCode = "429", description = "Every analysis worker is busy and the queue is full, or every place for long computations is taken; Retry-After says when to try again")
    @ApiResponse(responseCode = "503", description = "The analysis took longer than its time budget; nothing was stored; Retry-After says when to try again")
    @ApiResponse(responseCode = "400", description = "A setting cannot be used, or the analysis is too large (with a resolution that fits)")
    @ApiResponse(responseCode = "404", description = "No site with this id")
    @PostMapping
    public ResponseEntity<?> run(@PathVariable long siteId,
            @RequestParam(required = false) String level, @RequestParam(required = false) String radius,
            @RequestParam(required = false) String resolution, @RequestParam(defaultValue = "false") boolean async) {
        if (async) {
            AnalysisJob.Snapshot job = jobs.submit(siteId, level, radius, resolution);
            return ResponseEntity.accepted()
                    .location(URI.create("/api/sites/" + siteId + "/analyses/jobs/" + job.id()))
                    .body(job);
        }
        AnalysisRevision revision = analyses.run(siteId, level, radius, resolution);
        return ResponseEntity.status(HttpStatus.CREATED).body(AnalysisView.of(revision, analyses));
    }

    /** Where a background analysis is: state, stage, share done, and the revision once done. */
    @Operation(summary = "Follow a background analysis",
            description = "State (QUEUED, RUNNING, DONE, FAILED, CANCELLED), stage, share done (0..1), the stored revision once done, or the error.")
    @ApiResponse(responseCode = "200", description = "The job")
    @ApiResponse(responseCode = "404", description = "No such job for this site")
    @GetMapping("/jobs/{jobId}")
    public AnalysisJob.Snapshot job(@PathVariable long siteId, @PathVariable String jobId) {
        sites.get(siteId); // another team's site (and so its jobs) is not found
        return jobs.find(siteId, jobId).orElseThrow(() -> new AnalysisJobNotFoundException(siteId, jobId));
    }

    /** Asks a background analysis to stop; nothing of it is stored. Answers with the job. */
    @Operation(summary = "Cancel a background analysis", description = "A queued job never starts; a running one stops at its next check. Nothing of it is stored.")
    @ApiResponse(responseCode = "200", description = "The job, CANCELLED or about to be")
    @ApiResponse(responseCode = "404", description = "No such job for this site")
    @DeleteMapping("/jobs/{jobId}")
    public AnalysisJob.Snapshot cancel(@PathVariable long siteId, @PathVariable String jobId) {
        sites.get(siteId); // another team's site (and so its jobs) is not found
        return jobs.cancel(siteId, jobId).orElseThrow(() -> new AnalysisJobNotFoundException(siteId, jobId));
    }

    /** 404 when the site was never analysed. */
    @Operation(summary = "The latest analysis of a site")
    @ApiResponse(responseCode = "200", description = "The latest revision with result and cautions")
    @ApiResponse(responseCode = "404", description = "No such site, or it was never analysed")
    @GetMapping("/latest")
    public AnalysisView latest(@PathVariable long siteId) {
        return AnalysisView.of(analyses.latest(siteId).orElseThrow(() -> new ReviewItemNotFoundException(
                "site " + siteId + " has not been analysed yet")), analyses);
    }
}
