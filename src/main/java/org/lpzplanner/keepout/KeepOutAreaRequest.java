package org.lpzplanner.keepout;

import com.fasterxml.jackson.annotation.JsonIgnoreProperties;
import io.swagger.v3.oas.annotations.media.ArraySchema;
import io.swagger.v3.oas.annotations.media.Schema;
import jakarta.validation.constraints.NotNull;
import java.util.List;

/**
 * A keep-out area to store, as the API takes it. The corners' count, range and shape are checked by
 * {@link KeepOutOutline}, the name by the service, as for the design page.
 */
@Schema(description = "A keep-out area to store")
@JsonIgnoreProperties(ignoreUnknown = true)
public record KeepOutAreaRequest(
        @Schema(description = "Not blank, at most " + KeepOutAreaService.MAX_NAME + " characters",
                requiredMode = Schema.RequiredMode.REQUIRED, example = "North skylight")
        @NotNull(message = "is required: a name, e.g. \"North skylight\"")
        String name,
        @ArraySchema(arraySchema = @Schema(description = "The outline in local metres, in order round the area: 3 to "
                + KeepOutOutline.MAX_CORNERS + " corners within " + (int) KeepOutOutline.MAX_COORDINATE
                + " m of the site's origin, no corner repeating the one before, not crossing itself, at least "
                + KeepOutOutline.MIN_AREA + " m²; a last corner equal to the first is dropped",
                requiredMode = Schema.RequiredMode.REQUIRED),
                schema = @Schema(implementation = double[].class, description = "[x, y] in metres",
                        example = "[10, 5]"))
        @NotNull(message = "is required: the outline as [[x, y], …] in local metres, at least 3 corners")
        List<Corner> corners) {

    /** The corners as the outline check takes them; a corner sent as null stays null (and is refused there). */
    List<double[]> outline() {
        return corners.stream().map(c -> c == null ? null : c.xy()).toList();
    }
}
