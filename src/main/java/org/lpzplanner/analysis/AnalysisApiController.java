package org.lpzplanner.analysis;

import java.util.List;
import org.lpzplanner.common.Cautions;
import org.springframework.http.HttpStatus;
import org.springframework.http.ResponseEntity;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.bind.annotation.RestController;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * JSON API for analyses of a site:
 * {@code POST /api/sites/{id}/analyses} runs one (parameters {@code level}, {@code radius},
 * {@code resolution}, all optional) and {@code GET /api/sites/{id}/analyses/latest} returns the
 * latest. Both answer with the summary, the result GeoJSON and the cautions.
 */
@RestController
@RequestMapping("/api/sites/{siteId}/analyses")
public class AnalysisApiController {

    private static final JsonMapper JSON = JsonMapper.builder().build();

    private final AnalysisService analyses;

    public AnalysisApiController(AnalysisService analyses) {
        this.analyses = analyses;
    }

    /** An analysis with everything a client needs to show it responsibly. */
    public record AnalysisView(long siteId, AnalysisSummary summary, JsonNode result, List<String> cautions) {

        static AnalysisView of(AnalysisRevision r) {
            return new AnalysisView(r.siteId(), AnalysisSummary.of(r), JSON.readTree(r.resultGeoJson()),
                    Cautions.lines());
        }
    }

    @PostMapping
    public ResponseEntity<AnalysisView> run(@PathVariable long siteId,
            @RequestParam(required = false) String level, @RequestParam(required = false) String radius,
            @RequestParam(required = false) String resolution) {
        AnalysisRevision revision = analyses.run(siteId, level, radius, resolution);
        return ResponseEntity.status(HttpStatus.CREATED).body(AnalysisView.of(revision));
    }

    /** 404 with a JSON message when the site was never analysed. */
    @GetMapping("/latest")
    public ResponseEntity<?> latest(@PathVariable long siteId) {
        return analyses.latest(siteId)
                .<ResponseEntity<?>>map(r -> ResponseEntity.ok(AnalysisView.of(r)))
                .orElseGet(() -> ResponseEntity.status(HttpStatus.NOT_FOUND).body(
                        java.util.Map.of("error", "site " + siteId + " has not been analysed yet")));
    }
}
