package org.lpzplanner.airtermination;

import java.net.URI;
import java.util.List;
import java.util.Locale;
import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.media.Content;
import io.swagger.v3.oas.annotations.media.Schema;
import io.swagger.v3.oas.annotations.responses.ApiResponse;
import io.swagger.v3.oas.annotations.tags.Tag;
import jakarta.validation.Valid;
import org.lpzplanner.analysis.AnalysisSummary;
import org.lpzplanner.editing.Edit;
import org.lpzplanner.plan.PlanPresenter;
import org.lpzplanner.system.ApiError;
import org.springframework.http.HttpStatus;
import org.springframework.http.MediaType;
import org.springframework.http.ResponseEntity;
import org.springframework.web.bind.annotation.DeleteMapping;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.PutMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.bind.annotation.RestController;

/**
 * JSON API for the air-termination parts of a site: {@code GET /api/sites/{id}/parts} lists rods
 * and conductors; {@code POST /api/sites/{id}/rods} adds a rod ({@link RodRequest}: {@code version},
 * {@code x}, {@code y} in local metres, {@code height}, optional {@code name} and {@code id});
 * {@code PUT /api/sites/{id}/rods/{rodId}} moves it ({@code x}, {@code y}) and/or changes its
 * {@code height}; {@code DELETE /api/sites/{id}/rods/{rodId}?version=N} removes it. Each change
 * rewrites the stored file and analyses the site again ({@link org.lpzplanner.editing.EditPipeline})
 * and answers with the site's new version, the new summary, plan drawing, method, level, radius and
 * cautions ({@link PlanPresenter}); when the analysis cannot run now, the change is still stored and
 * the answer says the analysis is pending and why. {@code POST /api/sites/{id}/conductors} adds a roof conductor
 * or catenary wire, {@code PUT /api/sites/{id}/conductors/{conductorId}} gives it a new path
 * ({@link ConductorRequest}: {@code points}, optional {@code heightAboveRoof} and {@code name}) and
 * {@code DELETE /api/sites/{id}/conductors/{conductorId}?version=N} removes one, answering the same way. A stale {@code version} answers 409.
 */
@RestController
@Tag(name = "Air-termination", description = "Rods and conductors of a site; each change rewrites the site file and analyses again")
@RequestMapping("/api/sites/{id}")
public class AirTerminationApiController {

    private final PartsView parts;
    private final RodEdits rods;
    private final ConductorEdits conductors;
    private final PlanPresenter plan;

    public AirTerminationApiController(PartsView parts, RodEdits rods, ConductorEdits conductors, PlanPresenter plan) {
        this.parts = parts;
        this.rods = rods;
        this.conductors = conductors;
        this.plan = plan;
    }

    /**
     * The answer to a change: the rod concerned ({@code rodId}; {@code before} is the rod as it was,
     * null for a new one), the site's new {@code version}, the new analysis ({@code summary},
     * {@code svg}, the worded {@code basis} and {@code status} lines, {@code cautions}), the parts
     * as they are now, and the server time taken in milliseconds. While {@code analysisPending}, the
     * change is stored but not analysed ({@code pendingReason} says why): {@code summary},
     * {@code svg} and {@code basis} are null and {@code status} gives no verdict.
     */
    public record Change(String rodId, PartsView.RodView before, long version, AnalysisSummary summary,
            String svg, String basis, String status, List<String> cautions, PartsView.Parts parts,
            long serverMillis, boolean analysisPending, String pendingReason) {
    }

    @Operation(summary = "Rods and conductors of a site")
    @ApiResponse(responseCode = "200", description = "The parts")
    @ApiResponse(responseCode = "404", description = "No site with this id", content = @Content(mediaType = "application/json", schema = @Schema(implementation = ApiError.class)))
    @GetMapping("/parts")
    public PartsView.Parts parts(@PathVariable long id) {
        return parts.parts(id);
    }

    @Operation(summary = "Add a rod",
            description = "JSON object with version, x and y (local metres), height and optional name and id. GeoJSON sites only.")
    @ApiResponse(responseCode = "201", description = "Added; the new analysis and parts")
    @ApiResponse(responseCode = "400", description = "A value cannot be used, or the site file cannot hold rods; the field is named", content = @Content(mediaType = "application/json", schema = @Schema(implementation = ApiError.class)))
    @ApiResponse(responseCode = "404", description = "No site with this id", content = @Content(mediaType = "application/json", schema = @Schema(implementation = ApiError.class)))
    @ApiResponse(responseCode = "409", description = "The site was changed meanwhile: the version sent is not the stored one", content = @Content(mediaType = "application/json", schema = @Schema(implementation = ApiError.class)))
    @PostMapping(value = "/rods", consumes = MediaType.APPLICATION_JSON_VALUE)
    public ResponseEntity<Change> add(@PathVariable long id, @Valid @RequestBody RodRequest body, Locale locale) {
        long start = System.nanoTime();
        Edit<String> edit = rods.add(id, body.version(), body.input());
        return ResponseEntity.status(HttpStatus.CREATED)
                .location(URI.create("/api/sites/" + id + "/rods/" + edit.outcome()))
                .body(answer(edit, edit.outcome(), null, start, locale));
    }

    @Operation(summary = "Move or change a rod",
            description = "JSON object with version and any of x, y, height, name.")
    @ApiResponse(responseCode = "200", description = "Changed; the new analysis and parts")
    @ApiResponse(responseCode = "400", description = "A value cannot be used; the field is named", content = @Content(mediaType = "application/json", schema = @Schema(implementation = ApiError.class)))
    @ApiResponse(responseCode = "404", description = "No such site or rod", content = @Content(mediaType = "application/json", schema = @Schema(implementation = ApiError.class)))
    @ApiResponse(responseCode = "409", description = "The site was changed meanwhile: the version sent is not the stored one", content = @Content(mediaType = "application/json", schema = @Schema(implementation = ApiError.class)))
    @PutMapping(value = "/rods/{rodId}", consumes = MediaType.APPLICATION_JSON_VALUE)
    public Change change(@PathVariable long id, @PathVariable String rodId, @Valid @RequestBody RodRequest body,
            Locale locale) {
        long start = System.nanoTime();
        Edit<PartsView.RodView> edit = rods.change(id, body.version(), rodId, body.input());
        return answer(edit, rodId, edit.outcome(), start, locale);
    }

    @Operation(summary = "Delete a rod",
            description = "Parameter version is required.")
    @ApiResponse(responseCode = "200", description = "Deleted; the new analysis and parts")
    @ApiResponse(responseCode = "400", description = "version is missing or not a whole number", content = @Content(mediaType = "application/json", schema = @Schema(implementation = ApiError.class)))
    @ApiResponse(responseCode = "404", description = "No such site or rod", content = @Content(mediaType = "application/json", schema = @Schema(implementation = ApiError.class)))
    @ApiResponse(responseCode = "409", description = "The site was changed meanwhile: the version sent is not the stored one", content = @Content(mediaType = "application/json", schema = @Schema(implementation = ApiError.class)))
    @DeleteMapping("/rods/{rodId}")
    public Change remove(@PathVariable long id, @PathVariable String rodId, @RequestParam Long version,
            Locale locale) {
        long start = System.nanoTime();
        Edit<PartsView.RodView> edit = rods.remove(id, version, rodId);
        return answer(edit, rodId, edit.outcome(), start, locale);
    }

    /** The answer to a conductor change, as {@link Change} for rods. */
    public record ConductorChange(String conductorId, PartsView.ConductorView before, long version,
            AnalysisSummary summary, String svg, String basis, String status, List<String> cautions,
            PartsView.Parts parts, long serverMillis, boolean analysisPending, String pendingReason) {
    }

    /**
     * Adds a conductor: JSON {@code version}, {@code points} ([[x, y], ...] in local metres with
     * {@code heightAboveRoof}, or [[x, y, elevation above ground], ...]), optional {@code name} and
     * {@code id}.
     */
    @Operation(summary = "Add a roof conductor or catenary wire",
            description = "JSON object with version, points ([[x, y], ...] in local metres with heightAboveRoof, or [[x, y, elevation above ground], ...]) and optional name and id. GeoJSON sites only.")
    @ApiResponse(responseCode = "201", description = "Added; the new analysis and parts")
    @ApiResponse(responseCode = "400", description = "Points or heights cannot be used, or the site file cannot hold conductors; the field is named", content = @Content(mediaType = "application/json", schema = @Schema(implementation = ApiError.class)))
    @ApiResponse(responseCode = "404", description = "No site with this id", content = @Content(mediaType = "application/json", schema = @Schema(implementation = ApiError.class)))
    @ApiResponse(responseCode = "409", description = "The site was changed meanwhile: the version sent is not the stored one", content = @Content(mediaType = "application/json", schema = @Schema(implementation = ApiError.class)))
    @PostMapping(value = "/conductors", consumes = MediaType.APPLICATION_JSON_VALUE)
    public ResponseEntity<ConductorChange> addConductor(@PathVariable long id,
            @Valid @RequestBody ConductorRequest body, Locale locale) {
        long start = System.nanoTime();
        Edit<String> edit = conductors.add(id, body.version(), body.input(true));
        return ResponseEntity.status(HttpStatus.CREATED)
                .location(URI.create("/api/sites/" + id + "/conductors/" + edit.outcome()))
                .body(conductorChange(edit.outcome(), null, answer(edit, null, null, start, locale)));
    }

    @Operation(summary = "Move or reshape a roof conductor or catenary wire",
            description = "JSON object with version and points, the conductor's whole new path: [[x, y], ...] in local metres (a roof conductor keeps its heightAboveRoof unless one is given) or [[x, y, elevation above ground], ...]; optional heightAboveRoof and name. The conductor keeps its id.")
    @ApiResponse(responseCode = "200", description = "Changed; the conductor as it was (before), the new analysis and parts")
    @ApiResponse(responseCode = "400", description = "Points or heights cannot be used; the field is named", content = @Content(mediaType = "application/json", schema = @Schema(implementation = ApiError.class)))
    @ApiResponse(responseCode = "404", description = "No such site or conductor", content = @Content(mediaType = "application/json", schema = @Schema(implementation = ApiError.class)))
    @ApiResponse(responseCode = "409", description = "The site was changed meanwhile: the version sent is not the stored one", content = @Content(mediaType = "application/json", schema = @Schema(implementation = ApiError.class)))
    @PutMapping(value = "/conductors/{conductorId}", consumes = MediaType.APPLICATION_JSON_VALUE)
    public ConductorChange changeConductor(@PathVariable long id, @PathVariable String conductorId,
            @Valid @RequestBody ConductorRequest body, Locale locale) {
        long start = System.nanoTime();
        Edit<PartsView.ConductorView> edit = conductors.change(id, body.version(), conductorId, body.input(false));
        return conductorChange(conductorId, edit.outcome(), answer(edit, null, null, start, locale));
    }

    @Operation(summary = "Delete a conductor", description = "Parameter version is required.")
    @ApiResponse(responseCode = "200", description = "Deleted; the new analysis and parts")
    @ApiResponse(responseCode = "400", description = "version is missing or not a whole number", content = @Content(mediaType = "application/json", schema = @Schema(implementation = ApiError.class)))
    @ApiResponse(responseCode = "404", description = "No such site or conductor", content = @Content(mediaType = "application/json", schema = @Schema(implementation = ApiError.class)))
    @ApiResponse(responseCode = "409", description = "The site was changed meanwhile: the version sent is not the stored one", content = @Content(mediaType = "application/json", schema = @Schema(implementation = ApiError.class)))
    @DeleteMapping("/conductors/{conductorId}")
    public ConductorChange removeConductor(@PathVariable long id, @PathVariable String conductorId,
            @RequestParam Long version, Locale locale) {
        long start = System.nanoTime();
        Edit<PartsView.ConductorView> edit = conductors.remove(id, version, conductorId);
        return conductorChange(conductorId, edit.outcome(), answer(edit, null, null, start, locale));
    }

    private static ConductorChange conductorChange(String conductorId, PartsView.ConductorView before, Change c) {
        return new ConductorChange(conductorId, before, c.version(), c.summary(), c.svg(), c.basis(), c.status(),
                c.cautions(), c.parts(), c.serverMillis(), c.analysisPending(), c.pendingReason());
    }

    private Change answer(Edit<?> edit, String rodId, PartsView.RodView before, long start, Locale locale) {
        PlanPresenter.Refresh refresh = plan.afterChange(edit.siteId(), edit.analysis(), locale);
        PartsView.Parts now = parts.parts(edit.siteId());
        long millis = (System.nanoTime() - start) / 1_000_000;
        return new Change(rodId, before, edit.version(), refresh.summary(), refresh.svg(), refresh.basis(),
                refresh.status(), refresh.cautions(), now, millis, refresh.analysisPending(), refresh.pendingReason());
    }
}
