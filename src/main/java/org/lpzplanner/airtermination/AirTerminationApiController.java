package org.lpzplanner.airtermination;

import java.net.URI;
import java.util.List;
import java.util.Locale;
import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.media.Content;
import io.swagger.v3.oas.annotations.media.Schema;
import io.swagger.v3.oas.annotations.responses.ApiResponse;
import io.swagger.v3.oas.annotations.tags.Tag;
import org.lpzplanner.analysis.AnalysisRevision;
import org.lpzplanner.analysis.AnalysisService;
import org.lpzplanner.analysis.AnalysisSummary;
import org.lpzplanner.analysis.PlanSvg;
import org.lpzplanner.analysis.ResultGeoJson;
import org.lpzplanner.common.Cautions;
import org.lpzplanner.common.Formats;
import org.lpzplanner.keepout.KeepOutAreaService;
import org.lpzplanner.plan.PlanStatus;
import org.lpzplanner.sites.SiteService;
import org.lpzplanner.system.ApiError;
import org.lpzplanner.system.InvalidInputException;
import org.springframework.context.MessageSource;
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
import tools.jackson.databind.JsonNode;

/**
 * JSON API for the air-termination parts of a site: {@code GET /api/sites/{id}/parts} lists rods
 * and conductors; {@code POST /api/sites/{id}/rods} adds a rod (JSON {@code version}, {@code x},
 * {@code y} in local metres, {@code height}, optional {@code name} and {@code id});
 * {@code PUT /api/sites/{id}/rods/{rodId}} moves it ({@code x}, {@code y}) and/or changes its
 * {@code height}; {@code DELETE /api/sites/{id}/rods/{rodId}?version=N} removes it. Each change
 * rewrites the stored file, analyses the site again and answers with the new summary, plan drawing,
 * method, level, radius and cautions. {@code POST /api/sites/{id}/conductors} adds a roof conductor
 * or catenary wire, {@code PUT /api/sites/{id}/conductors/{conductorId}} gives it a new path
 * ({@code points}, optional {@code heightAboveRoof} and {@code name}) and
 * {@code DELETE /api/sites/{id}/conductors/{conductorId}?version=N} removes one, answering the same way. A stale {@code version} answers 409.
 */
@RestController
@Tag(name = "Air-termination", description = "Rods and conductors of a site; each change rewrites the site file and analyses again")
@RequestMapping("/api/sites/{id}")
public class AirTerminationApiController {

    private final AirTerminationService parts;
    private final AnalysisService analyses;
    private final SiteService sites;
    private final MessageSource messages;
    private final KeepOutAreaService keepOut;

    public AirTerminationApiController(AirTerminationService parts, AnalysisService analyses, SiteService sites,
            MessageSource messages, KeepOutAreaService keepOut) {
        this.keepOut = keepOut;
        this.parts = parts;
        this.analyses = analyses;
        this.sites = sites;
        this.messages = messages;
    }

    /**
     * The answer to a change: the rod concerned ({@code rodId}; {@code before} is the rod as it was,
     * null for a new one), the site's new {@code version}, the new analysis ({@code summary},
     * {@code svg}, the worded {@code basis} and {@code status} lines, {@code cautions}), the parts
     * as they are now, and the server time taken in milliseconds.
     */
    public record Change(String rodId, AirTerminationService.RodView before, long version, AnalysisSummary summary,
            String svg, String basis, String status, List<String> cautions, AirTerminationService.Parts parts,
            long serverMillis) {
    }

    @Operation(summary = "Rods and conductors of a site")
    @ApiResponse(responseCode = "200", description = "The parts")
    @ApiResponse(responseCode = "404", description = "No site with this id", content = @Content(mediaType = "application/json", schema = @Schema(implementation = ApiError.class)))
    @GetMapping("/parts")
    public AirTerminationService.Parts parts(@PathVariable long id) {
        return parts.parts(id);
    }

    @Operation(summary = "Add a rod",
            description = "JSON object with version, x and y (local metres), height and optional name and id. GeoJSON sites only.")
    @ApiResponse(responseCode = "201", description = "Added; the new analysis and parts")
    @ApiResponse(responseCode = "400", description = "A value cannot be used, or the site file cannot hold rods; the field is named", content = @Content(mediaType = "application/json", schema = @Schema(implementation = ApiError.class)))
    @ApiResponse(responseCode = "404", description = "No site with this id", content = @Content(mediaType = "application/json", schema = @Schema(implementation = ApiError.class)))
    @ApiResponse(responseCode = "409", description = "The site was changed meanwhile: the version sent is not the stored one", content = @Content(mediaType = "application/json", schema = @Schema(implementation = ApiError.class)))
    @PostMapping(value = "/rods", consumes = MediaType.APPLICATION_JSON_VALUE)
    public ResponseEntity<Change> add(@PathVariable long id, @RequestBody JsonNode body, Locale locale) {
        long start = System.nanoTime();
        String rodId = parts.addRod(id, version(body), input(body));
        return ResponseEntity.status(HttpStatus.CREATED).location(URI.create("/api/sites/" + id + "/rods/" + rodId))
                .body(answer(id, rodId, null, start, locale));
    }

    @Operation(summary = "Move or change a rod",
            description = "JSON object with version and any of x, y, height, name.")
    @ApiResponse(responseCode = "200", description = "Changed; the new analysis and parts")
    @ApiResponse(responseCode = "400", description = "A value cannot be used; the field is named", content = @Content(mediaType = "application/json", schema = @Schema(implementation = ApiError.class)))
    @ApiResponse(responseCode = "404", description = "No such site or rod", content = @Content(mediaType = "application/json", schema = @Schema(implementation = ApiError.class)))
    @ApiResponse(responseCode = "409", description = "The site was changed meanwhile: the version sent is not the stored one", content = @Content(mediaType = "application/json", schema = @Schema(implementation = ApiError.class)))
    @PutMapping(value = "/rods/{rodId}", consumes = MediaType.APPLICATION_JSON_VALUE)
    public Change change(@PathVariable long id, @PathVariable String rodId, @RequestBody JsonNode body,
            Locale locale) {
        long start = System.nanoTime();
        AirTerminationService.RodView before = parts.changeRod(id, version(body), rodId, input(body));
        return answer(id, rodId, before, start, locale);
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
        AirTerminationService.RodView before = parts.removeRod(id, version, rodId);
        return answer(id, rodId, before, start, locale);
    }

    /** The answer to a conductor change, as {@link Change} for rods. */
    public record ConductorChange(String conductorId, AirTerminationService.ConductorView before, long version,
            AnalysisSummary summary, String svg, String basis, String status, List<String> cautions,
            AirTerminationService.Parts parts, long serverMillis) {
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
    public ResponseEntity<ConductorChange> addConductor(@PathVariable long id, @RequestBody JsonNode body,
            Locale locale) {
        long start = System.nanoTime();
        String conductorId = parts.addConductor(id, version(body), new AirTerminationService.ConductorInput(
                text(body, "id"), text(body, "name"), points(body), number(body, "heightAboveRoof")));
        Change change = answer(id, null, null, start, locale);
        return ResponseEntity.status(HttpStatus.CREATED)
                .location(URI.create("/api/sites/" + id + "/conductors/" + conductorId))
                .body(conductorChange(conductorId, null, change));
    }

    @Operation(summary = "Move or reshape a roof conductor or catenary wire",
            description = "JSON object with version and points, the conductor's whole new path: [[x, y], ...] in local metres (a roof conductor keeps its heightAboveRoof unless one is given) or [[x, y, elevation above ground], ...]; optional heightAboveRoof and name. The conductor keeps its id.")
    @ApiResponse(responseCode = "200", description = "Changed; the conductor as it was (before), the new analysis and parts")
    @ApiResponse(responseCode = "400", description = "Points or heights cannot be used; the field is named", content = @Content(mediaType = "application/json", schema = @Schema(implementation = ApiError.class)))
    @ApiResponse(responseCode = "404", description = "No such site or conductor", content = @Content(mediaType = "application/json", schema = @Schema(implementation = ApiError.class)))
    @ApiResponse(responseCode = "409", description = "The site was changed meanwhile: the version sent is not the stored one", content = @Content(mediaType = "application/json", schema = @Schema(implementation = ApiError.class)))
    @PutMapping(value = "/conductors/{conductorId}", consumes = MediaType.APPLICATION_JSON_VALUE)
    public ConductorChange changeConductor(@PathVariable long id, @PathVariable String conductorId,
            @RequestBody JsonNode body, Locale locale) {
        long start = System.nanoTime();
        AirTerminationService.ConductorView before = parts.changeConductor(id, version(body), conductorId,
                new AirTerminationService.ConductorInput(null, text(body, "name"), points(body),
                        number(body, "heightAboveRoof")));
        return conductorChange(conductorId, before, answer(id, null, null, start, locale));
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
        AirTerminationService.ConductorView before = parts.removeConductor(id, version, conductorId);
        return conductorChange(conductorId, before, answer(id, null, null, start, locale));
    }

    private static ConductorChange conductorChange(String conductorId, AirTerminationService.ConductorView before,
            Change c) {
        return new ConductorChange(conductorId, before, c.version(), c.summary(), c.svg(), c.basis(), c.status(),
                c.cautions(), c.parts(), c.serverMillis());
    }

    private static List<double[]> points(JsonNode body) {
        JsonNode node = body.get("points");
        if (node == null || !node.isArray()) {
            throw new InvalidInputException("points", "points is required: a list of [x, y] or [x, y, elevation]"
                    + " positions in local metres");
        }
        List<double[]> out = new java.util.ArrayList<>();
        for (JsonNode p : node) {
            if (!p.isArray() || p.size() < 2 || p.size() > 3) {
                throw new InvalidInputException("points", "point " + (out.size() + 1) + " must be [x, y] or"
                        + " [x, y, elevation], got " + p);
            }
            double[] values = new double[p.size()];
            for (int k = 0; k < p.size(); k++) {
                if (!p.get(k).isNumber() || !Double.isFinite(p.get(k).asDouble())) {
                    throw new InvalidInputException("points", "point " + (out.size() + 1) + " must hold numbers"
                            + " of metres, got " + p);
                }
                values[k] = p.get(k).asDouble();
            }
            out.add(values);
        }
        return out;
    }

    private Change answer(long id, String rodId, AirTerminationService.RodView before, long start, Locale locale) {
        AnalysisRevision revision = analyses.run(id, null, null, null);
        // the stored keep-out areas stay on the redrawn plan
        String svg = PlanSvg.render(revision.resultGeoJson(), (key, args) -> messages.getMessage(key, args, locale),
                java.util.Map.of(), keepOut.forPlan(id));
        String basis = messages.getMessage("plan.basis", new Object[] {ResultGeoJson.METHOD, revision.level().name(),
                Formats.oneDecimal(revision.sphereRadius()), Formats.dateTime(revision.createdAt())},
                locale);
        String status = PlanStatus.text(revision, messages, locale);
        AirTerminationService.Parts now = parts.parts(id);
        long millis = (System.nanoTime() - start) / 1_000_000;
        return new Change(rodId, before, sites.get(id).version(), AnalysisSummary.of(revision), svg, basis, status,
                Cautions.lines(), now, millis);
    }

    private static long version(JsonNode body) {
        if (!body.isObject()) {
            throw new InvalidInputException("body", "the body must be a JSON object with \"version\"");
        }
        JsonNode version = body.path("version");
        if (!version.isIntegralNumber()) {
            throw new InvalidInputException("version", "version is required: the site's version as last read");
        }
        return version.longValue();
    }

    private static AirTerminationService.RodInput input(JsonNode body) {
        return new AirTerminationService.RodInput(text(body, "id"), text(body, "name"), coordinate(body, "x"),
                coordinate(body, "y"), number(body, "height"));
    }

    private static Double coordinate(JsonNode body, String field) {
        JsonNode node = body.get(field);
        if (node == null || node.isNull()) {
            return null;
        }
        String text = node.isNumber() ? node.asString() : node.isString() ? node.stringValue().strip() : null;
        try {
            double value = Double.parseDouble(text == null ? "" : text);
            if (Double.isFinite(value)) {
                return value;
            }
        } catch (NumberFormatException e) {
            // reported below
        }
        throw new InvalidInputException(field, field + " must be a number of metres, got " + node);
    }

    private static String number(JsonNode body, String field) {
        JsonNode node = body.get(field);
        if (node == null || node.isNull()) {
            return null;
        }
        if (node.isNumber()) {
            return node.asString();
        }
        if (node.isString()) {
            return node.stringValue();
        }
        throw new InvalidInputException(field, field + " must be a number of metres, got " + node);
    }

    private static String text(JsonNode body, String field) {
        JsonNode node = body.get(field);
        if (node == null || node.isNull()) {
            return null;
        }
        if (!node.isString()) {
            throw new InvalidInputException(field, field + " must be a string");
        }
        return node.stringValue();
    }
}
