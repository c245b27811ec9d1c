package org.lpzplanner.design;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.multipart;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.nio.charset.StandardCharsets;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.lpzplanner.accounts.SignedIn;
import org.lpzplanner.audit.AuditTrail;
import org.lpzplanner.engine.exposure.AnalysisOptions;
import org.lpzplanner.engine.exposure.AnalysisResult;
import org.lpzplanner.engine.exposure.ExposureAnalysis;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.sites.SiteService;
import org.lpzplanner.sites.StoredSite;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.MediaType;
import org.springframework.mock.web.MockMultipartFile;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.RequestBuilder;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * Accepting a proposal with conductors: the site's parts become exactly the proposal's (rods,
 * masts and conductors, positions and elevations to the millimetre the file holds), in one change
 * recorded once in the audit trail, and analysing the site finds what the proposal's verification found.
 */
@SpringBootTest
@AutoConfigureMockMvc
@SignedIn
class ProposalAcceptTest {

    private static final JsonMapper JSON = JsonMapper.builder().build();

    /** A gable-roofed hall, eaves 6 m, ridge 9 m running east-west, and a flat block with a 1 m parapet (invented). */
    private static final String HALL = """
            {"type": "FeatureCollection", "name": "Test hall", "coordinates": "local-metres", "features": [
              {"type": "Feature", "properties": {"kind": "structure", "name": "Hall", "height": 6, "roof": "gable",
                "ridgeHeight": 9, "ridgeBearing": 90},
               "geometry": {"type": "Polygon", "coordinates": [[[0, 0], [24, 0], [24, 10], [0, 10], [0, 0]]]}},
              {"type": "Feature", "properties": {"kind": "structure", "name": "Block", "height": 7, "roof": "flat",
                "parapet": 1},
               "geometry": {"type": "Polygon", "coordinates": [[[40, 0], [52, 0], [52, 12], [40, 12], [40, 0]]]}}
            ]}""";

    @Autowired
    MockMvc mvc;

    @Autowired
    SiteService sites;

    @Autowired
    ProposalService design;

    @Autowired
    AuditTrail audit;

    @Test
    void acceptingWritesRodsAndConductorsAsProposedAndTheAnalysisAgrees() throws Exception {
        String created = mvc.perform(multipart("/api/sites").file(new MockMultipartFile("file", "hall.geojson",
                "application/geo+json", HALL.getBytes(StandardCharsets.UTF_8))).param("level", "II"))
                .andExpect(status().isCreated()).andReturn().getResponse().getContentAsString();
        long id = JSON.readTree(created).path("id").asLong();
        long version = sites.get(id).version();

        // short rods only, so that conductors along the edges and the ridge are worth choosing
        JsonNode started = send(post("/api/sites/" + id + "/proposals").contentType(MediaType.APPLICATION_JSON)
                .content("{\"rodHeights\": [0.3], \"edgeConductors\": true, \"ridgeConductors\": true}"), 202);
        String jobId = started.path("jobId").asString();
        JsonNode done = finished(id, jobId);
        assertThat(done.path("state").asString()).isEqualTo("done");
        assertThat(done.path("cautions").size()).isPositive();

        // the parts as the API shows them (and as accepting reads them back from the stored job)
        List<JsonNode> rods = new java.util.ArrayList<>();
        List<JsonNode> conductors = new java.util.ArrayList<>();
        done.path("parts").forEach(p -> (p.has("x") ? rods : conductors).add(p));
        assertThat(conductors).as("the proposal uses conductors (else this test checks nothing about them)").isNotEmpty();

        JsonNode accepted = send(post("/api/sites/" + id + "/proposals/" + jobId + "/accept")
                .contentType(MediaType.APPLICATION_JSON).content("{\"version\": " + version + "}"), 200);
        assertThat(accepted.path("rodIds").size()).isEqualTo(rods.size());
        assertThat(accepted.path("conductorIds").size()).isEqualTo(conductors.size());

        // one change of the file: one earlier file, which is the site as it was, and one audit entry
        StoredSite after = sites.get(id);
        assertThat(after.version()).isGreaterThan(version);
        assertThat(sites.fileVersions(id)).singleElement()
                .satisfies(v -> assertThat(v.sourceText()).isEqualTo(HALL));
        assertThat(audit.forSite(id, 100).stream().filter(e -> e.action().equals("proposal-accepted")).toList())
                .singleElement().satisfies(e -> assertThat(e.detail()).contains(conductors.size() + " conductors"));

        Site site = sites.document(after).site();
        assertThat(site.rods()).hasSize(rods.size());
        assertThat(site.conductors()).hasSize(conductors.size());
        for (int i = 0; i < rods.size(); i++) {
            JsonNode want = rods.get(i);
            var got = site.rods().get(i);
            assertThat(got.x()).isCloseTo(want.path("x").asDouble(), within(0.0005));
            assertThat(got.y()).isCloseTo(want.path("y").asDouble(), within(0.0005));
            assertThat(got.height()).isCloseTo(want.path("height").asDouble(), within(0.0005));
        }
        for (int i = 0; i < conductors.size(); i++) {
            JsonNode want = conductors.get(i).path("path");
            List<Coordinate> got = site.conductors().get(i).path();
            assertThat(site.conductors().get(i).followsSurface()).isFalse();
            assertThat(got).hasSize(want.size());
            for (int k = 0; k < want.size(); k++) {
                Coordinate w = new Coordinate(want.path(k).path(0).asDouble(), want.path(k).path(1).asDouble(),
                        want.path(k).path(2).asDouble());
                assertThat(got.get(k).distance3D(w)).isLessThan(0.001);
            }
        }

        // a fresh analysis of the stored site finds what the proposal's last verification found
        JsonNode verification = done.path("verification");
        AnalysisResult fresh = ExposureAnalysis.analyze(site, AnalysisOptions.of(after.sphere())
                .withResolution(verification.path("resolution").asDouble()));
        assertThat(fresh.isFullyProtected()).isEqualTo(verification.path("fullyProtected").asBoolean());
        assertThat(fresh.edges()).hasSize(verification.path("exposedEdges").asInt());
        assertThat(fresh.corners()).hasSize(verification.path("exposedCorners").asInt());
        assertThat(fresh.facades()).hasSize(verification.path("exposedFacadeBands").asInt());
        assertThat(fresh.totalExposedRoofArea()).isCloseTo(verification.path("exposedRoofArea").asDouble(), within(1e-6));
        assertThat(fresh.totalExposedEdgeLength()).isCloseTo(verification.path("exposedEdgeLength").asDouble(),
                within(1e-6));
        assertThat(done.path("complete").asBoolean()).isEqualTo(fresh.isFullyProtected());

        // undo takes exactly those parts out again in one change, recorded once; only once
        long acceptedVersion = accepted.path("version").asLong();
        assertThat(acceptedVersion).isEqualTo(sites.get(id).version());
        send(post("/api/sites/" + id + "/proposals/" + jobId + "/undo").contentType(MediaType.APPLICATION_JSON)
                .content("{\"version\": " + (acceptedVersion - 1) + "}"), 409);
        send(post("/api/sites/" + id + "/proposals/" + jobId + "/undo").contentType(MediaType.APPLICATION_JSON)
                .content("{\"version\": " + acceptedVersion + "}"), 200);
        Site undone = sites.document(sites.get(id)).site();
        assertThat(undone.rods()).isEmpty();
        assertThat(undone.conductors()).isEmpty();
        assertThat(undone.structures()).hasSameSizeAs(site.structures());
        assertThat(sites.fileVersions(id)).hasSize(2);
        assertThat(audit.forSite(id, 100).stream().filter(e -> e.action().equals("proposal-accept-undone"))).hasSize(1);
        JsonNode again = send(post("/api/sites/" + id + "/proposals/" + jobId + "/undo")
                .contentType(MediaType.APPLICATION_JSON).content("{\"version\": " + sites.get(id).version() + "}"), 400);
        assertThat(again.path("field").asString()).isEqualTo("proposal");
    }

    private JsonNode send(RequestBuilder request, int status) throws Exception {
        String body = mvc.perform(request).andExpect(status().is(status)).andReturn().getResponse().getContentAsString();
        return body.isEmpty() ? null : JSON.readTree(body);
    }

    private JsonNode finished(long id, String job) throws Exception {
        JsonNode view = null;
        for (int i = 0; i < 1200; i++) {
            view = send(get("/api/sites/" + id + "/proposals/" + job), 200);
            if (!view.path("state").asString().equals("running")) {
                return view;
            }
            Thread.sleep(100);
        }
        return view;
    }
}
