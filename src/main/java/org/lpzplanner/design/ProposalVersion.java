package org.lpzplanner.design;

import com.fasterxml.jackson.annotation.JsonIgnoreProperties;
import io.swagger.v3.oas.annotations.media.Schema;
import jakarta.validation.constraints.NotNull;

/**
 * The site's version that accepting a proposal, or undoing that, applies to: for accepting the
 * version as last read, for undoing the version the accept answered. Other members are ignored.
 */
@Schema(description = "The site's version: as last read to accept a proposal, as the accept answered to undo it")
@JsonIgnoreProperties(ignoreUnknown = true)
public record ProposalVersion(
        @Schema(description = "A stale one answers 409", requiredMode = Schema.RequiredMode.REQUIRED, example = "4")
        @NotNull(message = "is required: the site's version as last read (to undo: the version the accept answered)")
        Long version) {
}
