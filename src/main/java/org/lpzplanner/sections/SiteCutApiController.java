package org.lpzplanner.sections;

import java.net.URI;
import java.util.List;
import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.responses.ApiResponse;
import io.swagger.v3.oas.annotations.tags.Tag;
import jakarta.validation.Valid;
import org.springframework.http.HttpStatus;
import org.springframework.http.MediaType;
import org.springframework.http.ResponseEntity;
import org.springframework.web.bind.annotation.DeleteMapping;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RestController;

/**
 * JSON API of saved section cuts: {@code GET|POST /api/sites/{id}/cuts} ({@link SaveCut}:
 * {@code {"name": "...", "x1": 0, "y1": 0, "x2": 10, "y2": 0}}, local metres) and
 * {@code DELETE /api/sites/{id}/cuts/{cutId}}. Errors are problem details, see
 * {@link org.lpzplanner.system.ApiErrorHandler}.
 */
@RestController
@RequestMapping("/api/sites/{id}/cuts")
@Tag(name = "Sites")
public class SiteCutApiController {

    private final SiteCutService cuts;

    public SiteCutApiController(SiteCutService cuts) {
        this.cuts = cuts;
    }

    @Operation(summary = "List the site's saved section cuts", description = "Oldest first; ends in local metres")
    @ApiResponse(responseCode = "200", description = "The saved cuts")
    @ApiResponse(responseCode = "404", description = "No site with this id")
    @GetMapping
    public List<SiteCut> list(@PathVariable long id) {
        return cuts.cuts(id);
    }

    @Operation(summary = "Save a section cut under a name",
            description = "Name of at most 100 characters; ends x1, y1, x2, y2 in local metres, 1 m to 2000 m apart;"
                    + " the printed report draws saved cuts. Designers and administrators only")
    @ApiResponse(responseCode = "201", description = "Saved; Location names the cut")
    @ApiResponse(responseCode = "400", description = "A number, the length or the name is unusable; the field is named")
    @ApiResponse(responseCode = "403", description = "The account may not edit sites (reviewer)")
    @ApiResponse(responseCode = "404", description = "No site with this id")
    @PostMapping(consumes = MediaType.APPLICATION_JSON_VALUE)
    public ResponseEntity<SiteCut> save(@PathVariable long id, @Valid @RequestBody SaveCut body) {
        SiteCut cut = cuts.save(id, body.name(), body.ends());
        return ResponseEntity.status(HttpStatus.CREATED)
                .location(URI.create("/api/sites/" + id + "/cuts/" + cut.id())).body(cut);
    }

    @Operation(summary = "Delete a saved section cut", description = "Designers and administrators only")
    @ApiResponse(responseCode = "204", description = "Deleted")
    @ApiResponse(responseCode = "403", description = "The account may not edit sites (reviewer)")
    @ApiResponse(responseCode = "404", description = "No site with this id, or the site has no such cut")
    @DeleteMapping("/{cutId}")
    public ResponseEntity<Void> delete(@PathVariable long id, @PathVariable long cutId) {
        cuts.delete(id, cutId);
        return ResponseEntity.noContent().build();
    }
}
