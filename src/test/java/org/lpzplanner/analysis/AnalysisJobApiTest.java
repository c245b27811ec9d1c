package org.lpzplanner.analysis;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.delete;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.multipart;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.header;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.mock.web.MockMultipartFile;
import org.springframework.test.web.servlet.MockMvc;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/** Background analyses through the JSON API: queued, followed to the end, stored; bad requests refused. */
@SpringBootTest
@AutoConfigureMockMvc
class AnalysisJobApiTest {

    private static final JsonMapper JSON = JsonMapper.builder().build();

    @Autowired
    MockMvc mvc;

    @Autowired
    AnalysisRepository revisions;

    private long upload() throws Exception {
        byte[] file = Files.readAllBytes(Path.of("sample-sites/harbour-warehouse.geojson"));
        String body = mvc.perform(multipart("/api/sites").file(new MockMultipartFile("file", "harbour.geojson",
                "application/geo+json", file)).param("level", "III")).andExpect(status().isCreated())
                .andReturn().getResponse().getContentAsString();
        return JSON.readTree(body).path("id").asLong();
    }

    @Test
    void aBackgroundAnalysisIsFollowedToItsStoredRevision() throws Exception {
        long id = upload();
        int before = revisions.latest(id).map(AnalysisRevision::revision).orElse(0);
        var answer = mvc.perform(post("/api/sites/" + id + "/analyses").param("async", "true").param("level", "I"))
                .andExpect(status().isAccepted())
                .andExpect(jsonPath("$.siteId").value(id))
                .andReturn().getResponse();
        JsonNode job = JSON.readTree(answer.getContentAsString());
        assertThat(answer.getHeader("Location")).isEqualTo("/api/sites/" + id + "/analyses/jobs/" + job.path("id").asString());
        JsonNode now = job;
        for (int k = 0; k < 600 && !now.path("state").asString().equals("DONE"); k++) {
            assertThat(now.path("state").asString()).isIn("QUEUED", "RUNNING");
            assertThat(now.path("fraction").asDouble()).isBetween(0.0, 1.0);
            Thread.sleep(50);
            now = JSON.readTree(mvc.perform(get(answer.getHeader("Location"))).andExpect(status().isOk())
                    .andReturn().getResponse().getContentAsString());
        }
        assertThat(now.path("state").asString()).isEqualTo("DONE");
        assertThat(now.path("fraction").asDouble()).isEqualTo(1.0);
        AnalysisRevision stored = revisions.latest(id).orElseThrow();
        assertThat(now.path("revision").asInt()).isEqualTo(stored.revision()).isEqualTo(before + 1);
        assertThat(stored.level().name()).isEqualTo("I");
    }

    @Test
    void badSettingsAndUnknownSitesAreRefusedBeforeAnythingIsQueued() throws Exception {
        long id = upload();
        mvc.perform(post("/api/sites/" + id + "/analyses").param("async", "true").param("level", "VII"))
                .andExpect(status().isBadRequest()).andExpect(jsonPath("$.field").value("level"));
        mvc.perform(post("/api/sites/" + id + "/analyses").param("async", "true").param("radius", "-3"))
                .andExpect(status().isBadRequest()).andExpect(jsonPath("$.field").value("radius"));
        mvc.perform(post("/api/sites/987654/analyses").param("async", "true")).andExpect(status().isNotFound());
    }

    @Test
    void unknownJobsAndJobsOfAnotherSiteAreNotFound() throws Exception {
        long id = upload();
        mvc.perform(get("/api/sites/" + id + "/analyses/jobs/no-such-job")).andExpect(status().isNotFound())
                .andExpect(jsonPath("$.error").value("no analysis job no-such-job for site " + id));
        mvc.perform(delete("/api/sites/" + id + "/analyses/jobs/no-such-job")).andExpect(status().isNotFound());
        String body = mvc.perform(post("/api/sites/" + id + "/analyses").param("async", "true"))
                .andExpect(status().isAccepted()).andReturn().getResponse().getContentAsString();
        String jobId = JSON.readTree(body).path("id").asString();
        mvc.perform(get("/api/sites/" + (id + 1000) + "/analyses/jobs/" + jobId)).andExpect(status().isNotFound());
        mvc.perform(delete("/api/sites/" + (id + 1000) + "/analyses/jobs/" + jobId)).andExpect(status().isNotFound());
    }
}
