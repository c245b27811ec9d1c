package org.lpzplanner.analysis;

import com.fasterxml.jackson.annotation.JsonIgnoreProperties;
import io.swagger.v3.oas.annotations.media.Schema;
import jakarta.validation.constraints.NotNull;

/**
 * An exposed item of the review accepted, as the API takes it: the item's key as the review lists it
 * and the designer's reason; the service checks that the reason is not blank and not too long.
 */
@Schema(description = "An exposed item to accept, with the reason")
@JsonIgnoreProperties(ignoreUnknown = true)
public record AcceptItem(
        @Schema(description = "The item's key, as the review lists it", requiredMode = Schema.RequiredMode.REQUIRED,
                example = "edge-3f9a1c2b7d4e")
        @NotNull(message = "is required: the key of an exposed item of the review list")
        String key,
        @Schema(description = "Why the item needs no air-termination, at most " + ReviewService.MAX_REASON
                + " characters", requiredMode = Schema.RequiredMode.REQUIRED,
                example = "covered by a natural component")
        @NotNull(message = "is required: say why this item needs no air-termination")
        String reason) {
}
