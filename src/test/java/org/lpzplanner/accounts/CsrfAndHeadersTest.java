package org.lpzplanner.accounts;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.setup.SecurityMockMvcConfigurers.springSecurity;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.patch;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.header;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.redirectedUrl;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.lpzplanner.sites.SiteService;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.MediaType;
import org.springframework.security.test.context.TestSecurityContextHolder;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.setup.MockMvcBuilders;
import org.springframework.web.context.WebApplicationContext;

/**
 * Checks with a MockMvc that adds nothing on its own: a signed-in state-changing request without
 * a CSRF token is refused and changes nothing; pages carry the security headers; without signing
 * in, pages lead to the sign-in page and the API answers 401, while static files stay public.
 */
@SpringBootTest
@AutoConfigureMockMvc // the suite's shared context has MockMvc; this class does not use it
@SignedIn
class CsrfAndHeadersTest {

    @Autowired
    WebApplicationContext context;

    @Autowired
    SiteService sites;

    MockMvc mvc;

    long siteId;

    @BeforeEach
    void plainMockMvcAndASite() throws Exception {
        mvc = MockMvcBuilders.webAppContextSetup(context).apply(springSecurity()).build();
        siteId = sites.create("hall.geojson", Files.readAllBytes(Path.of("sample-sites", "millbrook-hall.geojson")),
                "Hall", "II", null).id();
    }

    @Test
    void stateChangingRequestsWithoutCsrfTokenAre403AndChangeNothing() throws Exception {
        long version = sites.get(siteId).version();
        mvc.perform(post("/sites/{id}/name", siteId).param("name", "Changed").param("version", String.valueOf(version)))
                .andExpect(status().isForbidden());
        mvc.perform(patch("/api/sites/{id}", siteId).contentType(MediaType.APPLICATION_JSON)
                .content("{\"version\": " + version + ", \"name\": \"Changed\"}")).andExpect(status().isForbidden());
        mvc.perform(post("/sites/{id}/comments", siteId).param("comment", "x")).andExpect(status().isForbidden());
        SecurityContextRestore.restore();
        assertThat(sites.get(siteId).name()).isEqualTo("Hall");

        // the same with the token the page carries goes through
        mvc.perform(post("/sites/{id}/name", siteId).param("name", "Changed").param("version", String.valueOf(version))
                .with(csrf())).andExpect(status().is3xxRedirection());
        SecurityContextRestore.restore();
        assertThat(sites.get(siteId).name()).isEqualTo("Changed");
    }

    @Test
    void pagesCarryTheSecurityHeadersAndTheCsrfTokenForScripts() throws Exception {
        String html = mvc.perform(get("/sites/{id}", siteId)).andExpect(status().isOk())
                .andExpect(header().string("X-Frame-Options", "DENY"))
                .andExpect(header().string("X-Content-Type-Options", "nosniff"))
                .andExpect(header().string("Referrer-Policy", "same-origin"))
                .andReturn().getResponse().getContentAsString();
        String csp = mvc.perform(get("/")).andReturn().getResponse().getHeader("Content-Security-Policy");
        assertThat(csp).contains("default-src 'self'", "script-src 'self'", "style-src 'self'",
                "frame-ancestors 'none'", "object-src 'none'").doesNotContain("unsafe-inline", "unsafe-eval");
        assertThat(html).contains("<meta name=\"csrf-token\"", "<meta name=\"csrf-header\" content=\"X-CSRF-TOKEN\"");
        // no inline script or style on the page the CSP could not allow anyway
        assertThat(html).doesNotContainPattern("<script(?![^>]*\\bsrc=)").doesNotContainPattern("\\son[a-z]+=")
                .doesNotContain("style=\"", "<style");
    }

    @Test
    void withoutSigningInPagesLeadToSignInAndTheApiAnswers401() throws Exception {
        TestSecurityContextHolder.clearContext();
        mvc.perform(get("/")).andExpect(status().is3xxRedirection()).andExpect(redirectedUrl("/login"));
        mvc.perform(get("/sites/{id}", siteId)).andExpect(status().is3xxRedirection());
        mvc.perform(get("/api/sites")).andExpect(status().isUnauthorized());
        mvc.perform(get("/api/sites/{id}/file", siteId)).andExpect(status().isUnauthorized());
        mvc.perform(get("/css/app.css")).andExpect(status().isOk());
        mvc.perform(get("/js/plan-editor.js")).andExpect(status().isOk());
        mvc.perform(get("/login")).andExpect(status().isOk())
                .andExpect(header().string("X-Frame-Options", "DENY"));
    }
}
