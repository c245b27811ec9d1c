package org.lpzplanner.system;

import org.lpzplanner.engine.io.Json;
import org.springframework.boot.jackson.autoconfigure.JsonMapperBuilderCustomizer;
import org.springframework.context.annotation.Bean;
import org.springframework.context.annotation.Configuration;

/**
 * The application's one {@code JsonMapper} (Spring Boot's, which also reads request bodies and writes
 * answers) gets the product's JSON settings ({@link Json#configure}); every Spring component that reads
 * or writes JSON takes that bean.
 */
@Configuration(proxyBeanMethods = false)
public class JsonConfiguration {

    @Bean
    JsonMapperBuilderCustomizer productJsonSettings() {
        return Json::configure;
    }
}
