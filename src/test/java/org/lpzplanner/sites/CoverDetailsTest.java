package org.lpzplanner.sites;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.patch;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;
import org.lpzplanner.accounts.AccountService;
import org.lpzplanner.accounts.CurrentAccount;
import org.lpzplanner.accounts.Role;
import org.lpzplanner.accounts.SignedIn;
import org.lpzplanner.analysis.AnalysisService;
import org.lpzplanner.audit.AuditTrail;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.MediaType;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.RequestBuilder;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * The address and designer a site stores for its report's cover: entered on the site page and
 * through the JSON API, checked, audited, refused to reviewers and other teams, and printed.
 */
@SpringBootTest
@AutoConfigureMockMvc
@SignedIn
class CoverDetailsTest {

    private static final JsonMapper JSON = JsonMapper.builder().build();

    @Autowired
    MockMvc mvc;
    @Autowired
    SiteService sites;
    @Autowired
    AnalysisService analyses;
    @Autowired
    AuditTrail audit;
    @Autowired
    AccountService accounts;

    private long site(String name) throws Exception {
        return sites.create("harbour-warehouse.geojson",
                Files.readAllBytes(Path.of("sample-sites/harbour-warehouse.geojson")), name, "III", null).id();
    }

    private JsonNode send(RequestBuilder request, int status) throws Exception {
        String body = mvc.perform(request).andExpect(status().is(status)).andReturn().getResponse()
                .getContentAsString(StandardCharsets.UTF_8);
        return body.isEmpty() || !body.startsWith("{") ? null : JSON.readTree(body);
    }

    private static RequestBuilder patchJson(long id, String json) {
        return patch("/api/sites/{id}", id).contentType(MediaType.APPLICATION_JSON).content(json);
    }

    private String page(long id) throws Exception {
        return mvc.perform(get("/sites/{id}", id)).andExpect(status().isOk()).andReturn().getResponse()
                .getContentAsString(StandardCharsets.UTF_8);
    }

    @Test
    void apiStoresShowsAndClearsTheDetailsAndTheTrailRecordsThem() throws Exception {
        long id = site("Cover shed");
        long version = sites.get(id).version();
        JsonNode changed = send(patchJson(id, "{\"version\": " + version
                + ", \"address\": \"  4 Quay Row, Saltmarsh \u00c9tang  \", \"designer\": \"R. \u00d8stberg <PE>\"}"),
                200);
        assertThat(changed.path("address").asString()).isEqualTo("4 Quay Row, Saltmarsh \u00c9tang");
        assertThat(changed.path("designer").asString()).isEqualTo("R. \u00d8stberg <PE>");
        assertThat(changed.path("version").asLong()).isEqualTo(version + 1);
        assertThat(send(get("/api/sites/{id}", id), 200).path("address").asString())
                .isEqualTo("4 Quay Row, Saltmarsh \u00c9tang");
        assertThat(audit.forSite(id, 10)).anySatisfy(e -> {
            assertThat(e.action()).isEqualTo("cover details");
            assertThat(e.detail()).contains("address \"\" to \"4 Quay Row, Saltmarsh \u00c9tang\"")
                    .contains("designer \"\" to \"R. \u00d8stberg <PE>\"");
        });
        // the page shows them, escaped, to every role
        assertThat(page(id)).contains("4 Quay Row, Saltmarsh \u00c9tang").contains("R. \u00d8stberg &lt;PE&gt;");

        // a name change in the same call is one change of the site; null clears the address
        JsonNode both = send(patchJson(id, "{\"version\": " + (version + 1)
                + ", \"name\": \"Cover shed 2\", \"address\": null}"), 200);
        assertThat(both.path("name").asString()).isEqualTo("Cover shed 2");
        assertThat(both.path("address").asString()).isEmpty();
        assertThat(both.path("designer").asString()).isEqualTo("R. \u00d8stberg <PE>");
        // the version follows every write, so the next read-modify-write still works
        send(patchJson(id, "{\"version\": " + both.path("version").asLong() + ", \"designer\": \"\"}"), 200);
        assertThat(sites.get(id).designer()).isEmpty();
    }

    @Test
    void badDetailsAnswer400NamingTheFieldAndChangeNothing() throws Exception {
        long id = site("Refused cover");
        StoredSite before = sites.get(id);
        String v = "{\"version\": " + before.version() + ", ";
        JsonNode tooLong = send(patchJson(id, v + "\"address\": \"" + "a".repeat(201) + "\"}"), 400);
        assertThat(tooLong.path("field").asString()).isEqualTo("address");
        assertThat(tooLong.path("error").asString()).contains("at most 200 characters, got 201");
        // 200 characters are kept (the column is VARCHAR(200))
        JsonNode control = send(patchJson(id, v + "\"designer\": \"Ann\\nLee\"}"), 400);
        assertThat(control.path("field").asString()).isEqualTo("designer");
        assertThat(control.path("error").asString()).contains("U+000A");
        assertThat(send(patchJson(id, v + "\"address\": \"Bell\\u0007 Road\"}"), 400).path("field").asString())
                .isEqualTo("address");
        assertThat(send(patchJson(id, v + "\"designer\": \"Half \\ud83d pair\"}"), 400).path("field").asString())
                .isEqualTo("designer");
        assertThat(send(patchJson(id, v + "\"designer\": 42}"), 400).path("field").asString()).isEqualTo("designer");
        // a bad detail beside a good name: nothing is written
        assertThat(send(patchJson(id, v + "\"name\": \"New\", \"address\": \"x\\ty\"}"), 400).path("field")
                .asString()).isEqualTo("address");
        StoredSite after = sites.get(id);
        assertThat(after.name()).isEqualTo(before.name());
        assertThat(after.address()).isEmpty();
        assertThat(after.version()).isEqualTo(before.version());

        send(patchJson(id, v + "\"address\": \"" + "a".repeat(200) + "\"}"), 200);
        assertThat(sites.get(id).address()).hasSize(200);
    }

    @Test
    void pageFormSavesTheDetailsAndShowsErrorsAndClashes() throws Exception {
        long id = site("Form shed");
        long version = sites.get(id).version();
        assertThat(page(id)).contains("id=\"cover-form\"").contains("Address: not entered");
        mvc.perform(post("/sites/{id}/cover-details", id).param("version", String.valueOf(version))
                        .param("address", "Unit 7, Fenwick Yard").param("designer", "Mara Quill"))
                .andExpect(status().is3xxRedirection());
        assertThat(sites.get(id).address()).isEqualTo("Unit 7, Fenwick Yard");
        assertThat(sites.get(id).designer()).isEqualTo("Mara Quill");
        assertThat(page(id)).contains("value=\"Unit 7, Fenwick Yard\"").contains("value=\"Mara Quill\"");

        String refused = mvc.perform(post("/sites/{id}/cover-details", id)
                        .param("version", String.valueOf(version + 1)).param("address", "x".repeat(201))
                        .param("designer", "Mara Quill"))
                .andExpect(status().isBadRequest()).andReturn().getResponse().getContentAsString(StandardCharsets.UTF_8);
        assertThat(refused).contains("id=\"cover-error\"").contains("at most 200 characters");
        // stale version: 409, what was typed is kept in the form, nothing stored
        String clash = mvc.perform(post("/sites/{id}/cover-details", id).param("version", String.valueOf(version))
                        .param("address", "Typed again").param("designer", ""))
                .andExpect(status().isConflict()).andReturn().getResponse().getContentAsString(StandardCharsets.UTF_8);
        assertThat(clash).contains("id=\"cover-clash\"").contains("value=\"Typed again\"");
        assertThat(sites.get(id).address()).isEqualTo("Unit 7, Fenwick Yard");
    }

    @Test
    @SignedIn(role = Role.REVIEWER)
    void aReviewerSeesTheDetailsButCannotChangeThem() throws Exception {
        long id = site("Reviewed shed");
        long version = sites.get(id).version();
        sites.updateCoverDetails(id, version, "9 Heron Quay", "Ida Marsh");
        send(patchJson(id, "{\"version\": " + (version + 1) + ", \"address\": \"Elsewhere\"}"), 403);
        send(post("/sites/{id}/cover-details", id).param("version", String.valueOf(version + 1))
                .param("address", "Elsewhere").param("designer", "Someone"), 403);
        assertThat(sites.get(id).address()).isEqualTo("9 Heron Quay");
        assertThat(page(id)).contains("9 Heron Quay").doesNotContain("id=\"cover-form\"");
    }

    @Test
    void anotherTeamsSiteAnswers404AndKeepsItsDetails() throws Exception {
        long otherTeam = accounts.teams().stream().filter(t -> t.name().equals("Northfield office")).findFirst()
                .orElseGet(() -> accounts.createTeam("Northfield office")).id();
        byte[] file = Files.readAllBytes(Path.of("sample-sites/harbour-warehouse.geojson"));
        long foreign = CurrentAccount.asSystem("test", otherTeam, () -> {
            long f = sites.create("w.geojson", file, "Secret shed", "III", null).id();
            sites.updateCoverDetails(f, 0, "1 Hidden Lane", "Secret Designer");
            return f;
        });
        for (long id : new long[] {foreign, 987654321L}) {
            JsonNode answer = send(patchJson(id, "{\"version\": 1, \"address\": \"Taken\"}"), 404);
            assertThat(answer.toString()).doesNotContain("Hidden Lane");
            send(post("/sites/{id}/cover-details", id).param("version", "1").param("address", "Taken")
                    .param("designer", "x"), 404);
        }
        assertThat(CurrentAccount.asSystem("test", otherTeam, () -> sites.get(foreign).address()))
                .isEqualTo("1 Hidden Lane");
    }

    @Test
    void theReportCoverPrintsTheStoredDetailsOrKeepsLinesToFillIn() throws Exception {
        long id = site("Printed cover");
        analyses.run(id, null, null, null);
        String blank = cover(id);
        assertThat(blank).contains("Address and designer not stored for the site: write them on the lines above.");

        // long enough to wrap; characters the font lacks print as "?"
        String address = "Warehouse 3, Quay Row " + "(loading side, gate B) ".repeat(6) + "\u5de5 end";
        sites.updateCoverDetails(id, sites.get(id).version(), address, "Mara Quill, chartered engineer");
        String printed = cover(id);
        assertThat(printed).contains("Warehouse 3, Quay Row (loading side, gate B)").contains("? end")
                .contains("Designer Mara Quill, chartered engineer")
                .containsPattern("Address and designer as stored for the site on \\d{4}-\\d\\d-\\d\\d \\d\\d:\\d\\d UTC"
                        + " when this report was printed");
        // the revision's own content did not change: only the cover's details and their note differ
        assertThat(printed.replaceAll("Address .*? UTC when this report was printed \\(site data, not part of the"
                + " analysis revision\\)\\.", "")).doesNotContain("not stored for the site");

        sites.updateCoverDetails(id, sites.get(id).version(), null, "");
        assertThat(cover(id)).contains("Address as stored for the site on")
                .contains("designer not stored for the site: write it on the line above.");
    }

    /** The first page of the latest revision's report, whitespace folded. */
    private String cover(long id) throws Exception {
        byte[] pdf = mvc.perform(get("/api/sites/{id}/revisions/1/report", id)).andExpect(status().isOk()).andReturn()
                .getResponse().getContentAsByteArray();
        try (PDDocument doc = Loader.loadPDF(pdf)) {
            PDFTextStripper stripper = new PDFTextStripper();
            stripper.setStartPage(1);
            stripper.setEndPage(1);
            return stripper.getText(doc).replaceAll("\\s+", " ");
        }
    }
}
