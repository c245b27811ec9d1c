package org.lpzplanner.analysis;

import org.lpzplanner.accounts.SignedIn;
import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.delete;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.lpzplanner.sites.SiteService;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.MediaType;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.ResultActions;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.ObjectNode;

@SpringBootTest
@AutoConfigureMockMvc
@SignedIn
class ReviewApiTest {

    private static final JsonMapper JSON = JsonMapper.builder().build();

    @Autowired
    MockMvc mvc;

    @Autowired
    SiteService sites;

    @Autowired
    AnalysisService analyses;

    @Autowired
    AcceptedItemRepository accepted;

    private long siteId;
    private String url;

    @BeforeEach
    void analysedWarehouse() throws Exception {
        siteId = sites.create("harbour-warehouse.geojson",
                Files.readAllBytes(Path.of("sample-sites/harbour-warehouse.geojson")), "Reviewed shed", "II", null).id();
        analyses.run(siteId, null, null, null);
        url = "/api/sites/" + siteId + "/analyses/latest";
    }

    private JsonNode items() throws Exception {
        return JSON.readTree(mvc.perform(get(url + "/items")).andExpect(status().isOk()).andReturn().getResponse()
                .getContentAsString());
    }

    private ResultActions accept(String key, String reason) throws Exception {
        ObjectNode body = JSON.createObjectNode();
        body.put("key", key);
        body.put("reason", reason);
        return mvc.perform(post(url + "/accepted").contentType(MediaType.APPLICATION_JSON)
                .content(JSON.writeValueAsString(body)));
    }

    private long revisionId() {
        return analyses.latest(siteId).orElseThrow().id();
    }

    @Test
    void itemListNamesEveryExposedItemWithKeyKindAndStatusBesideMethodLevelRadiusAndCautions() throws Exception {
        JsonNode review = items();

        assertThat(review.path("method").asString()).isEqualTo(ResultGeoJson.METHOD);
        assertThat(review.path("level").asString()).isEqualTo("II");
        // protection level II rolls a 30 m sphere (IEC 62305-3, Table 2)
        assertThat(review.path("radius").asDouble()).isEqualTo(30.0);
        assertThat(review.path("cautions").size()).isPositive();
        assertThat(review.path("exposedItems").asInt()).isPositive().isEqualTo(review.path("items").size());
        assertThat(review.path("accepted").asInt()).isZero();
        JsonNode first = review.path("items").get(0);
        assertThat(first.path("key").asString()).matches("[a-z0-9-]+");
        assertThat(first.path("status").asString()).isEqualTo("exposed");
        assertThat(first.path("owner").asString()).isNotBlank();
    }

    @Test
    void acceptingAnItemStoresTheReasonAndTheListShowsItAccepted() throws Exception {
        String key = items().path("items").get(0).path("key").asString();

        accept(key, "  covered by a natural component  ").andExpect(status().isOk())
                .andExpect(jsonPath("$.accepted").value(1))
                .andExpect(jsonPath("$.items[0].status").value("accepted"))
                .andExpect(jsonPath("$.items[0].reason").value("covered by a natural component"));

        JsonNode review = items();
        assertThat(review.path("accepted").asInt()).isEqualTo(1);
        assertThat(review.path("items").get(0).path("reason").asString()).isEqualTo("covered by a natural component");
        assertThat(accepted.reasons(revisionId())).containsEntry(key, "covered by a natural component");
    }

    @Test
    void removingAnAcceptanceMarksTheItemExposedAgain() throws Exception {
        String key = items().path("items").get(1).path("key").asString();
        accept(key, "metal roof edge of sufficient thickness").andExpect(status().isOk());

        mvc.perform(delete(url + "/accepted/" + key)).andExpect(status().isOk())
                .andExpect(jsonPath("$.accepted").value(0))
                .andExpect(jsonPath("$.items[1].status").value("exposed"));
        assertThat(accepted.reasons(revisionId())).isEmpty();
    }

    @Test
    void unknownKeyAnswers404AndStoresNothing() throws Exception {
        accept("ridge-000000000000", "covered by a natural component").andExpect(status().isNotFound())
                .andExpect(jsonPath("$.error").value(org.hamcrest.Matchers.containsString("ridge-000000000000")));
        mvc.perform(delete(url + "/accepted/ridge-000000000000")).andExpect(status().isNotFound());
        assertThat(accepted.reasons(revisionId())).isEmpty();
    }

    @Test
    void blankReasonAnswers400NamingTheFieldAndStoresNothing() throws Exception {
        String key = items().path("items").get(0).path("key").asString();

        accept(key, "   ").andExpect(status().isBadRequest()).andExpect(jsonPath("$.field").value("reason"));
        mvc.perform(post(url + "/accepted").contentType(MediaType.APPLICATION_JSON).content("{\"key\": \"" + key + "\"}"))
                .andExpect(status().isBadRequest()).andExpect(jsonPath("$.field").value("reason"));
        mvc.perform(post(url + "/accepted").contentType(MediaType.APPLICATION_JSON).content("{\"reason\": \"fine\"}"))
                .andExpect(status().isBadRequest()).andExpect(jsonPath("$.field").value("key"));
        assertThat(accepted.reasons(revisionId())).isEmpty();
    }

    @Test
    void acceptancesCarryOverToANewRevisionOnlyForItemsStillExposedTheSameWay() throws Exception {
        JsonNode before = items().path("items");
        String first = before.get(0).path("key").asString(), second = before.get(1).path("key").asString();
        accept(first, "covered by a natural component").andExpect(status().isOk());
        accept(second, "metal roof edge of sufficient thickness").andExpect(status().isOk());
        long firstRevision = revisionId();

        analyses.run(siteId, null, null, null); // same inputs: the same items, so both stay accepted
        assertThat(revisionId()).isNotEqualTo(firstRevision);
        assertThat(accepted.reasons(revisionId())).containsEntry(first, "covered by a natural component")
                .containsEntry(second, "metal roof edge of sufficient thickness").hasSize(2);
        assertThat(items().path("accepted").asInt()).isEqualTo(2);

        analyses.run(siteId, "IV", null, null); // a 60 m sphere: items change where the sphere reaches differently
        java.util.Set<String> nowExposed = new java.util.HashSet<>();
        items().path("items").forEach(i -> nowExposed.add(i.path("key").asString()));
        java.util.Map<String, String> expected = new java.util.LinkedHashMap<>();
        if (nowExposed.contains(first)) {
            expected.put(first, "covered by a natural component");
        }
        if (nowExposed.contains(second)) {
            expected.put(second, "metal roof edge of sufficient thickness");
        }
        assertThat(accepted.reasons(revisionId())).isEqualTo(expected);
        // the earlier revisions keep their own acceptances
        assertThat(accepted.reasons(firstRevision)).hasSize(2);
    }

    /**
     * A hut under a wire strung at 45 m between two masts, at level I (R = 20 m, IEC 62305-3:2010
     * Table 2): the wire runs more than R above what lies beneath it (IEC 62305-3:2010 Annex A).
     */
    private String analysedWireAboveHut() throws Exception {
        siteId = sites.create("wire-above-hut.geojson", Files.readAllBytes(ResultGeoJsonTest.WIRE_ABOVE_HUT),
                "Wire above a hut", "I", null).id();
        analyses.run(siteId, null, null, null);
        url = "/api/sites/" + siteId + "/analyses/latest";
        return url;
    }

    private static JsonNode warningItem(JsonNode review) {
        for (JsonNode item : review.path("items")) {
            if (item.path("kind").asString().equals("free-span")) {
                return item;
            }
        }
        throw new AssertionError("no model warning among the items: " + review);
    }

    @Test
    void aModelWarningIsAnItemToReviewNamingThePartWithTheWarningsText() throws Exception {
        analysedWireAboveHut();
        JsonNode review = items();

        assertThat(review.path("modelWarnings").asInt()).isEqualTo(1);
        JsonNode warning = warningItem(review);
        assertThat(warning.path("owner").asString()).isEqualTo("Span wire");
        assertThat(warning.path("status").asString()).isEqualTo("exposed");
        assertThat(warning.path("text").asString()).contains("Span wire");
        assertThat(warning.path("heightAboveSurface").asDouble()).isGreaterThan(20.0);
        // the engine gives no verdict of full protection while a warning stands
        assertThat(analyses.latest(siteId).orElseThrow().fullyProtected()).isFalse();
    }

    @Test
    void aModelWarningIsAcceptedOnlyWithAReasonAndTheRevisionStaysNotFullyProtected() throws Exception {
        analysedWireAboveHut();
        String key = warningItem(items()).path("key").asString();

        accept(key, "  ").andExpect(status().isBadRequest()).andExpect(jsonPath("$.field").value("reason"));
        assertThat(accepted.reasons(revisionId())).isEmpty();

        accept(key, "ground beneath the span is fenced off and holds nothing").andExpect(status().isOk());
        JsonNode warning = warningItem(items());
        assertThat(warning.path("status").asString()).isEqualTo("accepted");
        assertThat(warning.path("reason").asString()).isEqualTo("ground beneath the span is fenced off and holds nothing");
        assertThat(analyses.latest(siteId).orElseThrow().fullyProtected()).isFalse();
    }

    @Test
    void unknownSiteOrNeverAnalysedSiteAnswers404() throws Exception {
        mvc.perform(get("/api/sites/987654/analyses/latest/items")).andExpect(status().isNotFound());
        long fresh = sites.create("harbour-warehouse.geojson",
                Files.readAllBytes(Path.of("sample-sites/harbour-warehouse.geojson")), "Not analysed", "II", null).id();
        mvc.perform(get("/api/sites/" + fresh + "/analyses/latest/items")).andExpect(status().isNotFound());
    }
}
