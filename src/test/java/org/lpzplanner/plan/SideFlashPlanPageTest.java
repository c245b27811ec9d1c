package org.lpzplanner.plan;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.nio.charset.StandardCharsets;
import org.junit.jupiter.api.Test;
import org.lpzplanner.accounts.SignedIn;
import org.lpzplanner.analysis.AnalysisService;
import org.lpzplanner.sites.SiteService;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.test.web.servlet.MockMvc;

/**
 * The plan page and the review API of a 50 m tower at level I (R = 20 m, IEC 62305-3:2010 Table 2):
 * the sphere touches its walls from 20 m up (closed form 4 of the sphere geometry),
 * but on a structure lower than 60 m flashes to the side are negligible (IEC 62305-3:2010 5.2.3 and
 * Annex A), so its bands are not review items and the page says why.
 */
@SpringBootTest
@AutoConfigureMockMvc
@SignedIn
class SideFlashPlanPageTest {

    @Autowired
    MockMvc mvc;

    @Autowired
    SiteService sites;

    @Autowired
    AnalysisService analyses;

    private long tower(double height) {
        long id = sites.create("tower.wkt", ("POLYGON ((0 0, 10 0, 10 10, 0 10, 0 0)) " + height + "\n")
                .getBytes(StandardCharsets.UTF_8), "Tower " + height, "I", null).id();
        analyses.run(id, null, null, null);
        return id;
    }

    @Test
    void aFiftyMetreTowersBandsAreNotInTheReviewListAndThePageStatesTheRule() throws Exception {
        long id = tower(50);
        var response = mvc.perform(get("/sites/" + id)).andExpect(status().isOk()).andReturn().getResponse();
        String html = response.getContentAsString(StandardCharsets.UTF_8);

        assertThat(html).doesNotContain("data-item-key=\"facade-band-");
        int at = html.indexOf("id=\"negligible-bands\"");
        assertThat(at).isPositive();
        assertThat(html.substring(at, html.indexOf("</p>", at))).contains("4 facade band")
                .contains("IEC 62305-3:2010 5.2.3").contains("lower than 60 m");
        // 0 bands needing lateral air-termination in the revision's count
        assertThat(analyses.latest(id).orElseThrow().facadeBands()).isZero();
    }

    @Test
    void theReviewApiCountsNegligibleBandsApartFromItsItems() throws Exception {
        long id = tower(50);
        mvc.perform(get("/api/sites/" + id + "/analyses/latest/items")).andExpect(status().isOk())
                .andExpect(jsonPath("$.negligibleFacadeBands").value(4))
                .andExpect(jsonPath("$.items[?(@.kind == 'facade-band')]").isEmpty());
    }
}
