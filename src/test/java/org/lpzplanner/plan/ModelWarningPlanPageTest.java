package org.lpzplanner.plan;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.lpzplanner.accounts.SignedIn;
import org.lpzplanner.analysis.AnalysisService;
import org.lpzplanner.analysis.ReviewItems;
import org.lpzplanner.common.Cautions;
import org.lpzplanner.sites.SiteService;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.web.util.HtmlUtils;

/**
 * The plan page of a hut under a wire strung at 45 m between two 45 m masts, at level I (R = 20 m,
 * IEC 62305-3:2010 Table 2): the wire runs more than R above what lies beneath it, where a sphere
 * can pass under it (IEC 62305-3:2010 Annex A). The page shows the warning plainly and never a
 * verdict of protection while it stands.
 */
@SpringBootTest
@AutoConfigureMockMvc
@SignedIn
class ModelWarningPlanPageTest {

    static final Path WIRE_ABOVE_HUT = Path.of("src/test/resources/sites/wire-above-hut.geojson");

    @Autowired
    MockMvc mvc;

    @Autowired
    SiteService sites;

    @Autowired
    AnalysisService analyses;

    private long id;

    @BeforeEach
    void analysedWireAboveHut() throws Exception {
        id = sites.create("wire-above-hut.geojson", Files.readAllBytes(WIRE_ABOVE_HUT), "Wire above a hut", "I", null)
                .id();
        analyses.run(id, null, null, null);
    }

    private String page() throws Exception {
        var response = mvc.perform(get("/sites/" + id)).andExpect(status().isOk()).andReturn().getResponse();
        return response.getContentAsString(StandardCharsets.UTF_8);
    }

    private static String element(String html, String id) {
        int at = html.indexOf("id=\"" + id + "\"");
        assertThat(at).as("element #" + id).isPositive();
        int start = html.lastIndexOf('<', at);
        String tag = html.substring(start + 1, html.indexOf(' ', start));
        return html.substring(start, html.indexOf("</" + tag + ">", at));
    }

    @Test
    void aWarningBoxNamesTheWireAndSaysWhatToDo() throws Exception {
        String box = element(page(), "model-warnings");
        assertThat(box).contains("role=\"alert\"").contains("Span wire")
                .contains("more than the sphere radius 20 m")
                .contains("Protect what lies beneath by other air-termination, or lower the conductor");
    }

    @Test
    void theStatusLineGivesNoVerdictOfProtectionWhileTheWarningStands() throws Exception {
        String html = page();
        String status = element(html, "plan-status");
        assertThat(status).contains("No verdict of full protection").contains("Span wire")
                .doesNotContain("No roof area, edge, corner or facade band is exposed");
    }

    @Test
    void anAcceptedWarningStillStandsOnThePage() throws Exception {
        String key = ReviewItems.of(analyses.latest(id).orElseThrow().resultGeoJson()).stream()
                .filter(ReviewItems.Item::isModelWarning).findFirst().orElseThrow().key();
        mvc.perform(post("/sites/" + id + "/accepted").param("key", key)
                .param("reason", "ground beneath the span is fenced off")).andExpect(status().is3xxRedirection());

        String html = page();
        String box = element(html, "model-warnings");
        assertThat(box).contains("Span wire").contains(HtmlUtils.htmlEscape("ground beneath the span is fenced off"));
        assertThat(element(html, "plan-status")).contains("No verdict of full protection");
        for (String caution : Cautions.lines()) {
            assertThat(html).contains(HtmlUtils.htmlEscape(caution));
        }
    }
}
