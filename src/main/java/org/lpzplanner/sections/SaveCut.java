package org.lpzplanner.sections;

import com.fasterxml.jackson.annotation.JsonIgnoreProperties;
import io.swagger.v3.oas.annotations.media.Schema;
import jakarta.validation.constraints.NotNull;
import org.lpzplanner.system.Finite;

/**
 * A section cut to save, as the API takes it: a name and the ends in local metres. The name and the
 * cut's length are checked by the service, as for the section page's form.
 */
@Schema(description = "A section cut to save; ends in local metres, " + (int) SectionPage.MIN_LENGTH + " m to "
        + (int) SectionPage.MAX_LENGTH + " m apart")
@JsonIgnoreProperties(ignoreUnknown = true)
public record SaveCut(
        @Schema(description = "Not blank, at most " + SiteCutService.MAX_NAME + " characters",
                requiredMode = Schema.RequiredMode.REQUIRED, example = "North gable")
        @NotNull(message = "is required: a name, e.g. \"North gable\"")
        String name,
        @Schema(description = "First end, x", requiredMode = Schema.RequiredMode.REQUIRED, example = "-10")
        @NotNull(message = "is missing: give it in metres, e.g. 12.5") @Finite Double x1,
        @Schema(description = "First end, y", requiredMode = Schema.RequiredMode.REQUIRED, example = "20")
        @NotNull(message = "is missing: give it in metres, e.g. 12.5") @Finite Double y1,
        @Schema(description = "Second end, x", requiredMode = Schema.RequiredMode.REQUIRED, example = "90.5")
        @NotNull(message = "is missing: give it in metres, e.g. 12.5") @Finite Double x2,
        @Schema(description = "Second end, y", requiredMode = Schema.RequiredMode.REQUIRED, example = "20")
        @NotNull(message = "is missing: give it in metres, e.g. 12.5") @Finite Double y2) {

    double[] ends() {
        return new double[] {x1, y1, x2, y2};
    }
}
