package org.lpzplanner.risk;

import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.media.Content;
import io.swagger.v3.oas.annotations.media.Schema;
import io.swagger.v3.oas.annotations.responses.ApiResponse;
import io.swagger.v3.oas.annotations.tags.Tag;
import org.lpzplanner.system.ApiError;
import java.util.HashMap;
import java.util.Locale;
import java.util.Map;
import org.lpzplanner.system.InvalidInputException;
import org.springframework.http.MediaType;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PutMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RestController;
import tools.jackson.databind.JsonNode;

/**
 * JSON API of a site's risk of loss of human life: {@code GET /api/sites/{id}/risk} (the saved
 * inputs, or the defaults, with the result) and {@code PUT /api/sites/{id}/risk} (a JSON object of
 * inputs; a missing member takes its default). A value that cannot be used answers 400 with the
 * field named and nothing saved; an unknown site answers 404. Errors are JSON, see
 * {@link org.lpzplanner.system.ApiErrorHandler}.
 */
@RestController
@Tag(name = "Risk", description = "Risk of loss of human life (IEC 62305-2:2010, flashes to the structure) and the lowest sufficient protection level")
@RequestMapping("/api/sites/{id}/risk")
public class RiskApiController {

    private final RiskService risk;

    RiskApiController(RiskService risk) {
        this.risk = risk;
    }

    @Operation(summary = "Risk inputs and result of a site",
            description = "The saved inputs (or the defaults while none are saved, saved = false), A_D, C_D and its suggestion, N_D, R1 for no LPS and levels IV to I against 1e-5 per year, the lowest sufficient level and the cautions.")
    @ApiResponse(responseCode = "200", description = "The risk of the site")
    @ApiResponse(responseCode = "404", description = "No site with this id", content = @Content(mediaType = "application/json", schema = @Schema(implementation = ApiError.class)))
    @ApiResponse(responseCode = "400", description = "The id is not a whole number", content = @Content(mediaType = "application/json", schema = @Schema(implementation = ApiError.class)))
    @GetMapping
    public RiskView get(@PathVariable long id, Locale locale) {
        return view(risk.assess(id), locale);
    }

    @Operation(summary = "Save the risk inputs of a site",
            description = "JSON object with any of the inputs; a missing one takes its default. Choices by name (e.g. fireRisk HIGH, location SUGGESTED), numbers as numbers or strings. Answers with the new result.")
    @ApiResponse(responseCode = "200", description = "Saved; the new result")
    @ApiResponse(responseCode = "400", description = "A value cannot be used or a field is unknown; the field is named and nothing is saved", content = @Content(mediaType = "application/json", schema = @Schema(implementation = ApiError.class)))
    @ApiResponse(responseCode = "404", description = "No site with this id", content = @Content(mediaType = "application/json", schema = @Schema(implementation = ApiError.class)))
    @PutMapping(consumes = MediaType.APPLICATION_JSON_VALUE)
    public RiskView put(@PathVariable long id, @io.swagger.v3.oas.annotations.parameters.RequestBody(
            description = "Any of the inputs, by the names GET shows under inputs",
            content = @Content(schema = @Schema(implementation = RiskView.Inputs.class)))
            @RequestBody JsonNode body, Locale locale) {
        if (!body.isObject()) {
            throw new InvalidInputException("body", "the body must be a JSON object of risk inputs, e.g."
                    + " {\"thunderstormDays\": 20, \"structureUse\": \"OTHER\"}");
        }
        Map<String, String> values = new HashMap<>();
        for (Map.Entry<String, JsonNode> member : body.properties()) {
            String field = member.getKey();
            if (!RiskSettingsParser.FIELDS.contains(field)) {
                throw new InvalidInputException(field, "unknown field \"" + field + "\"; the fields are "
                        + String.join(", ", RiskSettingsParser.FIELDS));
            }
            JsonNode node = member.getValue();
            if (node.isString()) {
                values.put(field, node.stringValue());
            } else if (node.isNumber()) {
                values.put(field, node.asString());
            } else if (!node.isNull()) {
                throw new InvalidInputException(field, field + " must be a string or a number");
            }
        }
        return view(risk.save(id, values::get), locale);
    }

    private RiskView view(RiskAssessment a, Locale locale) {
        return RiskView.of(a, risk.outcome(a, locale), risk.dominance(a, locale));
    }
}
