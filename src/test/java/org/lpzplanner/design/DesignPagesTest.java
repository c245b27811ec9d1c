package org.lpzplanner.design;

import static org.assertj.core.api.Assertions.assertThat;
import static org.hamcrest.Matchers.containsString;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.flash;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.redirectedUrl;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.lpzplanner.analysis.AnalysisService;
import org.lpzplanner.sites.SiteService;
import org.lpzplanner.sites.StoredSite;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.test.web.servlet.MockMvc;

/** The design page shows every section with the cautions; its forms refuse bad input with a message. */
@SpringBootTest
@AutoConfigureMockMvc
@org.lpzplanner.accounts.SignedIn
class DesignPagesTest {

    @Autowired
    MockMvc mvc;

    @Autowired
    SiteService sites;

    @Autowired
    AnalysisService analyses;

    private long site() throws Exception {
        StoredSite site = sites.create("courtyard-block.wkt", Files.readAllBytes(Path.of("sample-sites/courtyard-block.wkt")),
                "Courtyard test", "II", null);
        analyses.run(site.id(), null, null, null);
        return site.id();
    }

    @Test
    void pageShowsProposalChecksDownConductorsSeparationQuantitiesAndCautions() throws Exception {
        long id = site();
        String html = mvc.perform(get("/sites/" + id + "/design")).andExpect(status().isOk()).andReturn().getResponse()
                .getContentAsString();
        assertThat(html).contains("id=\"propose-form\"", "id=\"method-check-table\"", "id=\"down-conductor-table\"",
                "id=\"separation\"", "id=\"quantity-table\"", "class=\"cautions\"", "/js/design-page.js",
                "quantities.csv");
        // WKT files cannot hold rods: the page says so and the accept button is disabled
        assertThat(html).contains("cannot hold rods");
        mvc.perform(get("/sites/" + id)).andExpect(content().string(containsString("/sites/" + id + "/design")));
        mvc.perform(get("/sites/987654/design")).andExpect(status().isNotFound());
    }

    @Test
    void badDownConductorTextAndInstallationsComeBackAsMessages() throws Exception {
        long id = site();
        mvc.perform(post("/sites/" + id + "/design/down-conductors/S1").param("positions", "1, 2, 3"))
                .andExpect(redirectedUrl("/sites/" + id + "/design#down-conductors"))
                .andExpect(flash().attribute("downError", containsString("line 1")));
        mvc.perform(post("/sites/" + id + "/design/installations").param("name", "Rail").param("x", "a")
                        .param("y", "1").param("z", "1"))
                .andExpect(flash().attribute("installationError", containsString("x must be a number")));
    }
}
