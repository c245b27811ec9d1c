package org.lpzplanner.design;

import java.net.URI;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.lpzplanner.common.Cautions;
import org.lpzplanner.editing.Edit;
import org.lpzplanner.engine.design.quantities.QuantityTable;
import org.lpzplanner.system.InvalidInputException;
import org.springframework.http.HttpHeaders;
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
import tools.jackson.databind.json.JsonMapper;

/**
 * JSON API of the design of a site (local metres throughout):
 * <ul>
 * <li>{@code POST /api/sites/{id}/proposals} starts a proposal ({@code rodHeights}, optional
 *     {@code mastHeights}, optional {@code edgeConductors} and {@code ridgeConductors} (booleans),
 *     optional {@code keepOut}: polygons as lists of [x, y]); 202 with the job.</li>
 * <li>{@code GET /api/sites/{id}/proposals/{job}}: state, stage, fraction and, when done, the parts
 *     and counts; {@code POST …/cancel}; {@code POST …/accept} with {@code version} writes the rods,
 *     masts and conductors into the site in one change; {@code POST …/undo} with the {@code version}
 *     accepting answered removes them again in one change. Both analyse the site again and answer
 *     its new {@code version}; {@code analysisPending} is true when the analysis could not run now
 *     (the change is stored all the same), {@code pendingReason} says why.</li>
 * <li>{@code GET /api/sites/{id}/method-checks}: angle and mesh methods against the rolling sphere per structure.</li>
 * <li>{@code GET /api/sites/{id}/down-conductors}: per building (structures whose footprints overlap
 *     or touch, on the outline of the whole), {@code buildings}; {@code PUT …/down-conductors/{building}}
 *     with {@code positions} (the building's id or the id of any of its structures); {@code DELETE}
 *     returns to the planned layout.</li>
 * <li>{@code GET /api/sites/{id}/separation-distances}; {@code GET/POST /api/sites/{id}/metal-installations},
 *     {@code DELETE …/metal-installations/{n}}.</li>
 * <li>{@code GET /api/sites/{id}/quantities?fixingsPerMetre=1} as a table; {@code GET …/quantities.csv}.</li>
 * </ul>
 */
@RestController
@RequestMapping("/api/sites/{id}")
@io.swagger.v3.oas.annotations.tags.Tag(name = "Design", description = "Proposed air-termination, method cross-checks,"
        + " down-conductors, separation distances (IEC 62305-3:2010 6.3) and the bill of quantities")
public class DesignApiController {

    private final ProposalService proposals;
    private final MethodCheckService methodChecks;
    private final DownConductorService downConductors;
    private final SeparationService separations;
    private final MetalInstallationService installations;
    private final QuantityService quantities;
    private final JsonMapper json;

    public DesignApiController(ProposalService proposals, MethodCheckService methodChecks,
            DownConductorService downConductors, SeparationService separations,
            MetalInstallationService installations, QuantityService quantities, JsonMapper json) {
        this.proposals = proposals;
        this.methodChecks = methodChecks;
        this.downConductors = downConductors;
        this.separations = separations;
        this.installations = installations;
        this.quantities = quantities;
        this.json = json;
    }

    @PostMapping(value = "/proposals", consumes = MediaType.APPLICATION_JSON_VALUE)
    public ResponseEntity<Map<String, Object>> propose(@PathVariable long id, @RequestBody JsonNode body) {
        if (!body.isObject()) {
            throw new InvalidInputException("body", "the body must be a JSON object with \"rodHeights\"");
        }
        boolean edge = flag(body, "edgeConductors");
        boolean ridge = flag(body, "ridgeConductors");
        List<Double> rodHeights = body.has("rodHeights") || !(edge || ridge) ? numbers(body, "rodHeights") : List.of();
        ProposeRequest request = new ProposeRequest(rodHeights,
                body.has("mastHeights") ? numbers(body, "mastHeights") : List.of(), edge, ridge,
                polygons(body.path("keepOut"), "keepOut"));
        ProposalJobs.Job job = proposals.propose(id, request);
        return ResponseEntity.status(HttpStatus.ACCEPTED)
                .location(URI.create("/api/sites/" + id + "/proposals/" + job.id())).body(view(job));
    }

    @GetMapping("/proposals/{jobId}")
    public Map<String, Object> proposal(@PathVariable long id, @PathVariable String jobId) {
        return view(proposals.job(id, jobId));
    }

    @PostMapping("/proposals/{jobId}/cancel")
    public Map<String, Object> cancel(@PathVariable long id, @PathVariable String jobId) {
        return view(proposals.cancel(id, jobId));
    }

    @PostMapping(value = "/proposals/{jobId}/accept", consumes = MediaType.APPLICATION_JSON_VALUE)
    public Map<String, Object> accept(@PathVariable long id, @PathVariable String jobId, @RequestBody JsonNode body) {
        JsonNode version = body.path("version");
        if (!version.isIntegralNumber()) {
            throw new InvalidInputException("version", "version is required: the site's version as last read");
        }
        Edit<AcceptedProposal> accepted = proposals.accept(id, jobId, version.longValue());
        Map<String, Object> out = new LinkedHashMap<>();
        out.put("rodIds", accepted.outcome().rodIds());
        out.put("conductorIds", accepted.outcome().conductorIds());
        out.put("version", accepted.version());
        out.put("plan", "/sites/" + id);
        out.put("analysisPending", accepted.analysis().isPending());
        out.put("pendingReason", accepted.analysis().pendingReason());
        return out;
    }

    @PostMapping(value = "/proposals/{jobId}/undo", consumes = MediaType.APPLICATION_JSON_VALUE)
    public Map<String, Object> undoAccept(@PathVariable long id, @PathVariable String jobId, @RequestBody JsonNode body) {
        JsonNode version = body.path("version");
        if (!version.isIntegralNumber()) {
            throw new InvalidInputException("version", "version is required: the site's version the accept answered");
        }
        Edit<Void> undone = proposals.undoAccept(id, jobId, version.longValue());
        Map<String, Object> out = new LinkedHashMap<>();
        out.put("version", undone.version());
        out.put("plan", "/sites/" + id);
        out.put("analysisPending", undone.analysis().isPending());
        out.put("pendingReason", undone.analysis().pendingReason());
        return out;
    }

    @GetMapping("/method-checks")
    public Map<String, Object> methodChecks(@PathVariable long id) {
        return withCautions("structures", methodChecks.methodChecks(id));
    }

    @GetMapping("/down-conductors")
    public Map<String, Object> downConductors(@PathVariable long id) {
        return withCautions("buildings", downConductors.list(id));
    }

    @PutMapping(value = "/down-conductors/{buildingId}", consumes = MediaType.APPLICATION_JSON_VALUE)
    public Map<String, Object> saveDownConductors(@PathVariable long id, @PathVariable String buildingId,
            @RequestBody JsonNode body) {
        List<List<double[]>> rings = polygons(body.path("positions").isMissingNode() ? null
                : wrap(body.path("positions")), "positions");
        if (rings.isEmpty()) {
            throw new InvalidInputException("positions", "positions is required: a list of [x, y] in local metres");
        }
        return withCautions("buildings", downConductors.save(id, buildingId, rings.get(0)));
    }

    @DeleteMapping("/down-conductors/{buildingId}")
    public Map<String, Object> resetDownConductors(@PathVariable long id, @PathVariable String buildingId) {
        return withCautions("buildings", downConductors.reset(id, buildingId));
    }

    @GetMapping("/separation-distances")
    public Map<String, Object> separations(@PathVariable long id) {
        Map<String, Object> out = withCautions("checks", separations.separations(id));
        out.put("edition", "IEC 62305-3:2010 6.3 (the 2024 edition revised this method)");
        return out;
    }

    @GetMapping("/metal-installations")
    public List<DesignRepository.Installation> installations(@PathVariable long id) {
        return installations.list(id);
    }

    @PostMapping(value = "/metal-installations", consumes = MediaType.APPLICATION_JSON_VALUE)
    public ResponseEntity<DesignRepository.Installation> addInstallation(@PathVariable long id, @RequestBody JsonNode body) {
        DesignRepository.Installation i = installations.add(id, text(body, "name"), number(body, "x"),
                number(body, "y"), number(body, "z"), text(body, "material"));
        return ResponseEntity.status(HttpStatus.CREATED)
                .location(URI.create("/api/sites/" + id + "/metal-installations/" + i.id())).body(i);
    }

    @DeleteMapping("/metal-installations/{installationId}")
    public ResponseEntity<Void> removeInstallation(@PathVariable long id, @PathVariable long installationId) {
        installations.remove(id, installationId);
        return ResponseEntity.noContent().build();
    }

    @GetMapping("/quantities")
    public Map<String, Object> quantities(@PathVariable long id,
            @RequestParam(defaultValue = "1") double fixingsPerMetre) {
        QuantityTable table = quantities.quantities(id, fixingsPerMetre);
        Map<String, Object> out = new LinkedHashMap<>();
        out.put("title", table.title());
        out.put("columns", table.columns());
        out.put("rows", table.rows());
        out.put("cautions", Cautions.lines());
        return out;
    }

    @GetMapping(value = "/quantities.csv", produces = "text/csv")
    public ResponseEntity<byte[]> quantitiesCsv(@PathVariable long id,
            @RequestParam(defaultValue = "1") double fixingsPerMetre) {
        QuantityTable table = quantities.quantities(id, fixingsPerMetre);
        return ResponseEntity.ok()
                .header(HttpHeaders.CONTENT_DISPOSITION, "attachment; filename=\"site-" + id + "-quantities.csv\"")
                .contentType(new MediaType("text", "csv", StandardCharsets.UTF_8))
                .body(table.toCsv().getBytes(StandardCharsets.UTF_8));
    }

    /** A job as the API shows it. */
    private Map<String, Object> view(ProposalJobs.Job job) {
        Map<String, Object> out = new LinkedHashMap<>();
        out.put("jobId", job.id());
        out.put("state", job.state().name().toLowerCase(java.util.Locale.ROOT));
        out.put("stage", job.stage());
        out.put("fraction", Math.round(job.fraction() * 1000) / 1000.0);
        out.put("siteVersion", job.siteVersion());
        out.put("level", job.level());
        out.put("radius", job.radius());
        if (job.error() != null) {
            out.put("error", job.error());
        }
        if (job.result() != null) {
            // the proposal's parts and figures as stored when it finished (StoredProposal)
            json.valueToTree(job.result()).properties().forEach(e -> out.put(e.getKey(), e.getValue()));
            out.put("cautions", Cautions.lines());
        }
        return out;
    }

    private static Map<String, Object> withCautions(String key, Object value) {
        Map<String, Object> out = new LinkedHashMap<>();
        out.put(key, value);
        out.put("cautions", Cautions.lines());
        return out;
    }

    private static List<Double> numbers(JsonNode body, String field) {
        JsonNode node = body.path(field);
        if (!node.isArray()) {
            throw new InvalidInputException(field, field + " must be a list of numbers of metres, e.g. [0.5, 1, 2]");
        }
        List<Double> out = new ArrayList<>();
        for (JsonNode n : node) {
            if (!n.isNumber()) {
                throw new InvalidInputException(field, field + " must hold numbers only, got " + n);
            }
            out.add(n.asDouble());
        }
        if (out.size() > 20) {
            throw new InvalidInputException(field, field + " may hold at most 20 heights");
        }
        return out;
    }

    private static boolean flag(JsonNode body, String field) {
        JsonNode n = body.path(field);
        if (n.isMissingNode() || n.isNull()) {
            return false;
        }
        if (!n.isBoolean()) {
            throw new InvalidInputException(field, field + " must be true or false, got " + n);
        }
        return n.booleanValue();
    }

    private static JsonNode wrap(JsonNode ring) {
        var array = tools.jackson.databind.node.JsonNodeFactory.instance.arrayNode();
        array.add(ring);
        return array;
    }

    private static List<List<double[]>> polygons(JsonNode node, String field) {
        List<List<double[]>> out = new ArrayList<>();
        if (node == null || node.isMissingNode() || node.isNull()) {
            return out;
        }
        if (!node.isArray()) {
            throw new InvalidInputException(field, field + " must be a list of polygons, each a list of [x, y]");
        }
        for (JsonNode ring : node) {
            if (!ring.isArray()) {
                throw new InvalidInputException(field, field + " must be a list of [x, y] in local metres");
            }
            List<double[]> points = new ArrayList<>();
            for (JsonNode p : ring) {
                if (!p.isArray() || p.size() != 2 || !p.get(0).isNumber() || !p.get(1).isNumber()) {
                    throw new InvalidInputException(field, "every point of " + field + " must be [x, y] in metres, got " + p);
                }
                points.add(new double[] {p.get(0).asDouble(), p.get(1).asDouble()});
            }
            out.add(points);
        }
        return out;
    }

    private static String text(JsonNode body, String field) {
        JsonNode n = body.path(field);
        return n.isString() ? n.stringValue() : null;
    }

    private static Double number(JsonNode body, String field) {
        JsonNode n = body.path(field);
        if (n.isMissingNode() || n.isNull()) {
            return null;
        }
        if (!n.isNumber()) {
            throw new InvalidInputException(field, field + " must be a number of metres, got " + n);
        }
        return n.asDouble();
    }
}
