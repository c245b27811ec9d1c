package org.lpzplanner.heavywork;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.header;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.util.List;
import org.hamcrest.Matchers;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.lpzplanner.accounts.Role;
import org.lpzplanner.accounts.SignedIn;
import org.lpzplanner.analysis.AnalysisService;
import org.lpzplanner.sites.SiteService;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.RequestBuilder;

/**
 * While the instance's only place for long computations is taken, every request that computes over a
 * whole site (method checks, separation survey, down-conductor layout, bill of quantities, the design
 * page, the section page and the printed report) is answered 429 with Retry-After, as a problem
 * detail from the API and as a page from the pages, for a designer and a reviewer alike; once the
 * place is free the same requests are answered.
 */
@SpringBootTest(properties = {"lpz.analysis.concurrent=1", "lpz.analysis.wait-seconds=0",
        "lpz.analysis.retry-after-seconds=7"})
@AutoConfigureMockMvc
@SignedIn
class HeavyWorkBusyAnswersTest {

    @Autowired
    MockMvc mvc;
    @Autowired
    HeavyWorkCapacity capacity;
    @Autowired
    SiteService sites;
    @Autowired
    AnalysisService analyses;

    private HeldPlace held;

    @AfterEach
    void freeThePlace() throws InterruptedException {
        if (held != null) {
            held.close();
            held = null;
        }
    }

    @Test
    void everyHeavyRequestOfADesignerFindingThePlaceTakenIs429WithRetryAfter() throws Exception {
        long id = analysedSite("Busy design yard");
        takeTheOnlyPlace();
        for (String api : List.of("/api/sites/{id}/method-checks", "/api/sites/{id}/separation-distances",
                "/api/sites/{id}/down-conductors", "/api/sites/{id}/quantities", "/api/sites/{id}/quantities.csv",
                "/api/sites/{id}/revisions/1/report")) {
            mvc.perform(get(api, id)).andExpect(status().isTooManyRequests())
                    .andExpect(header().string("Retry-After", "7"))
                    .andExpect(jsonPath("$.error").value(Matchers.containsString("busy")))
                    .andExpect(jsonPath("$.retryAfterSeconds").value(7));
        }
        for (String page : List.of("/sites/{id}/design", "/sites/{id}/section")) {
            mvc.perform(get(page, id)).andExpect(status().isTooManyRequests())
                    .andExpect(header().string("Retry-After", "7"))
                    .andExpect(org.springframework.test.web.servlet.result.MockMvcResultMatchers.content()
                            .string(Matchers.containsString("try again in 7 s")));
        }
        freeThePlace();
        for (String path : List.of("/api/sites/{id}/method-checks", "/api/sites/{id}/separation-distances",
                "/api/sites/{id}/down-conductors", "/api/sites/{id}/quantities", "/api/sites/{id}/revisions/1/report",
                "/sites/{id}/design", "/sites/{id}/section")) {
            mvc.perform(get(path, id)).andExpect(status().isOk());
        }
    }

    @Test
    @SignedIn(role = Role.REVIEWER)
    void aReviewerFindingThePlaceTakenIsAnswered429Too() throws Exception {
        long id = analysedSite("Busy review yard");
        takeTheOnlyPlace();
        expectBusy(get("/api/sites/{id}/method-checks", id));
        expectBusy(get("/api/sites/{id}/revisions/1/report", id));
        expectBusy(get("/sites/{id}/section", id));
        expectBusy(get("/sites/{id}/design", id));
    }

    private void expectBusy(RequestBuilder request) throws Exception {
        mvc.perform(request).andExpect(status().isTooManyRequests()).andExpect(header().string("Retry-After", "7"));
    }

    private long analysedSite(String name) {
        long id = sites.create("yard.wkt", "POLYGON ((0 0, 12 0, 12 8, 0 8, 0 0)) 6".getBytes(), name, null, null).id();
        analyses.run(id, "", "", "");
        return id;
    }

    /** Takes the instance's only place on another thread until the test ends. */
    private void takeTheOnlyPlace() throws InterruptedException {
        held = HeldPlace.take(capacity);
    }
}
