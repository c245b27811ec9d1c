package org.lpzplanner.transfer;

import java.io.IOException;
import java.net.URI;
import java.nio.charset.StandardCharsets;
import java.util.Map;
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
 * site) and import ({@code POST /api/sites/import}, multipart {@code file}: stores it as a new site,
 * 201 with its id; a bad file answers 400 naming the member and stores nothing).
 */
@RestController
public class SiteTransferApiController {

    private final SiteTransferService transfers;

    public SiteTransferApiController(SiteTransferService transfers) {
        this.transfers = transfers;
    }

    @GetMapping("/api/sites/{id}/export")
    public ResponseEntity<byte[]> export(@PathVariable long id) {
        SiteTransferService.ExportFile file = transfers.export(id);
        return ResponseEntity.ok()
                .header(HttpHeaders.CONTENT_DISPOSITION, ContentDisposition.attachment()
                        .filename(file.fileName(), StandardCharsets.UTF_8).build().toString())
                .contentType(MediaType.APPLICATION_JSON)
                .body(file.content());
    }

    @PostMapping(value = "/api/sites/import", consumes = MediaType.MULTIPART_FORM_DATA_VALUE)
    public ResponseEntity<Map<String, Object>> importSite(@RequestParam("file") MultipartFile file) throws IOException {
        long id = transfers.importSite(file.getBytes());
        return ResponseEntity.created(URI.create("/api/sites/" + id)).body(Map.of("id", id));
    }
}
