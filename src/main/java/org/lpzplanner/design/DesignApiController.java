package org.lpzplanner.design;

import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.annotation.JsonUnwrapped;
import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.responses.ApiResponse;
import jakarta.validation.Valid;
import java.net.URI;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Locale;
import org.lpzplanner.common.Cautions;
import org.lpzplanner.editing.Edit;
import org.lpzplanner.engine.design.quantities.QuantityTable;
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

/**
 * JSON API of the design of a site (local metres throughout):
 * <ul>
 * <li>{@code POST /api/sites/{id}/proposals} starts a proposal ({@link ProposalRequest}:
 *     {@code rodHeights}, optional {@code mastHeights}, optional {@code edgeConductors} and
 *     {@code ridgeConductors} (booleans), optional {@code keepOut}: polygons as lists of [x, y]); 202
 *     with the job ({@link ProposalJobView}).</li>
 * <li>{@code GET /api/sites/{id}/proposals/{job}}: state, stage, fraction and, when done, the parts
 *     and counts; {@code POST …/cancel}; {@code POST …/accept} with {@code version}
 *     ({@link ProposalVersion}) writes the rods, masts and conductors into the site in one change;
 *     {@code POST …/undo} with the {@code version} accepting answered removes them again in one change. Both analyse the site again and answer
 *     its new {@code version}; {@code analysisPending} is true when the analysis could not run now
 *     (the change is stored all the same), {@code pendingReason} says why.</li>
 * <li>{@code GET /api/sites/{id}/method-checks}: angle and mesh methods against the rolling sphere per structure.</li>
 * <li>{@code GET /api/sites/{id}/down-conductors}: per building (structures whose footprints overlap
 *     or touch, on the outline of the whole), {@code buildings}; {@code PUT …/down-conductors/{building}}
 *     with {@code positions} ({@link DownConductorPositions}; the building's id or the id of any of its
 *     structures); {@code DELETE} returns to the planned layout.</li>
 * <li>{@code GET /api/sites/{id}/separation-distances}; {@code GET/POST /api/sites/{id}/metal-installations}
 *     ({@link NewInstallation}), {@code DELETE …/metal-installations/{n}}.</li>
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

    public DesignApiController(ProposalService proposals, MethodCheckService methodChecks,
            DownConductorService downConductors, SeparationService separations,
            MetalInstallationService installations, QuantityService quantities) {
        this.proposals = proposals;
        this.methodChecks = methodChecks;
        this.downConductors = downConductors;
        this.separations = separations;
        this.installations = installations;
        this.quantities = quantities;
    }

    /**
     * A proposal job as the API shows it: where it stands ({@code state} running, done, failed or
     * cancelled; {@code stage}, {@code fraction} done), what it was asked for (the site's version,
     * level and sphere radius), why it failed ({@code error}, only then) and, once done, the
     * proposal's parts and figures as stored ({@link StoredProposal}, its members at this level) with
     * the review {@code cautions}.
     */
    public record ProposalJobView(String jobId, String state, String stage, double fraction, long siteVersion,
            String level, double radius, @JsonInclude(JsonInclude.Include.NON_NULL) String error,
            @JsonUnwrapped StoredProposal result, @JsonInclude(JsonInclude.Include.NON_NULL) List<String> cautions) {

        static ProposalJobView of(ProposalJobs.Job job) {
            return new ProposalJobView(job.id(), job.state().name().toLowerCase(Locale.ROOT), job.stage(),
                    Math.round(job.fraction() * 1000) / 1000.0, job.siteVersion(), job.level(), job.radius(),
                    job.error(), job.result(), job.result() == null ? null : Cautions.lines());
        }
    }

    /**
     * An accepted proposal: the ids its parts got, the site's new {@code version}, the plan page, and
     * whether the analysis is pending ({@code pendingReason} says why).
     */
    public record ProposalAccepted(List<String> rodIds, List<String> conductorIds, long version, String plan,
            boolean analysisPending, String pendingReason) {
    }

    /** An accepting undone: the site's new {@code version}, the plan page and the analysis as for accepting. */
    public record ProposalUndone(long version, String plan, boolean analysisPending, String pendingReason) {
    }

    /** The angle and mesh methods against the rolling sphere, per structure, with the review cautions. */
    public record MethodChecks(List<MethodCheckService.MethodCheck> structures, List<String> cautions) {
    }

    /** The down-conductors per building, with the review cautions. */
    public record DownConductorList(List<DownConductorService.DownConductors> buildings, List<String> cautions) {
    }

    /** The separation distances checked, with the review cautions and the edition the method follows. */
    public record SeparationChecks(List<SeparationService.Separation> checks, List<String> cautions, String edition) {
    }

    /** The bill of quantities as a table, with the review cautions. */
    public record Quantities(String title, List<String> columns, List<List<String>> rows, List<String> cautions) {
    }

    @Operation(summary = "Start an air-termination proposal",
            description = "Runs in the background; follow it with GET …/proposals/{jobId}")
    @ApiResponse(responseCode = "202", description = "Started; Location names the job")
    @ApiResponse(responseCode = "400", description = "A height or keep-out area cannot be used, or nothing may be placed; the field is named")
    @ApiResponse(responseCode = "404", description = "No site with this id")
    @PostMapping(value = "/proposals", consumes = MediaType.APPLICATION_JSON_VALUE)
    public ResponseEntity<ProposalJobView> propose(@PathVariable long id, @Valid @RequestBody ProposalRequest body) {
        ProposalJobs.Job job = proposals.propose(id, body.toRequest());
        return ResponseEntity.status(HttpStatus.ACCEPTED)
                .location(URI.create("/api/sites/" + id + "/proposals/" + job.id())).body(ProposalJobView.of(job));
    }

    @Operation(summary = "A proposal job: its progress and, when done, the proposed parts")
    @ApiResponse(responseCode = "200", description = "The job")
    @ApiResponse(responseCode = "404", description = "No such site or job")
    @GetMapping("/proposals/{jobId}")
    public ProposalJobView proposal(@PathVariable long id, @PathVariable String jobId) {
        return ProposalJobView.of(proposals.job(id, jobId));
    }

    @Operation(summary = "Cancel a running proposal")
    @ApiResponse(responseCode = "200", description = "The job as it is now")
    @ApiResponse(responseCode = "404", description = "No such site or job")
    @PostMapping("/proposals/{jobId}/cancel")
    public ProposalJobView cancel(@PathVariable long id, @PathVariable String jobId) {
        return ProposalJobView.of(proposals.cancel(id, jobId));
    }

    @Operation(summary = "Accept a finished proposal",
            description = "Writes its rods, masts and conductors into the site file in one change and analyses again")
    @ApiResponse(responseCode = "200", description = "Accepted; the parts' ids and the site's new version")
    @ApiResponse(responseCode = "400", description = "version is missing (field version), or the proposal is not done or adds nothing (field proposal)")
    @ApiResponse(responseCode = "404", description = "No such site or job")
    @ApiResponse(responseCode = "409", description = "The site was changed since the proposal started or since the version sent")
    @PostMapping(value = "/proposals/{jobId}/accept", consumes = MediaType.APPLICATION_JSON_VALUE)
    public ProposalAccepted accept(@PathVariable long id, @PathVariable String jobId,
            @Valid @RequestBody ProposalVersion body) {
        Edit<AcceptedProposal> accepted = proposals.accept(id, jobId, body.version());
        return new ProposalAccepted(accepted.outcome().rodIds(), accepted.outcome().conductorIds(),
                accepted.version(), "/sites/" + id, accepted.analysis().isPending(),
                accepted.analysis().pendingReason());
    }

    @Operation(summary = "Undo accepting a proposal",
            description = "Removes the parts the accept added, in one change; version is the one the accept answered")
    @ApiResponse(responseCode = "200", description = "Undone; the site's new version")
    @ApiResponse(responseCode = "400", description = "version is missing (field version), or the proposal was not accepted (field proposal)")
    @ApiResponse(responseCode = "404", description = "No such site or job")
    @ApiResponse(responseCode = "409", description = "The site was changed after the accept")
    @PostMapping(value = "/proposals/{jobId}/undo", consumes = MediaType.APPLICATION_JSON_VALUE)
    public ProposalUndone undoAccept(@PathVariable long id, @PathVariable String jobId,
            @Valid @RequestBody ProposalVersion body) {
        Edit<Void> undone = proposals.undoAccept(id, jobId, body.version());
        return new ProposalUndone(undone.version(), "/sites/" + id, undone.analysis().isPending(),
                undone.analysis().pendingReason());
    }

    @Operation(summary = "Angle and mesh methods against the rolling sphere, per structure")
    @ApiResponse(responseCode = "200", description = "The checks")
    @ApiResponse(responseCode = "404", description = "No site with this id")
    @GetMapping("/method-checks")
    public MethodChecks methodChecks(@PathVariable long id) {
        return new MethodChecks(methodChecks.methodChecks(id), Cautions.lines());
    }

    @Operation(summary = "Down-conductors per building, planned or as edited")
    @ApiResponse(responseCode = "200", description = "The buildings")
    @ApiResponse(responseCode = "404", description = "No site with this id")
    @GetMapping("/down-conductors")
    public DownConductorList downConductors(@PathVariable long id) {
        return new DownConductorList(downConductors.list(id), Cautions.lines());
    }

    @Operation(summary = "Save a building's down-conductors",
            description = "buildingId is the building's id or the id of any of its structures")
    @ApiResponse(responseCode = "200", description = "Saved; every building")
    @ApiResponse(responseCode = "400", description = "The positions cannot be used; the field is named")
    @ApiResponse(responseCode = "404", description = "No such site or building")
    @PutMapping(value = "/down-conductors/{buildingId}", consumes = MediaType.APPLICATION_JSON_VALUE)
    public DownConductorList saveDownConductors(@PathVariable long id, @PathVariable String buildingId,
            @Valid @RequestBody DownConductorPositions body) {
        return new DownConductorList(downConductors.save(id, buildingId, body.positions().checked()),
                Cautions.lines());
    }

    @Operation(summary = "Return a building to its planned down-conductors")
    @ApiResponse(responseCode = "200", description = "Reset; every building")
    @ApiResponse(responseCode = "404", description = "No such site or building")
    @DeleteMapping("/down-conductors/{buildingId}")
    public DownConductorList resetDownConductors(@PathVariable long id, @PathVariable String buildingId) {
        return new DownConductorList(downConductors.reset(id, buildingId), Cautions.lines());
    }

    @Operation(summary = "Separation distances of the metal installations and the LPS (IEC 62305-3:2010 6.3)")
    @ApiResponse(responseCode = "200", description = "The checks")
    @ApiResponse(responseCode = "404", description = "No site with this id")
    @GetMapping("/separation-distances")
    public SeparationChecks separations(@PathVariable long id) {
        return new SeparationChecks(separations.separations(id), Cautions.lines(),
                "IEC 62305-3:2010 6.3 (the 2024 edition revised this method)");
    }

    @Operation(summary = "Metal installations of a site")
    @ApiResponse(responseCode = "200", description = "The installations")
    @ApiResponse(responseCode = "404", description = "No site with this id")
    @GetMapping("/metal-installations")
    public List<DesignRepository.Installation> installations(@PathVariable long id) {
        return installations.list(id);
    }

    @Operation(summary = "Add a metal installation")
    @ApiResponse(responseCode = "201", description = "Stored; Location names it")
    @ApiResponse(responseCode = "400", description = "A value cannot be used; the field is named")
    @ApiResponse(responseCode = "404", description = "No site with this id")
    @PostMapping(value = "/metal-installations", consumes = MediaType.APPLICATION_JSON_VALUE)
    public ResponseEntity<DesignRepository.Installation> addInstallation(@PathVariable long id,
            @Valid @RequestBody NewInstallation body) {
        DesignRepository.Installation i = installations.add(id, body.name(), body.x(), body.y(), body.z(),
                body.material());
        return ResponseEntity.status(HttpStatus.CREATED)
                .location(URI.create("/api/sites/" + id + "/metal-installations/" + i.id())).body(i);
    }

    @Operation(summary = "Remove a metal installation")
    @ApiResponse(responseCode = "204", description = "Removed")
    @ApiResponse(responseCode = "404", description = "No such site or installation")
    @DeleteMapping("/metal-installations/{installationId}")
    public ResponseEntity<Void> removeInstallation(@PathVariable long id, @PathVariable long installationId) {
        installations.remove(id, installationId);
        return ResponseEntity.noContent().build();
    }

    @Operation(summary = "Bill of quantities as a table")
    @ApiResponse(responseCode = "200", description = "The table")
    @ApiResponse(responseCode = "400", description = "fixingsPerMetre cannot be used")
    @ApiResponse(responseCode = "404", description = "No site with this id")
    @GetMapping("/quantities")
    public Quantities quantities(@PathVariable long id,
            @RequestParam(defaultValue = "1") double fixingsPerMetre) {
        QuantityTable table = quantities.quantities(id, fixingsPerMetre);
        return new Quantities(table.title(), table.columns(), table.rows(), Cautions.lines());
    }

    @Operation(summary = "Bill of quantities as CSV")
    @ApiResponse(responseCode = "200", description = "The table as CSV (RFC 4180)")
    @ApiResponse(responseCode = "400", description = "fixingsPerMetre cannot be used")
    @ApiResponse(responseCode = "404", description = "No site with this id")
    @GetMapping(value = "/quantities.csv", produces = "text/csv")
    public ResponseEntity<byte[]> quantitiesCsv(@PathVariable long id,
            @RequestParam(defaultValue = "1") double fixingsPerMetre) {
        QuantityTable table = quantities.quantities(id, fixingsPerMetre);
        return ResponseEntity.ok()
                .header(HttpHeaders.CONTENT_DISPOSITION, "attachment; filename=\"site-" + id + "-quantities.csv\"")
                .contentType(new MediaType("text", "csv", StandardCharsets.UTF_8))
                .body(table.toCsv().getBytes(StandardCharsets.UTF_8));
    }
}
