package org.lpzplanner.report;

import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.responses.ApiResponse;
import io.swagger.v3.oas.annotations.tags.Tag;
import org.springframework.http.ContentDisposition;
import org.springframework.http.HttpHeaders;
import org.springframework.http.MediaType;
import org.springframework.http.ResponseEntity;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.RestController;

/**
 * The printed assessment of a stored revision as PDF. Errors answer as problem details through the API
 * error handler: 404 for an unknown site or revision, 409 when the revision's file is no longer stored,
 * 400 for an id that is not a number.
 */
@RestController
@Tag(name = "Report", description = "The printed assessment of a stored analysis revision")
public class ReportApiController {

    private final ReportService reports;

    public ReportApiController(ReportService reports) {
        this.reports = reports;
    }

    @Operation(summary = "The printed assessment as PDF",
            description = "Plan, sections, schedules, cautions and the review block of one stored revision.")
    @ApiResponse(responseCode = "200", description = "The PDF")
    @ApiResponse(responseCode = "400", description = "An id is not a whole number")
    @ApiResponse(responseCode = "404", description = "No such site or revision")
    @ApiResponse(responseCode = "409", description = "The revision's site file is no longer stored")
    @ApiResponse(responseCode = "429", description = "Every place for long computations is taken; try again after Retry-After")
    @ApiResponse(responseCode = "503", description = "The report took longer than its time budget; try again after Retry-After")
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
