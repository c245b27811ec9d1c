package org.lpzplanner.plan;

import static org.assertj.core.api.Assertions.assertThat;
import static org.hamcrest.Matchers.containsString;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.delete;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.patch;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.nio.charset.StandardCharsets;
import org.junit.jupiter.api.Test;
import org.lpzplanner.sites.Uploads;
import org.lpzplanner.accounts.SignedIn;
import org.lpzplanner.analysis.AnalysisRepository;
import org.lpzplanner.sites.SampleFiles;
import org.lpzplanner.sites.SiteService;
import org.lpzplanner.sites.StoredSite;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.MediaType;
import org.springframework.mock.web.MockMultipartFile;
import org.springframework.test.web.servlet.MockMvc;
import tools.jackson.databind.json.JsonMapper;

@SpringBootTest
@AutoConfigureMockMvc
@SignedIn
class SiteChangesApiTest {

    private static final JsonMapper JSON = JsonMapper.builder().build();

    @Autowired
    MockMvc mvc;

    @Autowired
    SiteService sites;

    @Autowired
    AnalysisRepository analyses;

    private long upload(MockMultipartFile file) throws Exception {
        return Uploads.throughApi(mvc, file, "II");
    }

    private static String body(String json) {
        return json.replace('\'', '"');
    }

    @Test
    void patchChangesNameLevelAndRadiusAndRaisesTheVersion() throws Exception {
        long id = upload(SampleFiles.sample("harbour-warehouse.geojson"));
        long version = sites.get(id).version();

        mvc.perform(patch("/api/sites/" + id).contentType(MediaType.APPLICATION_JSON)
                        .content(body("{'version': " + version + ", 'name': 'Quay shed <north>', 'level': 'III',"
                                + " 'radius': 46}")))
                .andExpect(status().isOk())
                .andExpect(jsonPath("$.name").value("Quay shed <north>"))
                .andExpect(jsonPath("$.level").value("III"))
                .andExpect(jsonPath("$.customRadius").value(46.0))
                .andExpect(jsonPath("$.version").value(version + 1));
        StoredSite stored = sites.get(id);
        assertThat(stored.name()).isEqualTo("Quay shed <north>");
        assertThat(stored.customRadius()).isEqualTo(46.0);

        mvc.perform(patch("/api/sites/" + id).contentType(MediaType.APPLICATION_JSON)
                        .content(body("{'version': " + (version + 1) + ", 'radius': null}")))
                .andExpect(status().isOk())
                .andExpect(jsonPath("$.name").value("Quay shed <north>"))
                .andExpect(jsonPath("$.customRadius").doesNotExist());
    }

    @Test
    void patchWithAStaleVersionAnswers409AndChangesNothing() throws Exception {
        long id = upload(SampleFiles.sample("harbour-warehouse.geojson"));
        StoredSite before = sites.get(id);

        mvc.perform(patch("/api/sites/" + id).contentType(MediaType.APPLICATION_JSON)
                        .content(body("{'version': " + (before.version() + 5) + ", 'name': 'Late rename'}")))
                .andExpect(status().isConflict())
                .andExpect(jsonPath("$.error").value(containsString("changed or removed meanwhile")));
        assertThat(sites.get(id)).isEqualTo(before);
    }

    @Test
    void patchWithoutVersionOrWithBadValuesAnswers400AndChangesNothing() throws Exception {
        long id = upload(SampleFiles.sample("harbour-warehouse.geojson"));
        StoredSite before = sites.get(id);

        mvc.perform(patch("/api/sites/" + id).contentType(MediaType.APPLICATION_JSON)
                        .content(body("{'name': 'No version'}")))
                .andExpect(status().isBadRequest()).andExpect(jsonPath("$.field").value("version"));
        mvc.perform(patch("/api/sites/" + id).contentType(MediaType.APPLICATION_JSON)
                        .content(body("{'version': " + before.version() + ", 'name': '   '}")))
                .andExpect(status().isBadRequest()).andExpect(jsonPath("$.field").value("name"));
        mvc.perform(patch("/api/sites/" + id).contentType(MediaType.APPLICATION_JSON)
                        .content(body("{'version': " + before.version() + ", 'level': 'V'}")))
                .andExpect(status().isBadRequest()).andExpect(jsonPath("$.field").value("level"));
        mvc.perform(patch("/api/sites/" + id).contentType(MediaType.APPLICATION_JSON)
                        .content(body("{'version': " + before.version() + ", 'radius': -4}")))
                .andExpect(status().isBadRequest()).andExpect(jsonPath("$.field").value("radius"));
        assertThat(sites.get(id)).isEqualTo(before);
    }

    @Test
    void patchAndDuplicateOfAnUnknownSiteAnswer404() throws Exception {
        mvc.perform(patch("/api/sites/919191").contentType(MediaType.APPLICATION_JSON)
                        .content(body("{'version': 0, 'name': 'Nobody'}")))
                .andExpect(status().isNotFound())
                .andExpect(jsonPath("$.error").value(containsString("919191")));
        mvc.perform(post("/api/sites/919191/duplicate")).andExpect(status().isNotFound());
        mvc.perform(get("/api/sites/919191/file/versions")).andExpect(status().isNotFound());
    }

    @Test
    void deleteWithAStaleVersionAnswers409AndKeepsTheSite() throws Exception {
        long id = upload(SampleFiles.sample("harbour-warehouse.geojson"));
        StoredSite before = sites.get(id);

        mvc.perform(delete("/api/sites/" + id).param("version", String.valueOf(before.version() + 1)))
                .andExpect(status().isConflict());
        assertThat(sites.get(id)).isEqualTo(before);

        mvc.perform(delete("/api/sites/" + id).param("version", String.valueOf(before.version())))
                .andExpect(status().isNoContent());
        mvc.perform(get("/api/sites/" + id)).andExpect(status().isNotFound());
    }

    @Test
    void duplicateKeepsTheFileBytesAndSettingsButNotTheAnalyses() throws Exception {
        byte[] original = "\uFEFF# sheds\r\nPOLYGON ((0 0, 10 0, 10 8, 0 8, 0 0)) 6\r\n".getBytes(StandardCharsets.UTF_8);
        long id = upload(new MockMultipartFile("file", "sheds.wkt", "text/plain", original));
        StoredSite site = sites.update(id, sites.get(id).version(), "Sheds", "III", "40");
        mvc.perform(post("/api/sites/" + id + "/analyses")).andExpect(status().isCreated());

        String answer = mvc.perform(post("/api/sites/" + id + "/duplicate"))
                .andExpect(status().isCreated())
                .andExpect(jsonPath("$.name").value("Sheds (copy)"))
                .andExpect(jsonPath("$.level").value("III"))
                .andExpect(jsonPath("$.customRadius").value(40.0))
                .andExpect(jsonPath("$.fileName").value("sheds.wkt"))
                .andExpect(jsonPath("$.latest").doesNotExist())
                .andReturn().getResponse().getContentAsString();
        long copy = JSON.readTree(answer).path("id").asLong();

        assertThat(copy).isNotEqualTo(id);
        byte[] copied = mvc.perform(get("/api/sites/" + copy + "/file")).andExpect(status().isOk())
                .andReturn().getResponse().getContentAsByteArray();
        assertThat(copied).isEqualTo(original);
        assertThat(analyses.count(copy)).isZero();
        // the upload's analysis and the one asked for
        assertThat(analyses.count(id)).isEqualTo(2);
        assertThat(sites.get(id)).usingRecursiveComparison().ignoringFields("version", "updatedAt")
                .isEqualTo(site);
    }
}
