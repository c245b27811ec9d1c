package org.lpzplanner.accounts;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.setup.SecurityMockMvcConfigurers.springSecurity;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.request;

import java.util.Set;
import java.util.TreeSet;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.beans.factory.annotation.Qualifier;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.HttpMethod;
import org.springframework.mock.web.MockHttpServletResponse;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.setup.MockMvcBuilders;
import org.springframework.web.bind.annotation.RequestMethod;
import org.springframework.web.context.WebApplicationContext;
import org.springframework.web.servlet.mvc.method.RequestMappingInfo;
import org.springframework.web.servlet.mvc.method.annotation.RequestMappingHandlerMapping;

/**
 * Every address the app maps, with every method it answers, refuses a request without an account:
 * the API with 401, pages by leading to the sign-in page. Only the sign-in page, the setup page and
 * the error page are open (static files and the health check are not controller addresses). The
 * requests carry a valid CSRF token, so what refuses them is the missing sign-in. A new endpoint is
 * checked here without anyone listing it.
 */
@SpringBootTest
@AutoConfigureMockMvc // the suite's shared context has MockMvc; this class does not use it
class EveryAddressNeedsSignInTest {

    private static final Set<String> OPEN = Set.of("/login", "/setup", "/error");

    @Autowired
    WebApplicationContext context;

    @Autowired
    @Qualifier("requestMappingHandlerMapping")
    RequestMappingHandlerMapping mappings;

    @Test
    void everyMappedAddressRefusesAnonymousRequests() throws Exception {
        MockMvc mvc = MockMvcBuilders.webAppContextSetup(context).apply(springSecurity()).build();
        Set<String> checked = new TreeSet<>();
        for (RequestMappingInfo info : mappings.getHandlerMethods().keySet()) {
            Set<RequestMethod> methods = info.getMethodsCondition().getMethods();
            for (String pattern : info.getPatternValues()) {
                if (OPEN.contains(pattern)) {
                    continue;
                }
                String path = pattern.replaceAll("\\{[^}]*}", "1").replace("/**", "/x");
                for (RequestMethod method : methods.isEmpty() ? Set.of(RequestMethod.GET, RequestMethod.POST) : methods) {
                    MockHttpServletResponse response = mvc.perform(request(HttpMethod.valueOf(method.name()), path)
                            .with(csrf())).andReturn().getResponse();
                    String label = method + " " + path;
                    if (path.startsWith("/api/")) {
                        assertThat(response.getStatus()).as(label).isEqualTo(401);
                    } else {
                        assertThat(response.getStatus()).as(label).isEqualTo(302);
                        assertThat(response.getRedirectedUrl()).as(label).endsWith("/login");
                    }
                    checked.add(label);
                }
            }
        }
        // the site pages and the JSON API of sites, analyses, design, risk and transfer at least
        assertThat(checked).contains("GET /sites/1", "POST /api/sites", "GET /api/sites/1/export",
                "POST /api/sites/1/proposals", "DELETE /api/sites/1/analyses/jobs/1", "GET /api/docs");
        assertThat(checked.size()).as("addresses checked").isGreaterThan(60);
    }
}
