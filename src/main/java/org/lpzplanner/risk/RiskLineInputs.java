package org.lpzplanner.risk;

import io.swagger.v3.oas.annotations.media.Schema;
import java.util.Map;
import org.lpzplanner.system.TextOrNumber;
import tools.jackson.databind.annotation.JsonDeserialize;

/**
 * One incoming line of {@link RiskInputs}: any of the line's fields ({@link RiskSettingsParser#LINE_FIELDS});
 * a missing one takes its most conservative value. Choices by name, the length in metres, each as
 * text or a number; {@link RiskSettingsParser} checks them. Any other member is refused.
 */
@Schema(description = "An incoming line: any of its inputs, by the names GET shows under inputs.lines")
public record RiskLineInputs(
        @Schema(description = "OVERHEAD or BURIED", example = "BURIED")
        @JsonDeserialize(using = TextOrNumber.class) String installation,
        @Schema(description = "Length in metres (a number or text)", example = "250")
        @JsonDeserialize(using = TextOrNumber.class) String length,
        @JsonDeserialize(using = TextOrNumber.class) String environment,
        @JsonDeserialize(using = TextOrNumber.class) String transformer,
        @JsonDeserialize(using = TextOrNumber.class) String surgeProtection,
        @JsonDeserialize(using = TextOrNumber.class) String shielding,
        @JsonDeserialize(using = TextOrNumber.class) String withstandVoltage,
        @JsonDeserialize(using = TextOrNumber.class) String touchProtection) {

    /** The values given, by field name; what is left out is not in the map. */
    Map<String, String> values() {
        Map<String, String> out = new java.util.LinkedHashMap<>();
        put(out, "installation", installation);
        put(out, "length", length);
        put(out, "environment", environment);
        put(out, "transformer", transformer);
        put(out, "surgeProtection", surgeProtection);
        put(out, "shielding", shielding);
        put(out, "withstandVoltage", withstandVoltage);
        put(out, "touchProtection", touchProtection);
        return out;
    }

    static void put(Map<String, String> values, String field, String value) {
        if (value != null) {
            values.put(field, value);
        }
    }
}
