package org.lpzplanner.transfer;

import java.io.IOException;
import java.net.URI;
import java.nio.charset.StandardCharsets;
import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.responses.ApiResponse;
import io.swagger.v3.oas.annotations.tags.Tag;
import org.springframework.http.ContentDisposition;
import org.springframework.http.HttpHeaders;
import org.springframework.http.MediaType;
import org.springframework.http.ResponseEntity;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.bind.annotation.RestController;
import org.springframework.web.multipart.MultipartFile;

/**
 * Site export ({@code GET /api/sites/{id}/export}: one JSON file with everything stored for the
 * site) and import ({@code POST /api/sites/import}, multipart {@code file}: stores it as a new site
 * with every revision's results computed here, 201 with its id; a bad file answers 400 naming the
 * member and stores nothing). Errors are problem details, see {@link org.lpzplanner.system.ApiErrorHandler}.
 */
@RestController
@Tag(name = "Sites")
public class SiteTransferApiController {

    private final SiteTransferService transfers;

    public SiteTransferApiController(SiteTransferService transfers) {
        this.transfers = transfers;
    }

    @Operation(summary = "Export a whole site as one file",
            description = "Site settings and file, earlier files, every revision with what it read and its accepted"
                    + " items, and the risk inputs; database ids are left out")
    @ApiResponse(responseCode = "200", description = "The site export (JSON, as an attachment)")
    @ApiResponse(responseCode = "404", description = "No site with this id")
    @GetMapping("/api/sites/{id}/export")
    public ResponseEntity<byte[]> export(@PathVariable long id) {
        SiteTransferService.ExportFile file = transfers.export(id);
        return ResponseEntity.ok()
                .header(HttpHeaders.CONTENT_DISPOSITION, ContentDisposition.attachment()
                        .filename(file.fileName(), StandardCharsets.UTF_8).build().toString())
                .contentType(MediaType.APPLICATION_JSON)
                .body(file.content());
    }

    @Operation(summary = "Import a site export as a new site",
            description = "All or nothing: a bad file stores nothing. Every site file inside is checked as an upload"
                    + " is, and every revision's results are computed again here from the site file and settings it"
                    + " records (the results in the file are not stored); one analysis per revision")
    @ApiResponse(responseCode = "201", description = "Stored; Location names the new site")
    @ApiResponse(responseCode = "400", description = "Not a usable site export; the member at fault is named (for a revision's site file, checksum or settings, with the revision's number)")
    @ApiResponse(responseCode = "413", description = "The file is larger than the upload limit")
    @ApiResponse(responseCode = "429", description = "Every place for long computations is taken; try again after Retry-After seconds")
    @ApiResponse(responseCode = "503", description = "A revision's analysis took longer than its time budget; nothing was stored; try again after Retry-After seconds")
    @PostMapping(value = "/api/sites/import", consumes = MediaType.MULTIPART_FORM_DATA_VALUE)
    public ResponseEntity<ImportedSite> importSite(@RequestParam("file") MultipartFile file) throws IOException {
        long id = transfers.importSite(file.getBytes());
        return ResponseEntity.created(URI.create("/api/sites/" + id)).body(new ImportedSite(id));
    }

    /** The answer to an import: the new site's id. */
    public record ImportedSite(long id) {
    }
}
