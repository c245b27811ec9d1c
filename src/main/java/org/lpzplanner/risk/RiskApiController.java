package org.lpzplanner.risk;

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
@RequestMapping("/api/sites/{id}/risk")
public class RiskApiController {

    private final RiskService risk;

    RiskApiController(RiskService risk) {
        this.risk = risk;
    }

    @GetMapping
    public RiskView get(@PathVariable long id, Locale locale) {
        return view(risk.assess(id), locale);
    }

    @PutMapping(consumes = MediaType.APPLICATION_JSON_VALUE)
    public RiskView put(@PathVariable long id, @RequestBody JsonNode body, Locale locale) {
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
