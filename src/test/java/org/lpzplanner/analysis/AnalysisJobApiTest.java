package org.lpzplanner.analysis;

import org.lpzplanner.sites.SampleFiles;
import org.lpzplanner.sites.Uploads;
import org.lpzplanner.accounts.SignedIn;
import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.delete;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.multipart;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.header;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

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
@SignedIn
class AnalysisJobApiTest {

    private static final JsonMapper JSON = JsonMapper.builder().build();

    @Autowired
    MockMvc mvc;

    @Autowired
    AnalysisRepository revisions;

    @Autowired
    org.springframework.jdbc.core.simple.JdbcClient jdbc;

    private long upload() throws Exception {
        return Uploads.throughApi(mvc, SampleFiles.sample("harbour-warehouse.geojson"), "III");
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

    /**
     * Two sheds 12 km apart east and north at 0.5 m resolution would need a grid of some 6e8 cells, far beyond
     * what an analysis may use: refused before anything is queued or computed, naming the
     * resolution and one that fits, in the background as in the foreground.
     */
    @Test
    void anAnalysisTooLargeIsRefusedBeforeItIsQueued() throws Exception {
        String far = """
                {"type": "FeatureCollection", "name": "Far sheds", "coordinates": "local-metres", "features": [
                  {"type": "Feature", "properties": {"kind": "structure", "name": "West shed", "height": 5},
                   "geometry": {"type": "Polygon", "coordinates": [[[0, 0], [10, 0], [10, 8], [0, 8], [0, 0]]]}},
                  {"type": "Feature", "properties": {"kind": "structure", "name": "East shed", "height": 5},
                   "geometry": {"type": "Polygon", "coordinates": [[[12000, 12000], [12010, 12000], [12010, 12008], [12000, 12008], [12000, 12000]]]}}
                ]}""";
        String body = mvc.perform(multipart("/api/sites").file(new MockMultipartFile("file", "far.geojson",
                "application/geo+json", far.getBytes(java.nio.charset.StandardCharsets.UTF_8))))
                .andReturn().getResponse().getContentAsString();
        long id = JSON.readTree(body).path("id").asLong();
        for (String async : new String[] {"true", "false"}) {
            String answer = mvc.perform(post("/api/sites/" + id + "/analyses").param("async", async)
                            .param("resolution", "0.5"))
                    .andExpect(status().isBadRequest()).andExpect(jsonPath("$.field").value("resolution"))
                    .andReturn().getResponse().getContentAsString();
            JsonNode error = JSON.readTree(answer);
            assertThat(error.path("error").asString()).contains("cells").contains("coarser");
            // the suggested resolution fits: (12,008 m + 2 R + margins)^2 / h^2 <= 12 million cells
            assertThat(error.path("suggestedResolution").asDouble()).isGreaterThan(12_000 / Math.sqrt(12e6));
        }
        assertThat(jdbc.sql("SELECT COUNT(*) FROM background_jobs WHERE site_id = ?").param(id).query(Long.class)
                .single()).as("nothing was queued").isZero();
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
