package org.lpzplanner.plan;

import static org.assertj.core.api.Assertions.assertThat;
import static org.hamcrest.Matchers.containsString;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.delete;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.multipart;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.header;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.lpzplanner.accounts.SignedIn;
import org.lpzplanner.sites.SampleFiles;
import org.lpzplanner.sites.SiteService;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.mock.web.MockMultipartFile;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.MvcResult;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

@SpringBootTest
@AutoConfigureMockMvc
@SignedIn
class SiteApiTest {

    static final Path SAMPLES = Path.of("sample-sites");
    private static final JsonMapper JSON = JsonMapper.builder().build();

    @Autowired
    MockMvc mvc;

    @Autowired
    SiteService sites;


    long upload(MockMultipartFile file, String... params) throws Exception {
        var request = multipart("/api/sites").file(file);
        for (int i = 0; i + 1 < params.length; i += 2) {
            request.param(params[i], params[i + 1]);
        }
        MvcResult result = mvc.perform(request).andExpect(status().isCreated()).andReturn();
        return JSON.readTree(result.getResponse().getContentAsString()).path("id").asLong();
    }

    @Test
    void uploadedLocalMetresSiteIsStoredAndListed() throws Exception {
        long id = upload(SampleFiles.sample("harbour-warehouse.geojson"), "name", "Quay shed", "level", "III");

        mvc.perform(get("/api/sites/" + id)).andExpect(status().isOk())
                .andExpect(jsonPath("$.name").value("Quay shed"))
                .andExpect(jsonPath("$.level").value("III"))
                .andExpect(jsonPath("$.fileName").value("harbour-warehouse.geojson"))
                // analysed at once, like an upload through the page
                .andExpect(jsonPath("$.latest.revision").value(1))
                .andExpect(jsonPath("$.latest.level").value("III"));
        mvc.perform(get("/api/sites")).andExpect(status().isOk())
                .andExpect(jsonPath("$[?(@.id == " + id + ")].name").value("Quay shed"));
    }

    @Test
    void uploadedLonLatSiteTakesItsNameFromTheFile() throws Exception {
        long id = upload(SampleFiles.sample("millbrook-hall.geojson"));

        String name = sites.document(sites.get(id)).site().name();
        mvc.perform(get("/api/sites/" + id)).andExpect(status().isOk())
                .andExpect(jsonPath("$.name").value(name))
                .andExpect(jsonPath("$.level").value("II"));
    }

    @Test
    void downloadReturnsTheUploadedBytesUnderTheOriginalName() throws Exception {
        byte[] original = "\uFEFF# sheds\r\nPOLYGON ((0 0, 10 0, 10 8, 0 8, 0 0)) 6\r\n".getBytes(StandardCharsets.UTF_8);
        long id = upload(new MockMultipartFile("file", "sheds.wkt", "text/plain", original));

        MvcResult result = mvc.perform(get("/api/sites/" + id + "/file")).andExpect(status().isOk())
                .andExpect(header().string("Content-Disposition", containsString("sheds.wkt")))
                .andReturn();
        assertThat(result.getResponse().getContentAsByteArray()).isEqualTo(original);
    }

    @Test
    void analysisRunStoresARevisionThatLatestReturnsWithCautions() throws Exception {
        long id = upload(SampleFiles.sample("harbour-warehouse.geojson"));

        // revision 1 is the upload's own analysis
        mvc.perform(post("/api/sites/" + id + "/analyses").param("level", "II"))
                .andExpect(status().isCreated())
                .andExpect(jsonPath("$.summary.revision").value(2))
                .andExpect(jsonPath("$.summary.level").value("II"))
                .andExpect(jsonPath("$.summary.radius").value(30.0));
        MvcResult latest = mvc.perform(get("/api/sites/" + id + "/analyses/latest")).andExpect(status().isOk())
                .andExpect(jsonPath("$.summary.revision").value(2))
                .andExpect(jsonPath("$.summary.method").value("rolling sphere method"))
                .andExpect(jsonPath("$.result.type").value("FeatureCollection"))
                .andExpect(jsonPath("$.cautions.length()").value(5))
                .andReturn();
        JsonNode body = JSON.readTree(latest.getResponse().getContentAsString());
        assertThat(body.path("summary").path("exposedRoofArea").asDouble()).isPositive();
        assertThat(body.path("summary").path("inputsSha256").asString()).hasSize(64);
        mvc.perform(get("/api/sites/" + id)).andExpect(jsonPath("$.latest.revision").value(2));
    }

    @Test
    void secondAnalysisGetsTheNextRevisionAndACustomRadius() throws Exception {
        long id = upload(SampleFiles.sample("courtyard-block.wkt"));
        mvc.perform(post("/api/sites/" + id + "/analyses")).andExpect(status().isCreated());

        mvc.perform(post("/api/sites/" + id + "/analyses").param("level", "IV").param("radius", "46"))
                .andExpect(status().isCreated())
                .andExpect(jsonPath("$.summary.revision").value(3))
                .andExpect(jsonPath("$.summary.radius").value(46.0));
    }

    @Test
    void malformedJsonIsRejectedWithTheProblemAndNothingIsStored() throws Exception {
        long before = sites.count();
        MockMultipartFile broken = new MockMultipartFile("file", "broken.geojson", "application/json",
                "{\"type\": \"FeatureCollection\", \"features\": [".getBytes(StandardCharsets.UTF_8));

        mvc.perform(multipart("/api/sites").file(broken)).andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.error", containsString("broken.geojson")))
                .andExpect(jsonPath("$.file").value("broken.geojson"));
        assertThat(sites.count()).isEqualTo(before);
    }

    @Test
    void invalidFeatureIsNamedWithItsField() throws Exception {
        long before = sites.count();
        String text = "{\"type\":\"FeatureCollection\",\"coordinates\":\"local-metres\",\"features\":[{\"type\":\"Feature\","
                + "\"properties\":{\"kind\":\"structure\",\"name\":\"Barn\",\"height\":\"abc\"},"
                + "\"geometry\":{\"type\":\"Polygon\",\"coordinates\":[[[0,0],[10,0],[10,10],[0,10],[0,0]]]}}]}";

        mvc.perform(multipart("/api/sites").file(new MockMultipartFile("file", "barn.geojson", "application/json",
                        text.getBytes(StandardCharsets.UTF_8))))
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.feature").value(0))
                .andExpect(jsonPath("$.featureName").value("Barn"))
                .andExpect(jsonPath("$.field").value("height"));
        assertThat(sites.count()).isEqualTo(before);
    }

    @Test
    void unknownSiteAnswers404WithAMessage() throws Exception {
        mvc.perform(get("/api/sites/987654")).andExpect(status().isNotFound())
                .andExpect(jsonPath("$.error").value("no site with id 987654 is stored"));
        mvc.perform(post("/api/sites/987654/analyses")).andExpect(status().isNotFound());
        mvc.perform(get("/api/sites/987654/file")).andExpect(status().isNotFound());
        mvc.perform(delete("/api/sites/987654")).andExpect(status().isNotFound());
    }

    @Test
    void badLevelAnswers400WithTheReasonAndNothingIsStored() throws Exception {
        long before = sites.count();
        mvc.perform(multipart("/api/sites").file(SampleFiles.sample("harbour-warehouse.geojson")).param("level", "V"))
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.error", containsString("level must be I, II, III or IV")));
        assertThat(sites.count()).isEqualTo(before);

        long id = upload(SampleFiles.sample("harbour-warehouse.geojson"));
        mvc.perform(post("/api/sites/" + id + "/analyses").param("level", "V")).andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.field").value("level"));
        mvc.perform(post("/api/sites/" + id + "/analyses").param("resolution", "0")).andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.error", containsString("resolution must be between")));
        mvc.perform(post("/api/sites/" + id + "/analyses").param("radius", "abc")).andExpect(status().isBadRequest());
    }

    @Test
    void nonNumericIdAndMissingFileAnswer400() throws Exception {
        mvc.perform(get("/api/sites/abc")).andExpect(status().isBadRequest()).andExpect(jsonPath("$.error").exists());
        mvc.perform(multipart("/api/sites")).andExpect(status().isBadRequest()).andExpect(jsonPath("$.error").exists());
    }

    @Test
    void deletedSiteIsGone() throws Exception {
        long id = upload(SampleFiles.sample("courtyard-block.wkt"));
        mvc.perform(post("/api/sites/" + id + "/analyses")).andExpect(status().isCreated());

        mvc.perform(delete("/api/sites/" + id)).andExpect(status().isNoContent());
        mvc.perform(get("/api/sites/" + id)).andExpect(status().isNotFound());
    }

    @Test
    void analysisTooLargeForItsResolutionIsRefusedWithASuggestion() throws Exception {
        // two small sheds 6 km apart: at 0.5 m the grid would hold about 150 million cells
        String site = "{\"type\":\"FeatureCollection\",\"coordinates\":\"local-metres\",\"features\":["
                + "{\"type\":\"Feature\",\"properties\":{\"kind\":\"structure\",\"height\":5},"
                + "\"geometry\":{\"type\":\"Polygon\",\"coordinates\":[[[0,0],[10,0],[10,10],[0,10],[0,0]]]}},"
                + "{\"type\":\"Feature\",\"properties\":{\"kind\":\"structure\",\"height\":5},"
                + "\"geometry\":{\"type\":\"Polygon\",\"coordinates\":[[[6000,6000],[6010,6000],[6010,6010],[6000,6010],[6000,6000]]]}}]}";
        long id = upload(new MockMultipartFile("file", "far-apart.geojson", "application/geo+json",
                site.getBytes(java.nio.charset.StandardCharsets.UTF_8)));

        mvc.perform(post("/api/sites/" + id + "/analyses").param("resolution", "0.5"))
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.field").value("resolution"))
                .andExpect(jsonPath("$.error").value(org.hamcrest.Matchers.containsString("choose a resolution")))
                .andExpect(jsonPath("$.suggestedResolution").isNumber());
        // nothing stored: the latest revision is still the upload's own, at the resolution the engine chose
        mvc.perform(get("/api/sites/" + id + "/analyses/latest")).andExpect(status().isOk())
                .andExpect(jsonPath("$.summary.revision").value(1));
    }
}
