package org.lpzplanner.airtermination;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.delete;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.put;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.nio.charset.StandardCharsets;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.lpzplanner.sites.Uploads;
import org.lpzplanner.accounts.SignedIn;
import org.lpzplanner.audit.AuditEvent;
import org.lpzplanner.audit.AuditTrail;
import org.lpzplanner.engine.model.Conductor;
import org.lpzplanner.sites.SampleFiles;
import org.lpzplanner.sites.SiteService;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.MediaType;
import org.springframework.mock.web.MockMultipartFile;
import org.springframework.test.web.servlet.MockMvc;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/** Adding, moving, reshaping and removing roof conductors and catenary wires through the JSON API. */
@SpringBootTest
@AutoConfigureMockMvc
@SignedIn
class ConductorApiTest {

    private static final JsonMapper JSON = JsonMapper.builder().build();

    @Autowired
    MockMvc mvc;

    @Autowired
    SiteService sites;

    @Autowired
    AuditTrail audit;

    private long upload(MockMultipartFile file) throws Exception {
        long id = Uploads.throughApi(mvc, file, "II");
        mvc.perform(post("/api/sites/" + id + "/analyses")).andExpect(status().isCreated());
        return id;
    }

    private long warehouse() throws Exception {
        return upload(SampleFiles.sample("harbour-warehouse.geojson"));
    }

    private static String json(String text) {
        return text.replace('\'', '"');
    }

    private JsonNode add(long id, String fields, int status) throws Exception {
        String body = mvc.perform(post("/api/sites/" + id + "/conductors").contentType(MediaType.APPLICATION_JSON)
                .content(json("{'version': " + sites.get(id).version() + ", " + fields + "}")))
                .andExpect(status().is(status)).andReturn().getResponse().getContentAsString();
        return JSON.readTree(body);
    }

    private JsonNode change(long id, String conductorId, String fields, int status) throws Exception {
        return change(id, conductorId, sites.get(id).version(), fields, status);
    }

    private JsonNode change(long id, String conductorId, long version, String fields, int status) throws Exception {
        String body = mvc.perform(put("/api/sites/" + id + "/conductors/" + conductorId)
                .contentType(MediaType.APPLICATION_JSON)
                .content(json("{'version': " + version + ", " + fields + "}")))
                .andExpect(status().is(status)).andReturn().getResponse().getContentAsString();
        return JSON.readTree(body);
    }

    private List<Conductor> conductors(long id) {
        return sites.document(sites.get(id)).site().conductors();
    }

    @Test
    void aRoofConductorAlongTheMiddleOfTheWarehouseRoofNarrowsItsExposedArea() throws Exception {
        long id = warehouse();
        double before = add(id, "'points': [[20, 20], [60, 20]], 'heightAboveRoof': '0.5', 'name': 'Middle line'", 201)
                .path("summary").path("exposedRoofArea").asDouble();
        // the answer is after the change; compare with the site without it
        JsonNode removed = JSON.readTree(mvc.perform(delete("/api/sites/" + id + "/conductors/conductor-1")
                .param("version", Long.toString(sites.get(id).version()))).andExpect(status().isOk())
                .andReturn().getResponse().getContentAsString());
        double without = removed.path("summary").path("exposedRoofArea").asDouble();
        assertThat(removed.path("before").path("name").asString()).isEqualTo("Middle line");
        assertThat(removed.path("parts").path("conductors").size()).isZero();
        assertThat(conductors(id)).isEmpty();
        // a conductor 0.5 m above a flat roof keeps a 30 m sphere off a strip of half-width
        // sqrt(2Rh - h^2) = sqrt(29.75) ~ 5.45 m on each side (circle geometry), so the exposed area shrinks
        assertThat(before).isLessThan(without);
    }

    @Test
    void aCatenaryWireKeepsItsElevationsAndIsListedWithThePartsAndInTheFile() throws Exception {
        long id = warehouse();
        JsonNode answer = add(id, "'points': [[-5, 20, 16], [85, 20, 16.5]], 'name': 'Wire'", 201);
        assertThat(answer.path("conductorId").asString()).isEqualTo("conductor-1");
        assertThat(answer.path("cautions").size()).isPositive();
        JsonNode listed = answer.path("parts").path("conductors").get(0);
        assertThat(listed.path("path").get(1).get(2).asDouble()).isEqualTo(16.5);
        Conductor stored = conductors(id).get(0);
        assertThat(stored.followsSurface()).isFalse();
        assertThat(stored.path()).extracting(Coordinate::getZ).containsExactly(16.0, 16.5);
        assertThat(stored.path().get(0).x).isCloseTo(-5, within(0.001));
        assertThat(sites.fileVersions(id)).as("the file before is kept").hasSize(1);
        // a second one gets the next id
        assertThat(add(id, "'points': [[0, 0, 12], [0, 40, 12]]", 201).path("conductorId").asString())
                .isEqualTo("conductor-2");
    }

    @Test
    void unusablePointsOrHeightsAnswer400NamingTheFieldAndStoreNothing() throws Exception {
        long id = warehouse();
        long version = sites.get(id).version();
        add(id, "'points': [[20, 20]], 'heightAboveRoof': 0.1", 400);
        assertThat(add(id, "'points': [[20, 20], [30, 20, 12]], 'heightAboveRoof': 0.1", 400).path("field").asString())
                .isEqualTo("points");
        assertThat(add(id, "'points': [[20, 20], [30, 20]]", 400).path("field").asString()).isEqualTo("heightAboveRoof");
        assertThat(add(id, "'points': [[20, 20], [30, 20]], 'heightAboveRoof': -1", 400).path("field").asString())
                .isEqualTo("heightAboveRoof");
        assertThat(add(id, "'points': [[20, 20, -2], [30, 20, 12]]", 400).path("error").asString()).contains("below the ground");
        assertThat(add(id, "'points': [[20, 'a'], [30, 20]], 'heightAboveRoof': 0.1", 400).path("field").asString())
                .isEqualTo("points");
        assertThat(add(id, "'heightAboveRoof': 0.1", 400).path("field").asString()).isEqualTo("points");
        JsonNode notNumbers = add(id, "'points': [[20, 20], [30, 20], [30, true]], 'heightAboveRoof': 0.1", 400);
        assertThat(notNumbers.path("field").asString()).isEqualTo("points");
        assertThat(notNumbers.path("error").asString()).contains("point 3");
        assertThat(add(id, "'points': 'north edge', 'heightAboveRoof': 0.1", 400).path("field").asString())
                .isEqualTo("points");
        assertThat(add(id, "'points': [[20, 20], [30, 20]], 'heightAboveRoof': [0.1]", 400).path("field").asString())
                .isEqualTo("heightAboveRoof");
        assertThat(add(id, "'points': [[20, 20], [30, 20]], 'heightAboveRoof': 0.1, 'name': 3", 400).path("field")
                .asString()).isEqualTo("name");
        assertThat(sites.get(id).version()).isEqualTo(version);
        assertThat(conductors(id)).isEmpty();
        assertThat(sites.fileVersions(id)).isEmpty();
    }

    @Test
    void staleVersionsUnknownSitesAndUnknownConductorsAreRefused() throws Exception {
        long id = warehouse();
        mvc.perform(post("/api/sites/" + id + "/conductors").contentType(MediaType.APPLICATION_JSON)
                .content(json("{'version': 999, 'points': [[0, 0, 12], [0, 40, 12]]}"))).andExpect(status().isConflict());
        mvc.perform(post("/api/sites/987654/conductors").contentType(MediaType.APPLICATION_JSON)
                .content(json("{'version': 1, 'points': [[0, 0, 12], [0, 40, 12]]}"))).andExpect(status().isNotFound());
        mvc.perform(delete("/api/sites/" + id + "/conductors/no-such").param("version", Long.toString(sites.get(id).version())))
                .andExpect(status().isNotFound()).andExpect(jsonPath("$.error").value(org.hamcrest.Matchers.containsString("no-such")));
        assertThat(conductors(id)).isEmpty();
    }

    @Test
    void aWktSiteCannotHoldConductors() throws Exception {
        long id = upload(new MockMultipartFile("file", "block.wkt", "text/plain",
                "POLYGON ((0 0, 20 0, 20 10, 0 10, 0 0)) 8\n".getBytes(StandardCharsets.UTF_8)));
        assertThat(add(id, "'points': [[0, 0, 12], [0, 10, 12]]", 400).path("field").asString()).isEqualTo("file");
    }

    @Test
    void movingAVertexRewritesThePathKeepsIdHeightAndPlaceAndIsAudited() throws Exception {
        long id = warehouse();
        add(id, "'points': [[20, 20], [60, 20]], 'heightAboveRoof': '0.5', 'name': 'Middle line'", 201);
        add(id, "'points': [[-5, 20, 16], [85, 20, 16.5]], 'name': 'Wire'", 201);
        String fileBefore = sites.get(id).sourceText();

        JsonNode answer = change(id, "conductor-1", "'points': [[20, 20], [60, 30]]", 200);

        assertThat(answer.path("conductorId").asString()).isEqualTo("conductor-1");
        assertThat(answer.path("before").path("path").get(1).get(1).asDouble()).isEqualTo(20.0);
        assertThat(answer.path("cautions").size()).isPositive();
        assertThat(answer.path("version").asLong()).isEqualTo(sites.get(id).version());
        Conductor moved = conductors(id).get(0);
        assertThat(moved.id()).isEqualTo("conductor-1");
        assertThat(moved.name()).isEqualTo("Middle line");
        assertThat(moved.heightAboveRoof()).isEqualTo(0.5); // kept: only points were sent
        assertThat(moved.path().get(1).x).isCloseTo(60, within(0.001));
        assertThat(moved.path().get(1).y).isCloseTo(30, within(0.001));
        assertThat(conductors(id).get(1).id()).as("the other conductor is untouched").isEqualTo("conductor-2");
        assertThat(sites.fileVersions(id)).as("the file before the move is kept")
                .anySatisfy(v -> assertThat(v.sourceText()).isEqualTo(fileBefore));
        assertThat(audit.forSite(id, 10)).filteredOn(e -> e.action().equals("conductor-changed")).singleElement()
                .extracting(AuditEvent::detail).asString().contains("conductor-1", "(60.0, 20.0)", "(60.0, 30.0)");

        // a wire's vertex moves in 3D; the elevations given are stored as they are
        change(id, "conductor-2", "'points': [[-5, 20, 16], [40, 25, 18], [85, 20, 16.5]]", 200);
        assertThat(conductors(id).get(1).path()).extracting(Coordinate::getZ).containsExactly(16.0, 18.0, 16.5);
        assertThat(conductors(id).get(1).followsSurface()).isFalse();
    }

    @Test
    void aConductorMovedOntoTheRoofNarrowsTheExposedAreaAndMovedBackRestoresIt() throws Exception {
        long id = warehouse();
        // 200 m east of the warehouse: more than 2R = 60 m from every roof point, so no sphere that
        // touches the roof can rest on it (rolling sphere geometry); the roof is exposed as if bare
        double far = add(id, "'points': [[210, 20], [270, 20]], 'heightAboveRoof': 1", 201)
                .path("summary").path("exposedRoofArea").asDouble();
        // along the middle of the flat roof, 1 m above it: a 30 m sphere is kept off a strip of
        // half-width sqrt(2Rh - h^2) = sqrt(59) ~ 7.7 m on each side (circle geometry)
        double onRoof = change(id, "conductor-1", "'points': [[10, 20], [70, 20]]", 200)
                .path("summary").path("exposedRoofArea").asDouble();
        double back = change(id, "conductor-1", "'points': [[210, 20], [270, 20]]", 200)
                .path("summary").path("exposedRoofArea").asDouble();
        assertThat(onRoof).isLessThan(far);
        // the same file gives the same result whatever edits came before
        assertThat(back).isCloseTo(far, within(0.01));
    }

    @Test
    void badPointsAnswer400NamingTheFieldUnknownIds404StaleVersions409AndNothingIsStored() throws Exception {
        long id = warehouse();
        add(id, "'points': [[20, 20], [60, 20]], 'heightAboveRoof': '0.5'", 201);
        long version = sites.get(id).version();
        String file = sites.get(id).sourceText();
        int kept = sites.fileVersions(id).size();

        assertThat(change(id, "conductor-1", "'points': [[20, 20]]", 400).path("field").asString()).isEqualTo("points");
        assertThat(change(id, "conductor-1", "'points': [[20, 20], [30, 20, 12]]", 400).path("field").asString())
                .isEqualTo("points");
        assertThat(change(id, "conductor-1", "'points': [[20, 'a'], [30, 20]]", 400).path("field").asString())
                .isEqualTo("points");
        assertThat(change(id, "conductor-1", "'points': [[20, 20], [20, 20]]", 400).path("error").asString())
                .contains("repeats");
        assertThat(change(id, "conductor-1", "'name': 'x'", 400).path("field").asString()).isEqualTo("points");
        assertThat(change(id, "conductor-1", "'points': [[20, 20, -1], [30, 20, 12]]", 400).path("error").asString())
                .contains("below the ground");
        assertThat(change(id, "conductor-1", "'points': [[20, 20], [30, 20]], 'heightAboveRoof': 'high'", 400)
                .path("field").asString()).isEqualTo("heightAboveRoof");
        assertThat(change(id, "conductor-1", "'points': [[20, 20, 12], [30, 20, 12]], 'heightAboveRoof': 1", 400)
                .path("field").asString()).isEqualTo("heightAboveRoof");
        assertThat(change(id, "no-such", "'points': [[20, 20], [30, 20]]", 404).path("error").asString())
                .contains("no-such");
        mvc.perform(put("/api/sites/987654/conductors/conductor-1").contentType(MediaType.APPLICATION_JSON)
                .content(json("{'version': 1, 'points': [[0, 0], [0, 40]]}"))).andExpect(status().isNotFound());
        change(id, "conductor-1", version - 1, "'points': [[20, 20], [30, 20]]", 409);
        mvc.perform(put("/api/sites/" + id + "/conductors/conductor-1").contentType(MediaType.APPLICATION_JSON)
                .content(json("{'points': [[20, 20], [30, 20]]}"))).andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.field").value("version"));

        assertThat(sites.get(id).version()).isEqualTo(version);
        assertThat(sites.get(id).sourceText()).isEqualTo(file);
        assertThat(sites.fileVersions(id)).hasSize(kept);
        assertThat(audit.forSite(id, 20)).extracting(AuditEvent::action).doesNotContain("conductor-changed");
    }

    @Test
    void aWireGivenPlanPointsNeedsAHeightAboveRoofAndThenFollowsTheSurface() throws Exception {
        long id = warehouse();
        add(id, "'points': [[-5, 20, 16], [85, 20, 16.5]]", 201);
        assertThat(change(id, "conductor-1", "'points': [[-5, 20], [85, 20]]", 400).path("field").asString())
                .isEqualTo("points");
        change(id, "conductor-1", "'points': [[10, 20], [70, 20]], 'heightAboveRoof': 0.3", 200);
        assertThat(conductors(id).get(0).heightAboveRoof()).isEqualTo(0.3);
    }

    @Test
    void onALonLatSiteTheNewPathIsWrittenInLonLatAndReadsBackInLocalMetres() throws Exception {
        long id = upload(SampleFiles.sample("millbrook-hall.geojson"));
        add(id, "'points': [[0, 0, 15], [10, 0, 15]], 'name': 'Wire'", 201);
        change(id, "conductor-1", "'points': [[0, 0, 15], [12.5, 3.25, 16]]", 200);
        Conductor wire = conductors(id).stream().filter(c -> c.id().equals("conductor-1")).findFirst().orElseThrow();
        // written to 1e-8 degree: within about a millimetre of the metres sent
        assertThat(wire.path().get(1).x).isCloseTo(12.5, within(0.002));
        assertThat(wire.path().get(1).y).isCloseTo(3.25, within(0.002));
        assertThat(wire.path().get(1).getZ()).isEqualTo(16.0);
        JsonNode feature = null;
        for (JsonNode f : JSON.readTree(sites.get(id).sourceText()).path("features")) {
            if ("conductor-1".equals(f.path("id").asString())) {
                feature = f;
            }
        }
        assertThat(feature).isNotNull();
        JsonNode end = feature.path("geometry").path("coordinates").get(1);
        // a longitude and a latitude (RFC 7946), not metres: the file keeps its own coordinates
        assertThat(Math.abs(end.get(0).asDouble())).isLessThanOrEqualTo(180);
        assertThat(Math.abs(end.get(1).asDouble())).isBetween(1.0, 90.0);
        assertThat(end.get(2).asDouble()).isEqualTo(16.0);
    }
}
