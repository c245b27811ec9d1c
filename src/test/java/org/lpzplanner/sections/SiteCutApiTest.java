package org.lpzplanner.sections;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.delete;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.lpzplanner.accounts.AccountService;
import org.lpzplanner.accounts.CurrentAccount;
import org.lpzplanner.accounts.Role;
import org.lpzplanner.accounts.SignedIn;
import org.lpzplanner.audit.AuditTrail;
import org.lpzplanner.sites.SiteService;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.MediaType;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.RequestBuilder;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/** Saved section cuts over the API and the section page: save, list, delete, and every refusal. */
@SpringBootTest
@AutoConfigureMockMvc
@SignedIn
class SiteCutApiTest {

    private static final JsonMapper JSON = JsonMapper.builder().build();

    @Autowired
    MockMvc mvc;
    @Autowired
    SiteService sites;
    @Autowired
    SiteCutService cuts;
    @Autowired
    AuditTrail audit;
    @Autowired
    AccountService accounts;

    private long site() throws Exception {
        return sites.create("harbour-warehouse.geojson",
                Files.readAllBytes(Path.of("sample-sites/harbour-warehouse.geojson")), "Cut store", "III", null).id();
    }

    private JsonNode send(RequestBuilder request, int status) throws Exception {
        String body = mvc.perform(request).andExpect(status().is(status)).andReturn().getResponse()
                .getContentAsString(StandardCharsets.UTF_8);
        return body.isEmpty() ? null : JSON.readTree(body);
    }

    private static RequestBuilder save(long id, String json) {
        return post("/api/sites/{id}/cuts", id).contentType(MediaType.APPLICATION_JSON).content(json);
    }

    @Test
    void savesListsAndDeletesACutAndRecordsBoth() throws Exception {
        long id = site();
        JsonNode saved = send(save(id, "{\"name\": \" North gable \", \"x1\": -10, \"y1\": 20, \"x2\": 90.5, \"y2\": 20}"),
                201);
        assertThat(saved.path("name").asString()).isEqualTo("North gable");
        assertThat(saved.path("x2").asDouble()).isEqualTo(90.5);

        JsonNode list = send(get("/api/sites/{id}/cuts", id), 200);
        assertThat(list).hasSize(1);
        assertThat(list.get(0).path("id").asLong()).isEqualTo(saved.path("id").asLong());
        assertThat(list.get(0).path("x1").asDouble()).isEqualTo(-10);
        assertThat(audit.forSite(id, 10)).anySatisfy(e -> {
            assertThat(e.action()).isEqualTo("save cut");
            assertThat(e.detail()).contains("North gable").contains("(-10.00, 20.00)");
        });

        String page = mvc.perform(get("/sites/{id}/section", id)).andExpect(status().isOk()).andReturn()
                .getResponse().getContentAsString(StandardCharsets.UTF_8);
        assertThat(page).contains("id=\"saved-cuts\"").contains("North gable").contains("id=\"save-cut-form\"");

        send(delete("/api/sites/{id}/cuts/{cut}", id, saved.path("id").asLong()), 204);
        assertThat(send(get("/api/sites/{id}/cuts", id), 200)).isEmpty();
        assertThat(audit.forSite(id, 10)).anySatisfy(e -> assertThat(e.action()).isEqualTo("delete cut"));
        // deleting it again: the site has no such cut any more
        JsonNode again = send(delete("/api/sites/{id}/cuts/{cut}", id, saved.path("id").asLong()), 404);
        assertThat(again.toString()).contains("no saved cut");
    }

    @Test
    void badInputAnswers400NamingTheFieldAndStoresNothing() throws Exception {
        long id = site();
        assertThat(send(save(id, "{\"name\": \"A\", \"x1\": \"ten\", \"y1\": 0, \"x2\": 10, \"y2\": 0}"), 400)
                .path("field").asString()).isEqualTo("x1");
        assertThat(send(save(id, "{\"name\": \"A\", \"x1\": 0, \"y1\": 0, \"x2\": 10}"), 400)
                .path("field").asString()).isEqualTo("y2");
        // zero length: both ends at (5, 5)
        JsonNode zero = send(save(id, "{\"name\": \"A\", \"x1\": 5, \"y1\": 5, \"x2\": 5, \"y2\": 5}"), 400);
        assertThat(zero.toString()).contains("at least 1 m apart");
        JsonNode longName = send(save(id, "{\"name\": \"" + "n".repeat(101)
                + "\", \"x1\": 0, \"y1\": 0, \"x2\": 10, \"y2\": 0}"), 400);
        assertThat(longName.path("field").asString()).isEqualTo("name");
        assertThat(longName.toString()).contains("at most 100 characters, got 101");
        assertThat(send(save(id, "{\"name\": \"  \", \"x1\": 0, \"y1\": 0, \"x2\": 10, \"y2\": 0}"), 400)
                .path("field").asString()).isEqualTo("name");
        assertThat(cuts.cuts(id)).isEmpty();
    }

    @Test
    void unknownSiteAndAnotherTeamsSiteAnswer404() throws Exception {
        long otherTeam = accounts.teams().stream().filter(t -> t.name().equals("Northfield office")).findFirst()
                .orElseGet(() -> accounts.createTeam("Northfield office")).id();
        byte[] file = Files.readAllBytes(Path.of("sample-sites/harbour-warehouse.geojson"));
        long foreign = CurrentAccount.asSystem("test", otherTeam, () -> {
            long f = sites.create("w.geojson", file, "Secret store", "III", null).id();
            cuts.save(f, "Secret cut", new String[] {"0", "0", "10", "0"});
            return f;
        });
        long foreignCut = CurrentAccount.asSystem("test", otherTeam, () -> cuts.cuts(foreign).get(0).id());
        String ok = "{\"name\": \"A\", \"x1\": 0, \"y1\": 0, \"x2\": 10, \"y2\": 0}";
        for (long id : new long[] {foreign, 987654321L}) {
            assertThat(send(get("/api/sites/{id}/cuts", id), 404).toString()).doesNotContain("Secret");
            send(save(id, ok), 404);
            send(delete("/api/sites/{id}/cuts/{cut}", id, foreignCut), 404);
        }
        assertThat(CurrentAccount.asSystem("test", otherTeam, () -> cuts.cuts(foreign))).hasSize(1);
    }

    @Test
    @SignedIn(role = Role.REVIEWER)
    void reviewerSeesSavedCutsButGets403OnSaveAndDelete() throws Exception {
        long id = site();
        long cut = cuts.save(id, "East wall", new String[] {"0", "0", "10", "0"}).id();
        send(save(id, "{\"name\": \"B\", \"x1\": 0, \"y1\": 0, \"x2\": 10, \"y2\": 0}"), 403);
        send(delete("/api/sites/{id}/cuts/{cut}", id, cut), 403);
        send(post("/sites/{id}/cuts", id).param("name", "B").param("x1", "0").param("y1", "0").param("x2", "10")
                .param("y2", "0"), 403);
        send(post("/sites/{id}/cuts/{cut}/delete", id, cut), 403);
        assertThat(send(get("/api/sites/{id}/cuts", id), 200)).hasSize(1);
        String page = mvc.perform(get("/sites/{id}/section", id)).andExpect(status().isOk()).andReturn()
                .getResponse().getContentAsString(StandardCharsets.UTF_8);
        assertThat(page).contains("East wall").doesNotContain("save-cut-form").doesNotContain("/delete\"");
    }

    @Test
    void sectionPageFormSavesTheCutShownAndDeletesIt() throws Exception {
        long id = site();
        mvc.perform(post("/sites/{id}/cuts", id).param("name", "Along the quay").param("x1", "-5").param("y1", "20")
                        .param("x2", "85").param("y2", "20"))
                .andExpect(status().is3xxRedirection());
        SiteCut cut = cuts.cuts(id).get(0);
        assertThat(cut.name()).isEqualTo("Along the quay");
        mvc.perform(post("/sites/{id}/cuts", id).param("name", "Short").param("x1", "1").param("y1", "1")
                .param("x2", "1.5").param("y2", "1")).andExpect(status().isBadRequest());
        mvc.perform(post("/sites/{id}/cuts/{cut}/delete", id, cut.id())).andExpect(status().is3xxRedirection());
        assertThat(cuts.cuts(id)).isEmpty();
    }
}
