package org.lpzplanner.report;

import org.springframework.http.ContentDisposition;
import org.springframework.http.HttpHeaders;
import org.springframework.http.MediaType;
import org.springframework.http.ResponseEntity;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.RestController;

/**
 * The printed assessment of a stored revision as PDF. Errors answer as JSON through the API error
 * handler: 404 for an unknown site or revision, 409 when the revision's file is no longer stored,
 * 400 for an id that is not a number.
 */
@RestController
public class ReportApiController {

    private final ReportService reports;

    public ReportApiController(ReportService reports) {
        this.reports = reports;
    }

    @GetMapping(path = "/api/sites/{siteId}/revisions/{revision}/report",
            produces = {MediaType.APPLICATION_PDF_VALUE, MediaType.APPLICATION_JSON_VALUE})
    public ResponseEntity<byte[]> report(@PathVariable long siteId, @PathVariable int revision) {
        byte[] pdf = reports.pdf(siteId, revision);
        return ResponseEntity.ok()
                .contentType(MediaType.APPLICATION_PDF)
                .header(HttpHeaders.CONTENT_DISPOSITION, ContentDisposition.inline()
                        .filename("site-" + siteId + "-revision-" + revision + "-assessment.pdf").build().toString())
                .body(pdf);
    }
}
