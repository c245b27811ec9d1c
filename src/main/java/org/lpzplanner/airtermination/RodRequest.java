package org.lpzplanner.airtermination;

import com.fasterxml.jackson.annotation.JsonIgnoreProperties;
import io.swagger.v3.oas.annotations.media.Schema;
import jakarta.validation.constraints.NotNull;
import org.lpzplanner.system.InvalidInputException;
import org.lpzplanner.system.TextOrNumber;
import tools.jackson.databind.annotation.JsonDeserialize;

/**
 * A new rod or a change of one, as the API takes it: the site's version and any of position (local
 * metres) and height, each as a number or as text; a member left out keeps its value (a new rod needs
 * x and y; its height is 1 m unless given). The height and name are checked by {@link RodEdits}, as
 * for the plan page. Other members are ignored (clients may send back a rod as read).
 */
@Schema(description = "A new rod, or a change of one: the site's version and any of x, y, height and name")
@JsonIgnoreProperties(ignoreUnknown = true)
public record RodRequest(
        @Schema(description = "The site's version as last read; a stale one answers 409",
                requiredMode = Schema.RequiredMode.REQUIRED, example = "3")
        @NotNull(message = "is required: the site's version as last read")
        Long version,
        @Schema(description = "For a new rod only: an id not in use (lets a removed rod come back under its old id);"
                + " left out, the next free one is given", example = "rod-4")
        String id,
        @Schema(description = "A name shown on the plan and in the report", example = "North gable")
        String name,
        @Schema(description = "East in local metres (a number or text); required for a new rod, and together with y"
                + " to move one", example = "12.5")
        @JsonDeserialize(using = TextOrNumber.class)
        String x,
        @Schema(description = "North in local metres (a number or text), as x", example = "4")
        @JsonDeserialize(using = TextOrNumber.class)
        String y,
        @Schema(description = "Height above what the rod stands on, metres (a number or text); a new rod is 1 m"
                + " high unless given", example = "2")
        @JsonDeserialize(using = TextOrNumber.class)
        String height) {

    /**
     * The values as {@link RodEdits} takes them.
     *
     * @throws InvalidInputException naming x or y when it is not a finite number
     */
    RodInput input() {
        return new RodInput(id, name, metres("x", x), metres("y", y), height);
    }

    private static Double metres(String field, String text) {
        if (text == null) {
            return null;
        }
        try {
            double value = Double.parseDouble(text.strip());
            if (Double.isFinite(value)) {
                return value;
            }
        } catch (NumberFormatException e) {
            // refused below, naming the field
        }
        String shown = text.length() > 40 ? text.substring(0, 40) + "…" : text;
        throw new InvalidInputException(field, field + " must be a number of metres, got \"" + shown + "\"");
    }
}
