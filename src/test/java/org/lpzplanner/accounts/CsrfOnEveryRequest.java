package org.lpzplanner.accounts;

import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;

import org.springframework.boot.test.context.TestConfiguration;
import org.springframework.boot.webmvc.test.autoconfigure.MockMvcBuilderCustomizer;
import org.springframework.context.annotation.Bean;
import org.springframework.security.core.context.SecurityContextHolder;
import org.springframework.security.test.context.TestSecurityContextHolder;
import org.springframework.test.web.servlet.request.MockMvcRequestBuilders;

/**
 * Adds a valid CSRF token to every MockMvc request of a {@link SignedIn} test, as the app's own
 * forms and scripts do (tests of the CSRF check itself build their MockMvc without it), and gives
 * the test thread its signed-in account back after each request, whose filters clear it, so that
 * the test can go on calling services.
 */
@TestConfiguration(proxyBeanMethods = false)
class CsrfOnEveryRequest {

    @Bean
    MockMvcBuilderCustomizer csrfOnEveryRequest() {
        return builder -> builder.defaultRequest(MockMvcRequestBuilders.get("/").with(csrf()))
                .alwaysDo(result -> SecurityContextHolder.setContext(TestSecurityContextHolder.getContext()));
    }
}
