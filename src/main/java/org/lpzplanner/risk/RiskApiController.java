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
 * inputs, or the initial ones, with the result, or the missing inputs and no verdict) and
 * {@code PUT /api/sites/{id}/risk} (a JSON object of inputs, the lines as an array {@code lines};
 * a missing member takes its default or stays not chosen). A value that cannot be used answers 400
 * with the field named and nothing saved; an unknown site answers 404. Errors are JSON, see
 * {@link org.lpzplanner.system.ApiErrorHandler}.
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
    @ApiResponse(responseCode = "404", description = "No site with this id", content = @Content(mediaType = "application/json", schema = @Schema(implementation = ApiError.class)))
    @ApiResponse(responseCode = "400", description = "The id is not a whole number", content = @Content(mediaType = "application/json", schema = @Schema(implementation = ApiError.class)))
    @GetMapping
    public RiskView get(@PathVariable long id, Locale locale) {
        return view(risk.assess(id), locale);
    }

    @Operation(summary = "Save the risk inputs of a site",
            description = "JSON object with any of the inputs; it replaces the saved ones: a missing one takes its default, or stays not chosen where it has none (the answer names it). Choices by name (e.g. fireRisk HIGH, location SUGGESTED, lifeCriticalSystems NO), numbers as numbers or strings, the incoming lines as lines: [{installation, length, environment, transformer, surgeProtection, shielding, withstandVoltage, touchProtection}] (lines: [] for none). Answers with the new result.")
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
                    + " {\"thunderstormDays\": 20, \"structureUse\": \"OTHER\", \"lines\": []}");
        }
        Map<String, String> values = new HashMap<>();
        for (Map.Entry<String, JsonNode> member : body.properties()) {
            String field = member.getKey();
            if (!RiskSettingsParser.FIELDS.contains(field) && !RiskSettingsParser.API_FIELDS.contains(field)) {
                throw new InvalidInputException(field, "unknown field \"" + field + "\"; the fields are "
                        + String.join(", ", RiskSettingsParser.FIELDS) + ", "
                        + String.join(", ", RiskSettingsParser.API_FIELDS));
            }
            if ("lines".equals(field)) {
                lines(member.getValue(), values);
            } else {
                put(values, field, member.getValue());
            }
        }
        JsonNode lines = body.get("lines");
        if (lines != null && lines.isArray()) {
            String count = String.valueOf(lines.size());
            String given = values.get("lineCount");
            if (given != null && !given.isBlank() && !count.equals(given.strip())) {
                throw new InvalidInputException("lineCount", "lineCount (" + given.strip() + ") differs from the "
                        + count + " entries of lines; give one of them, or both alike");
            }
            values.put("lineCount", count);
        }
        return view(risk.save(id, values::get), locale);
    }

    /** The members of each line as {@code lines[i].field}. */
    private static void lines(JsonNode lines, Map<String, String> values) {
        if (lines.isNull()) {
            return;
        }
        if (!lines.isArray() || lines.size() > RiskSettingsParser.MAX_LINES) {
            throw new InvalidInputException("lines", "lines must be an array of at most " + RiskSettingsParser.MAX_LINES
                    + " objects with any of " + String.join(", ", RiskSettingsParser.LINE_FIELDS));
        }
        for (int i = 0; i < lines.size(); i++) {
            JsonNode line = lines.get(i);
            String path = "lines[" + i + "]";
            if (!line.isObject()) {
                throw new InvalidInputException(path, path + " must be an object with any of "
                        + String.join(", ", RiskSettingsParser.LINE_FIELDS));
            }
            for (Map.Entry<String, JsonNode> member : line.properties()) {
                if (!RiskSettingsParser.LINE_FIELDS.contains(member.getKey())) {
                    throw new InvalidInputException(path + "." + member.getKey(), "unknown field \"" + member.getKey()
                            + "\" of " + path + "; the fields of a line are "
                            + String.join(", ", RiskSettingsParser.LINE_FIELDS));
                }
                put(values, RiskSettingsParser.lineField(i, member.getKey()), member.getValue());
            }
        }
    }

    private static void put(Map<String, String> values, String field, JsonNode node) {
        if (node.isString()) {
            values.put(field, node.stringValue());
        } else if (node.isNumber() || node.isBoolean()) {
            values.put(field, node.asString());
        } else if (!node.isNull()) {
            throw new InvalidInputException(field, field + " must be a string or a number");
        }
    }

    private RiskView view(RiskAssessment a, Locale locale) {
        return RiskView.of(a, risk.outcome(a, locale), risk.dominance(a, locale));
    }
}
