package org.lpzplanner.plan;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.multipart;

import java.util.List;
import java.util.Random;
import java.util.stream.LongStream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.lpzplanner.accounts.SignedIn;
import org.lpzplanner.engine.io.BadSiteFiles;
import org.lpzplanner.sites.SiteService;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.mock.web.MockMultipartFile;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.MvcResult;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * Generated bad site files through the upload API and the upload form: every one gets a 4xx with a
 * message naming the feature and field at fault, and the stored sites are exactly as before. Replay
 * one seed with {@code -Dlpz.seed=N}.
 */
@SpringBootTest
@AutoConfigureMockMvc
@SignedIn
class UploadFuzzProperties {

    private static final int FILES_PER_SEED = 1000;
    private static final JsonMapper JSON = JsonMapper.builder().build();

    @Autowired
    MockMvc mvc;
    @Autowired
    SiteService sites;

    static LongStream seeds() {
        String replay = System.getProperty("lpz.seed");
        if (replay != null && !replay.isBlank()) {
            return LongStream.of(Long.parseLong(replay.trim()));
        }
        return LongStream.of(20_260_201L, 20_260_202L);
    }

    private record Snapshot(long id, long version, String text) {
    }

    private List<Snapshot> snapshot() {
        return sites.list().stream().map(s -> new Snapshot(s.id(), s.version(), s.sourceText())).toList();
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void everyBadUploadIsAnswered4xxNamingFeatureAndFieldAndStoresNothing(long seed) throws Exception {
        sites.create("kept.wkt", "POLYGON ((0 0, 10 0, 10 10, 0 10, 0 0)) 6".getBytes(), "Kept", null, null);
        List<Snapshot> before = snapshot();
        Random random = new Random(seed);
        for (int i = 0; i < FILES_PER_SEED; i++) {
            BadSiteFiles.Case c = BadSiteFiles.generate(random);
            String label = "seed " + seed + " file " + i + " (" + c.description() + ")";
            MockMultipartFile file = new MockMultipartFile("file", "fuzz.geojson", "application/geo+json", c.content());
            if (i % 10 == 0) {
                MvcResult page = mvc.perform(multipart("/sites").file(file)).andReturn();
                assertThat(page.getResponse().getStatus()).as(label).isEqualTo(400);
                assertThat(page.getResponse().getContentAsString()).as(label).contains("id=\"upload-error\"")
                        .doesNotContain("Exception");
                continue;
            }
            MvcResult result = mvc.perform(multipart("/api/sites").file(file)).andReturn();
            int status = result.getResponse().getStatus();
            String body = result.getResponse().getContentAsString();
            assertThat(status).as(label + ": " + body).isBetween(400, 499);
            JsonNode error = JSON.readTree(body);
            assertThat(error.path("error").asString()).as(label).contains("fuzz.geojson");
            if (c.feature() >= 0) {
                assertThat(error.path("feature").asInt(-1)).as(label + ": " + body).isEqualTo(c.feature());
            }
            if (c.field() != null) {
                assertThat(error.path("field").asString()).as(label + ": " + body).isEqualTo(c.field());
            }
        }
        assertThat(snapshot()).isEqualTo(before);
    }
}
