package org.lpzplanner.keepout;

import com.fasterxml.jackson.annotation.JsonIgnoreProperties;
import io.swagger.v3.oas.annotations.media.Schema;
import jakarta.validation.constraints.NotNull;

/** A new name for a keep-out area; the service checks it. */
@Schema(description = "A keep-out area's new name")
@JsonIgnoreProperties(ignoreUnknown = true)
public record KeepOutAreaName(
        @Schema(description = "Not blank, at most " + KeepOutAreaService.MAX_NAME + " characters",
                requiredMode = Schema.RequiredMode.REQUIRED, example = "Plant access")
        @NotNull(message = "is required: the new name, e.g. \"Plant access\"")
        String name) {
}
