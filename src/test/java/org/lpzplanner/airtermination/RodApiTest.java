package org.lpzplanner.airtermination;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.hamcrest.Matchers.containsString;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.delete;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.put;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.nio.charset.StandardCharsets;
import org.junit.jupiter.api.Test;
import org.lpzplanner.sites.Uploads;
import org.lpzplanner.accounts.SignedIn;
import org.lpzplanner.analysis.AnalysisRepository;
import org.lpzplanner.engine.model.Rod;
import org.lpzplanner.sites.SampleFiles;
import org.lpzplanner.sites.SiteService;
import org.lpzplanner.sites.StoredSite;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.MediaType;
import org.springframework.mock.web.MockMultipartFile;
import org.springframework.test.web.servlet.MockMvc;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/** Placing, moving and removing rods through the JSON API rewrites the stored file and re-analyses. */
@SpringBootTest
@AutoConfigureMockMvc
@SignedIn
class RodApiTest {

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

    private double exposedRoofAfterAnalysis(long id) throws Exception {
        String body = mvc.perform(post("/api/sites/" + id + "/analyses")).andExpect(status().isCreated())
                .andReturn().getResponse().getContentAsString();
        JsonNode answer = JSON.readTree(body);
        return answer.has("summary") ? answer.path("summary").path("exposedRoofArea").asDouble()
                : answer.path("exposedRoofArea").asDouble();
    }

    private JsonNode send(org.springframework.test.web.servlet.RequestBuilder request, int status) throws Exception {
        String body = mvc.perform(request).andExpect(status().is(status)).andReturn().getResponse()
                .getContentAsString();
        return JSON.readTree(body);
    }

    private static String json(String text) {
        return text.replace('\'', '"');
    }

    private Rod onlyRod(long id) {
        var rods = sites.document(sites.get(id)).site().rods();
        assertThat(rods).hasSize(1);
        return rods.get(0);
    }

    @Test
    void aThreeMetreRodInTheMiddleOfTheWarehouseRoofReducesItsExposedRoofArea() throws Exception {
        long id = upload(SampleFiles.sample("harbour-warehouse.geojson"));
        double before = exposedRoofAfterAnalysis(id);
        long version = sites.get(id).version();

        JsonNode answer = send(post("/api/sites/" + id + "/rods").contentType(MediaType.APPLICATION_JSON)
                .content(json("{'version': " + version + ", 'x': 40, 'y': 20, 'height': 3, 'name': 'Middle <rod>'}")),
                201);

        // the analysis ran again: new summary, new drawing with the rod, cautions and basis
        assertThat(answer.path("summary").path("exposedRoofArea").asDouble()).isLessThan(before);
        assertThat(answer.path("summary").path("method").asString()).isEqualTo("rolling sphere method");
        assertThat(answer.path("summary").path("level").asString()).isEqualTo("II");
        assertThat(answer.path("svg").asString()).startsWith("<svg").contains("data-rod-id=\"rod-1\"",
                "data-origin-x=", "data-scale=", "Middle &lt;rod&gt;").doesNotContain("Middle <rod>");
        assertThat(answer.path("cautions")).isNotEmpty();
        assertThat(answer.path("basis").asString()).contains("rolling sphere method", "II", "30");
        assertThat(answer.path("version").asLong()).isEqualTo(sites.get(id).version());
        // the stored file holds the rod, and the earlier file is kept
        Rod rod = onlyRod(id);
        assertThat(rod.id()).isEqualTo("rod-1");
        assertThat(rod.x()).isEqualTo(40.0);
        assertThat(rod.y()).isEqualTo(20.0);
        assertThat(rod.height()).isEqualTo(3.0);
        assertThat(sites.get(id).sourceText()).contains("\"kind\" : \"rod\"");
        assertThat(sites.fileVersions(id)).hasSize(1);
    }

    @Test
    void movingAndRemovingARodChangesTheStoredFileAndReanalyses() throws Exception {
        long id = upload(SampleFiles.sample("harbour-warehouse.geojson"));
        String added = mvc.perform(post("/api/sites/" + id + "/rods").contentType(MediaType.APPLICATION_JSON)
                        .content(json("{'version': " + sites.get(id).version() + ", 'x': 40, 'y': 20, 'height': 3}")))
                .andExpect(status().isCreated()).andReturn().getResponse().getContentAsString();
        int revision = JSON.readTree(added).path("summary").path("revision").asInt();

        JsonNode moved = send(put("/api/sites/" + id + "/rods/rod-1").contentType(MediaType.APPLICATION_JSON)
                .content(json("{'version': " + sites.get(id).version() + ", 'x': 10.25, 'y': 30.5, 'height': '1.5'}")),
                200);

        assertThat(moved.path("before").path("x").asDouble()).isEqualTo(40.0);
        assertThat(moved.path("before").path("height").asDouble()).isEqualTo(3.0);
        assertThat(moved.path("summary").path("revision").asInt()).isEqualTo(revision + 1);
        assertThat(moved.path("parts").path("rods").path(0).path("x").asDouble()).isEqualTo(10.25);
        Rod rod = onlyRod(id);
        assertThat(rod.x()).isEqualTo(10.25);
        assertThat(rod.y()).isEqualTo(30.5);
        assertThat(rod.height()).isEqualTo(1.5);

        JsonNode removed = send(delete("/api/sites/" + id + "/rods/rod-1")
                .param("version", String.valueOf(sites.get(id).version())), 200);

        assertThat(removed.path("summary").path("revision").asInt()).isEqualTo(revision + 2);
        assertThat(removed.path("parts").path("rods")).isEmpty();
        assertThat(sites.document(sites.get(id)).site().rods()).isEmpty();
        assertThat(sites.fileVersions(id)).hasSize(3);
        // the upload's analysis and one after each of the three changes
        assertThat(analyses.count(id)).isEqualTo(4);
    }

    @Test
    void partsListRodsAndConductorsInLocalMetresAndInTheFilesLonLat() throws Exception {
        long id = upload(SampleFiles.sample("brookfield-campus.geojson"));

        mvc.perform(get("/api/sites/" + id + "/parts"))
                .andExpect(status().isOk())
                .andExpect(jsonPath("$.coordinates").value("lon-lat"))
                .andExpect(jsonPath("$.editable").value(true))
                .andExpect(jsonPath("$.rods.length()").value(2))
                .andExpect(jsonPath("$.rods[0].name").value("Larch rod south-west"))
                .andExpect(jsonPath("$.rods[0].height").value(2.5))
                // the file's own position: RFC 7946 lon/lat as written in the sample
                .andExpect(jsonPath("$.rods[0].sitePosition[0]").value(6.8136793))
                .andExpect(jsonPath("$.rods[0].sitePosition[1]").value(51.4381472))
                .andExpect(jsonPath("$.conductors[0].heightAboveRoof").value(0.1))
                .andExpect(jsonPath("$.conductors[0].path.length()").value(5));
    }

    @Test
    void aRodAddedToALonLatSiteIsWrittenInLonLatAndReadsBackAtThePlacedPoint() throws Exception {
        long id = upload(SampleFiles.sample("brookfield-campus.geojson"));
        var before = sites.document(sites.get(id)).site().rods();
        Rod first = before.get(0);
        // a point between the two existing rods stays inside the file's extent, so the frame is kept
        double x = (before.get(0).x() + before.get(1).x()) / 2;
        double y = (before.get(0).y() + before.get(1).y()) / 2;

        send(post("/api/sites/" + id + "/rods").contentType(MediaType.APPLICATION_JSON)
                .content(json("{'version': " + sites.get(id).version() + ", 'x': " + x + ", 'y': " + y
                        + ", 'height': 2}")), 201);
        send(delete("/api/sites/" + id + "/rods/R1").param("version", String.valueOf(sites.get(id).version())), 200);

        var rods = sites.document(sites.get(id)).site().rods();
        assertThat(rods).extracting(Rod::id).containsExactly("R2", "rod-1");
        // 1e-8 degree written: about a millimetre
        assertThat(rods.get(1).x()).isCloseTo(x, within(0.01));
        assertThat(rods.get(1).y()).isCloseTo(y, within(0.01));
        assertThat(sites.get(id).sourceText()).doesNotContain(String.valueOf(first.x()));
        JsonNode file = JSON.readTree(sites.get(id).sourceText());
        JsonNode added = file.path("features").get(file.path("features").size() - 1);
        assertThat(added.path("geometry").path("coordinates").path(0).asDouble()).isBetween(6.81, 6.82);
        assertThat(added.path("geometry").path("coordinates").path(1).asDouble()).isBetween(51.43, 51.44);
    }

    @Test
    void aWktSiteCannotHoldRods() throws Exception {
        long id = upload(new MockMultipartFile("file", "block.wkt", "text/plain",
                "POLYGON ((0 0, 20 0, 20 10, 0 10, 0 0)) 8\n".getBytes(StandardCharsets.UTF_8)));
        StoredSite before = sites.get(id);

        mvc.perform(post("/api/sites/" + id + "/rods").contentType(MediaType.APPLICATION_JSON)
                        .content(json("{'version': " + before.version() + ", 'x': 5, 'y': 5, 'height': 1}")))
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.error").value(containsString("WKT")))
                .andExpect(jsonPath("$.field").value("file"));
        assertThat(sites.get(id)).isEqualTo(before);
        mvc.perform(get("/api/sites/" + id + "/parts")).andExpect(status().isOk())
                .andExpect(jsonPath("$.editable").value(false));
    }

    @Test
    void aBadHeightOrPositionAnswers400NamingTheFieldAndStoresNothing() throws Exception {
        long id = upload(SampleFiles.sample("harbour-warehouse.geojson"));
        StoredSite before = sites.get(id);
        String url = "/api/sites/" + id + "/rods";

        for (String height : new String[] {"-1", "0", "'tall'", "5000"}) {
            mvc.perform(post(url).contentType(MediaType.APPLICATION_JSON)
                            .content(json("{'version': " + before.version() + ", 'x': 5, 'y': 5, 'height': " + height + "}")))
                    .andExpect(status().isBadRequest())
                    .andExpect(jsonPath("$.field").value("height"));
        }
        mvc.perform(post(url).contentType(MediaType.APPLICATION_JSON)
                        .content(json("{'version': " + before.version() + ", 'x': 'east', 'y': 5, 'height': 1}")))
                .andExpect(status().isBadRequest()).andExpect(jsonPath("$.field").value("x"));
        mvc.perform(post(url).contentType(MediaType.APPLICATION_JSON)
                        .content(json("{'version': " + before.version() + ", 'x': 5, 'height': 1}")))
                .andExpect(status().isBadRequest()).andExpect(jsonPath("$.field").value("y"));

        assertThat(sites.get(id)).isEqualTo(before);
        assertThat(sites.fileVersions(id)).isEmpty();
    }

    @Test
    void positionsSentAsTextAreReadAsMetres() throws Exception {
        long id = upload(SampleFiles.sample("harbour-warehouse.geojson"));

        send(post("/api/sites/" + id + "/rods").contentType(MediaType.APPLICATION_JSON)
                .content(json("{'version': " + sites.get(id).version() + ", 'x': ' 12.5', 'y': '7', 'height': 2}")), 201);

        Rod rod = onlyRod(id);
        assertThat(rod.x()).isEqualTo(12.5);
        assertThat(rod.y()).isEqualTo(7.0);
    }

    @Test
    void valuesOfTheWrongKindAnswer400NamingTheMemberAndStoreNothing() throws Exception {
        long id = upload(SampleFiles.sample("harbour-warehouse.geojson"));
        StoredSite before = sites.get(id);
        String url = "/api/sites/" + id + "/rods";
        // each body is a usable rod but for one member
        String[][] cases = {
                {"{'x': 5, 'y': 5, 'height': 1}", "version"},
                {"{'version': 1.5, 'x': 5, 'y': 5, 'height': 1}", "version"},
                {"{'version': 'one', 'x': 5, 'y': 5, 'height': 1}", "version"},
                {"{'version': " + before.version() + ", 'x': true, 'y': 5, 'height': 1}", "x"},
                {"{'version': " + before.version() + ", 'x': 1e999, 'y': 5, 'height': 1}", "x"},
                {"{'version': " + before.version() + ", 'x': 5, 'y': [5], 'height': 1}", "y"},
                {"{'version': " + before.version() + ", 'x': 5, 'y': 5, 'height': {'m': 1}}", "height"},
                {"{'version': " + before.version() + ", 'x': 5, 'y': 5, 'height': 1, 'name': 7}", "name"},
                {"{'version': " + before.version() + ", 'x': 5, 'y': 5, 'height': 1, 'id': false}", "id"}};
        for (String[] c : cases) {
            JsonNode problem = send(post(url).contentType(MediaType.APPLICATION_JSON).content(json(c[0])), 400);
            assertThat(problem.path("field").asString()).as(c[0]).isEqualTo(c[1]);
            assertThat(problem.path("detail").asString()).as(c[0]).contains(c[1]);
            assertThat(problem.path("error").asString()).as(c[0]).isEqualTo(problem.path("detail").asString());
        }
        JsonNode change = send(put(url + "/rod-1").contentType(MediaType.APPLICATION_JSON)
                .content(json("{'version': " + before.version() + ", 'x': 'east', 'y': 5}")), 400);
        assertThat(change.path("field").asString()).isEqualTo("x");

        assertThat(sites.get(id)).isEqualTo(before);
        assertThat(sites.fileVersions(id)).isEmpty();
    }

    @Test
    void aStaleVersionAnswers409AndStoresNothing() throws Exception {
        long id = upload(SampleFiles.sample("harbour-warehouse.geojson"));
        StoredSite before = sites.get(id);

        mvc.perform(post("/api/sites/" + id + "/rods").contentType(MediaType.APPLICATION_JSON)
                        .content(json("{'version': " + (before.version() - 1) + ", 'x': 5, 'y': 5, 'height': 1}")))
                .andExpect(status().isConflict());

        assertThat(sites.get(id)).isEqualTo(before);
    }

    @Test
    void anUnknownRodOrSiteAnswers404() throws Exception {
        long id = upload(SampleFiles.sample("harbour-warehouse.geojson"));
        long version = sites.get(id).version();

        mvc.perform(put("/api/sites/" + id + "/rods/no-such-rod").contentType(MediaType.APPLICATION_JSON)
                        .content(json("{'version': " + version + ", 'height': 2}")))
                .andExpect(status().isNotFound())
                .andExpect(jsonPath("$.error").value(containsString("no-such-rod")));
        mvc.perform(delete("/api/sites/" + id + "/rods/no-such-rod").param("version", String.valueOf(version)))
                .andExpect(status().isNotFound());
        mvc.perform(get("/api/sites/929292/parts")).andExpect(status().isNotFound())
                .andExpect(jsonPath("$.error").exists());
        mvc.perform(post("/api/sites/929292/rods").contentType(MediaType.APPLICATION_JSON)
                        .content(json("{'version': 0, 'x': 5, 'y': 5, 'height': 1}")))
                .andExpect(status().isNotFound());
    }
}
