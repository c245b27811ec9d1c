package org.lpzplanner.editing;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.delete;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.multipart;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.put;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.flash;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.redirectedUrl;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import jakarta.servlet.http.Cookie;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.lpzplanner.accounts.SignedIn;
import org.lpzplanner.heavywork.HeavyWorkCapacity;
import org.lpzplanner.heavywork.HeldPlace;
import org.lpzplanner.analysis.AnalysisRepository;
import org.lpzplanner.audit.AuditTrail;
import org.lpzplanner.sites.SampleFiles;
import org.lpzplanner.sites.SiteService;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.MediaType;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.RequestBuilder;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * While every analysis place of the instance is taken, a change of a site is still stored: the
 * answer (201 or 200, as when analysed) carries the site's new version and says the analysis is
 * pending and why, the change is kept with its earlier file and audit line, the next change sent
 * with that version is accepted, and once a place is free the next change is analysed again. Pages
 * (upload, structure correction) send the browser to the plan, which says the analysis is pending
 * and gives no verdict for the older revision it still shows.
 */
@SpringBootTest(properties = {"lpz.analysis.concurrent=1", "lpz.analysis.wait-seconds=0",
        "lpz.analysis.retry-after-seconds=7"})
@AutoConfigureMockMvc
@SignedIn
class EditsWhileAnalysesAreBusyTest {

    private static final JsonMapper JSON = JsonMapper.builder().build();

    @Autowired
    MockMvc mvc;
    @Autowired
    HeavyWorkCapacity capacity;
    @Autowired
    SiteService sites;
    @Autowired
    AnalysisRepository revisions;
    @Autowired
    AuditTrail audit;

    private HeldPlace held;

    /** Takes the instance's only analysis place until {@link #freeThePlace}. */
    @BeforeEach
    void takeTheOnlyAnalysisPlace() throws InterruptedException {
        held = HeldPlace.take(capacity);
    }

    @AfterEach
    void freeThePlace() throws InterruptedException {
        held.close();
    }

    private JsonNode send(RequestBuilder request, int status) throws Exception {
        return JSON.readTree(mvc.perform(request).andExpect(status().is(status)).andReturn().getResponse()
                .getContentAsString());
    }

    private static String json(String text) {
        return text.replace('\'', '"');
    }

    @Test
    void aRodPlacedWhileEveryAnalysisPlaceIsTakenIsStoredAndAnsweredWithTheNewVersionAndWhyTheAnalysisIsPending()
            throws Exception {
        JsonNode uploaded = send(multipart("/api/sites").file(SampleFiles.sample("harbour-warehouse.geojson")), 201);
        long id = uploaded.path("id").asLong();
        // the upload itself is stored, its analysis pending for the same reason
        assertThat(uploaded.path("analysisPending").asBoolean()).isTrue();
        assertThat(uploaded.path("pendingReason").asString()).contains("busy");
        assertThat(uploaded.path("latest").isNull()).isTrue();
        long version = sites.get(id).version();

        JsonNode added = send(post("/api/sites/" + id + "/rods").contentType(MediaType.APPLICATION_JSON)
                .content(json("{'version': " + version + ", 'x': 40, 'y': 20, 'height': 3}")), 201);

        assertThat(added.path("analysisPending").asBoolean()).isTrue();
        assertThat(added.path("pendingReason").asString()).contains("busy");
        assertThat(added.path("version").asLong()).isEqualTo(version + 1).isEqualTo(sites.get(id).version());
        assertThat(added.path("status").asString()).contains("No verdict", "pending");
        assertThat(added.path("summary").isNull()).isTrue();
        assertThat(added.path("svg").isNull()).isTrue();
        assertThat(added.path("rodId").asString()).isEqualTo("rod-1");
        assertThat(added.path("parts").path("rods")).hasSize(1);
        // stored as any change: the rod in the file, the earlier file kept, the audit line written
        assertThat(sites.document(sites.get(id)).site().rods()).hasSize(1);
        assertThat(sites.fileVersions(id)).hasSize(1);
        assertThat(audit.forSite(id, 10)).anySatisfy(e -> assertThat(e.action()).isEqualTo("rod-added"));
        assertThat(revisions.count(id)).isZero();

        // the next change, sent with the version answered, is accepted (not 409)
        JsonNode moved = send(put("/api/sites/" + id + "/rods/rod-1").contentType(MediaType.APPLICATION_JSON)
                .content(json("{'version': " + added.path("version").asLong() + ", 'x': 30, 'y': 20}")), 200);
        assertThat(moved.path("analysisPending").asBoolean()).isTrue();
        assertThat(moved.path("before").path("x").asDouble()).isEqualTo(40.0);
        assertThat(moved.path("version").asLong()).isEqualTo(version + 2);

        // once a place is free, the next change is analysed again
        freeThePlace();
        JsonNode removed = send(delete("/api/sites/" + id + "/rods/rod-1")
                .param("version", String.valueOf(moved.path("version").asLong())), 200);
        assertThat(removed.path("analysisPending").asBoolean()).isFalse();
        assertThat(removed.path("pendingReason").isNull()).isTrue();
        assertThat(removed.path("summary").path("revision").asInt()).isEqualTo(1);
        assertThat(removed.path("svg").asString()).startsWith("<svg");
        assertThat(removed.path("version").asLong()).isEqualTo(sites.get(id).version());
    }

    @Test
    void aConductorDrawnWhileEveryAnalysisPlaceIsTakenIsStoredWithTheAnalysisPending() throws Exception {
        long id = send(multipart("/api/sites").file(SampleFiles.sample("harbour-warehouse.geojson")), 201)
                .path("id").asLong();

        JsonNode added = send(post("/api/sites/" + id + "/conductors").contentType(MediaType.APPLICATION_JSON)
                .content(json("{'version': " + sites.get(id).version()
                        + ", 'points': [[20, 20], [60, 20]], 'heightAboveRoof': 0.5}")), 201);

        assertThat(added.path("analysisPending").asBoolean()).isTrue();
        assertThat(added.path("conductorId").asString()).isEqualTo("conductor-1");
        assertThat(added.path("version").asLong()).isEqualTo(sites.get(id).version());
        assertThat(sites.document(sites.get(id)).site().conductors()).hasSize(1);
    }

    @Test
    void aPageUploadAndAStructureCorrectionWhileBusyAreStoredAndThePlanSaysTheAnalysisIsPending() throws Exception {
        String location = mvc.perform(multipart("/sites").file(SampleFiles.sample("courtyard-block.wkt")))
                .andExpect(status().is3xxRedirection())
                .andExpect(flash().attribute("analysisPending", org.hamcrest.Matchers.containsString("busy")))
                .andReturn().getResponse().getRedirectedUrl();
        long id = Long.parseLong(location.substring(location.lastIndexOf('/') + 1));
        assertThat(revisions.count(id)).isZero();

        // sessions are kept by Spring Session, found again by their cookie as a browser sends it
        Cookie session = mvc.perform(post("/sites/" + id + "/structures")
                        .param("structure", "1").param("height", "20")
                        .param("version", String.valueOf(sites.get(id).version())))
                .andExpect(status().is3xxRedirection()).andExpect(redirectedUrl("/sites/" + id))
                .andExpect(flash().attribute("analysisPending", org.hamcrest.Matchers.containsString("busy")))
                .andReturn().getResponse().getCookie("SESSION");
        assertThat(sites.document(sites.get(id)).site().structures().get(1).height()).isEqualTo(20.0);
        assertThat(sites.fileVersions(id)).hasSize(1);

        // the page the browser is sent to says so
        assertThat(session).isNotNull();
        String page = mvc.perform(get("/sites/" + id).cookie(session)).andExpect(status().isOk()).andReturn()
                .getResponse().getContentAsString();
        assertThat(page).contains("id=\"analysis-pending\"", "Saved; analysis pending: the server is busy");
    }

    @Test
    void thePlanOfASiteChangedAfterItsLatestAnalysisGivesNoVerdictUntilItIsAnalysedAgain() throws Exception {
        freeThePlace();
        long id = send(multipart("/api/sites").file(SampleFiles.sample("courtyard-block.wkt")), 201)
                .path("id").asLong();
        assertThat(mvc.perform(get("/sites/" + id)).andReturn().getResponse().getContentAsString())
                .doesNotContain("id=\"analysis-stale\"");
        takeTheOnlyAnalysisPlace();

        mvc.perform(post("/sites/" + id + "/structures").param("structure", "1").param("height", "20")
                .param("version", String.valueOf(sites.get(id).version()))).andExpect(status().is3xxRedirection());

        String page = mvc.perform(get("/sites/" + id)).andExpect(status().isOk()).andReturn().getResponse()
                .getContentAsString();
        assertThat(page).contains("id=\"analysis-stale\"", "has not been analysed since",
                "No verdict: the site changed and its analysis is pending");
        assertThat(page).doesNotContain("No roof area, edge or corner is exposed");
    }
}
