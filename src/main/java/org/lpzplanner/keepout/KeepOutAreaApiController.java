package org.lpzplanner.keepout;

import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.responses.ApiResponse;
import io.swagger.v3.oas.annotations.tags.Tag;
import jakarta.validation.Valid;
import java.net.URI;
import java.util.List;
import org.springframework.http.HttpStatus;
import org.springframework.http.MediaType;
import org.springframework.http.ResponseEntity;
import org.springframework.web.bind.annotation.DeleteMapping;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PatchMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RestController;

/**
 * JSON API of a site's keep-out areas: {@code GET|POST /api/sites/{id}/keep-out-areas}
 * ({@link KeepOutAreaRequest}: {@code {"name": "...", "corners": [[x, y], …]}}, local metres),
 * {@code PATCH …/{areaId}} ({@link KeepOutAreaName}) and {@code DELETE …/{areaId}}. Errors are problem
 * details, see {@link org.lpzplanner.system.ApiErrorHandler}.
 */
@RestController
@RequestMapping("/api/sites/{id}/keep-out-areas")
@Tag(name = "Sites")
public class KeepOutAreaApiController {

    private final KeepOutAreaService areas;

    public KeepOutAreaApiController(KeepOutAreaService areas) {
        this.areas = areas;
    }

    @Operation(summary = "List the site's keep-out areas", description = "Oldest first; corners in local metres,"
            + " area in m². Proposals keep out of them by default; the plan page and the report draw them")
    @ApiResponse(responseCode = "200", description = "The stored keep-out areas")
    @ApiResponse(responseCode = "404", description = "No site with this id")
    @GetMapping
    public List<KeepOutArea> list(@PathVariable long id) {
        return areas.areas(id);
    }

    @Operation(summary = "Store a keep-out area under a name",
            description = "Name of at most 100 characters; corners [[x, y], …] in local metres: 3 to 200, in order"
                    + " round the area, finite, within 100 km of the site's origin, no corner repeating the one"
                    + " before it, an outline that does not cross itself, at least 0.01 m². At most 50 areas per"
                    + " site. Designers and administrators only")
    @ApiResponse(responseCode = "201", description = "Stored; Location names the area")
    @ApiResponse(responseCode = "400", description = "The name or the corners are unusable, or the site keeps the most areas it may; the field is named")
    @ApiResponse(responseCode = "403", description = "The account may not edit sites (reviewer)")
    @ApiResponse(responseCode = "404", description = "No site with this id")
    @PostMapping(consumes = MediaType.APPLICATION_JSON_VALUE)
    public ResponseEntity<KeepOutArea> save(@PathVariable long id, @Valid @RequestBody KeepOutAreaRequest body) {
        KeepOutArea area = areas.save(id, body.name(), body.outline());
        return ResponseEntity.status(HttpStatus.CREATED)
                .location(URI.create("/api/sites/" + id + "/keep-out-areas/" + area.id())).body(area);
    }

    @Operation(summary = "Rename a keep-out area", description = "JSON {\"name\": \"...\"}, at most 100 characters."
            + " Designers and administrators only")
    @ApiResponse(responseCode = "200", description = "Renamed; the area as stored")
    @ApiResponse(responseCode = "400", description = "The name is unusable")
    @ApiResponse(responseCode = "403", description = "The account may not edit sites (reviewer)")
    @ApiResponse(responseCode = "404", description = "No site with this id, or the site has no such area")
    @PatchMapping(path = "/{areaId}", consumes = MediaType.APPLICATION_JSON_VALUE)
    public KeepOutArea rename(@PathVariable long id, @PathVariable long areaId,
            @Valid @RequestBody KeepOutAreaName body) {
        return areas.rename(id, areaId, body.name());
    }

    @Operation(summary = "Delete a keep-out area", description = "Designers and administrators only")
    @ApiResponse(responseCode = "204", description = "Deleted")
    @ApiResponse(responseCode = "403", description = "The account may not edit sites (reviewer)")
    @ApiResponse(responseCode = "404", description = "No site with this id, or the site has no such area")
    @DeleteMapping("/{areaId}")
    public ResponseEntity<Void> delete(@PathVariable long id, @PathVariable long areaId) {
        areas.delete(id, areaId);
        return ResponseEntity.noContent().build();
    }

}
