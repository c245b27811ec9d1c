package org.lpzplanner.analysis;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.multipart;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.header;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import org.junit.jupiter.api.Test;
import org.lpzplanner.heavywork.HeldPlace;
import org.lpzplanner.accounts.SignedIn;
import org.lpzplanner.heavywork.HeavyWorkCapacity;
import org.lpzplanner.sites.SiteService;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.mock.web.MockMultipartFile;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.test.web.servlet.MockMvc;

/**
 * While every analysis place of the instance is taken, an analysis asked for through the API is
 * answered 429 with Retry-After and a JSON reason, one asked for through the page form 429 with
 * Retry-After and a page; the same for an import, whose revisions are analysed again. Nothing is
 * stored, and the next request after the place is free succeeds.
 */
@SpringBootTest(properties = {"lpz.analysis.concurrent=1", "lpz.analysis.wait-seconds=0",
        "lpz.analysis.retry-after-seconds=7"})
@AutoConfigureMockMvc
@SignedIn
class BusyAnswersTest {

    @Autowired
    MockMvc mvc;
    @Autowired
    HeavyWorkCapacity capacity;
    @Autowired
    SiteService sites;
    @Autowired
    AnalysisRepository revisions;

    @Test
    void aFullInstanceAnswers429WithRetryAfterAndStoresNothing() throws Exception {
        long id = sites.create("yard.wkt", "POLYGON ((0 0, 12 0, 12 8, 0 8, 0 0)) 6".getBytes(), "Busy yard", null,
                null).id();
        try (HeldPlace held = HeldPlace.take(capacity)) {
            mvc.perform(post("/api/sites/{id}/analyses", id)).andExpect(status().isTooManyRequests())
                    .andExpect(header().string("Retry-After", "7"))
                    .andExpect(jsonPath("$.error").value(org.hamcrest.Matchers.containsString("busy")));
            mvc.perform(post("/sites/{id}/analyses", id)).andExpect(status().isTooManyRequests())
                    .andExpect(header().string("Retry-After", "7"));
            assertThat(revisions.latest(id)).isEmpty();
        }
        mvc.perform(post("/api/sites/{id}/analyses", id)).andExpect(status().isCreated());
        mvc.perform(get("/api/sites/{id}/analyses/latest", id)).andExpect(status().isOk());
    }

    @Test
    void anImportWhoseRevisionsFindTheInstanceFullAnswers429WithRetryAfterAndStoresNothing() throws Exception {
        long id = sites.create("yard.wkt", "POLYGON ((0 0, 12 0, 12 8, 0 8, 0 0)) 6".getBytes(), "Busy import", null,
                null).id();
        mvc.perform(post("/api/sites/{id}/analyses", id)).andExpect(status().isCreated());
        byte[] export = mvc.perform(get("/api/sites/{id}/export", id)).andExpect(status().isOk()).andReturn()
                .getResponse().getContentAsByteArray();
        long stored = sites.list().size();
        try (HeldPlace held = HeldPlace.take(capacity)) {
            mvc.perform(multipart("/api/sites/import").file(new MockMultipartFile("file", "yard.site-export.json",
                            "application/json", export)))
                    .andExpect(status().isTooManyRequests()).andExpect(header().string("Retry-After", "7"))
                    .andExpect(jsonPath("$.error").value(org.hamcrest.Matchers.containsString("busy")));
            mvc.perform(multipart("/sites/import").file(new MockMultipartFile("file", "yard.site-export.json",
                            "application/json", export)))
                    .andExpect(status().isTooManyRequests()).andExpect(header().string("Retry-After", "7"));
            assertThat(sites.list()).hasSize((int) stored);
        }
        mvc.perform(multipart("/api/sites/import").file(new MockMultipartFile("file", "yard.site-export.json",
                "application/json", export))).andExpect(status().isCreated());
    }
}
