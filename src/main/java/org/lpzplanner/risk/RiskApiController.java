package org.lpzplanner.risk;

import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.responses.ApiResponse;
import io.swagger.v3.oas.annotations.tags.Tag;
import jakarta.validation.Valid;
import java.util.Locale;
import org.springframework.http.MediaType;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PutMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RestController;

/**
 * JSON API of a site's risk of loss of human life: {@code GET /api/sites/{id}/risk} (the saved
 * inputs, or the initial ones, with the result, or the missing inputs and no verdict) and
 * {@code PUT /api/sites/{id}/risk} ({@link RiskInputs}: a JSON object of inputs, the lines as an array
 * {@code lines}; a missing member takes its default or stays not chosen). A value that cannot be used
 * answers 400 with the field named and nothing saved; an unknown site answers 404. Errors are problem
 * details, see {@link org.lpzplanner.system.ApiErrorHandler}.
 */
@RestController
@Tag(name = "Risk", description = "Risk of loss of human life (IEC 62305-2:2010, flashes to the structure and to its incoming lines) and the lowest sufficient protection level")
@RequestMapping("/api/sites/{id}/risk")
public class RiskApiController {

    private final RiskService risk;

    RiskApiController(RiskService risk) {
        this.risk = risk;
    }

    @Operation(summary = "Risk inputs and result of a site",
            description = "The saved inputs (saved = false while none are saved), A_D, C_D and its suggestion, N_D, R1 = R_A + R_B + R_U + R_V for no LPS and levels IV to I against 1e-5 per year, the lowest sufficient level and the cautions. While an input without a default is missing, complete = false, missingInputs names the fields and no verdict is given (options empty, verdict fields null); a structure with a risk of explosion or life-critical internal systems is not estimated (notCovered).")
    @ApiResponse(responseCode = "200", description = "The risk of the site")
    @ApiResponse(responseCode = "404", description = "No site with this id")
    @ApiResponse(responseCode = "400", description = "The id is not a whole number")
    @GetMapping
    public RiskView get(@PathVariable long id, Locale locale) {
        return view(risk.assess(id), locale);
    }

    @Operation(summary = "Save the risk inputs of a site",
            description = "JSON object with any of the inputs; it replaces the saved ones: a missing one takes its default, or stays not chosen where it has none (the answer names it). Choices by name (e.g. fireRisk HIGH, location SUGGESTED, lifeCriticalSystems NO), numbers as numbers or strings, the incoming lines as lines: [{installation, length, environment, transformer, surgeProtection, shielding, withstandVoltage, touchProtection}] (lines: [] for none). Answers with the new result.")
    @ApiResponse(responseCode = "200", description = "Saved; the new result")
    @ApiResponse(responseCode = "400", description = "A value cannot be used or a field is unknown; the field is named and nothing is saved")
    @ApiResponse(responseCode = "404", description = "No site with this id")
    @PutMapping(consumes = MediaType.APPLICATION_JSON_VALUE)
    public RiskView put(@PathVariable long id, @Valid @RequestBody RiskInputs body, Locale locale) {
        return view(risk.save(id, body.values()::get), locale);
    }

    private RiskView view(RiskAssessment a, Locale locale) {
        return RiskView.of(a, risk.outcome(a, locale), risk.dominance(a, locale));
    }
}
