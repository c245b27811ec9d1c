package org.lpzplanner.report;

import org.lpzplanner.accounts.SignedIn;
import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.redirectedUrl;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.lpzplanner.system.FixedClock;
import org.lpzplanner.analysis.AnalysisService;
import org.lpzplanner.plan.StructureCorrections;
import org.lpzplanner.sites.SiteService;
import org.lpzplanner.sites.StructureCorrection;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.MediaType;
import org.springframework.test.web.servlet.MockMvc;

// prints compared with each other carry the same time of printing
@FixedClock("2026-03-14T09:30:00Z")
@SpringBootTest
@AutoConfigureMockMvc
@SignedIn
class ReportApiTest {

    @Autowired
    MockMvc mvc;

    @Autowired
    SiteService sites;

    @Autowired
    AnalysisService analyses;

    @Autowired
    StructureCorrections corrections;

    @Autowired
    JdbcClient jdbc;

    private long analysedWarehouse(String name) throws Exception {
        long id = sites.create("harbour-warehouse.geojson",
                Files.readAllBytes(Path.of("sample-sites/harbour-warehouse.geojson")), name, "III", null).id();
        analyses.run(id, null, null, null);
        return id;
    }

    @Test
    void aStoredRevisionPrintsAsPdfFromTheFileItAnalysed() throws Exception {
        long id = analysedWarehouse("Printed shed");
        // Renamed after the analysis: the revision prints the name it was analysed under.
        sites.update(id, sites.get(id).version(), "Renamed shed", null, null);
        byte[] pdf = mvc.perform(get("/api/sites/" + id + "/revisions/1/report"))
                .andExpect(status().isOk())
                .andExpect(content().contentType(MediaType.APPLICATION_PDF))
                .andReturn().getResponse().getContentAsByteArray();
        String text = String.join(" ", ReportPdfTest.pages(pdf)).replaceAll("\\s+", " ");
        // IEC 62305-3:2010 Table 2: level III, R = 45 m.
        assertThat(text).contains("Revision 1").contains("Protection level III, R = 45 m")
                .contains("Printed shed").doesNotContain("Renamed shed");
        // The risk section of the site is printed after the schedules.
        assertThat(text).contains("Risk of loss of human life and protection level (IEC 62305-2:2010)");
        byte[] again = mvc.perform(get("/api/sites/" + id + "/revisions/1/report")).andReturn().getResponse()
                .getContentAsByteArray();
        // the same text: the clock stands still, so even the time of printing is the same
        assertThat(ReportPdfTest.pages(again)).isEqualTo(ReportPdfTest.pages(pdf));
    }

    @Test
    void aRevisionKeepsItsFileWhenTheSiteFileIsCorrectedLater() throws Exception {
        long id = analysedWarehouse("Corrected later");
        String before = text(id, 1);
        corrections.correct(id, sites.get(id).version(), new StructureCorrection(0, "21", null, null, null, null));
        assertThat(text(id, 1)).isEqualTo(before);
        assertThat(text(id, 2)).isNotEqualTo(before).contains("21.00");
    }

    @Test
    void revisionsStoredWithoutTheirFileFindItByChecksumOrAnswerConflict() throws Exception {
        long id = analysedWarehouse("Older revision");
        String before = text(id, 1);
        assertThat(before).contains("2026-03-14 09:30 UTC"); // printed by the fixed clock
        // As stored before revisions kept their inputs.
        jdbc.sql("UPDATE analysis_revisions SET site_name = NULL, source_name = NULL, source_text = NULL,"
                + " tolerance = NULL WHERE site_id = ?").param(id).update();
        assertThat(text(id, 1)).isEqualTo(before);
        corrections.correct(id, sites.get(id).version(), new StructureCorrection(0, "21", null, null, null, null));
        assertThat(text(id, 1)).isEqualTo(before); // found among the earlier files
        jdbc.sql("DELETE FROM site_file_versions WHERE site_id = ?").param(id).update();
        mvc.perform(get("/api/sites/" + id + "/revisions/1/report")).andExpect(status().isConflict())
                .andExpect(jsonPath("$.field").value("revision"))
                .andExpect(jsonPath("$.error").value(org.hamcrest.Matchers.containsString("no longer stored")));
    }

    private String text(long id, int revision) throws Exception {
        byte[] pdf = mvc.perform(get("/api/sites/" + id + "/revisions/" + revision + "/report"))
                .andExpect(status().isOk()).andReturn().getResponse().getContentAsByteArray();
        String text = String.join(" ", ReportPdfTest.pages(pdf)).replaceAll("\\s+", " ");
        // The appendix (the site's risk estimate) reflects the site as it stands at printing.
        return text.substring(0, text.indexOf(ReportAssembler.APPENDIX));
    }

    @Test
    void thePrintLinkGoesToTheLatestRevision() throws Exception {
        long id = analysedWarehouse("Twice analysed");
        analyses.run(id, null, null, null);
        mvc.perform(get("/sites/" + id + "/report"))
                .andExpect(redirectedUrl("/api/sites/" + id + "/revisions/2/report"));
        mvc.perform(get("/sites/" + id)).andExpect(status().isOk())
                .andExpect(content().string(org.hamcrest.Matchers.containsString("/sites/" + id + "/report")));
    }

    @Test
    void unknownSitesAndRevisionsAnswerJsonErrors() throws Exception {
        long id = analysedWarehouse("Errors");
        mvc.perform(get("/api/sites/999999/revisions/1/report")).andExpect(status().isNotFound())
                .andExpect(jsonPath("$.error").exists());
        mvc.perform(get("/api/sites/" + id + "/revisions/7/report")).andExpect(status().isNotFound())
                .andExpect(jsonPath("$.field").value("revision"))
                .andExpect(jsonPath("$.error").value(org.hamcrest.Matchers.containsString("no analysis revision 7")));
        mvc.perform(get("/api/sites/" + id + "/revisions/one/report")).andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.error").exists());
        mvc.perform(get("/sites/999999/report")).andExpect(status().isNotFound());
    }
}
