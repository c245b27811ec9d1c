package org.lpzplanner.comments;

import com.fasterxml.jackson.annotation.JsonIgnoreProperties;
import io.swagger.v3.oas.annotations.media.Schema;
import jakarta.validation.constraints.NotNull;

/** A comment as the API takes it: {@code {"comment": "..."}}; the service checks its length. */
@Schema(description = "A comment on a site")
@JsonIgnoreProperties(ignoreUnknown = true)
public record NewComment(
        @Schema(description = "The comment, not blank, at most " + CommentService.MAX_COMMENT + " characters",
                requiredMode = Schema.RequiredMode.REQUIRED, example = "Checked the ridge conductor on site")
        @NotNull(message = "is required: send a JSON object with \"comment\" as text")
        String comment) {
}
