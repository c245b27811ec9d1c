package org.lpzplanner.system;

import io.swagger.v3.oas.annotations.media.Schema;

/**
 * The body of every error answer of the API: a problem detail (RFC 9457) as {@link ApiErrorHandler}
 * writes it, content type {@code application/problem+json}; described here for the OpenAPI document
 * (schema {@code Problem}, which {@link ApiDocsConfiguration} puts on every 4xx and 5xx answer).
 */
@Schema(name = "Problem", description = "Error answer (RFC 9457 problem detail): what is wrong and where, never a"
        + " stack trace. Nothing is stored when a request is refused.")
public record ApiError(
        @Schema(description = "The kind of problem: a URI of LPZ Planner's own, an identifier rather than an address"
                + " to open (see the list in the API description)", requiredMode = Schema.RequiredMode.REQUIRED,
                example = "urn:lpz-planner:problem:invalid-input")
        String type,
        @Schema(description = "The kind of problem in a few words", requiredMode = Schema.RequiredMode.REQUIRED,
                example = "Invalid input")
        String title,
        @Schema(description = "The HTTP status of the answer", requiredMode = Schema.RequiredMode.REQUIRED,
                example = "400")
        int status,
        @Schema(description = "What is wrong and what to do, fit to show to users",
                requiredMode = Schema.RequiredMode.REQUIRED,
                example = "radius must be above 0 and at most 1000 m, got -4")
        String detail,
        @Schema(description = "The path of the request", example = "/api/sites/12") String instance,
        @Schema(description = "The same text as detail, for clients of earlier releases, which read this member;"
                + " new clients read detail", requiredMode = Schema.RequiredMode.REQUIRED,
                example = "radius must be above 0 and at most 1000 m, got -4")
        String error,
        @Schema(description = "The request member or parameter at fault, where known: a JSON member as a path"
                + " (lines[0].length), a parameter, body (the body as a whole), file (an upload)",
                example = "radius")
        String field,
        @Schema(description = "Site files: the file name") String file,
        @Schema(description = "Site files: the feature's index (from 0)") Integer feature,
        @Schema(description = "Site files: the feature's name") String featureName,
        @Schema(description = "Site files: the line in the file") Integer line,
        @Schema(description = "Site files: the problem alone, without the place") String problem,
        @Schema(description = "Analyses too large to run (analysis-too-large): a grid resolution in metres that"
                + " fits") Double suggestedResolution,
        @Schema(description = "Busy (429): seconds to wait before trying again, as the Retry-After header says")
        Integer retryAfterSeconds) {
}
