package org.lpzplanner.design;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.delete;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.put;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import org.junit.jupiter.api.Test;
import org.lpzplanner.sites.Uploads;
import org.lpzplanner.accounts.SignedIn;
import org.lpzplanner.sites.SiteService;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.MediaType;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.RequestBuilder;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/** The design API: propose, poll, accept; down-conductors, separation distances, quantities; error paths. */
@SpringBootTest
@AutoConfigureMockMvc
@SignedIn
class DesignApiTest {

    private static final JsonMapper JSON = JsonMapper.builder().build();

    /** A 30 × 12 m flat-roofed block, 8 m high, with a 1.5 m plant box (invented). */
    private static final String BLOCK = """
            {"type": "FeatureCollection", "name": "Test block", "coordinates": "local-metres", "features": [
              {"type": "Feature", "properties": {"kind": "structure", "name": "Block", "height": 8, "roof": "flat"},
               "geometry": {"type": "Polygon", "coordinates": [[[0, 0], [30, 0], [30, 12], [0, 12], [0, 0]]]}},
              {"type": "Feature", "properties": {"kind": "rooftop-object", "name": "Plant box", "top": 9.5},
               "geometry": {"type": "Polygon", "coordinates": [[[20, 4], [23, 4], [23, 7], [20, 7], [20, 4]]]}}
            ]}""";

    @Autowired
    MockMvc mvc;

    @Autowired
    SiteService sites;

    @Autowired
    DesignRepository store;

    /** Two 30 × 10 m flat-roofed parts, 10 m high, overlapping in a 10 × 10 m corner: an L (invented). */
    private static final String ELL = """
            {"type": "FeatureCollection", "name": "Test L", "coordinates": "local-metres", "features": [
              {"type": "Feature", "properties": {"kind": "structure", "name": "East arm", "height": 10, "roof": "flat"},
               "geometry": {"type": "Polygon", "coordinates": [[[0, 0], [30, 0], [30, 10], [0, 10], [0, 0]]]}},
              {"type": "Feature", "properties": {"kind": "structure", "name": "North arm", "height": 10, "roof": "flat"},
               "geometry": {"type": "Polygon", "coordinates": [[[0, 0], [10, 0], [10, 30], [0, 30], [0, 0]]]}}
            ]}""";

    private long upload() throws Exception {
        return upload("III");
    }

    private long upload(String level) throws Exception {
        return upload(BLOCK, level);
    }

    private long upload(String file, String level) throws Exception {
        return Uploads.throughApi(mvc, Uploads.geoJson("block.geojson", file), level);
    }

    private JsonNode send(RequestBuilder request, int status) throws Exception {
        String body = mvc.perform(request).andExpect(status().is(status)).andReturn().getResponse().getContentAsString();
        return body.isEmpty() ? null : JSON.readTree(body);
    }

    private JsonNode finished(long id, String job) throws Exception {
        JsonNode view = null;
        for (int i = 0; i < 600; i++) {
            view = send(get("/api/sites/" + id + "/proposals/" + job), 200);
            if (!view.path("state").asString().equals("running")) {
                return view;
            }
            Thread.sleep(100);
        }
        return view;
    }

    @Test
    void proposeThenAcceptWritesTheRodsAndTheSiteIsProtected() throws Exception {
        long id = upload("I");
        long version = sites.get(id).version();
        JsonNode started = send(post("/api/sites/" + id + "/proposals").contentType(MediaType.APPLICATION_JSON)
                .content("{\"rodHeights\": [0.5, 1, 2], \"keepOut\": [[[5, 5], [8, 5], [8, 8], [5, 8]]]}"), 202);
        JsonNode done = finished(id, started.path("jobId").asString());

        // the members the design page reads: the job's own, then the proposal's (StoredProposal), then cautions
        assertThat(started.propertyNames()).containsExactly("jobId", "state", "stage", "fraction", "siteVersion",
                "level", "radius");
        assertThat(done.propertyNames()).containsExactly("jobId", "state", "stage", "fraction", "siteVersion",
                "level", "radius", "parts", "count", "counts", "regularLayoutCount", "shareOfRegular", "complete",
                "left", "beyondReach", "rounds", "elapsedMillis", "verification", "cautions");
        assertThat(done.path("state").asString()).isEqualTo("done");
        assertThat(done.path("complete").asBoolean()).isTrue();
        assertThat(done.path("count").asInt()).isPositive().isLessThan(done.path("regularLayoutCount").asInt());
        assertThat(done.path("cautions").size()).isPositive();
        for (JsonNode part : done.path("parts")) {
            boolean inKeepOut = part.path("x").asDouble() >= 5 && part.path("x").asDouble() <= 8
                    && part.path("y").asDouble() >= 5 && part.path("y").asDouble() <= 8;
            assertThat(inKeepOut).as("part %s in the keep-out area", part).isFalse();
        }

        JsonNode accepted = send(post("/api/sites/" + id + "/proposals/" + started.path("jobId").asString() + "/accept")
                .contentType(MediaType.APPLICATION_JSON).content("{\"version\": " + version + "}"), 200);
        assertThat(accepted.path("rodIds").size()).isEqualTo(done.path("count").asInt());
        assertThat(accepted.propertyNames()).containsExactly("rodIds", "conductorIds", "version", "plan",
                "analysisPending", "pendingReason");
        assertThat(accepted.path("plan").asString()).isEqualTo("/sites/" + id);
        JsonNode parts = send(get("/api/sites/" + id + "/parts"), 200);
        assertThat(parts.path("rods").size()).isEqualTo(done.path("count").asInt());
        JsonNode analysis = send(post("/api/sites/" + id + "/analyses"), 201);
        JsonNode summary = analysis.has("summary") ? analysis.path("summary") : analysis;
        assertThat(summary.path("fullyProtected").asBoolean()).isTrue();

        // the same proposal cannot be accepted twice: the site has moved on
        send(post("/api/sites/" + id + "/proposals/" + started.path("jobId").asString() + "/accept")
                .contentType(MediaType.APPLICATION_JSON).content("{\"version\": " + version + "}"), 409);
    }

    @Test
    void proposalErrorsAreClear() throws Exception {
        long id = upload();
        JsonNode noHeights = send(post("/api/sites/" + id + "/proposals").contentType(MediaType.APPLICATION_JSON)
                .content("{\"rodHeights\": []}"), 400);
        assertThat(noHeights.path("field").asString()).isEqualTo("rodHeights");
        JsonNode tooTall = send(post("/api/sites/" + id + "/proposals").contentType(MediaType.APPLICATION_JSON)
                .content("{\"rodHeights\": [1, 25]}"), 400);
        assertThat(tooTall.path("error").asString()).contains("between 0.1 m and 10 m");
        JsonNode badArea = send(post("/api/sites/" + id + "/proposals").contentType(MediaType.APPLICATION_JSON)
                .content("{\"rodHeights\": [1], \"keepOut\": [[[0, 0], [1, 1]]]}"), 400);
        assertThat(badArea.path("field").asString()).isEqualTo("keepOut[0]");
        JsonNode badFlag = send(post("/api/sites/" + id + "/proposals").contentType(MediaType.APPLICATION_JSON)
                .content("{\"rodHeights\": [1], \"edgeConductors\": \"yes\"}"), 400);
        assertThat(badFlag.path("field").asString()).isEqualTo("edgeConductors");
        send(get("/api/sites/" + id + "/proposals/nosuchjob"), 404);
        send(post("/api/sites/999999/proposals").contentType(MediaType.APPLICATION_JSON).content("{\"rodHeights\": [1]}"), 404);
        JsonNode noVersion = send(post("/api/sites/" + id + "/proposals/nosuchjob/accept")
                .contentType(MediaType.APPLICATION_JSON).content("{}"), 400);
        assertThat(noVersion.path("field").asString()).isEqualTo("version");
        // each body is usable but for one member, which the answer names
        String[][] proposals = {
                {"{}", "rodHeights"},
                {"{\"mastHeights\": [6]}", "rodHeights"},
                {"{\"rodHeights\": 1}", "rodHeights"},
                {"{\"rodHeights\": [1, \"2\"]}", "rodHeights"},
                {"{\"rodHeights\": [" + "1, ".repeat(20) + "1]}", "rodHeights"},
                {"{\"rodHeights\": [1], \"mastHeights\": [[6]]}", "mastHeights"},
                {"{\"rodHeights\": [1], \"ridgeConductors\": 1}", "ridgeConductors"},
                {"{\"rodHeights\": [1], \"keepOut\": [[5, 5], [8, 5], [8, 8]]}", "keepOut"},
                {"{\"rodHeights\": [1], \"keepOut\": \"north\"}", "keepOut"}};
        for (String[] c : proposals) {
            JsonNode problem = send(post("/api/sites/" + id + "/proposals").contentType(MediaType.APPLICATION_JSON)
                    .content(c[0]), 400);
            assertThat(problem.path("field").asString()).as(c[0]).isEqualTo(c[1]);
            assertThat(problem.path("detail").asString()).as(c[0]).contains(c[1]);
            assertThat(problem.path("error").asString()).as(c[0]).isEqualTo(problem.path("detail").asString());
        }
        JsonNode fractionVersion = send(post("/api/sites/" + id + "/proposals/nosuchjob/undo")
                .contentType(MediaType.APPLICATION_JSON).content("{\"version\": 2.5}"), 400);
        assertThat(fractionVersion.path("field").asString()).isEqualTo("version");
    }

    @Test
    void downConductorsArePlannedEditedAndReset() throws Exception {
        long id = upload();
        JsonNode planned = send(get("/api/sites/" + id + "/down-conductors"), 200).path("buildings").get(0);
        // perimeter 2 · (30 + 12) = 84 m at class III, typical spacing 15 m [IEC 62305-3:2010 Table 4]:
        // ⌈84 / 15⌉ = 6
        assertThat(planned.path("perimeter").asDouble()).isCloseTo(84, within(1e-9));
        assertThat(planned.path("required").asInt()).isEqualTo(6);
        assertThat(planned.path("positions").size()).isEqualTo(6);
        assertThat(planned.path("edited").asBoolean()).isFalse();

        JsonNode edited = send(put("/api/sites/" + id + "/down-conductors/" + planned.path("buildingId").asString())
                .contentType(MediaType.APPLICATION_JSON).content("{\"positions\": [[0, 0], [30, 12]]}"), 200)
                .path("buildings").get(0);
        assertThat(edited.path("edited").asBoolean()).isTrue();
        assertThat(edited.path("positions").size()).isEqualTo(2);
        assertThat(edited.path("warnings").get(0).asString()).contains("fewer than the 6");

        JsonNode one = send(put("/api/sites/" + id + "/down-conductors/" + planned.path("buildingId").asString())
                .contentType(MediaType.APPLICATION_JSON).content("{\"positions\": [[0, 0]]}"), 400);
        assertThat(one.path("error").asString()).contains("at least two");
        JsonNode far = send(put("/api/sites/" + id + "/down-conductors/" + planned.path("buildingId").asString())
                .contentType(MediaType.APPLICATION_JSON).content("{\"positions\": [[0, 0], [100, 100]]}"), 400);
        assertThat(far.path("field").asString()).isEqualTo("positions[1]");
        for (String body : new String[] {"{}", "{\"positions\": null}", "{\"positions\": \"north wall\"}",
                "{\"positions\": [[0, 0], [30]]}"}) {
            assertThat(send(put("/api/sites/" + id + "/down-conductors/" + planned.path("buildingId").asString())
                    .contentType(MediaType.APPLICATION_JSON).content(body), 400).path("field").asString())
                    .as(body).isEqualTo("positions");
        }
        send(put("/api/sites/" + id + "/down-conductors/nosuch").contentType(MediaType.APPLICATION_JSON)
                .content("{\"positions\": [[0, 0], [30, 12]]}"), 404);

        JsonNode reset = send(delete("/api/sites/" + id + "/down-conductors/" + planned.path("buildingId").asString()), 200)
                .path("buildings").get(0);
        assertThat(reset.path("edited").asBoolean()).isFalse();
        assertThat(reset.path("positions").size()).isEqualTo(6);
    }

    @Test
    void overlappingStructuresShareOneSetOfDownConductorsAndEarlierEditsPerStructureStayReadable() throws Exception {
        long id = upload(ELL, "III");
        JsonNode buildings = send(get("/api/sites/" + id + "/down-conductors"), 200).path("buildings");
        // one building: the union is the L of perimeter 30 + 10 + 20 + 20 + 10 + 30 = 120 m; class III typical
        // spacing 15 m [IEC 62305-3:2010 Table 4]: ⌈120 / 15⌉ = 8 [IEC 62305-3:2010 5.3]
        assertThat(buildings.size()).isEqualTo(1);
        JsonNode ell = buildings.get(0);
        assertThat(ell.path("name").asString()).isEqualTo("East arm + North arm");
        assertThat(ell.path("structureIds").size()).isEqualTo(2);
        String east = ell.path("structureIds").get(0).asString(), north = ell.path("structureIds").get(1).asString();
        assertThat(ell.path("buildingId").asString()).isEqualTo(east);
        assertThat(ell.path("perimeter").asDouble()).isCloseTo(120, within(1e-9));
        assertThat(ell.path("required").asInt()).isEqualTo(8);
        assertThat(ell.path("positions").size()).isEqualTo(8);
        assertThat(ell.path("labels").get(7).asString()).isEqualTo("D8");

        // positions stored per structure by an earlier release: read for the building as a whole; (0, 0) stored
        // under both counts once; (5, 10) stood on the east arm's north wall, now 5 m inside the L: left out
        store.saveDownConductors(id, east, java.util.List.of(new double[] {0, 0}, new double[] {30, 0},
                new double[] {30, 10}, new double[] {5, 10}), java.time.Instant.now());
        store.saveDownConductors(id, north, java.util.List.of(new double[] {0, 0}, new double[] {10, 30}),
                java.time.Instant.now());
        JsonNode read = send(get("/api/sites/" + id + "/down-conductors"), 200).path("buildings").get(0);
        assertThat(read.path("edited").asBoolean()).isTrue();
        assertThat(read.path("positions").size()).isEqualTo(4);
        assertThat(read.path("warnings").toString()).contains("(5.00, 10.00)").contains("fewer than the 8");

        // saved through either structure's id: stored once, under the building's id
        send(put("/api/sites/" + id + "/down-conductors/" + north).contentType(MediaType.APPLICATION_JSON)
                .content("{\"positions\": [[0, 0], [30, 0], [30, 10], [10, 30], [0, 30]]}"), 200);
        assertThat(store.downConductors(id).keySet()).containsExactly(east);
        JsonNode inside = send(put("/api/sites/" + id + "/down-conductors/" + east).contentType(MediaType.APPLICATION_JSON)
                .content("{\"positions\": [[0, 0], [5, 5]]}"), 400);
        assertThat(inside.path("field").asString()).isEqualTo("positions[1]");
        assertThat(send(delete("/api/sites/" + id + "/down-conductors/" + north), 200).path("buildings").get(0)
                .path("edited").asBoolean()).isFalse();
        assertThat(store.downConductors(id)).isEmpty();
    }

    @Test
    void separationDistancesFollowTheFormulaWithLAlongTheRoute() throws Exception {
        long id = upload();
        long version = sites.get(id).version();
        send(post("/api/sites/" + id + "/rods").contentType(MediaType.APPLICATION_JSON)
                .content("{\"version\": " + version + ", \"x\": 15, \"y\": 6, \"height\": \"2\"}"), 201);
        send(post("/api/sites/" + id + "/metal-installations").contentType(MediaType.APPLICATION_JSON)
                .content("{\"name\": \"Pipe\", \"x\": 15, \"y\": 8, \"z\": 9, \"material\": \"AIR\"}"), 201);
        JsonNode checks = send(get("/api/sites/" + id + "/separation-distances"), 200).path("checks");
        assertThat(checks.size()).isEqualTo(2);
        for (JsonNode c : checks) {
            // s = ki · kc / km · l [IEC 62305-3:2010 6.3]; class III ki = 0.04 (Table 10), kc = 0.44 for
            // three or more down-conductors (Annex C, simplified), km = 1 in air (Table 11)
            double s = 0.04 * 0.44 / 1.0 * c.path("length").asDouble();
            assertThat(c.path("required").asDouble()).isCloseTo(s, within(0.001));
            // a pass needs the clearance and a route along drawn parts: an assumed straight link across
            // the roof makes l (and s) a lower bound
            boolean drawn = c.path("routeBasis").asString().equals("drawn")
                    || c.path("routeBasis").asString().equals("grounded-part");
            assertThat(c.path("passes").asBoolean())
                    .isEqualTo(drawn && c.path("actual").asDouble() >= c.path("required").asDouble());
        }
        JsonNode pipe = checks.get(1);
        // worst point for (15, 8, 9): on the rod shaft (15, 6, 8..10), 2 m away level with the pipe and a little
        // higher, where l is longer: at u = k·a / √(1 − k²) = 3.5 cm above [closed form, a = 2 m,
        // k = 0.04 · 0.44 = 0.0176], √(4 + u²) = 2.0003 m away
        assertThat(pipe.path("actual").asDouble()).isCloseTo(2.0, within(0.01));
        assertThat(pipe.path("lpsPoint").get(2).asDouble()).isBetween(9.0, 9.2);
        // l: z − 8 m down the rod to its foot (15, 6, 8), no conductor drawn, so straight across the roof to
        // the nearest planned down-conductor and 8 m down the wall; that down-conductor is where the
        // route ends, so the straight part is its 3D distance from the foot [closed form]
        assertThat(pipe.path("routeBasis").asString()).isEqualTo("assumed-links");
        assertThat(pipe.path("length").asDouble()).isCloseTo(pipe.path("lpsPoint").get(2).asDouble() - 8
                + pipe.path("straightAcross").asDouble() + 8, within(0.02));
        assertThat(pipe.path("route").asString()).contains("straight across the roof where no conductor is drawn");

        JsonNode noName = send(post("/api/sites/" + id + "/metal-installations").contentType(MediaType.APPLICATION_JSON)
                .content("{\"x\": 1, \"y\": 1, \"z\": 1}"), 400);
        assertThat(noName.path("field").asString()).isEqualTo("name");
        JsonNode badMaterial = send(post("/api/sites/" + id + "/metal-installations").contentType(MediaType.APPLICATION_JSON)
                .content("{\"name\": \"Rail\", \"x\": 1, \"y\": 1, \"z\": 1, \"material\": \"wood\"}"), 400);
        assertThat(badMaterial.path("field").asString()).isEqualTo("material");
        JsonNode textHeight = send(post("/api/sites/" + id + "/metal-installations").contentType(MediaType.APPLICATION_JSON)
                .content("{\"name\": \"Rail\", \"x\": 1, \"y\": 1, \"z\": \"high\"}"), 400);
        assertThat(textHeight.path("field").asString()).isEqualTo("z");
        send(delete("/api/sites/" + id + "/metal-installations/987654"), 404);
    }

    @Test
    void quantitiesAsTableAndCsv() throws Exception {
        long id = upload();
        JsonNode table = send(get("/api/sites/" + id + "/quantities?fixingsPerMetre=2"), 200);
        assertThat(table.path("columns").size()).isEqualTo(4);
        String csv = mvc.perform(get("/api/sites/" + id + "/quantities.csv")).andExpect(status().isOk())
                .andReturn().getResponse().getContentAsString();
        assertThat(csv).startsWith("Item,Unit,Quantity,Basis\r\n").contains("Test joint,pcs,6,");
        JsonNode bad = send(get("/api/sites/" + id + "/quantities?fixingsPerMetre=-1"), 400);
        assertThat(bad.path("field").asString()).isEqualTo("fixingsPerMetre");
        send(get("/api/sites/" + id + "/quantities?fixingsPerMetre=abc"), 400);
    }
}
