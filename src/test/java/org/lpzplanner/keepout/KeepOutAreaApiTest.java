package org.lpzplanner.keepout;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.delete;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.patch;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.lpzplanner.accounts.AccountService;
import org.lpzplanner.accounts.CurrentAccount;
import org.lpzplanner.accounts.Role;
import org.lpzplanner.accounts.SignedIn;
import org.lpzplanner.analysis.AnalysisService;
import org.lpzplanner.audit.AuditTrail;
import org.lpzplanner.sites.SiteService;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.MediaType;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.MvcResult;
import org.springframework.test.web.servlet.RequestBuilder;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/** Keep-out areas over the API: store, list, rename, delete, every refusal, and where they show. */
@SpringBootTest
@AutoConfigureMockMvc
@SignedIn
class KeepOutAreaApiTest {

    private static final JsonMapper JSON = JsonMapper.builder().build();
    /** A 3 m × 2 m rectangle: 6 m² (closed form). */
    private static final String SKYLIGHT = "{\"name\": \" North skylight \", \"corners\": [[10, 5], [13, 5], [13, 7],"
            + " [10, 7], [10, 5]]}";

    @Autowired
    MockMvc mvc;
    @Autowired
    SiteService sites;
    @Autowired
    KeepOutAreaService areas;
    @Autowired
    AuditTrail audit;
    @Autowired
    AccountService accounts;
    @Autowired
    AnalysisService analyses;

    private long site() throws Exception {
        return sites.create("harbour-warehouse.geojson",
                Files.readAllBytes(Path.of("sample-sites/harbour-warehouse.geojson")), "Keep-out store", "III", null)
                .id();
    }

    private JsonNode send(RequestBuilder request, int status) throws Exception {
        String body = mvc.perform(request).andExpect(status().is(status)).andReturn().getResponse()
                .getContentAsString(StandardCharsets.UTF_8);
        return body.isEmpty() ? null : JSON.readTree(body);
    }

    private static RequestBuilder save(long id, String json) {
        return post("/api/sites/{id}/keep-out-areas", id).contentType(MediaType.APPLICATION_JSON).content(json);
    }

    private static RequestBuilder rename(long id, long area, String json) {
        return patch("/api/sites/{id}/keep-out-areas/{area}", id, area).contentType(MediaType.APPLICATION_JSON)
                .content(json);
    }

    @Test
    void storesListsRenamesAndDeletesAnAreaAndRecordsEachChange() throws Exception {
        long id = site();
        long version = sites.get(id).version();
        MvcResult created = mvc.perform(save(id, SKYLIGHT)).andExpect(status().isCreated()).andReturn();
        JsonNode saved = JSON.readTree(created.getResponse().getContentAsString(StandardCharsets.UTF_8));
        long areaId = saved.path("id").asLong();
        assertThat(created.getResponse().getHeader("Location")).isEqualTo("/api/sites/" + id + "/keep-out-areas/"
                + areaId);
        assertThat(saved.path("name").asString()).isEqualTo("North skylight");
        // the closing corner of a closed ring is dropped: 4 corners stay
        assertThat(saved.path("corners")).hasSize(4);
        assertThat(saved.path("area").asDouble()).isCloseTo(6.0, within(1e-9)); // 3 m × 2 m
        // a keep-out area changes no analysis: the site's version stays (like saved cuts)
        assertThat(sites.get(id).version()).isEqualTo(version);

        // a right triangle with legs 4 m and 3 m: 6 m² (closed form), corners given clockwise
        JsonNode triangle = send(save(id, "{\"name\": \"Walkway end\", \"corners\": [[0, 0], [0, 3], [4, 0]]}"), 201);
        assertThat(triangle.path("area").asDouble()).isCloseTo(6.0, within(1e-9));

        JsonNode list = send(get("/api/sites/{id}/keep-out-areas", id), 200);
        assertThat(list).hasSize(2);
        assertThat(list.get(0).path("name").asString()).isEqualTo("North skylight");
        assertThat(list.get(0).path("corners").get(1).get(0).asDouble()).isEqualTo(13);
        assertThat(list.get(1).path("name").asString()).isEqualTo("Walkway end");

        JsonNode renamed = send(rename(id, areaId, "{\"name\": \"Skylight over the stairs\"}"), 200);
        assertThat(renamed.path("name").asString()).isEqualTo("Skylight over the stairs");
        assertThat(areas.areas(id).get(0).name()).isEqualTo("Skylight over the stairs");

        send(delete("/api/sites/{id}/keep-out-areas/{area}", id, areaId), 204);
        assertThat(areas.areas(id)).extracting(KeepOutArea::name).containsExactly("Walkway end");
        JsonNode again = send(delete("/api/sites/{id}/keep-out-areas/{area}", id, areaId), 404);
        assertThat(again.path("error").asString()).contains("no keep-out area " + areaId);

        assertThat(audit.forSite(id, 20)).anySatisfy(e -> {
            assertThat(e.action()).isEqualTo("keep-out-added");
            assertThat(e.detail()).contains("North skylight").contains("4 corners").contains("6.00 m²");
        }).anySatisfy(e -> {
            assertThat(e.action()).isEqualTo("keep-out-renamed");
            assertThat(e.detail()).contains("\"North skylight\" to \"Skylight over the stairs\"");
        }).anySatisfy(e -> assertThat(e.action()).isEqualTo("keep-out-removed"));
    }

    @Test
    void storedAreasShowOnTheDesignPageAndHatchedOnThePlan() throws Exception {
        long id = site();
        analyses.run(id, null, null, null);
        send(save(id, SKYLIGHT), 201);
        String design = mvc.perform(get("/sites/{id}/design", id)).andExpect(status().isOk()).andReturn()
                .getResponse().getContentAsString(StandardCharsets.UTF_8);
        assertThat(design).contains("id=\"keep-out-table\"").contains("North skylight").contains("6.00")
                .contains("id=\"store-keep-out\"").contains("class=\"keep-out-area\"");
        String plan = mvc.perform(get("/sites/{id}", id)).andExpect(status().isOk()).andReturn()
                .getResponse().getContentAsString(StandardCharsets.UTF_8);
        assertThat(plan).contains("class=\"keep-out-area\"").contains("data-keep-out-name=\"North skylight\"")
                .contains("url(#keep-out-hatch)").contains("Keep-out area stored for the site")
                .contains("keep-out area added");
        // a rod placed on the plan answers with the plan drawn again: the stored areas stay on it
        JsonNode change = send(post("/api/sites/{id}/rods", id).contentType(MediaType.APPLICATION_JSON)
                .content("{\"version\": " + sites.get(id).version() + ", \"x\": 30, \"y\": 30, \"height\": \"1\"}"),
                201);
        assertThat(change.path("svg").asString()).contains("data-keep-out-name=\"North skylight\"");
    }

    @Test
    void badInputAnswers400NamingTheFieldAndStoresNothing() throws Exception {
        long id = site();
        String square = "[[0, 0], [4, 0], [4, 4], [0, 4]]";
        assertThat(field(id, "{\"corners\": " + square + "}")).isEqualTo("name");
        assertThat(field(id, "{\"name\": \"  \", \"corners\": " + square + "}")).isEqualTo("name");
        JsonNode longName = send(save(id, "{\"name\": \"" + "n".repeat(101) + "\", \"corners\": " + square + "}"), 400);
        assertThat(longName.path("field").asString()).isEqualTo("name");
        assertThat(longName.path("error").asString()).contains("at most 100 characters, got 101");
        assertThat(field(id, "{\"name\": \"A\"}")).isEqualTo("corners");
        assertThat(field(id, "{\"name\": \"A\", \"corners\": \"0 0, 4 0, 4 4\"}")).isEqualTo("corners");
        JsonNode two = send(save(id, "{\"name\": \"A\", \"corners\": [[0, 0], [4, 0]]}"), 400);
        assertThat(two.path("field").asString()).isEqualTo("corners");
        assertThat(two.path("error").asString()).contains("3 to 200 corners, got 2");
        assertThat(field(id, "{\"name\": \"A\", \"corners\": [[0, 0], [4, \"x\"], [4, 4]]}")).isEqualTo("corners[1]");
        assertThat(field(id, "{\"name\": \"A\", \"corners\": [[0, 0], [4, 0, 1], [4, 4]]}")).isEqualTo("corners[1]");
        // beyond 100 km from the origin: degrees or another frame, not local metres
        assertThat(field(id, "{\"name\": \"A\", \"corners\": [[1e6, 0], [4, 0], [4, 4]]}")).isEqualTo("corners[0]");
        // 1e400 overflows a double: not a finite number
        assertThat(field(id, "{\"name\": \"A\", \"corners\": [[0, 0], [1e400, 0], [4, 4]]}")).isEqualTo("corners[1]");
        assertThat(field(id, "{\"name\": \"A\", \"corners\": [[0, 0], [4, 0], [4, 0], [4, 4]]}")).isEqualTo("corners[2]");
        // corners on one line: no area
        JsonNode line = send(save(id, "{\"name\": \"A\", \"corners\": [[0, 0], [2, 0], [5, 0]]}"), 400);
        assertThat(line.path("field").asString()).isEqualTo("corners");
        assertThat(line.path("error").asString()).contains("on a line");
        // a bow tie: the sides (0,0)-(4,4) and (4,0)-(0,4) cross at (2, 2)
        JsonNode bowTie = send(save(id, "{\"name\": \"A\", \"corners\": [[0, 0], [4, 4], [4, 0], [0, 4]]}"), 400);
        assertThat(bowTie.path("field").asString()).isEqualTo("corners");
        assertThat(bowTie.path("error").asString()).contains("crosses itself near (2.00, 2.00)");
        StringBuilder many = new StringBuilder("[");
        for (int i = 0; i < 201; i++) {
            double a = 2 * Math.PI * i / 201;
            many.append(i == 0 ? "" : ", ").append("[").append(10 * Math.cos(a)).append(", ").append(10 * Math.sin(a))
                    .append("]");
        }
        JsonNode tooMany = send(save(id, "{\"name\": \"A\", \"corners\": " + many + "]}"), 400);
        assertThat(tooMany.path("error").asString()).contains("got 201");
        assertThat(field(id, "[1, 2]")).isEqualTo("body");
        assertThat(areas.areas(id)).isEmpty();

        long stored = areas.save(id, "Plant access", List.of(new double[] {0, 0}, new double[] {1, 0},
                new double[] {1, 1})).id();
        assertThat(send(rename(id, stored, "{\"name\": \"\"}"), 400).path("field").asString()).isEqualTo("name");
        assertThat(send(rename(id, stored, "{\"name\": 5}"), 400).path("field").asString()).isEqualTo("name");
        assertThat(areas.areas(id).get(0).name()).isEqualTo("Plant access");
    }

    @Test
    void aSiteKeepsAtMost50Areas() throws Exception {
        long id = site();
        for (int i = 0; i < KeepOutAreaService.MAX_AREAS; i++) {
            areas.save(id, "Panel " + i, List.of(new double[] {i, 0}, new double[] {i + 0.5, 0},
                    new double[] {i + 0.5, 1}));
        }
        JsonNode full = send(save(id, "{\"name\": \"One more\", \"corners\": [[0, 0], [4, 0], [4, 4]]}"), 400);
        assertThat(full.path("field").asString()).isEqualTo("corners");
        assertThat(full.path("error").asString()).contains("already keeps 50");
        assertThat(areas.areas(id)).hasSize(50);
    }

    @Test
    void unknownSiteAndAnotherTeamsSiteAnswer404() throws Exception {
        long otherTeam = accounts.teams().stream().filter(t -> t.name().equals("Northfield office")).findFirst()
                .orElseGet(() -> accounts.createTeam("Northfield office")).id();
        byte[] file = Files.readAllBytes(Path.of("sample-sites/harbour-warehouse.geojson"));
        long foreign = CurrentAccount.asSystem("test", otherTeam, () ->
                sites.create("w.geojson", file, "Secret store", "III", null).id());
        long foreignArea = CurrentAccount.asSystem("test", otherTeam, () -> areas.save(foreign, "Secret roof",
                List.of(new double[] {0, 0}, new double[] {4, 0}, new double[] {4, 4})).id());
        for (long id : new long[] {foreign, 987654321L}) {
            assertThat(send(get("/api/sites/{id}/keep-out-areas", id), 404).toString()).doesNotContain("Secret");
            send(save(id, SKYLIGHT), 404);
            send(rename(id, foreignArea, "{\"name\": \"Mine now\"}"), 404);
            send(delete("/api/sites/{id}/keep-out-areas/{area}", id, foreignArea), 404);
        }
        // another team's area id under one of our own sites is unknown too
        long own = site();
        send(delete("/api/sites/{id}/keep-out-areas/{area}", own, foreignArea), 404);
        send(rename(own, foreignArea, "{\"name\": \"Mine now\"}"), 404);
        assertThat(CurrentAccount.asSystem("test", otherTeam, () -> areas.areas(foreign)))
                .extracting(KeepOutArea::name).containsExactly("Secret roof");
    }

    @Test
    @SignedIn(role = Role.REVIEWER)
    void reviewerSeesStoredAreasButGets403OnEveryChange() throws Exception {
        long id = site();
        long area = areas.save(id, "Solar panels", List.of(new double[] {0, 0}, new double[] {4, 0},
                new double[] {4, 4})).id();
        send(save(id, SKYLIGHT), 403);
        send(rename(id, area, "{\"name\": \"B\"}"), 403);
        send(delete("/api/sites/{id}/keep-out-areas/{area}", id, area), 403);
        assertThat(send(get("/api/sites/{id}/keep-out-areas", id), 200)).hasSize(1);
        assertThat(areas.areas(id).get(0).name()).isEqualTo("Solar panels");
        String design = mvc.perform(get("/sites/{id}/design", id)).andExpect(status().isOk()).andReturn()
                .getResponse().getContentAsString(StandardCharsets.UTF_8);
        assertThat(design).contains("Solar panels").doesNotContain("id=\"store-keep-out\"")
                .doesNotContain("remove-keep-out");
    }

    private String field(long id, String json) throws Exception {
        return send(save(id, json), 400).path("field").asString();
    }
}
