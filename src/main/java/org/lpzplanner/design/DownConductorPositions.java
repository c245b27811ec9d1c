package org.lpzplanner.design;

import com.fasterxml.jackson.annotation.JsonIgnoreProperties;
import io.swagger.v3.oas.annotations.media.Schema;
import jakarta.validation.constraints.NotNull;
import java.util.List;
import tools.jackson.databind.annotation.JsonDeserialize;

/**
 * A building's down-conductors as edited: their positions on the plan. How many there are and
 * where they stand is checked by {@link DownConductorService}. Other members are ignored.
 */
@Schema(description = "The down-conductors of a building, as edited")
@JsonIgnoreProperties(ignoreUnknown = true)
public record DownConductorPositions(
        @Schema(implementation = double[][].class, requiredMode = Schema.RequiredMode.REQUIRED,
                description = "At least two positions [x, y] in local metres, each on the building's outline",
                example = "[[0, 0], [30, 12]]")
        @NotNull(message = "is required: a list of [x, y] in local metres")
        @JsonDeserialize(using = Sent.Points.class)
        Sent<List<double[]>> positions) {
}
