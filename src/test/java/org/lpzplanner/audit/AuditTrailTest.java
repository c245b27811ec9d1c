package org.lpzplanner.audit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.delete;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.multipart;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.lpzplanner.accounts.SignedIn;
import org.lpzplanner.sites.SiteService;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.MediaType;
import org.springframework.mock.web.MockMultipartFile;
import org.springframework.test.web.servlet.MockMvc;

/** Every change of a site is recorded with who made it, and the record outlives the site. */
@SpringBootTest
@AutoConfigureMockMvc
@SignedIn
class AuditTrailTest {

    @Autowired
    MockMvc mvc;

    @Autowired
    SiteService sites;

    @Autowired
    AuditTrail audit;

    @Test
    void uploadChangesAnalysisAcceptanceAndDeletionAreRecordedInOrder() throws Exception {
        String location = mvc.perform(multipart("/sites").file(new MockMultipartFile("file", "hall.geojson", null,
                Files.readAllBytes(Path.of("sample-sites", "millbrook-hall.geojson")))).param("name", "Hall"))
                .andExpect(status().is3xxRedirection()).andReturn().getResponse().getRedirectedUrl();
        long id = Long.parseLong(location.substring(location.lastIndexOf('/') + 1));
        mvc.perform(post("/sites/{id}/name", id).param("name", "Hall north").param("version",
                String.valueOf(sites.get(id).version()))).andExpect(status().is3xxRedirection());
        mvc.perform(post("/sites/{id}/structures", id).param("structure", "0").param("height", "12.5")
                .param("version", String.valueOf(sites.get(id).version()))).andExpect(status().is3xxRedirection());
        mvc.perform(post("/api/sites/{id}/rods", id).contentType(MediaType.APPLICATION_JSON).content(
                "{\"version\": " + sites.get(id).version() + ", \"x\": 3, \"y\": 4, \"height\": \"2\"}"))
                .andExpect(status().is2xxSuccessful());
        mvc.perform(delete("/api/sites/{id}", id)).andExpect(status().isNoContent());

        List<AuditEvent> events = new java.util.ArrayList<>(audit.forSite(id, 50));
        java.util.Collections.reverse(events);
        assertThat(events).extracting(AuditEvent::action).containsSubsequence("upload", "analysis", "rename",
                "correction", "analysis", "rod-added", "delete");
        assertThat(events).allSatisfy(e -> assertThat(e.actor()).isEqualTo("designer@default.test"));
        assertThat(events).filteredOn(e -> e.action().equals("rename")).singleElement()
                .satisfies(e -> assertThat(e.detail()).isEqualTo("renamed \"Hall\" to \"Hall north\""));
        assertThat(events).filteredOn(e -> e.action().equals("correction")).singleElement()
                .satisfies(e -> assertThat(e.detail()).contains("structure 1", "height 12.5"));
        // the site is gone, its history is not
        mvc.perform(get("/sites/{id}", id)).andExpect(status().isNotFound());
        assertThat(audit.forSite(id, 50)).isNotEmpty();
    }
}
