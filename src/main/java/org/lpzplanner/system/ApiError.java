package org.lpzplanner.system;

import io.swagger.v3.oas.annotations.media.Schema;

/**
 * The JSON body of every error answer of the API, as {@link ApiErrorHandler} writes it; described
 * here for the OpenAPI document. Only {@code error} is always present.
 */
@Schema(name = "ApiError", description = "Error answer: what is wrong and where, never a stack trace")
public record ApiError(
        @Schema(description = "What is wrong and what to do, fit to show to users", requiredMode = Schema.RequiredMode.REQUIRED)
        String error,
        @Schema(description = "The request field or parameter at fault, where known") String field,
        @Schema(description = "Site files: the file name") String file,
        @Schema(description = "Site files: the feature's index (from 0)") Integer feature,
        @Schema(description = "Site files: the feature's name") String featureName,
        @Schema(description = "Site files: the line in the file") Integer line,
        @Schema(description = "Site files: the problem alone, without the place") String problem,
        @Schema(description = "Analyses too large to run: a grid resolution in metres that fits") Double suggestedResolution) {
}
