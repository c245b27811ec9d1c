package org.lpzplanner.accounts;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.delete;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.patch;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.lpzplanner.analysis.AnalysisJob;
import org.lpzplanner.analysis.AnalysisJobs;
import org.lpzplanner.analysis.AnalysisService;
import org.lpzplanner.design.ProposalService;
import org.lpzplanner.design.ProposeRequest;
import org.lpzplanner.design.ProposalJobs;
import org.lpzplanner.jobs.JobStore;
import org.lpzplanner.sites.SiteService;
import org.lpzplanner.sites.StoredSite;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.MediaType;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.RequestBuilder;

/** Another team's site is invisible: every page and API address answers 404 and shows none of it. */
@SpringBootTest
@AutoConfigureMockMvc
@SignedIn(role = Role.ADMIN)
class TeamIsolationTest {

    @Autowired
    MockMvc mvc;

    @Autowired
    SiteService sites;

    @Autowired
    AnalysisService analyses;

    @Autowired
    AccountService accounts;

    @Autowired
    ProposalService design;

    @Autowired
    AnalysisJobs analysisJobs;

    @Autowired
    JobStore jobs;

    long foreignId;

    @BeforeEach
    void storeSiteOfAnotherTeam() throws Exception {
        long otherTeam = accounts.teams().stream().filter(t -> t.name().equals("Northfield office")).findFirst()
                .orElseGet(() -> accounts.createTeam("Northfield office")).id();
        byte[] file = Files.readAllBytes(Path.of("sample-sites", "brookfield-campus.geojson"));
        foreignId = CurrentAccount.asSystem("test", otherTeam, () -> {
            StoredSite s = sites.create("campus.geojson", file, "Secret campus of Northfield", "II", null);
            analyses.run(s.id(), null, null, null);
            return s.id();
        });
    }

    @Test
    void everyAddressOfAnotherTeamsSiteAnswers404WithoutItsData() throws Exception {
        long id = foreignId;
        RequestBuilder[] requests = {
            get("/sites/{id}", id), get("/sites/{id}/section", id), get("/sites/{id}/delete", id),
            post("/sites/{id}/name", id).param("name", "x").param("version", "0"),
            post("/sites/{id}/duplicate", id), post("/sites/{id}/analyses", id),
            post("/sites/{id}/delete", id).param("confirm", "yes").param("version", "1"),
            post("/sites/{id}/comments", id).param("comment", "hello"), post("/sites/{id}/reviewed", id),
            post("/sites/{id}/accepted", id).param("key", "edge-1").param("reason", "r"),
            get("/api/sites/{id}", id), get("/api/sites/{id}/file", id), get("/api/sites/{id}/file/versions", id),
            get("/api/sites/{id}/analyses/latest", id), get("/api/sites/{id}/analyses/latest/items", id),
            get("/api/sites/{id}/parts", id), get("/api/sites/{id}/comments", id), get("/api/sites/{id}/audit", id),
            post("/api/sites/{id}/analyses", id), post("/api/sites/{id}/duplicate", id),
            post("/api/sites/{id}/analyses/latest/reviewed", id),
            patch("/api/sites/{id}", id).contentType(MediaType.APPLICATION_JSON).content("{\"version\":1,\"name\":\"x\"}"),
            delete("/api/sites/{id}", id),
            post("/api/sites/{id}/rods", id).contentType(MediaType.APPLICATION_JSON)
                    .content("{\"version\": 1, \"x\": 1, \"y\": 1}"),
        };
        for (RequestBuilder request : requests) {
            String body = mvc.perform(request).andExpect(status().isNotFound()).andReturn().getResponse()
                    .getContentAsString();
            assertThat(body).doesNotContain("Secret campus", "Larch rod");
        }
        String list = mvc.perform(get("/")).andReturn().getResponse().getContentAsString();
        String api = mvc.perform(get("/api/sites")).andReturn().getResponse().getContentAsString();
        assertThat(list + api).doesNotContain("Secret campus");
        // and nothing of it changed
        assertThat(CurrentAccount.asSystem("test", accounts.teams().stream()
                .filter(t -> t.name().equals("Northfield office")).findFirst().orElseThrow().id(),
                () -> sites.get(foreignId)).name()).isEqualTo("Secret campus of Northfield");
    }
    @Test
    void anotherTeamsBackgroundJobsAndDesignAnswer404() throws Exception {
        long otherTeam = accounts.teams().stream().filter(t -> t.name().equals("Northfield office")).findFirst()
                .orElseThrow().id();
        long id = foreignId;
        ProposalJobs.Job proposal = CurrentAccount.asSystem("test", otherTeam,
                () -> design.propose(id, new ProposeRequest(List.of(1.0), List.of(), List.of())));
        AnalysisJob.Snapshot analysis = CurrentAccount.asSystem("test", otherTeam,
                () -> analysisJobs.submit(id, null, null, "2"));
        RequestBuilder[] requests = {
            get("/api/sites/{id}/proposals/{job}", id, proposal.id()),
            post("/api/sites/{id}/proposals/{job}/cancel", id, proposal.id()),
            post("/api/sites/{id}/proposals/{job}/accept", id, proposal.id()).contentType(MediaType.APPLICATION_JSON)
                    .content("{\"version\": 0}"),
            post("/api/sites/{id}/proposals", id).contentType(MediaType.APPLICATION_JSON)
                    .content("{\"rodHeights\": [1]}"),
            get("/api/sites/{id}/analyses/jobs/{job}", id, analysis.id()),
            delete("/api/sites/{id}/analyses/jobs/{job}", id, analysis.id()),
            post("/api/sites/{id}/analyses", id).param("async", "true"),
            get("/sites/{id}/design", id), get("/api/sites/{id}/method-checks", id),
            get("/api/sites/{id}/down-conductors", id), get("/api/sites/{id}/separation-distances", id),
            get("/api/sites/{id}/metal-installations", id), get("/api/sites/{id}/quantities", id),
            get("/api/sites/{id}/quantities.csv", id), get("/api/sites/{id}/export", id),
            get("/api/sites/{id}/risk", id), get("/sites/{id}/risk", id),
        };
        for (RequestBuilder request : requests) {
            String body = mvc.perform(request).andExpect(status().isNotFound()).andReturn().getResponse()
                    .getContentAsString();
            assertThat(body).doesNotContain("Secret campus", "Larch rod");
        }
        // the other team's proposal was not cancelled by the refused request
        assertThat(CurrentAccount.asSystem("test", otherTeam, () -> jobs.find(proposal.id())).orElseThrow()
                .cancelRequested()).isFalse();
        assertThat(CurrentAccount.asSystem("test", otherTeam, () -> jobs.find(analysis.id())).orElseThrow()
                .cancelRequested()).isFalse();
        // the owners stop both, so that they do not hold workers other tests need
        CurrentAccount.asSystem("test", otherTeam, () -> design.cancel(id, proposal.id()));
        CurrentAccount.asSystem("test", otherTeam, () -> analysisJobs.cancel(id, analysis.id()));
    }
}
