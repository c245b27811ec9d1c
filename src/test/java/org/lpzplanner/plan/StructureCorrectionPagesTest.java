package org.lpzplanner.plan;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.multipart;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.redirectedUrl;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.redirectedUrlPattern;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import org.junit.jupiter.api.Test;
import org.lpzplanner.accounts.SignedIn;
import org.lpzplanner.analysis.AnalysisRepository;
import org.lpzplanner.analysis.AnalysisRevision;
import org.lpzplanner.engine.model.RoofShape;
import org.lpzplanner.engine.model.Structure;
import org.lpzplanner.sites.SampleFiles;
import org.lpzplanner.sites.SiteService;
import org.lpzplanner.sites.StoredSite;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.request.MockHttpServletRequestBuilder;

/** The structure table of the plan page and the correction of one structure. */
@SpringBootTest
@AutoConfigureMockMvc
@SignedIn
class StructureCorrectionPagesTest {

    @Autowired
    MockMvc mvc;

    @Autowired
    SiteService sites;

    @Autowired
    AnalysisRepository analyses;

    long uploadThroughThePage(String fileName) throws Exception {
        String location = mvc.perform(multipart("/sites").file(SampleFiles.sample(fileName)).param("level", "II"))
                .andExpect(status().is3xxRedirection()).andExpect(redirectedUrlPattern("/sites/*"))
                .andReturn().getResponse().getRedirectedUrl();
        return Long.parseLong(location.substring(location.lastIndexOf('/') + 1));
    }

    String html(MockHttpServletRequestBuilder request, int status) throws Exception {
        return mvc.perform(request).andExpect(status().is(status)).andReturn().getResponse()
                .getContentAsString(StandardCharsets.UTF_8);
    }

    MockHttpServletRequestBuilder correction(long id, int structure, String... fields) {
        MockHttpServletRequestBuilder request = post("/sites/" + id + "/structures")
                .param("structure", String.valueOf(structure))
                .param("version", String.valueOf(sites.get(id).version()));
        for (int i = 0; i + 1 < fields.length; i += 2) {
            request.param(fields[i], fields[i + 1]);
        }
        return request;
    }

    private Structure structure(long id, int index) {
        return sites.document(sites.get(id)).site().structures().get(index);
    }

    @Test
    void planPageListsEveryStructureWithAreaHeightRoofAndParapet() throws Exception {
        long id = uploadThroughThePage("harbour-warehouse.geojson");

        String page = html(get("/sites/" + id), 200);

        // the warehouse footprint is 80 m by 40 m (sample file), walls 10 m, flat roof, parapet 1 m
        assertThat(page).contains("id=\"structures\"", "<td>Warehouse</td>", "<td>3200.00</td>", "<td>10.00</td>",
                "<td>flat</td>", "<td>1.00</td>", "id=\"correction-form\"", "name=\"parapet\"", "name=\"roof\"");
    }

    @Test
    void wktSiteOffersOnlyAHeightCorrection() throws Exception {
        long id = uploadThroughThePage("courtyard-block.wkt");

        String page = html(get("/sites/" + id), 200);

        assertThat(page).contains("id=\"correction-form\"", "name=\"height\"", "only the wall-top height")
                .doesNotContain("name=\"roof\"", "name=\"parapet\"", "name=\"ridgeHeight\"");
    }

    @Test
    void raisingAStructureChangesTheExposureAndKeepsThePreviousFileRetrievable() throws Exception {
        long id = uploadThroughThePage("courtyard-block.wkt");
        String original = Files.readString(SiteApiTest.SAMPLES.resolve("courtyard-block.wkt"));
        AnalysisRevision before = analyses.latest(id).orElseThrow();

        // the 9.5 m wing beside the 14 m block is raised to 30 m, well above its neighbour
        mvc.perform(correction(id, 1, "height", "30"))
                .andExpect(status().is3xxRedirection()).andExpect(redirectedUrl("/sites/" + id));

        assertThat(structure(id, 1).height()).isEqualTo(30.0);
        String current = sites.get(id).sourceText();
        assertThat(current).isEqualTo(original.replace("40 0)); 9.5", "40 0)); 30"));
        AnalysisRevision after = analyses.latest(id).orElseThrow();
        assertThat(after.revision()).isEqualTo(before.revision() + 1);
        assertThat(after.inputsSha256()).isNotEqualTo(before.inputsSha256());
        assertThat(after.exposedEdgeLength() != before.exposedEdgeLength()
                || after.exposedRoofArea() != before.exposedRoofArea()
                || after.facadeBands() != before.facadeBands()).as("exposure changed").isTrue();

        byte[] earlier = mvc.perform(get("/api/sites/" + id + "/file/versions/1")).andExpect(status().isOk())
                .andReturn().getResponse().getContentAsByteArray();
        assertThat(earlier).isEqualTo(original.getBytes(StandardCharsets.UTF_8));
        mvc.perform(get("/api/sites/" + id + "/file/versions")).andExpect(status().isOk())
                .andExpect(jsonPath("$.length()").value(1))
                .andExpect(jsonPath("$[0].fileName").value("courtyard-block.wkt"));
        assertThat(html(get("/sites/" + id), 200)).contains("id=\"earlier-files\"",
                "/api/sites/" + id + "/file/versions/1");
        mvc.perform(get("/api/sites/" + id + "/file/versions/2")).andExpect(status().isNotFound());
    }

    @Test
    void geoJsonCorrectionStaysGeoJsonAndChangesOnlyTheGivenFields() throws Exception {
        long id = uploadThroughThePage("harbour-warehouse.geojson");
        var before = sites.document(sites.get(id)).site();

        mvc.perform(correction(id, 0, "parapet", "2.5", "height", "11"))
                .andExpect(status().is3xxRedirection());

        StoredSite site = sites.get(id);
        assertThat(site.sourceName()).isEqualTo("harbour-warehouse.geojson");
        assertThat(site.sourceText()).contains("\"FeatureCollection\"", "\"parapet\" : 2.5", "\"height\" : 11");
        var after = sites.document(site).site();
        assertThat(after.structures().get(0).roof()).isEqualTo(new RoofShape.Flat(2.5));
        assertThat(after.structures().get(0).height()).isEqualTo(11.0);
        assertThat(after.rooftopObjects()).isEqualTo(before.rooftopObjects());
        assertThat(after.rods()).isEqualTo(before.rods());
        assertThat(after.conductors()).isEqualTo(before.conductors());
        assertThat(sites.fileVersions(id)).singleElement().satisfies(v -> assertThat(v.sourceText().getBytes(
                StandardCharsets.UTF_8)).isEqualTo(Files.readAllBytes(
                        SiteApiTest.SAMPLES.resolve("harbour-warehouse.geojson"))));
    }

    @Test
    void changingAFlatRoofToAGableDropsTheParapetAndTakesRidgeAndBearing() throws Exception {
        long id = uploadThroughThePage("harbour-warehouse.geojson");

        mvc.perform(correction(id, 0, "height", "6", "roof", "gable", "ridgeHeight", "9", "bearing", "90"))
                .andExpect(status().is3xxRedirection());

        assertThat(structure(id, 0).roof()).isEqualTo(new RoofShape.Gable(9, 90));
        assertThat(sites.get(id).sourceText()).doesNotContain("\"parapet\"");
        assertThat(html(get("/sites/" + id), 200)).contains("<td>gable</td>", "<td>9.00</td>", "<td>90.0</td>");
    }

    @Test
    void invalidHeightIsRefusedWith400NamingTheFieldAndNothingChanges() throws Exception {
        long id = uploadThroughThePage("harbour-warehouse.geojson");
        StoredSite before = sites.get(id);
        long revisions = analyses.count(id);

        String negative = html(correction(id, 0, "height", "-3"), 400);
        String words = html(correction(id, 0, "height", "tall"), 400);

        assertThat(negative).contains("id=\"correction-error\"", "field &quot;height&quot;", "rolling sphere method");
        assertThat(words).contains("id=\"correction-error\"", "height must be a number");
        assertThat(sites.get(id)).isEqualTo(before);
        assertThat(sites.fileVersions(id)).isEmpty();
        assertThat(analyses.count(id)).isEqualTo(revisions);
    }

    @Test
    void gableWithoutABearingIsRefusedNamingTheMissingField() throws Exception {
        long id = uploadThroughThePage("harbour-warehouse.geojson");
        StoredSite before = sites.get(id);

        String page = html(correction(id, 0, "roof", "gable", "ridgeHeight", "14"), 400);

        assertThat(page).contains("id=\"correction-error\"", "ridgeBearing");
        assertThat(sites.get(id)).isEqualTo(before);
    }

    @Test
    void roofCorrectionOfAWktSiteIsRefusedAndNothingChanges() throws Exception {
        long id = uploadThroughThePage("courtyard-block.wkt");
        StoredSite before = sites.get(id);

        String page = html(correction(id, 0, "parapet", "1"), 400);

        assertThat(page).contains("id=\"correction-error\"", "only the height can be corrected");
        assertThat(sites.get(id)).isEqualTo(before);
    }

    @Test
    void correctionWithAStaleVersionShowsTheClashWithStatus409AndNothingChanges() throws Exception {
        long id = uploadThroughThePage("harbour-warehouse.geojson");
        StoredSite before = sites.get(id);

        String page = html(post("/sites/" + id + "/structures").param("structure", "0").param("height", "12")
                .param("version", String.valueOf(before.version() - 1)), 409);

        assertThat(page).contains("id=\"correction-clash\"", "value=\"12\"");
        assertThat(sites.get(id)).isEqualTo(before);
        assertThat(sites.fileVersions(id)).isEmpty();
    }
}
