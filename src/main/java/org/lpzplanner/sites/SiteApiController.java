package org.lpzplanner.sites;

import java.net.URI;
import java.nio.charset.StandardCharsets;
import java.time.Instant;
import java.util.List;
import java.util.Map;
import org.lpzplanner.analysis.AnalysisRevision;
import org.lpzplanner.analysis.AnalysisService;
import org.lpzplanner.analysis.AnalysisSummary;
import org.springframework.http.ContentDisposition;
import org.springframework.http.HttpHeaders;
import org.springframework.http.MediaType;
import org.springframework.http.ResponseEntity;
import org.springframework.web.bind.annotation.DeleteMapping;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.bind.annotation.RestController;
import org.springframework.web.multipart.MultipartFile;

/**
 * JSON API for sites: list ({@code GET /api/sites}), upload ({@code POST /api/sites}, multipart
 * {@code file} with optional {@code name}, {@code level}, {@code radius}), one site
 * ({@code GET /api/sites/{id}}), removal ({@code DELETE /api/sites/{id}}) and the stored file
 * ({@code GET /api/sites/{id}/file}). Errors are JSON, see
 * {@link org.lpzplanner.system.ApiErrorHandler}.
 */
@RestController
@RequestMapping("/api/sites")
public class SiteApiController {

    private final SiteService sites;
    private final AnalysisService analyses;

    public SiteApiController(SiteService sites, AnalysisService analyses) {
        this.sites = sites;
        this.analyses = analyses;
    }

    /**
     * A site as the API shows it; {@code latest} is null until the site is analysed, and
     * {@code lastChange} is when the site or its analyses last changed.
     */
    public record SiteView(long id, String name, String level, Double customRadius, String fileName,
            Instant createdAt, Instant lastChange, AnalysisSummary latest) {

        static SiteView of(StoredSite s, AnalysisRevision latest) {
            return new SiteView(s.id(), s.name(), s.level().name(), s.customRadius(), s.sourceName(), s.createdAt(),
                    s.updatedAt(), latest == null ? null : AnalysisSummary.of(latest));
        }
    }

    @GetMapping
    public List<SiteView> list() {
        Map<Long, AnalysisRevision> latest = analyses.latestSummaries();
        return sites.list().stream().map(s -> SiteView.of(s, latest.get(s.id()))).toList();
    }

    @PostMapping(consumes = MediaType.MULTIPART_FORM_DATA_VALUE)
    public ResponseEntity<SiteView> upload(@RequestParam("file") MultipartFile file,
            @RequestParam(required = false) String name, @RequestParam(required = false) String level,
            @RequestParam(required = false) String radius) throws java.io.IOException {
        StoredSite site = sites.create(file.getOriginalFilename(), file.getBytes(), name, level, radius);
        return ResponseEntity.created(URI.create("/api/sites/" + site.id())).body(SiteView.of(site, null));
    }

    @GetMapping("/{id}")
    public SiteView get(@PathVariable long id) {
        StoredSite site = sites.get(id);
        return SiteView.of(site, analyses.latest(id).orElse(null));
    }

    @DeleteMapping("/{id}")
    public ResponseEntity<Void> delete(@PathVariable long id) {
        sites.delete(id);
        return ResponseEntity.noContent().build();
    }

    /** The site file exactly as uploaded, under its original name. */
    @GetMapping("/{id}/file")
    public ResponseEntity<byte[]> file(@PathVariable long id) {
        StoredSite site = sites.get(id);
        return ResponseEntity.ok()
                .header(HttpHeaders.CONTENT_DISPOSITION, ContentDisposition.attachment()
                        .filename(site.sourceName(), StandardCharsets.UTF_8).build().toString())
                .contentType(new MediaType("text", "plain", StandardCharsets.UTF_8))
                .body(site.sourceText().getBytes(StandardCharsets.UTF_8));
    }
}
