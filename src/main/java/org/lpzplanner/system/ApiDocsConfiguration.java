package org.lpzplanner.system;

import io.swagger.v3.core.converter.ModelConverters;
import io.swagger.v3.oas.models.Components;
import io.swagger.v3.oas.models.OpenAPI;
import io.swagger.v3.oas.models.Operation;
import io.swagger.v3.oas.models.info.Info;
import io.swagger.v3.oas.models.media.Content;
import io.swagger.v3.oas.models.media.MediaType;
import io.swagger.v3.oas.models.media.ObjectSchema;
import io.swagger.v3.oas.models.media.Schema;
import io.swagger.v3.oas.models.responses.ApiResponse;
import java.util.Arrays;
import java.util.List;
import java.util.stream.Collectors;
import org.lpzplanner.common.Cautions;
import org.springdoc.core.customizers.OpenApiCustomizer;
import org.springdoc.core.utils.SpringDocUtils;
import org.springframework.context.annotation.Bean;
import org.springframework.context.annotation.Configuration;
import tools.jackson.databind.JsonNode;

/**
 * The OpenAPI document of the JSON API (springdoc): served at {@code /api/docs}, browsable at
 * {@code /api/docs/ui}. The operations describe themselves through annotations on the API
 * controllers; this adds the title, the conventions every operation shares, the cautions, and the
 * body of every error answer: each 4xx and 5xx answer an operation lists is a problem detail
 * ({@code application/problem+json}, schema {@code Problem}: {@link ApiError}).
 */
@Configuration(proxyBeanMethods = false)
public class ApiDocsConfiguration {

    static final String PROBLEM_SCHEMA = "Problem";

    static {
        // answers holding a JSON document (the result GeoJSON) are described as plain JSON objects
        SpringDocUtils.getConfig().replaceWithSchema(JsonNode.class, new ObjectSchema());
    }

    @Bean
    OpenAPI lpzPlannerApi() {
        return new OpenAPI().info(new Info().title("LPZ Planner API").version("1")
                .description("""
                        JSON API of LPZ Planner: sites (site files kept verbatim), analyses by the rolling sphere \
                        method, the review of exposed items, air-termination rods and the risk estimate that picks \
                        the protection level. Lengths are in metres in the site's local frame. Changes to a site \
                        carry the site's `version`; a stale one answers 409. JSON request bodies are at most \
                        1 MiB (413 above), hold each member once and give numbers as numbers and text as text \
                        unless an operation says otherwise.

                        Every error answer is a problem detail (RFC 9457, `application/problem+json`, schema \
                        Problem): `type`, `title`, `status`, `detail` (what is wrong and what to do, for users), \
                        `instance`, `field` naming the member or parameter at fault where known, and `error`, the \
                        same text as `detail`, kept for clients of earlier releases. Nothing is stored when a \
                        request is refused. The types: %s.

                        """.formatted(types()) + String.join(" ", Cautions.lines())));
    }

    private static boolean takesJson(Operation operation) {
        return operation.getRequestBody() != null && operation.getRequestBody().getContent() != null
                && operation.getRequestBody().getContent().keySet().stream().anyMatch(t -> t.contains("json"));
    }

    private static String types() {
        return Arrays.stream(ApiProblem.values()).map(p -> "`" + p.type() + "` (" + p.title() + ")")
                .collect(Collectors.joining(", "));
    }

    /**
     * Every operation taking a JSON body may answer 413 ({@link JsonBodyLimit}), and every 4xx and 5xx
     * answer of every operation carries the problem detail.
     */
    @Bean
    OpenApiCustomizer problemAnswers() {
        return api -> {
            if (api.getComponents() == null) {
                api.setComponents(new Components());
            }
            ModelConverters.getInstance(true).read(ApiError.class).forEach(api.getComponents()::addSchemas);
            @SuppressWarnings("unchecked")
            Schema<Object> type = (Schema<Object>) api.getComponents().getSchemas().get(PROBLEM_SCHEMA)
                    .getProperties().get("type");
            type.setEnum(List.copyOf(Arrays.stream(ApiProblem.values()).map(p -> (Object) p.type().toString())
                    .toList()));
            if (api.getPaths() == null) {
                return;
            }
            api.getPaths().values().forEach(path -> path.readOperations().forEach(operation -> {
                if (operation.getResponses() == null) {
                    return;
                }
                if (takesJson(operation) && !operation.getResponses().containsKey("413")) {
                    operation.getResponses().addApiResponse("413", new ApiResponse().description(
                            "The JSON body is larger than the limit (1 MiB)"));
                }
                operation.getResponses().forEach((code, response) -> {
                    if (code.startsWith("4") || code.startsWith("5")) {
                        response.setContent(new Content().addMediaType(
                                org.springframework.http.MediaType.APPLICATION_PROBLEM_JSON_VALUE,
                                new MediaType().schema(new Schema<>().$ref("#/components/schemas/" + PROBLEM_SCHEMA))));
                    }
                });
            }));
        };
    }
}
