package org.lpzplanner.system;

import io.swagger.v3.oas.models.OpenAPI;
import io.swagger.v3.oas.models.info.Info;
import io.swagger.v3.oas.models.media.ObjectSchema;
import org.lpzplanner.common.Cautions;
import org.springdoc.core.utils.SpringDocUtils;
import org.springframework.context.annotation.Bean;
import org.springframework.context.annotation.Configuration;
import tools.jackson.databind.JsonNode;

/**
 * The OpenAPI document of the JSON API (springdoc): served at {@code /api/docs}, browsable at
 * {@code /api/docs/ui}. The operations describe themselves through annotations on the API
 * controllers; this adds the title, the conventions every operation shares and the cautions.
 */
@Configuration(proxyBeanMethods = false)
public class ApiDocsConfiguration {

    static {
        // request bodies read as a JSON tree are described as plain JSON objects
        SpringDocUtils.getConfig().replaceWithSchema(JsonNode.class, new ObjectSchema());
    }

    @Bean
    OpenAPI lpzPlannerApi() {
        return new OpenAPI().info(new Info().title("LPZ Planner API").version("1")
                .description("""
                        JSON API of LPZ Planner: sites (site files kept verbatim), analyses by the rolling sphere \
                        method, the review of exposed items, air-termination rods and the risk estimate that picks \
                        the protection level. Lengths are in metres in the site's local frame. Changes to a site \
                        carry the site's `version`; a stale one answers 409. Every error answer is a JSON object \
                        (schema ApiError) saying what is wrong and naming the field; nothing is stored when a \
                        request is refused.

                        """ + String.join(" ", Cautions.lines())));
    }
}
