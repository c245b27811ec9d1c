package org.lpzplanner.risk;

import org.lpzplanner.accounts.SignedIn;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.put;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.nio.charset.StandardCharsets;
import org.junit.jupiter.api.Test;
import org.lpzplanner.common.Cautions;
import org.lpzplanner.engine.risk.CollectionAreaOp;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.MediaType;
import org.springframework.test.web.servlet.MockMvc;
import tools.jackson.databind.JsonNode;

/**
 * {@code /api/sites/{id}/risk}. The worked example: the 40 × 20 × 10 m block of {@link RiskSites},
 * T_d = 20, isolated (C_D = 1); a hospital (L_T = 10⁻², L_F = 10⁻¹), high fire risk (r_f = 10⁻¹),
 * automatic fire provisions (r_p = 0.2), difficulty of evacuation (h_z = 5), concrete ground
 * (r_t = 10⁻²), no touch and step protection (P_TA = 1), persons present all year (fraction 1).
 * Formulas of IEC 62305-2:2010 (Annexes A to C); the factor values are from memory, as in docs/risk.md:
 * <ul>
 *   <li>N_G = 0.1 · 20 = 2; N_D = 2 · 7227.43 · 1 · 10⁻⁶ = 0.0144549 per year;</li>
 *   <li>L_A = 10⁻² · 10⁻² = 10⁻⁴; L_B = 0.2 · 0.1 · 5 · 0.1 = 0.01;</li>
 *   <li>no LPS: R1 = N_D · (10⁻⁴ + 0.01) = 1.45994 · 10⁻⁴, R_B 99.0 % of it;</li>
 *   <li>level IV (P_B 0.2): 2.920 · 10⁻⁵; III (0.1): 1.460 · 10⁻⁵; II (0.05): 7.2997 · 10⁻⁶ ≤ 10⁻⁵,
 *       so level II is the lowest sufficient level.</li>
 * </ul>
 */
@SpringBootTest
@AutoConfigureMockMvc
@SignedIn
class RiskApiTest {

    static final String HOSPITAL = """
            {"thunderstormDays": 20, "location": "SUGGESTED", "structureUse": "HOSPITAL_HOTEL_SCHOOL_CIVIC",
             "fireRisk": "HIGH", "fireProvisions": "AUTOMATIC", "specialHazard": "DIFFICULT_EVACUATION"}
            """;

    /** N_D of the worked example, from the exact rectangle area. */
    static final double ND = 2 * RiskSites.BLOCK_AREA * 1e-6;

    @Autowired
    MockMvc mvc;

    @Autowired
    org.springframework.jdbc.core.simple.JdbcClient jdbc;

    private JsonNode json(String url, int status) throws Exception {
        String body = mvc.perform(get(url)).andExpect(status().is(status)).andReturn().getResponse()
                .getContentAsString(StandardCharsets.UTF_8);
        return RiskSites.JSON.readTree(body);
    }

    private JsonNode send(String url, String body, int status) throws Exception {
        String answer = mvc.perform(put(url).contentType(MediaType.APPLICATION_JSON).content(body))
                .andExpect(status().is(status)).andReturn().getResponse().getContentAsString(StandardCharsets.UTF_8);
        return RiskSites.JSON.readTree(answer);
    }

    private static java.util.List<String> texts(JsonNode array) {
        java.util.List<String> out = new java.util.ArrayList<>();
        array.forEach(n -> out.add(n.asString()));
        return out;
    }

    @Test
    void withoutTheInputsThatHaveNoSafeDefaultThereIsNoVerdictAndTheAnswerNamesThem() throws Exception {
        long id = RiskSites.upload(mvc, RiskSites.BLOCK, "Defaults block");

        JsonNode risk = json("/api/sites/" + id + "/risk", 200);

        assertThat(risk.path("saved").asBoolean()).isFalse();
        assertThat(risk.path("complete").isBoolean()).as("complete is answered").isTrue();
        assertThat(risk.path("complete").asBoolean()).isFalse();
        // no table gives the most conservative value of these a meaning as a default: the user chooses
        assertThat(texts(risk.path("missingInputs"))).contains("flashDensity", "location", "fireRisk",
                "specialHazard", "structureUse");
        // no verdict of any kind until they are entered
        assertThat(risk.path("options").isArray()).isTrue();
        assertThat(risk.path("options")).isEmpty();
        assertThat(risk.path("lowestSufficientLevel").isNull()).isTrue();
        assertThat(risk.path("tolerableWithoutLps").isNull()).isTrue();
        assertThat(risk.path("anyOptionTolerable").isNull()).isTrue();
        assertThat(risk.path("outcome").asString()).contains("ground flash density", "Fire risk r_f")
                .doesNotContain("tolerable");
        JsonNode inputs = risk.path("inputs");
        for (String none : java.util.List.of("flashDensity", "thunderstormDays", "location", "fireRisk",
                "specialHazard", "structureUse")) {
            assertThat(inputs.path(none).isNull()).as(none).isTrue();
        }
        // the defaults kept are each table's most conservative value: r_t = 10⁻² the highest of
        // IEC 62305-2:2010 Table C.3, r_p = 1 (Table C.4), P_TA = 1 (Table B.1), and
        // n_z/n_t · t_z/8760 = 1, the largest the occupancy can be (Annex C)
        assertThat(inputs.path("surface").asString()).isEqualTo("AGRICULTURAL_OR_CONCRETE");
        assertThat(inputs.path("fireProvisions").asString()).isEqualTo("NONE");
        assertThat(inputs.path("touchStep").asString()).isEqualTo("NONE");
        assertThat(inputs.path("personsInZone").asDouble()).isEqualTo(inputs.path("personsTotal").asDouble());
        assertThat(inputs.path("hoursPerYear").asDouble()).isEqualTo(8760.0);
        // the geometry needs no input: A_D, the upper bound of the buffer's area, never below the
        // exact area, at most twice the stated bound above it
        double area = risk.path("collectionArea").asDouble();
        assertThat(area).isGreaterThanOrEqualTo(RiskSites.BLOCK_AREA * (1 - 1e-12))
                .isLessThanOrEqualTo(RiskSites.BLOCK_AREA * (1 + 2 * CollectionAreaOp.MAX_RELATIVE_ERROR));
        // one structure alone: isolated (C_D = 1, IEC 62305-2:2010 Table A.1), offered, not applied
        assertThat(risk.path("suggestedLocation").path("factor").asString()).isEqualTo("ISOLATED");
        assertThat(risk.path("dangerousEventsPerYear").isNull()).isTrue();
        assertThat(risk.path("tolerableRisk").asDouble()).isEqualTo(1e-5);
        assertThat(risk.path("cautions")).hasSize(Cautions.lines().size());
    }

    @Test
    void partInputsAreSavedAndTheAnswerStillNamesWhatIsMissing() throws Exception {
        long id = RiskSites.upload(mvc, RiskSites.BLOCK, "Part block");

        JsonNode risk = send("/api/sites/" + id + "/risk",
                "{\"thunderstormDays\": 20, \"fireRisk\": \"HIGH\", \"location\": \"SUGGESTED\"}", 200);

        assertThat(risk.path("saved").asBoolean()).isTrue();
        assertThat(risk.path("complete").isBoolean()).isTrue();
        assertThat(risk.path("complete").asBoolean()).isFalse();
        assertThat(texts(risk.path("missingInputs"))).contains("specialHazard", "structureUse")
                .doesNotContain("thunderstormDays", "flashDensity", "fireRisk", "location");
        assertThat(risk.path("options")).isEmpty();
        assertThat(risk.path("lowestSufficientLevel").isNull()).isTrue();
        // N_D is known: N_G = 0.1 · 20 = 2 (Annex A), C_D = 1 as suggested (Table A.1)
        assertThat(risk.path("dangerousEventsPerYear").asDouble()).isCloseTo(ND, within(ND * 2 * CollectionAreaOp.MAX_RELATIVE_ERROR));

        JsonNode again = json("/api/sites/" + id + "/risk", 200);
        assertThat(again.path("inputs").path("fireRisk").asString()).isEqualTo("HIGH");
        assertThat(again.path("inputs").path("location").asString()).isEqualTo("SUGGESTED");
        assertThat(again.path("inputs").path("structureUse").isNull()).isTrue();

        // measured N_G chosen but not entered yet: saved as it is, and named
        risk = send("/api/sites/" + id + "/risk", "{\"flashDensitySource\": \"MEASURED\"}", 200);
        assertThat(texts(risk.path("missingInputs"))).contains("flashDensity").doesNotContain("thunderstormDays");
        assertThat(risk.path("groundFlashDensity").isNull()).isTrue();
    }

    @Test
    void workedExampleNeedsProtectionLevelTwo() throws Exception {
        long id = RiskSites.upload(mvc, RiskSites.BLOCK, "Hospital block");

        JsonNode risk = send("/api/sites/" + id + "/risk", HOSPITAL, 200);

        assertThat(risk.path("saved").asBoolean()).isTrue();
        double tolerance = ND * 2 * CollectionAreaOp.MAX_RELATIVE_ERROR;
        assertThat(risk.path("dangerousEventsPerYear").asDouble()).isCloseTo(ND, within(tolerance));
        JsonNode options = risk.path("options");
        assertThat(options.get(0).path("level").isNull()).isTrue();
        assertThat(options.get(0).path("r1").asDouble()).isCloseTo(ND * 0.0101, within(1e-3 * ND * 0.0101));
        assertThat(options.get(0).path("dominant").asString()).isEqualTo("R_B");
        assertThat(options.get(1).path("level").asString()).isEqualTo("IV");
        assertThat(options.get(1).path("r1").asDouble()).isCloseTo(ND * 0.2 * 0.0101, within(1e-8));
        assertThat(options.get(2).path("tolerable").asBoolean()).isFalse();
        assertThat(options.get(3).path("level").asString()).isEqualTo("II");
        assertThat(options.get(3).path("r1").asDouble()).isCloseTo(7.2997e-6, within(7.2997e-6 * 2 * CollectionAreaOp.MAX_RELATIVE_ERROR));
        assertThat(options.get(3).path("tolerable").asBoolean()).isTrue();
        assertThat(risk.path("lowestSufficientLevel").asString()).isEqualTo("II");
        assertThat(risk.path("tolerableWithoutLps").asBoolean()).isFalse();
        assertThat(risk.path("outcome").asString()).contains("protection level", "is II");
        assertThat(risk.path("dominance").asString()).contains("R_B", "99");

        JsonNode again = json("/api/sites/" + id + "/risk", 200);
        assertThat(again.path("saved").asBoolean()).isTrue();
        assertThat(again.path("inputs").path("fireProvisions").asString()).isEqualTo("AUTOMATIC");
        assertThat(again.path("inputs").path("thunderstormDays").asDouble()).isEqualTo(20.0);
    }

    @Test
    void measuredFlashDensityAndChosenLocationAreUsedAsEntered() throws Exception {
        long id = RiskSites.upload(mvc, RiskSites.BLOCK, "Measured block");

        JsonNode risk = send("/api/sites/" + id + "/risk",
                "{\"flashDensity\": \"4\", \"location\": \"surrounded_by_higher\", \"lineCount\": 2}", 200);

        assertThat(risk.path("inputs").path("flashDensitySource").asString()).isEqualTo("MEASURED");
        assertThat(risk.path("groundFlashDensity").asDouble()).isEqualTo(4.0);
        // C_D = 0.25 for a structure surrounded by higher objects [IEC 62305-2:2010 Table A.1]
        assertThat(risk.path("locationFactorValue").asDouble()).isEqualTo(0.25);
        assertThat(risk.path("dangerousEventsPerYear").asDouble())
                .isCloseTo(4 * RiskSites.BLOCK_AREA * 0.25 * 1e-6, within(4 * RiskSites.BLOCK_AREA * 0.25 * 1e-6 * 2 * CollectionAreaOp.MAX_RELATIVE_ERROR));
        // unknown line length: 1000 m; A_L = 40 · L_L [IEC 62305-2:2010 Annex A; from memory]
        assertThat(risk.path("lines").path("length").asDouble()).isEqualTo(1000.0);
        assertThat(risk.path("lines").path("collectionAreaPerLine").asDouble()).isEqualTo(40_000.0);
        assertThat(risk.path("lines").path("flashesPerLinePerYear").asDouble()).isCloseTo(0.16, within(1e-12));
        // ground near the line A_I = 4000 · L_L [IEC 62305-2:2010 Annex A; from memory]: 4·10⁶ m²,
        // N_I = N_G · A_I · 10⁻⁶ = 4 · 4 = 16 per year with every line factor at 1
        assertThat(risk.path("lines").path("nearAreaPerLine").asDouble()).isEqualTo(4_000_000.0);
        assertThat(risk.path("lines").path("flashesNearLinePerYear").asDouble()).isCloseTo(16, within(1e-9));
    }

    @Test
    void badValuesAnswer400NamingTheFieldAndKeepTheSavedInputs() throws Exception {
        long id = RiskSites.upload(mvc, RiskSites.BLOCK, "Refusals block");
        send("/api/sites/" + id + "/risk", HOSPITAL, 200);
        String url = "/api/sites/" + id + "/risk";

        JsonNode e = send(url, "{\"thunderstormDays\": \"twenty\"}", 400);
        assertThat(e.path("field").asString()).isEqualTo("thunderstormDays");
        assertThat(e.path("error").asString()).contains("thunderstormDays", "twenty");

        e = send(url, "{\"thunderstormDays\": 400}", 400);
        assertThat(e.path("field").asString()).isEqualTo("thunderstormDays");
        e = send(url, "{\"flashDensity\": -2}", 400);
        assertThat(e.path("field").asString()).isEqualTo("flashDensity");
        e = send(url, "{\"flashDensity\": 1e400}", 400);
        assertThat(e.path("field").asString()).isEqualTo("flashDensity");
        e = send(url, "{\"fireRisk\": \"EXTREME\"}", 400);
        assertThat(e.path("field").asString()).isEqualTo("fireRisk");
        assertThat(e.path("error").asString()).contains("HIGH", "ORDINARY", "LOW", "NONE", "EXTREME");
        e = send(url, "{\"personsInZone\": 30, \"personsTotal\": 10}", 400);
        assertThat(e.path("field").asString()).isEqualTo("personsInZone");
        e = send(url, "{\"lineCount\": 1.5}", 400);
        assertThat(e.path("field").asString()).isEqualTo("lineCount");
        e = send(url, "{\"hoursPerYear\": 9000}", 400);
        assertThat(e.path("field").asString()).isEqualTo("hoursPerYear");
        e = send(url, "{\"flashDensity\": 3, \"thunderstormDays\": 20}", 400);
        assertThat(e.path("field").asString()).isEqualTo("flashDensitySource");
        e = send(url, "{\"colour\": \"red\"}", 400);
        assertThat(e.path("field").asString()).isEqualTo("colour");
        e = send(url, "{\"surface\": [1]}", 400);
        assertThat(e.path("field").asString()).isEqualTo("surface");
        e = send(url, "[1, 2]", 400);
        assertThat(e.path("field").asString()).isEqualTo("body");

        JsonNode kept = json(url, 200);
        assertThat(kept.path("inputs").path("thunderstormDays").asDouble()).isEqualTo(20.0);
        assertThat(kept.path("inputs").path("fireRisk").asString()).isEqualTo("HIGH");
        assertThat(kept.path("lowestSufficientLevel").asString()).isEqualTo("II");
    }

    @Test
    void deletingASiteRemovesItsRiskInputs() throws Exception {
        long id = RiskSites.upload(mvc, RiskSites.BLOCK, "Short-lived block");
        send("/api/sites/" + id + "/risk", HOSPITAL, 200);

        mvc.perform(org.springframework.test.web.servlet.request.MockMvcRequestBuilders.delete("/api/sites/" + id))
                .andExpect(status().isNoContent());

        assertThat(json("/api/sites/" + id + "/risk", 404).path("error").asString()).contains(String.valueOf(id));
        assertThat(jdbc.sql("SELECT COUNT(*) FROM site_risk_inputs WHERE site_id = ?").param(id).query(Long.class)
                .single()).isZero();
    }

    @Test
    void unknownSiteAnswers404AndStoresNothing() throws Exception {
        JsonNode e = json("/api/sites/987654/risk", 404);
        assertThat(e.path("error").asString()).contains("987654");
        e = send("/api/sites/987654/risk", HOSPITAL, 404);
        assertThat(e.path("error").asString()).contains("987654");
        e = json("/api/sites/abc/risk", 400);
        assertThat(e.path("error").asString()).contains("id");
        assertThat(jdbc.sql("SELECT COUNT(*) FROM site_risk_inputs WHERE site_id = 987654").query(Long.class)
                .single()).isZero();
    }
}
