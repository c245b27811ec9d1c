package org.lpzplanner.design;

import com.fasterxml.jackson.annotation.JsonIgnoreProperties;
import io.swagger.v3.oas.annotations.media.Schema;
import org.lpzplanner.system.Finite;

/**
 * A metal installation to store, as the API takes it: a name, a point in local metres (z above
 * ground) and what lies between it and the LPS. The values are checked by
 * {@link MetalInstallationService}. Other members are ignored.
 */
@Schema(description = "A metal installation whose separation distance to the LPS is checked")
@JsonIgnoreProperties(ignoreUnknown = true)
public record NewInstallation(
        @Schema(description = "1 to 200 characters", requiredMode = Schema.RequiredMode.REQUIRED, example = "Vent pipe")
        String name,
        @Schema(description = "East in local metres", requiredMode = Schema.RequiredMode.REQUIRED, example = "15")
        @Finite Double x,
        @Schema(description = "North in local metres", requiredMode = Schema.RequiredMode.REQUIRED, example = "8")
        @Finite Double y,
        @Schema(description = "Height above ground in metres, not negative", requiredMode = Schema.RequiredMode.REQUIRED,
                example = "9")
        @Finite Double z,
        @Schema(description = "AIR (default) or CONCRETE_OR_BRICK: what separates it from the LPS", example = "AIR")
        String material) {
}
