package org.lpzplanner.heavywork;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.header;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import org.hamcrest.Matchers;
import org.junit.jupiter.api.Test;
import org.lpzplanner.accounts.SignedIn;
import org.lpzplanner.analysis.AnalysisRepository;
import org.lpzplanner.sites.SiteService;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.test.web.servlet.MockMvc;

/**
 * With a time budget of 0 s every long computation has run out of time at its first check: the API
 * answers 503 with Retry-After and a problem detail naming the budget, the pages a 503 page saying
 * so, and nothing is stored.
 */
@SpringBootTest(properties = {"lpz.heavy.budget-seconds=0", "lpz.analysis.retry-after-seconds=11"})
@AutoConfigureMockMvc
@SignedIn
class HeavyWorkBudgetAnswersTest {

    @Autowired
    MockMvc mvc;
    @Autowired
    SiteService sites;
    @Autowired
    AnalysisRepository revisions;

    @Test
    void computationsPastTheirBudgetAreStoppedAndAnswered503NamingTheBudget() throws Exception {
        long id = sites.create("yard.wkt", "POLYGON ((0 0, 12 0, 12 8, 0 8, 0 0)) 6".getBytes(), "Slow yard", null,
                null).id();
        mvc.perform(get("/api/sites/{id}/method-checks", id)).andExpect(status().isServiceUnavailable())
                .andExpect(header().string("Retry-After", "11"))
                .andExpect(jsonPath("$.type").value("urn:lpz-planner:problem:over-budget"))
                .andExpect(jsonPath("$.retryAfterSeconds").value(11))
                .andExpect(jsonPath("$.error").value(Matchers.allOf(Matchers.containsString("method check"),
                        Matchers.containsString("time budget of 0 s"))));
        mvc.perform(post("/api/sites/{id}/analyses", id)).andExpect(status().isServiceUnavailable())
                .andExpect(header().string("Retry-After", "11"))
                .andExpect(jsonPath("$.error").value(Matchers.containsString("time budget of 0 s")));
        assertThat(revisions.latest(id)).isEmpty();
        // the section's envelope has no hook: it is computed, then its answer is the 503
        mvc.perform(get("/sites/{id}/section", id)).andExpect(status().isServiceUnavailable())
                .andExpect(header().string("Retry-After", "11"))
                .andExpect(content().string(Matchers.containsString("time budget of 0 s")));
        mvc.perform(get("/api/sites/{id}/separation-distances", id)).andExpect(status().isServiceUnavailable());
    }
}
