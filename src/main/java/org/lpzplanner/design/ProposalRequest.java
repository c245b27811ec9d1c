package org.lpzplanner.design;

import com.fasterxml.jackson.annotation.JsonIgnoreProperties;
import io.swagger.v3.oas.annotations.media.Schema;
import java.util.List;
import org.lpzplanner.system.InvalidInputException;
import tools.jackson.databind.annotation.JsonDeserialize;

/**
 * A proposal as {@code POST /api/sites/{id}/proposals} takes it: the allowed rod and mast heights,
 * whether roof-edge and ridge conductors may be proposed, and keep-out areas for this proposal only.
 * The heights' range and the areas' shape are checked by {@link ProposalService}, as for the design
 * page. Other members are ignored (clients of earlier releases).
 */
@Schema(description = "What a proposal may place: rod heights, optional mast heights and conductors, and keep-out"
        + " areas for this proposal (the site's stored ones always apply)")
@JsonIgnoreProperties(ignoreUnknown = true)
public record ProposalRequest(
        @Schema(implementation = double[].class, description = "Allowed rod heights in metres, 0.1 to 10, at most "
                + Sent.Heights.MAX + "; required unless conductors are allowed", example = "[0.5, 1, 2]")
        @JsonDeserialize(using = Sent.Heights.class)
        Sent<List<Double>> rodHeights,
        @Schema(implementation = double[].class, description = "Allowed mast heights in metres, 1 to 60, at most "
                + Sent.Heights.MAX, example = "[6]")
        @JsonDeserialize(using = Sent.Heights.class)
        Sent<List<Double>> mastHeights,
        @Schema(description = "Whether roof-edge conductors may be proposed", example = "false")
        Boolean edgeConductors,
        @Schema(description = "Whether ridge conductors may be proposed", example = "false")
        Boolean ridgeConductors,
        @Schema(implementation = double[][][].class, description = "Areas the proposal keeps out of, each an"
                + " outline [[x, y], …] in local metres, as the site's stored keep-out areas",
                example = "[[[5, 5], [8, 5], [8, 8], [5, 8]]]")
        @JsonDeserialize(using = Sent.Areas.class)
        Sent<List<List<double[]>>> keepOut) {

    /**
     * The request as {@link ProposalService} takes it.
     *
     * @throws InvalidInputException naming the member when a list cannot be used, or naming
     *         rodHeights when neither heights nor conductors are given
     */
    ProposeRequest toRequest() {
        boolean edge = Boolean.TRUE.equals(edgeConductors);
        boolean ridge = Boolean.TRUE.equals(ridgeConductors);
        List<Double> rods = List.of();
        if (rodHeights != null) {
            rods = rodHeights.checked();
        } else if (!(edge || ridge)) {
            throw new InvalidInputException("rodHeights", "rodHeights must be a list of numbers of metres, e.g."
                    + " [0.5, 1, 2]");
        }
        List<Double> masts = mastHeights == null ? List.of() : mastHeights.checked();
        List<List<double[]>> areas = keepOut == null ? List.of() : keepOut.checked();
        return new ProposeRequest(rods, masts, edge, ridge, areas);
    }
}
