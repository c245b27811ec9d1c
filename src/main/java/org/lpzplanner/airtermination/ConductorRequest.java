package org.lpzplanner.airtermination;

import com.fasterxml.jackson.annotation.JsonIgnoreProperties;
import io.swagger.v3.oas.annotations.media.ArraySchema;
import io.swagger.v3.oas.annotations.media.Schema;
import jakarta.validation.constraints.NotNull;
import java.util.List;
import org.lpzplanner.system.TextOrNumber;
import tools.jackson.databind.annotation.JsonDeserialize;

/**
 * A new conductor or a conductor's new path, as the API takes it: the site's version and the whole
 * path ({@link ConductorPoints}); the height above the roof as a number or as text. The path, height
 * and name are checked by {@link ConductorEdits}, as for the plan page. Other members are ignored
 * (clients may send back a conductor as read).
 */
@Schema(description = "A new roof conductor or catenary wire, or a conductor's new path")
@JsonIgnoreProperties(ignoreUnknown = true)
public record ConductorRequest(
        @Schema(description = "The site's version as last read; a stale one answers 409",
                requiredMode = Schema.RequiredMode.REQUIRED, example = "3")
        @NotNull(message = "is required: the site's version as last read")
        Long version,
        @Schema(description = "For a new conductor only: an id not in use (lets a removed conductor come back under"
                + " its old id); left out, the next free one is given", example = "conductor-2")
        String id,
        @Schema(description = "A name shown on the plan and in the report", example = "Ridge")
        String name,
        @ArraySchema(arraySchema = @Schema(description = "The whole path in local metres: [[x, y], …] at"
                + " heightAboveRoof over the surface below, or [[x, y, elevation above ground], …]",
                requiredMode = Schema.RequiredMode.REQUIRED),
                schema = @Schema(implementation = double[].class, description = "[x, y] or [x, y, elevation]",
                        example = "[20, 20]"))
        @NotNull(message = "is required: a list of [x, y] or [x, y, elevation] positions in local metres")
        @JsonDeserialize(using = ConductorPoints.class)
        List<double[]> points,
        @Schema(description = "Metres above the surface below, for points given as [x, y] (a number or text);"
                + " required for a new roof conductor, a changed one keeps its own unless given", example = "0.1")
        @JsonDeserialize(using = TextOrNumber.class)
        String heightAboveRoof) {

    /** The values as {@link ConductorEdits} takes them; a change keeps the conductor's id. */
    ConductorInput input(boolean withId) {
        return new ConductorInput(withId ? id : null, name, points, heightAboveRoof);
    }
}
