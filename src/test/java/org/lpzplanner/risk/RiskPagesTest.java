package org.lpzplanner.risk;

import org.lpzplanner.accounts.SignedIn;
import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.redirectedUrl;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.nio.charset.StandardCharsets;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.lpzplanner.common.Cautions;
import org.lpzplanner.common.ReportSection;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.request.MockHttpServletRequestBuilder;
import org.springframework.web.util.HtmlUtils;
import tools.jackson.databind.JsonNode;

/** The risk page {@code /sites/{id}/risk}, its form, the level button and the report section. */
@SpringBootTest
@AutoConfigureMockMvc
@SignedIn
class RiskPagesTest {

    @Autowired
    MockMvc mvc;

    @Autowired
    RiskService risk;

    private String page(MockHttpServletRequestBuilder request, int status) throws Exception {
        String html = mvc.perform(request).andExpect(status().is(status)).andReturn().getResponse()
                .getContentAsString(StandardCharsets.UTF_8);
        return HtmlUtils.htmlUnescape(html);
    }

    private JsonNode api(String url) throws Exception {
        return RiskSites.JSON.readTree(mvc.perform(get(url)).andExpect(status().isOk()).andReturn().getResponse()
                .getContentAsString(StandardCharsets.UTF_8));
    }

    /** The worked example of {@link RiskApiTest} as the page form sends it. */
    private static MockHttpServletRequestBuilder hospitalForm(long id) {
        return hospitalForm(id, java.util.Map.of());
    }

    /** The worked example with some fields typed differently. */
    private static MockHttpServletRequestBuilder hospitalForm(long id, java.util.Map<String, String> changed) {
        MockHttpServletRequestBuilder form = post("/sites/" + id + "/risk");
        java.util.Map<String, String> values = new java.util.LinkedHashMap<>(HOSPITAL_FORM);
        values.putAll(changed);
        values.forEach(form::param);
        return form;
    }

    private static final java.util.Map<String, String> HOSPITAL_FORM = hospitalValues();

    private static java.util.Map<String, String> hospitalValues() {
        var form = post("/").param("flashDensitySource", "THUNDERSTORM_DAYS")
                .param("flashDensity", "").param("thunderstormDays", "20").param("location", "SUGGESTED")
                .param("surface", "AGRICULTURAL_OR_CONCRETE").param("fireRisk", "HIGH")
                .param("fireProvisions", "AUTOMATIC").param("specialHazard", "DIFFICULT_EVACUATION")
                .param("structureUse", "HOSPITAL_HOTEL_SCHOOL_CIVIC").param("touchStep", "NONE")
                .param("personsInZone", "1").param("personsTotal", "1").param("hoursPerYear", "8760")
                .param("lifeCriticalSystems", "NO").param("lineCount", "0");
        java.util.Map<String, String> values = new java.util.LinkedHashMap<>();
        form.buildRequest(new org.springframework.mock.web.MockServletContext()).getParameterMap()
                .forEach((k, v) -> values.put(k, v[0]));
        return values;
    }

    @Test
    void pageShowsEveryInputWithMeaningAndDefaultTheDrawingAndTheCautionsButNoVerdictWithoutTheInputs()
            throws Exception {
        long id = RiskSites.upload(mvc, RiskSites.BLOCK, "Page <block> & co");

        String html = page(get("/sites/" + id + "/risk"), 200);

        assertThat(html).contains("Page <block> & co", "IEC 62305-2:2010", "No risk inputs are saved",
                "class=\"plan collection-area\"", "class=\"collection-zone\"", "Block (10.00 m)",
                "Location factor C_D", "isolated, no other objects nearby", "Suggestion: isolated",
                "Collection area A_D");
        for (String field : RiskSettingsParser.FIELDS) {
            assertThat(html).contains("name=\"" + field + "\"");
        }
        assertThat(html).contains("Floor or ground surface r_t", "Default: agricultural ground or concrete",
                "Fire provisions r_p", "Default: no fire provisions", "Thunderstorm days T_d");
        // the inputs without a safe default are named, and nothing is judged until they are entered
        assertThat(html).contains("id=\"risk-missing\"", "Fire risk r_f", "Special hazard h_z",
                "Type of structure L_F", "No default: choose");
        assertThat(html).doesNotContain("id=\"risk-options\"", "id=\"select-level\"", "id=\"risk-dominance\"",
                "R1 for each option", "is tolerable", "lowest protection level", "Tolerable (R1");
        for (String caution : Cautions.lines()) {
            assertThat(html).contains(caution);
        }
        // the site name in the drawing is escaped
        assertThat(mvc.perform(get("/sites/" + id + "/risk")).andReturn().getResponse()
                .getContentAsString(StandardCharsets.UTF_8)).doesNotContain("<block>");
    }

    @Test
    void levelButtonIsRefusedWhileInputsAreMissing() throws Exception {
        long id = RiskSites.upload(mvc, RiskSites.BLOCK, "Unfinished block");
        long version = api("/api/sites/" + id).path("version").asLong();

        String html = page(post("/sites/" + id + "/risk/level").param("version", String.valueOf(version)), 400);

        assertThat(html).contains("The level was not changed", "inputs are missing");
        assertThat(api("/api/sites/" + id).path("level").asString()).isEqualTo("IV");
    }

    @Test
    void planPageAndSiteListLinkToTheRiskPage() throws Exception {
        long id = RiskSites.upload(mvc, RiskSites.BLOCK, "Linked block");
        assertThat(page(get("/sites/" + id), 200)).contains("href=\"/sites/" + id + "/risk\"");
        assertThat(page(get("/"), 200)).contains("href=\"/sites/" + id + "/risk\"");
    }

    @Test
    void savingTheFormRecalculatesAndOffersTheLevelWhichTheButtonSets() throws Exception {
        long id = RiskSites.upload(mvc, RiskSites.BLOCK, "Form block");

        mvc.perform(hospitalForm(id)).andExpect(status().is3xxRedirection())
                .andExpect(redirectedUrl("/sites/" + id + "/risk?saved=true"));
        String html = page(get("/sites/" + id + "/risk?saved=true"), 200);
        assertThat(html).contains("The risk inputs were saved", "The lowest protection level that brings it below is II",
                "Use protection level II for this site", "R_B (physical damage) dominates: 99");
        assertThat(html).doesNotContain("No risk inputs are saved", "stricter than the level");

        long version = api("/api/sites/" + id).path("version").asLong();
        mvc.perform(post("/sites/" + id + "/risk/level").param("version", String.valueOf(version)))
                .andExpect(status().is3xxRedirection()).andExpect(redirectedUrl("/sites/" + id + "/risk?levelSet=II"));
        assertThat(api("/api/sites/" + id).path("level").asString()).isEqualTo("II");
        html = page(get("/sites/" + id + "/risk?levelSet=II"), 200);
        assertThat(html).contains("Protection level II is now the site's level",
                "The site is already assessed at protection level II");
        assertThat(html).doesNotContain("id=\"select-level\"");

        // the old version is stale now: 409 and the level stays
        assertThat(page(post("/sites/" + id + "/risk/level").param("version", String.valueOf(version)), 409))
                .contains("changed meanwhile");
    }

    /** The level option the plan page's analysis form starts at. */
    private static String selectedLevel(String html) {
        java.util.regex.Matcher m = java.util.regex.Pattern
                .compile("<option value=\"(I|II|III|IV)\"[^>]*selected[^>]*>").matcher(html);
        assertThat(m.find()).as("a level option is selected").isTrue();
        String level = m.group(1);
        assertThat(m.find()).as("only one level option is selected").isFalse();
        return level;
    }

    @Test
    void planPageAnalysisFormStartsAtTheLevelTheSavedEstimateAsksFor() throws Exception {
        // uploaded at level IV; the worked example of RiskApiTest asks for level II
        long id = RiskSites.upload(mvc, RiskSites.BLOCK, "Preselect block");

        String html = page(get("/sites/" + id), 200);
        assertThat(selectedLevel(html)).isEqualTo("IV");
        assertThat(html).contains("id=\"analysis-level-note\"", "No risk inputs are saved for this site yet");

        mvc.perform(hospitalForm(id)).andExpect(status().is3xxRedirection());
        html = page(get("/sites/" + id), 200);
        assertThat(selectedLevel(html)).isEqualTo("II");
        assertThat(html).contains("The list starts at level II, the lowest protection level that brings",
                "instead of the site's level IV", "You can choose another level");
        // the choice stays free: every level is offered
        assertThat(html).contains("<option value=\"I\"", "<option value=\"III\"", "<option value=\"IV\"");
        // and the site's own level is unchanged until an analysis or the risk page sets it
        assertThat(api("/api/sites/" + id).path("level").asString()).isEqualTo("IV");
    }

    @Test
    void planPageKeepsAStricterSiteLevelAndSaysSo() throws Exception {
        long id = RiskSites.upload(mvc, RiskSites.BLOCK, "Strict plan block");
        long version = api("/api/sites/" + id).path("version").asLong();
        mvc.perform(org.springframework.test.web.servlet.request.MockMvcRequestBuilders.patch("/api/sites/" + id)
                .contentType(org.springframework.http.MediaType.APPLICATION_JSON)
                .content("{\"version\": " + version + ", \"level\": \"I\"}")).andExpect(status().isOk());
        mvc.perform(hospitalForm(id)).andExpect(status().is3xxRedirection());

        String html = page(get("/sites/" + id), 200);

        assertThat(selectedLevel(html)).isEqualTo("I");
        assertThat(html).contains("the site's level I, stricter than the level II the risk estimate asks for");
    }

    @Test
    void planPageCarriesTheCollectionAreaLayerInLocalMetres() throws Exception {
        long id = RiskSites.upload(mvc, RiskSites.BLOCK, "Layer block");
        mvc.perform(post("/api/sites/" + id + "/analyses")).andExpect(status().isCreated());

        String html = page(get("/sites/" + id), 200);

        assertThat(html).contains("id=\"collection-area-toggle\"", "/js/collection-area-layer.js");
        // the area in whole m², the upper bound: at or above the rectangle formula's 7227.43 m², within the buffer error
        java.util.regex.Matcher shown = java.util.regex.Pattern.compile("Show the collection area A_D = (\\d+) m").matcher(html);
        assertThat(shown.find()).isTrue();
        assertThat(Double.parseDouble(shown.group(1))).isBetween(Math.floor(RiskSites.BLOCK_AREA),
                Math.ceil(RiskSites.BLOCK_AREA * (1 + 2 * org.lpzplanner.engine.risk.CollectionAreaOp.MAX_RELATIVE_ERROR)));
        // the block 40 × 20 × 10 m: the zone reaches 3·H = 30 m beyond each wall (IEC 62305-2 Annex A),
        // so its rings span x from -30 to 70 and y from -30 to 50 (buffer vertices lie on the circle)
        java.util.regex.Matcher zone = java.util.regex.Pattern.compile("data-zone=\"([^\"]*)\"").matcher(html);
        assertThat(zone.find()).isTrue();
        JsonNode rings = RiskSites.JSON.readTree(zone.group(1));
        double minX = Double.MAX_VALUE, maxX = -Double.MAX_VALUE, minY = Double.MAX_VALUE, maxY = -Double.MAX_VALUE;
        for (JsonNode ring : rings) {
            for (JsonNode p : ring) {
                minX = Math.min(minX, p.get(0).asDouble());
                maxX = Math.max(maxX, p.get(0).asDouble());
                minY = Math.min(minY, p.get(1).asDouble());
                maxY = Math.max(maxY, p.get(1).asDouble());
            }
        }
        assertThat(new double[] {minX, maxX, minY, maxY}).containsExactly(new double[] {-30, 70, -30, 50},
                org.assertj.core.data.Offset.offset(0.01));
    }

    @Test
    void aStricterSiteLevelIsPointedOutAsTheSafeSide() throws Exception {
        long id = RiskSites.upload(mvc, RiskSites.BLOCK, "Strict block");
        long version = api("/api/sites/" + id).path("version").asLong();
        mvc.perform(org.springframework.test.web.servlet.request.MockMvcRequestBuilders.patch("/api/sites/" + id)
                .contentType(org.springframework.http.MediaType.APPLICATION_JSON)
                .content("{\"version\": " + version + ", \"level\": \"I\"}")).andExpect(status().isOk());
        mvc.perform(hospitalForm(id)).andExpect(status().is3xxRedirection());

        String html = page(get("/sites/" + id + "/risk"), 200);

        assertThat(html).contains("assessed at protection level I, stricter than the level II",
                "Use protection level II for this site");
    }

    @Test
    void badFormValueIsShownAgainWithTheReasonAndNothingIsSaved() throws Exception {
        long id = RiskSites.upload(mvc, RiskSites.BLOCK, "Refused block");

        String html = page(hospitalForm(id, java.util.Map.of("thunderstormDays", "lots")), 400);

        assertThat(html).contains("The inputs were not saved: thunderstormDays must be a number", "\"lots\"",
                "value=\"lots\"", "class=\"risk-field has-error\"");
        assertThat(html).contains("No risk inputs are saved");
        assertThat(api("/api/sites/" + id + "/risk").path("saved").asBoolean()).isFalse();

        html = page(hospitalForm(id, java.util.Map.of("personsInZone", "5", "personsTotal", "2")), 400);
        assertThat(html).contains("personsInZone (5) cannot be more than personsTotal (2)");
        assertThat(api("/api/sites/" + id + "/risk").path("saved").asBoolean()).isFalse();
    }

    @Test
    void levelButtonIsRefusedWhenNoLevelIsNeeded() throws Exception {
        long id = RiskSites.upload(mvc, RiskSites.BLOCK, "Calm block");
        // other structure (L_F 10⁻²), low fire risk (r_f 10⁻³), no special hazard (h_z 1), automatic
        // fire provisions (r_p 0.2) [IEC 62305-2:2010 Tables C.2, C.5, C.6, C.4; from memory]:
        // L_B = 0.2 · 10⁻³ · 10⁻² = 2·10⁻⁶, L_A = 10⁻⁴; R1 = 0.01445 · 1.02·10⁻⁴ = 1.5·10⁻⁶ ≤ 10⁻⁵ (hand)
        mvc.perform(hospitalForm(id, java.util.Map.of("structureUse", "OTHER", "fireRisk", "LOW",
                "specialHazard", "NONE"))).andExpect(status().is3xxRedirection());
        long version = api("/api/sites/" + id).path("version").asLong();

        String html = page(post("/sites/" + id + "/risk/level").param("version", String.valueOf(version)), 400);

        assertThat(html).contains("The level was not changed: R1 is tolerable without an LPS");
        assertThat(api("/api/sites/" + id).path("level").asString()).isEqualTo("IV");
    }

    @Test
    void unknownSiteGivesNotFoundPages() throws Exception {
        assertThat(page(get("/sites/987654/risk"), 404)).contains("987654");
        assertThat(page(post("/sites/987654/risk").param("thunderstormDays", "20"), 404)).contains("987654");
        assertThat(page(get("/sites/nonsense/risk"), 404)).contains("nonsense");
    }

    @Test
    void linesCountedInTheFormGetTheirOwnFieldsAndComponents() throws Exception {
        long id = RiskSites.upload(mvc, RiskSites.BLOCK, "Line form block");

        mvc.perform(hospitalForm(id, java.util.Map.of("lineCount", "1"))).andExpect(status().is3xxRedirection());
        String html = page(get("/sites/" + id + "/risk"), 200);
        // the new line at its most conservative values, its fields named for the form
        assertThat(html).contains("id=\"line-1\"", "Incoming line 1", "name=\"lines[0].installation\"",
                "name=\"lines[0].shielding\"", "name=\"lines[0].surgeProtection\"", "value=\"1000\"",
                "<option value=\"OVERHEAD\" selected");
        assertThat(html).contains("R_U", "R_V", "Line 1 (overhead, 1000 m, rural");

        mvc.perform(hospitalForm(id, java.util.Map.of("lineCount", "1", "lines[0].installation", "BURIED",
                "lines[0].length", "250"))).andExpect(status().is3xxRedirection());
        JsonNode inputs = api("/api/sites/" + id + "/risk").path("inputs");
        assertThat(inputs.path("lines").get(0).path("installation").asString()).isEqualTo("BURIED");
        assertThat(inputs.path("lines").get(0).path("length").asDouble()).isEqualTo(250.0);
        // a bad line value is named and shown again, nothing saved
        html = page(hospitalForm(id, java.util.Map.of("lineCount", "1", "lines[0].length", "far")), 400);
        assertThat(html).contains("lines[0].length must be a number", "value=\"far\"");
        assertThat(api("/api/sites/" + id + "/risk").path("inputs").path("lines").get(0).path("length").asDouble())
                .isEqualTo(250.0);
    }

    @Test
    void aStructureOutsideTheEstimateGetsNoVerdictNorLevel() throws Exception {
        long id = RiskSites.upload(mvc, RiskSites.BLOCK, "Life support block");
        mvc.perform(hospitalForm(id, java.util.Map.of("lifeCriticalSystems", "YES")))
                .andExpect(status().is3xxRedirection());

        String html = page(get("/sites/" + id + "/risk"), 200);

        assertThat(html).contains("id=\"risk-outside\"", "does not cover the structure", "life-saving equipment",
                "full method of IEC 62305-2");
        assertThat(html).doesNotContain("id=\"risk-options\"", "id=\"select-level\"", "lowest protection level");
        long version = api("/api/sites/" + id).path("version").asLong();
        assertThat(page(post("/sites/" + id + "/risk/level").param("version", String.valueOf(version)), 400))
                .contains("The level was not changed", "does not cover the structure");
        assertThat(page(get("/sites/" + id), 200)).contains("does not cover this structure");
    }

    @Test
    void reportSectionHasOneRowPerOptionAndTheOutcome() throws Exception {
        long id = RiskSites.upload(mvc, RiskSites.BLOCK, "Report block");
        mvc.perform(hospitalForm(id)).andExpect(status().is3xxRedirection());

        ReportSection section = risk.reportSection(id, Locale.ENGLISH);

        assertThat(section.title()).contains("Risk of loss of human life", "IEC 62305-2:2010");
        assertThat(section.columns()).containsExactly("Option", "P_B", "R_A", "R_B", "R_U", "R_V", "R1",
                "Tolerable (R1 \u2264 10\u207b\u2075)");
        assertThat(section.rows()).hasSize(5);
        assertThat(section.rows().get(0)).first().isEqualTo("No LPS");
        assertThat(section.rows().get(3)).containsExactly("LPS of protection level II", "0.05",
                "7.23 × 10⁻⁸", "7.23 × 10⁻⁶", "0", "0", "7.3 × 10⁻⁶", "yes");
        assertThat(section.notes()).anySatisfy(n -> assertThat(n).contains("lowest protection level", "is II"));
        assertThat(section.notes()).anySatisfy(n -> assertThat(n).contains("R1 here is R_A + R_B + R_U + R_V"));
        assertThat(section.notes()).anySatisfy(n -> assertThat(n).contains("No incoming lines"));
    }
}
