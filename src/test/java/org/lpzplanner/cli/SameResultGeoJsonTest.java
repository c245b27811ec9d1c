package org.lpzplanner.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.multipart;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.lpzplanner.accounts.SignedIn;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.mock.web.MockMultipartFile;
import org.springframework.test.web.servlet.MockMvc;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * {@code analyze --out} and the API's analysis answer are one writer's output: for the same site
 * file and level, the same features in the same coordinates (lon/lat for a lon/lat file).
 */
@SpringBootTest
@AutoConfigureMockMvc
@SignedIn
class SameResultGeoJsonTest {

    private static final JsonMapper JSON = JsonMapper.builder().build();

    @Autowired
    MockMvc mvc;

    @TempDir
    Path folder;

    private JsonNode api(String sample) throws Exception {
        MockMultipartFile file = new MockMultipartFile("file", sample, "application/octet-stream",
                Files.readAllBytes(TestFiles.SAMPLES.resolve(sample)));
        long id = JSON.readTree(mvc.perform(multipart("/api/sites").file(file).param("level", "II"))
                .andExpect(status().isCreated()).andReturn().getResponse().getContentAsString()).path("id").asLong();
        return JSON.readTree(mvc.perform(post("/api/sites/" + id + "/analyses"))
                .andExpect(status().isCreated()).andReturn().getResponse().getContentAsString()).path("result");
    }

    private JsonNode cli(String sample) throws Exception {
        Path out = folder.resolve(sample + ".result.geojson");
        CliRun run = CliRun.of("analyze", "--site", TestFiles.SAMPLES.resolve(sample).toString(), "--level", "II",
                "--out", out.toString());
        assertThat(run.exitCode()).as(run.err()).isZero();
        return JSON.readTree(Files.readString(out));
    }

    @Test
    void lonLatSiteGivesTheSameLonLatFeaturesFromTheCommandLineAndTheApi() throws Exception {
        JsonNode fromApi = api("millbrook-hall.geojson");
        JsonNode fromCli = cli("millbrook-hall.geojson");
        // RFC 7946: lon/lat needs no coordinates member; the file is in lon/lat, so are both
        assertThat(fromApi.has("coordinates")).isFalse();
        assertThat(fromCli.has("coordinates")).isFalse();
        assertThat(fromApi.path("features").size()).isPositive();
        assertThat(fromApi.path("features")).isEqualTo(fromCli.path("features"));
        assertThat(fromApi.path("localOrigin")).isEqualTo(fromCli.path("localOrigin"));
        assertThat(fromApi.path("analysis").path("summary")).isEqualTo(fromCli.path("analysis").path("summary"));
        assertThat(fromApi.path("analysis").path("cautions")).isEqualTo(fromCli.path("analysis").path("cautions"));
    }

    @Test
    void localSiteGivesTheSameLocalFeaturesSayingSo() throws Exception {
        JsonNode fromApi = api("harbour-warehouse.geojson");
        JsonNode fromCli = cli("harbour-warehouse.geojson");
        assertThat(fromApi.path("coordinates").asString()).isEqualTo("local-metres");
        assertThat(fromCli.path("coordinates").asString()).isEqualTo("local-metres");
        assertThat(fromApi.path("features")).isEqualTo(fromCli.path("features"));
    }
}
