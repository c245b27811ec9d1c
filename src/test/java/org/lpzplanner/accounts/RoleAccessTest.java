package org.lpzplanner.accounts;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.delete;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.multipart;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.patch;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.put;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.lpzplanner.analysis.AnalysisService;
import org.lpzplanner.audit.AuditTrail;
import org.lpzplanner.sites.SiteService;
import org.lpzplanner.sites.StoredSite;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.MediaType;
import org.springframework.mock.web.MockMultipartFile;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.RequestBuilder;

/**
 * What each role may do: designers edit, reviewers read, comment and mark reviewed but every
 * other state-changing request answers 403 and changes nothing, administrators manage accounts.
 */
@SpringBootTest
@AutoConfigureMockMvc
@SignedIn
class RoleAccessTest {

    @Autowired
    MockMvc mvc;

    @Autowired
    SiteService sites;

    @Autowired
    AnalysisService analyses;

    @Autowired
    AccountService accounts;

    @Autowired
    AuditTrail audit;

    long siteId;

    @BeforeEach
    void storeAnalysedSite() throws Exception {
        // stored for the default team, which the designer and the reviewer below both belong to
        StoredSite site = CurrentAccount.asSystem("test", accounts.defaultTeam().id(), () -> {
            StoredSite s = sites.create("brookfield-campus.geojson", sample("brookfield-campus.geojson"), "Campus",
                    "II", null);
            analyses.run(s.id(), null, null, null);
            return s;
        });
        siteId = site.id();
    }

    private static byte[] sample(String name) {
        try {
            return Files.readAllBytes(Path.of("sample-sites", name));
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    @Test
    void designerUploadsRenamesAndAnalyses() throws Exception {
        mvc.perform(multipart("/api/sites").file(new MockMultipartFile("file", "hall.geojson", null,
                sample("millbrook-hall.geojson")))).andExpect(status().isCreated());
        mvc.perform(post("/sites/{id}/name", siteId).param("name", "Campus renamed").param("version",
                String.valueOf(sites.get(siteId).version()))).andExpect(status().is3xxRedirection());
        mvc.perform(post("/api/sites/{id}/analyses", siteId)).andExpect(status().isCreated());

        assertThat(sites.get(siteId).name()).isEqualTo("Campus renamed");
        assertThat(audit.forSite(siteId, 10)).extracting(e -> e.action()).contains("rename", "analysis");
        assertThat(audit.forSite(siteId, 10)).filteredOn(e -> e.action().equals("rename"))
                .allSatisfy(e -> assertThat(e.actor()).isEqualTo("designer@default.test"));
    }

    @Test
    @SignedIn(role = Role.REVIEWER)
    void reviewerGets403OnEveryChangeAndNothingChanges() throws Exception {
        StoredSite before = sites.get(siteId);
        int siteCount = sites.list().size();
        String v = String.valueOf(before.version());
        RequestBuilder[] changes = {
            multipart("/api/sites").file(new MockMultipartFile("file", "hall.geojson", null,
                    sample("millbrook-hall.geojson"))),
            patch("/api/sites/{id}", siteId).contentType(MediaType.APPLICATION_JSON)
                    .content("{\"version\": " + v + ", \"name\": \"x\"}"),
            delete("/api/sites/{id}", siteId),
            post("/api/sites/{id}/duplicate", siteId),
            post("/api/sites/{id}/analyses", siteId),
            post("/api/sites/{id}/rods", siteId).contentType(MediaType.APPLICATION_JSON)
                    .content("{\"version\": " + v + ", \"x\": 1, \"y\": 1}"),
            put("/api/sites/{id}/rods/rod-1", siteId).contentType(MediaType.APPLICATION_JSON)
                    .content("{\"version\": " + v + ", \"x\": 1, \"y\": 1}"),
            delete("/api/sites/{id}/rods/rod-1", siteId).param("version", v),
            post("/api/sites/{id}/analyses/latest/accepted", siteId).contentType(MediaType.APPLICATION_JSON)
                    .content("{\"key\": \"edge-1\", \"reason\": \"r\"}"),
            delete("/api/sites/{id}/analyses/latest/accepted/edge-1", siteId),
            multipart("/sites").file(new MockMultipartFile("file", "hall.geojson", null,
                    sample("millbrook-hall.geojson"))),
            post("/sites/{id}/name", siteId).param("name", "x").param("version", v),
            post("/sites/{id}/duplicate", siteId),
            post("/sites/{id}/delete", siteId).param("confirm", "yes").param("version", v),
            post("/sites/{id}/structures", siteId).param("structure", "0").param("height", "9").param("version", v),
            post("/sites/{id}/analyses", siteId),
            post("/sites/{id}/accepted", siteId).param("key", "edge-1").param("reason", "r"),
            post("/sites/{id}/accepted/remove", siteId).param("key", "edge-1"),
            get("/sites/{id}/delete", siteId),
            get("/admin"),
            post("/admin/teams").param("name", "Reviewers' own team"),
        };
        for (RequestBuilder change : changes) {
            mvc.perform(change).andExpect(status().isForbidden());
        }

        StoredSite after = sites.get(siteId);
        assertThat(after.version()).isEqualTo(before.version());
        assertThat(after.name()).isEqualTo("Campus");
        assertThat(sites.list()).hasSize(siteCount);
        assertThat(accounts.teams()).noneMatch(t -> t.name().startsWith("Reviewers"));
    }

    @Test
    @SignedIn(role = Role.REVIEWER)
    void reviewerGets403OnDesignConductorsBackgroundAnalysesAndImport() throws Exception {
        StoredSite before = sites.get(siteId);
        int siteCount = sites.list().size();
        int auditCount = audit.forSite(siteId, 500).size();
        String v = String.valueOf(before.version());
        String installations = mvc.perform(get("/api/sites/{id}/metal-installations", siteId))
                .andExpect(status().isOk()).andReturn().getResponse().getContentAsString();
        MockMultipartFile export = new MockMultipartFile("file", "campus.site-export.json", null, "{}".getBytes());
        RequestBuilder[] changes = {
            post("/api/sites/{id}/proposals", siteId).contentType(MediaType.APPLICATION_JSON)
                    .content("{\"rodHeights\": [1]}"),
            post("/api/sites/{id}/proposals/any/accept", siteId).contentType(MediaType.APPLICATION_JSON)
                    .content("{\"version\": " + v + "}"),
            post("/api/sites/{id}/proposals/any/cancel", siteId),
            put("/api/sites/{id}/down-conductors/structure-1", siteId).contentType(MediaType.APPLICATION_JSON)
                    .content("{\"positions\": [[0, 0], [10, 0]]}"),
            delete("/api/sites/{id}/down-conductors/structure-1", siteId),
            post("/api/sites/{id}/metal-installations", siteId).contentType(MediaType.APPLICATION_JSON)
                    .content("{\"name\": \"Pipe\", \"x\": 1, \"y\": 1, \"z\": 2, \"material\": \"AIR\"}"),
            delete("/api/sites/{id}/metal-installations/1", siteId),
            post("/sites/{id}/design/down-conductors/structure-1", siteId).param("positions", "0 0\n10 0"),
            post("/sites/{id}/design/installations", siteId).param("name", "Pipe").param("x", "1").param("y", "1")
                    .param("z", "2").param("material", "AIR"),
            post("/sites/{id}/design/installations/1/delete", siteId),
            post("/api/sites/{id}/conductors", siteId).contentType(MediaType.APPLICATION_JSON)
                    .content("{\"version\": " + v + ", \"points\": [[0, 0], [10, 0]], \"heightAboveRoof\": \"0.5\"}"),
            delete("/api/sites/{id}/conductors/conductor-1", siteId).param("version", v),
            post("/api/sites/{id}/analyses", siteId).param("async", "true"),
            delete("/api/sites/{id}/analyses/jobs/any", siteId),
            multipart("/api/sites/import").file(export),
            multipart("/sites/import").file(export),
            put("/api/sites/{id}/risk", siteId).contentType(MediaType.APPLICATION_JSON).content("{}"),
            post("/sites/{id}/risk", siteId),
            post("/sites/{id}/risk/level", siteId),
        };
        for (RequestBuilder change : changes) {
            mvc.perform(change).andExpect(status().isForbidden());
        }

        StoredSite after = sites.get(siteId);
        assertThat(after.version()).isEqualTo(before.version());
        assertThat(after.sourceText()).isEqualTo(before.sourceText());
        assertThat(sites.list()).hasSize(siteCount);
        assertThat(audit.forSite(siteId, 500)).hasSize(auditCount);
        assertThat(mvc.perform(get("/api/sites/{id}/metal-installations", siteId)).andReturn().getResponse()
                .getContentAsString()).isEqualTo(installations);
        // the design page shows a reviewer the checks but none of the editing forms
        String page = mvc.perform(get("/sites/{id}/design", siteId)).andExpect(status().isOk()).andReturn()
                .getResponse().getContentAsString();
        assertThat(page).contains("id=\"separation\"")
                .doesNotContain("id=\"propose-form\"", "id=\"installation-form\"", "/design/down-conductors/",
                        "/design/installations/");
    }

    @Test
    @SignedIn(role = Role.REVIEWER)
    void reviewerReadsCommentsAndMarksTheRevisionReviewed() throws Exception {
        mvc.perform(get("/")).andExpect(status().isOk());
        String plan = mvc.perform(get("/sites/{id}", siteId)).andExpect(status().isOk()).andReturn().getResponse()
                .getContentAsString();
        // the page offers a reviewer no editing forms
        assertThat(plan).doesNotContain("id=\"rename-form\"", "id=\"correction-form\"", "class=\"accept-form\"")
                .contains("id=\"comment-form\"", "id=\"reviewed-form\"");
        mvc.perform(get("/api/sites/{id}", siteId)).andExpect(status().isOk());
        mvc.perform(get("/api/sites/{id}/analyses/latest/items", siteId)).andExpect(status().isOk());

        mvc.perform(post("/sites/{id}/comments", siteId).param("comment", "Check the north parapet"))
                .andExpect(status().is3xxRedirection());
        String created = mvc.perform(post("/api/sites/{id}/comments", siteId).contentType(MediaType.APPLICATION_JSON)
                .content("{\"comment\": \"Second look done\"}")).andExpect(status().isCreated())
                .andReturn().getResponse().getContentAsString();
        // the answer names the stored comment, the same id its list gives it
        long commentId = tools.jackson.databind.json.JsonMapper.builder().build().readTree(created).path("id").asLong();
        assertThat(commentId).isPositive();
        assertThat(mvc.perform(get("/api/sites/{id}/comments", siteId)).andReturn().getResponse()
                .getContentAsString()).contains("\"id\":" + commentId);
        mvc.perform(post("/sites/{id}/reviewed", siteId)).andExpect(status().is3xxRedirection());

        String after = mvc.perform(get("/sites/{id}", siteId)).andReturn().getResponse().getContentAsString();
        assertThat(after).contains("Check the north parapet", "Second look done",
                "Revision 1 reviewed by reviewer@default.test");
        assertThat(audit.forSite(siteId, 10)).extracting(e -> e.action()).contains("comment", "reviewed");
    }

    @Test
    @SignedIn(role = Role.ADMIN)
    void administratorCreatesAnAccountAndChangesItsRole() throws Exception {
        mvc.perform(get("/admin")).andExpect(status().isOk());
        long team = accounts.defaultTeam().id();
        mvc.perform(post("/admin/accounts").param("email", "New.Designer@Example.org").param("name", "New designer")
                .param("password", "a long enough password").param("role", "DESIGNER")
                .param("team", String.valueOf(team))).andExpect(status().is3xxRedirection());
        Account created = accounts.list().stream().filter(a -> a.email().equals("new.designer@example.org"))
                .findFirst().orElseThrow();
        assertThat(created.role()).isEqualTo(Role.DESIGNER);
        // the password is stored as a BCrypt hash through the delegating encoder, never as typed
        assertThat(created.passwordHash()).startsWith("{bcrypt}$2").doesNotContain("a long enough password");

        mvc.perform(post("/admin/accounts/{id}", created.id()).param("role", "REVIEWER")
                .param("team", String.valueOf(team)).param("enabled", "yes")).andExpect(status().is3xxRedirection());
        assertThat(accounts.get(created.id()).role()).isEqualTo(Role.REVIEWER);

        mvc.perform(post("/admin/accounts").param("email", "short@example.org").param("password", "short")
                .param("role", "DESIGNER").param("team", String.valueOf(team))).andExpect(status().isBadRequest());
        assertThat(accounts.list()).noneMatch(a -> a.email().equals("short@example.org"));
    }

    @Test
    void designerCannotManageAccounts() throws Exception {
        mvc.perform(get("/admin")).andExpect(status().isForbidden());
        mvc.perform(post("/admin/accounts").param("email", "x@example.org").param("password", "a long enough password")
                .param("role", "ADMIN").param("team", "1")).andExpect(status().isForbidden());
        assertThat(accounts.list()).noneMatch(a -> a.email().equals("x@example.org"));
    }
}
