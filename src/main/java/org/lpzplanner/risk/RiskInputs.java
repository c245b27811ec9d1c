package org.lpzplanner.risk;

import io.swagger.v3.oas.annotations.media.ArraySchema;
import io.swagger.v3.oas.annotations.media.Schema;
import jakarta.validation.Valid;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Size;
import java.util.List;
import java.util.Map;
import org.lpzplanner.system.InvalidInputException;
import org.lpzplanner.system.TextOrNumber;
import tools.jackson.databind.annotation.JsonDeserialize;

/**
 * The risk inputs {@code PUT /api/sites/{id}/risk} takes: any of the form's fields
 * ({@link RiskSettingsParser#FIELDS}) and of the API's own ({@code lineLength}, {@code lines}), each
 * choice by name and each number as a number or as text; the values are checked by
 * {@link RiskSettingsParser}, as the page's form is. A member left out takes its default or stays not
 * chosen; any other member is refused naming it.
 */
@Schema(description = "Any of the risk inputs, by the names GET shows under inputs; choices by name (e.g. fireRisk"
        + " HIGH, location SUGGESTED, lifeCriticalSystems NO), numbers as numbers or text. A missing one takes its"
        + " default, or stays not chosen where it has none")
public record RiskInputs(
        @Schema(description = "MEASURED (flashDensity counts) or THUNDERSTORM_DAYS (thunderstormDays counts)")
        @JsonDeserialize(using = TextOrNumber.class) String flashDensitySource,
        @Schema(description = "Ground flash density N_G, flashes per km² and year", example = "2")
        @JsonDeserialize(using = TextOrNumber.class) String flashDensity,
        @Schema(description = "Thunderstorm days per year, N_G estimated from them", example = "20")
        @JsonDeserialize(using = TextOrNumber.class) String thunderstormDays,
        @Schema(description = "Location factor class, or SUGGESTED for the app's suggestion", example = "SUGGESTED")
        @JsonDeserialize(using = TextOrNumber.class) String location,
        @JsonDeserialize(using = TextOrNumber.class) String surface,
        @Schema(description = "EXPLOSION, HIGH, ORDINARY, LOW or NONE", example = "ORDINARY")
        @JsonDeserialize(using = TextOrNumber.class) String fireRisk,
        @JsonDeserialize(using = TextOrNumber.class) String fireProvisions,
        @JsonDeserialize(using = TextOrNumber.class) String specialHazard,
        @JsonDeserialize(using = TextOrNumber.class) String structureUse,
        @Schema(description = "YES or NO", example = "NO")
        @JsonDeserialize(using = TextOrNumber.class) String lifeCriticalSystems,
        @JsonDeserialize(using = TextOrNumber.class) String touchStep,
        @JsonDeserialize(using = TextOrNumber.class) String personsInZone,
        @JsonDeserialize(using = TextOrNumber.class) String personsTotal,
        @JsonDeserialize(using = TextOrNumber.class) String hoursPerYear,
        @Schema(description = "How many lines enter; with lines, equal to their number")
        @JsonDeserialize(using = TextOrNumber.class) String lineCount,
        @Schema(description = "Length in metres of each line given by lineCount alone (earlier clients)")
        @JsonDeserialize(using = TextOrNumber.class) String lineLength,
        @ArraySchema(arraySchema = @Schema(description = "The incoming lines, each with any of its inputs ([] for"
                + " none)"), maxItems = RiskSettings.MAX_LINES)
        @Size(max = RiskSettings.MAX_LINES, message = "must be an array of at most {max} lines")
        List<@Valid @NotNull(message = "must be an object with any of installation, length, environment,"
                + " transformer, surgeProtection, shielding, withstandVoltage, touchProtection") RiskLineInputs> lines) {

    /**
     * The values given, by the field names {@link RiskSettingsParser} reads ({@code lines[i].field} for
     * a line); with {@code lines}, {@code lineCount} is their number.
     *
     * @throws InvalidInputException naming lineCount when it differs from the number of lines
     */
    Map<String, String> values() {
        Map<String, String> out = new java.util.HashMap<>();
        RiskLineInputs.put(out, "flashDensitySource", flashDensitySource);
        RiskLineInputs.put(out, "flashDensity", flashDensity);
        RiskLineInputs.put(out, "thunderstormDays", thunderstormDays);
        RiskLineInputs.put(out, "location", location);
        RiskLineInputs.put(out, "surface", surface);
        RiskLineInputs.put(out, "fireRisk", fireRisk);
        RiskLineInputs.put(out, "fireProvisions", fireProvisions);
        RiskLineInputs.put(out, "specialHazard", specialHazard);
        RiskLineInputs.put(out, "structureUse", structureUse);
        RiskLineInputs.put(out, "lifeCriticalSystems", lifeCriticalSystems);
        RiskLineInputs.put(out, "touchStep", touchStep);
        RiskLineInputs.put(out, "personsInZone", personsInZone);
        RiskLineInputs.put(out, "personsTotal", personsTotal);
        RiskLineInputs.put(out, "hoursPerYear", hoursPerYear);
        RiskLineInputs.put(out, "lineCount", lineCount);
        RiskLineInputs.put(out, "lineLength", lineLength);
        if (lines != null) {
            for (int i = 0; i < lines.size(); i++) {
                int index = i;
                lines.get(i).values().forEach((field, value) ->
                        out.put(RiskSettingsParser.lineField(index, field), value));
            }
            String count = String.valueOf(lines.size());
            if (lineCount != null && !lineCount.isBlank() && !count.equals(lineCount.strip())) {
                throw new InvalidInputException("lineCount", "lineCount (" + lineCount.strip() + ") differs from the "
                        + count + " entries of lines; give one of them, or both alike");
            }
            out.put("lineCount", count);
        }
        return out;
    }
}
