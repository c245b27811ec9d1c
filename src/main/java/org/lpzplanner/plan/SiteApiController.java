package org.lpzplanner.plan;

import java.net.URI;
import java.nio.charset.StandardCharsets;
import java.time.Instant;
import java.util.List;
import java.util.Map;
import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.responses.ApiResponse;
import io.swagger.v3.oas.annotations.tags.Tag;
import jakarta.validation.Valid;
import org.lpzplanner.analysis.AnalysisRevision;
import org.lpzplanner.analysis.AnalysisService;
import org.lpzplanner.analysis.AnalysisSummary;
import org.lpzplanner.editing.AnalysisUpdate;
import org.lpzplanner.editing.Edit;
import org.lpzplanner.editing.EditPipeline;
import org.lpzplanner.sites.SiteFileVersion;
import org.lpzplanner.sites.SiteService;
import org.lpzplanner.sites.StoredSite;
import org.springframework.http.ContentDisposition;
import org.springframework.http.HttpHeaders;
import org.springframework.http.MediaType;
import org.springframework.http.ResponseEntity;
import org.springframework.web.bind.annotation.DeleteMapping;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PatchMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.bind.annotation.RestController;
import org.springframework.web.multipart.MultipartFile;

/**
 * JSON API for sites: list ({@code GET /api/sites}), upload ({@code POST /api/sites}, multipart
 * {@code file} with optional {@code name}, {@code level}, {@code radius}; stored, then analysed like
 * an upload through the page), one site
 * ({@code GET /api/sites/{id}}), changes ({@code PATCH /api/sites/{id}}, a JSON object with the
 * site's {@code version} and any of {@code name}, {@code level}, {@code radius}; a null radius goes
 * back to the level's own; {@code address} and {@code designer}, printed on the report's cover,
 * one line of at most 200 characters each, null or blank to clear), a copy ({@code POST /api/sites/{id}/duplicate}), removal
 * ({@code DELETE /api/sites/{id}}, optionally {@code ?version=N}), the stored file ({@code GET /api/sites/{id}/file}) and the
 * files corrections replaced ({@code GET /api/sites/{id}/file/versions} and
 * {@code .../versions/{number}}). A stale {@code version} answers 409. Errors are problem details, see
 * {@link org.lpzplanner.system.ApiErrorHandler}.
 */
@RestController
@Tag(name = "Sites", description = "Stored sites and their files")
@RequestMapping("/api/sites")
public class SiteApiController {

    private final SiteService sites;
    private final AnalysisService analyses;
    private final EditPipeline edits;

    public SiteApiController(SiteService sites, AnalysisService analyses, EditPipeline edits) {
        this.sites = sites;
        this.analyses = analyses;
        this.edits = edits;
    }

    /**
     * A site as the API shows it; {@code latest} is null until the site is analysed, and
     * {@code lastChange} is when the site or its analyses last changed. {@code analysisPending} and
     * {@code pendingReason} answer an upload only (null elsewhere): whether the analysis after it is
     * pending (the site is stored all the same) and why.
     */
    public record SiteView(long id, String name, String level, Double customRadius, String fileName,
            Instant createdAt, Instant lastChange, long version, AnalysisSummary latest, String address,
            String designer, Boolean analysisPending, String pendingReason) {

        static SiteView of(StoredSite s, AnalysisRevision latest) {
            return new SiteView(s.id(), s.name(), s.level().name(), s.customRadius(), s.sourceName(), s.createdAt(),
                    s.updatedAt(), s.version(), latest == null ? null : AnalysisSummary.of(latest), s.address(),
                    s.designer(), null, null);
        }

        static SiteView uploaded(StoredSite s, AnalysisUpdate analysis) {
            return new SiteView(s.id(), s.name(), s.level().name(), s.customRadius(), s.sourceName(), s.createdAt(),
                    s.updatedAt(), s.version(), analysis.summary(), s.address(), s.designer(), analysis.isPending(),
                    analysis.pendingReason());
        }
    }

    /** An earlier site file: its number, name, size in bytes and when a correction replaced it. */
    public record FileVersionView(int number, String fileName, int bytes, Instant replacedAt) {
    }

    @Operation(summary = "List the sites",
            description = "Every stored site, most recently changed first, with the summary of its latest analysis.")
    @ApiResponse(responseCode = "200", description = "The sites")
    @GetMapping
    public List<SiteView> list() {
        Map<Long, AnalysisRevision> latest = analyses.latestSummaries();
        return sites.list().stream().map(s -> SiteView.of(s, latest.get(s.id()))).toList();
    }

    @Operation(summary = "Upload a site file",
            description = "Multipart: file (GeoJSON or WKT, UTF-8), optional name, level (I to IV, default II) and radius (metres). The file is checked and kept byte for byte, then the site is analysed; nothing is stored when it is refused. When the analysis cannot run now the site stays stored, analysisPending is true and pendingReason says why.")
    @ApiResponse(responseCode = "201", description = "Stored and analysed (latest), or stored with the analysis pending (analysisPending, pendingReason); Location names the new site")
    @ApiResponse(responseCode = "400", description = "The file is not a valid site (file, feature, line and field named) or a setting cannot be used")
    @ApiResponse(responseCode = "413", description = "The file is too large")
    @PostMapping(consumes = MediaType.MULTIPART_FORM_DATA_VALUE)
    public ResponseEntity<SiteView> upload(@RequestParam("file") MultipartFile file,
            @RequestParam(required = false) String name, @RequestParam(required = false) String level,
            @RequestParam(required = false) String radius) throws java.io.IOException {
        Edit<StoredSite> upload = edits.upload(file.getOriginalFilename(), file.getBytes(), name, level, radius);
        // read again: the analysis marked the site changed when it stored its revision
        StoredSite site = sites.get(upload.siteId());
        return ResponseEntity.created(URI.create("/api/sites/" + site.id()))
                .body(SiteView.uploaded(site, upload.analysis()));
    }

    @Operation(summary = "One site")
    @ApiResponse(responseCode = "200", description = "The site")
    @ApiResponse(responseCode = "404", description = "No site with this id")
    @ApiResponse(responseCode = "400", description = "The id is not a whole number")
    @GetMapping("/{id}")
    public SiteView get(@PathVariable long id) {
        StoredSite site = sites.get(id);
        return SiteView.of(site, analyses.latest(id).orElse(null));
    }

    @Operation(summary = "Change name, level, radius, address or designer",
            description = "JSON object with the site's version and any of name, level, radius (null radius: the level's own),"
                    + " address and designer (strings printed on the report's cover: one line, at most 200 characters,"
                    + " no control characters; null or blank clears).")
    @ApiResponse(responseCode = "200", description = "Changed")
    @ApiResponse(responseCode = "400", description = "A value cannot be used; the field is named")
    @ApiResponse(responseCode = "404", description = "No site with this id")
    @ApiResponse(responseCode = "409", description = "The site was changed meanwhile: the version sent is not the stored one")
    @PatchMapping(value = "/{id}", consumes = MediaType.APPLICATION_JSON_VALUE)
    public SiteView update(@PathVariable long id, @Valid @RequestBody SiteChanges body) {
        StoredSite site = sites.update(id, body.version(), body.name(), body.level(), body.radius(), body.address(),
                body.designer());
        return SiteView.of(site, analyses.latest(id).orElse(null));
    }

    @Operation(summary = "Copy a site",
            description = "Same file and settings, named '(copy)'; analyses are not copied.")
    @ApiResponse(responseCode = "201", description = "The copy")
    @ApiResponse(responseCode = "404", description = "No site with this id")
    @PostMapping("/{id}/duplicate")
    public ResponseEntity<SiteView> duplicate(@PathVariable long id) {
        StoredSite copy = sites.duplicate(id);
        return ResponseEntity.created(URI.create("/api/sites/" + copy.id())).body(SiteView.of(copy, null));
    }

    @Operation(summary = "Earlier files of a site",
            description = "The files that corrections replaced, oldest first.")
    @ApiResponse(responseCode = "200", description = "The earlier files")
    @ApiResponse(responseCode = "404", description = "No site with this id")
    @GetMapping("/{id}/file/versions")
    public List<FileVersionView> fileVersions(@PathVariable long id) {
        return sites.fileVersions(id).stream().map(v -> new FileVersionView(v.number(), v.sourceName(),
                v.sourceText().getBytes(StandardCharsets.UTF_8).length, v.replacedAt())).toList();
    }

    /** An earlier site file exactly as it was stored. */
    @Operation(summary = "One earlier file, verbatim")
    @ApiResponse(responseCode = "200", description = "The file as text")
    @ApiResponse(responseCode = "404", description = "No such site or earlier file")
    @GetMapping("/{id}/file/versions/{number}")
    public ResponseEntity<byte[]> fileVersion(@PathVariable long id, @PathVariable int number) {
        SiteFileVersion version = sites.fileVersion(id, number);
        return textFile(version.sourceName(), version.sourceText());
    }

    private static ResponseEntity<byte[]> textFile(String fileName, String text) {
        return ResponseEntity.ok()
                .header(HttpHeaders.CONTENT_DISPOSITION, ContentDisposition.attachment()
                        .filename(fileName, StandardCharsets.UTF_8).build().toString())
                .contentType(new MediaType("text", "plain", StandardCharsets.UTF_8))
                .body(text.getBytes(StandardCharsets.UTF_8));
    }

    /** With {@code ?version=N} the site is removed only while it is still at that version (else 409). */
    @Operation(summary = "Delete a site",
            description = "With its analyses and inputs. With ?version=N only while the site is still at that version.")
    @ApiResponse(responseCode = "204", description = "Deleted")
    @ApiResponse(responseCode = "404", description = "No site with this id")
    @ApiResponse(responseCode = "409", description = "The site was changed meanwhile: the version sent is not the stored one")
    @DeleteMapping("/{id}")
    public ResponseEntity<Void> delete(@PathVariable long id, @RequestParam(required = false) Long version) {
        if (version == null) {
            sites.delete(id);
        } else {
            sites.delete(id, version);
        }
        return ResponseEntity.noContent().build();
    }

    /** The site file exactly as uploaded, under its original name. */
    @Operation(summary = "The site file as uploaded")
    @ApiResponse(responseCode = "200", description = "The file as text")
    @ApiResponse(responseCode = "404", description = "No site with this id")
    @GetMapping("/{id}/file")
    public ResponseEntity<byte[]> file(@PathVariable long id) {
        StoredSite site = sites.get(id);
        return textFile(site.sourceName(), site.sourceText());
    }
}
