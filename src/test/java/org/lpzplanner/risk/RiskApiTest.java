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
 * T_d = 20, isolated (C_D = 1), no incoming lines, no life-critical internal systems; a hospital,
 * hotel, school or civic building (L_T = 10⁻², L_F = 10⁻¹), high fire risk (r_f = 10⁻¹),
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
             "fireRisk": "HIGH", "fireProvisions": "AUTOMATIC", "specialHazard": "DIFFICULT_EVACUATION",
             "lifeCriticalSystems": "NO", "lines": []}
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
        assertThat(texts(risk.path("missingInputs"))).containsExactly("flashDensity", "location", "fireRisk",
                "specialHazard", "structureUse", "lifeCriticalSystems", "lineCount");
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
                "specialHazard", "structureUse", "lifeCriticalSystems", "lineCount", "lines")) {
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
    void occupancyLeftPartlyOutKeepsTheWholeStructureExposed() throws Exception {
        long id = RiskSites.upload(mvc, RiskSites.BLOCK, "Occupied block");

        // n_z/n_t · t_z/8760 [IEC 62305-2:2010 Annex C] is at its largest, 1, with n_z = n_t and
        // t_z = 8760 h: a value left out must not shrink it
        JsonNode inputs = send("/api/sites/" + id + "/risk", "{\"personsTotal\": 40}", 200).path("inputs");
        assertThat(inputs.path("personsInZone").asDouble()).isEqualTo(40.0);
        assertThat(inputs.path("hoursPerYear").asDouble()).isEqualTo(8760.0);
        inputs = send("/api/sites/" + id + "/risk", "{\"personsInZone\": 30}", 200).path("inputs");
        assertThat(inputs.path("personsTotal").asDouble()).isEqualTo(30.0);
        inputs = send("/api/sites/" + id + "/risk", "{\"personsInZone\": 10, \"personsTotal\": 40}", 200)
                .path("inputs");
        assertThat(inputs.path("personsInZone").asDouble()).isEqualTo(10.0);
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

    /**
     * The worked school: the 40 × 20 × 10 m block of {@link RiskSites}, N_G = 4 flashes/km²/year
     * (measured), isolated (C_D = 1, Table A.1), with one overhead low-voltage line 1 km long. Values
     * [from memory — check against the standard] unless derived:
     * <pre>
     * school: L_T = 10⁻², L_F = 10⁻¹ (Table C.2); ordinary fire risk r_f = 10⁻² (Table C.5);
     * low panic h_z = 2 (Table C.6); no fire provisions r_p = 1 (C.4); concrete r_t = 10⁻² (C.3);
     * no touch and step protection P_TA = 1 (B.1); everyone all year: occupancy 1
     * L_A = L_U = 10⁻²·10⁻² = 10⁻⁴;  L_B = L_V = 1·10⁻²·2·10⁻¹ = 2·10⁻³          [Annex C]
     * N_D = 4 · 7227.43 · 1 · 10⁻⁶ = 0.0289097 per year                          [Annex A]
     * line: A_L = 40 · 1000 = 40 000 m² [Annex A]; overhead C_I = 1 (A.2), rural C_E = 1 (A.4),
     * low voltage C_T = 1 (A.3): N_L = 4 · 40 000 · 10⁻⁶ = 0.16 per year
     * unshielded P_LD = 1 (B.8), C_LD = 1 (B.4), no touch protection at the entry P_TU = 1 (B.6)
     * P_EB = 1 without SPDs; an LPS bonds the line at its entry with SPDs for its level (IEC 62305-3
     * 6.2): 0.05 for III and IV, 0.02 for II, 0.01 for I (Table B.7); P_B 0.2 / 0.1 / 0.05 / 0.02 (B.2)
     * R_U = N_L·P_TU·P_EB·P_LD·C_LD·L_U,  R_V = N_L·P_EB·P_LD·C_LD·L_V
     * no LPS: R_A 2.891e-6, R_B 5.782e-5, R_U 1.6e-5, R_V 3.2e-4,  R1 3.967e-4
     * IV:     R_A 5.782e-7, R_B 1.156e-5, R_U 8e-7,   R_V 1.6e-5,  R1 2.894e-5
     * III:    R_A 2.891e-7, R_B 5.782e-6, R_U 8e-7,   R_V 1.6e-5,  R1 2.287e-5 (6.07e-6 without R_U, R_V)
     * II:     R_A 1.446e-7, R_B 2.891e-6, R_U 3.2e-7, R_V 6.4e-6,  R1 9.756e-6 ≤ 10⁻⁵ → level II
     * </pre>
     * The tolerance covers the collection area's upper bound (at most 0.08 % above the exact area).
     */
    static final String SCHOOL = """
            {"flashDensity": 4, "location": "ISOLATED", "structureUse": "HOSPITAL_HOTEL_SCHOOL_CIVIC",
             "fireRisk": "ORDINARY", "specialHazard": "LOW_PANIC", "lifeCriticalSystems": "NO",
             "lineCount": 1, "lineLength": 1000}
            """;

    @Test
    void schoolWithAnOverheadLineNeedsLevelTwoOnceFlashesToTheLineCount() throws Exception {
        long id = RiskSites.upload(mvc, RiskSites.BLOCK, "School block");

        JsonNode risk = send("/api/sites/" + id + "/risk", SCHOOL, 200);

        assertThat(risk.path("complete").asBoolean()).isTrue();
        JsonNode options = risk.path("options");
        org.assertj.core.data.Percentage close = org.assertj.core.data.Percentage.withPercentage(0.2);
        // the lowest sufficient level counts R_U and R_V: II, not III (III would do without them)
        assertThat(options.get(2).path("r1").asDouble()).isCloseTo(2.287e-5, close);
        assertThat(risk.path("lowestSufficientLevel").asString()).isEqualTo("II");
        assertThat(options.get(0).path("ru").asDouble()).isCloseTo(1.6e-5, close);
        assertThat(options.get(0).path("rv").asDouble()).isCloseTo(3.2e-4, close);
        assertThat(options.get(0).path("r1").asDouble()).isCloseTo(3.967e-4, close);
        assertThat(options.get(0).path("dominant").asString()).isEqualTo("R_V");
        assertThat(options.get(2).path("level").asString()).isEqualTo("III");
        assertThat(options.get(2).path("rv").asDouble()).isCloseTo(1.6e-5, close);
        assertThat(options.get(2).path("r1").asDouble()).isCloseTo(2.287e-5, close);
        // the worked case's figure, about 2.3·10⁻⁵ at level III [factor values from memory: wide tolerance]
        assertThat(options.get(2).path("r1").asDouble()).isCloseTo(2.3e-5, org.assertj.core.data.Percentage.withPercentage(5));
        assertThat(options.get(2).path("tolerable").asBoolean()).isFalse();
        assertThat(options.get(3).path("r1").asDouble()).isCloseTo(9.756e-6, close);
        assertThat(options.get(3).path("tolerable").asBoolean()).isTrue();
        assertThat(risk.path("lowestSufficientLevel").asString()).isEqualTo("II");
        // the line's own figures
        JsonNode line = risk.path("lines").get(0);
        assertThat(line.path("collectionArea").asDouble()).isEqualTo(40_000.0);
        assertThat(line.path("flashesPerYear").asDouble()).isCloseTo(0.16, within(1e-12));
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
        // two lines given by their count: each at the most conservative values, 1000 m long (the
        // length taken when it is unknown, IEC 62305-2:2010 Annex A; from memory), overhead, rural,
        // no transformer (C_I = C_E = C_T = 1), unshielded, no SPD, no touch protection
        JsonNode lines = risk.path("inputs").path("lines");
        assertThat(risk.path("inputs").path("lineCount").asInt()).isEqualTo(2);
        assertThat(lines).hasSize(2);
        assertThat(lines.get(1).path("installation").asString()).isEqualTo("OVERHEAD");
        assertThat(lines.get(1).path("length").asDouble()).isEqualTo(1000.0);
        assertThat(lines.get(1).path("environment").asString()).isEqualTo("RURAL");
        assertThat(lines.get(1).path("transformer").asString()).isEqualTo("NONE");
        assertThat(lines.get(1).path("surgeProtection").asString()).isEqualTo("NONE");
        assertThat(lines.get(1).path("shielding").asString()).isEqualTo("UNSHIELDED");
        assertThat(lines.get(1).path("withstandVoltage").asString()).isEqualTo("KV_1");
        assertThat(lines.get(1).path("touchProtection").asString()).isEqualTo("NONE");
        // A_L = 40 · L_L, N_L = N_G · A_L · 10⁻⁶ = 0.16; A_I = 4000 · L_L, N_I = 16 [Annex A; from memory]
        JsonNode figures = risk.path("lines");
        assertThat(figures).hasSize(2);
        assertThat(figures.get(0).path("collectionArea").asDouble()).isEqualTo(40_000.0);
        assertThat(figures.get(0).path("flashesPerYear").asDouble()).isCloseTo(0.16, within(1e-12));
        assertThat(figures.get(0).path("nearArea").asDouble()).isEqualTo(4_000_000.0);
        assertThat(figures.get(0).path("flashesNearPerYear").asDouble()).isCloseTo(16, within(1e-9));
    }

    @Test
    void eachLineIsEnteredWithItsOwnFactorsAndCounts() throws Exception {
        long id = RiskSites.upload(mvc, RiskSites.BLOCK, "Two lines block");
        // the school of SCHOOL with two lines: a buried 500 m telecom line in a suburban street (C_I 0.5,
        // C_E 0.5, Tables A.2, A.4), screen bonded at the entry, 1 to 5 Ω/km, U_W 1.5 kV (P_LD 0.8,
        // Table B.8), SPDs for LPL I (P_EB 0.01, B.7), warning notices (P_TU 0.1, B.6); and a
        // high-voltage line with an HV/LV transformer (C_T 0.2, A.3), 1 km overhead, rural, isolating
        // interfaces (C_LD 0, B.4). [factor values from memory]
        // line 1: N_L = 4 · 20 000 · 0.25 · 10⁻⁶ = 0.02; P_V = 0.01 · 0.8 = 0.008, P_U = 8·10⁻⁴;
        // R_V = 0.02 · 0.008 · 2·10⁻³ = 3.2·10⁻⁷, R_U = 0.02 · 8·10⁻⁴ · 10⁻⁴ = 1.6·10⁻⁹ (hand), the
        // same with every LPS (its SPDs are no better than LPL I); line 2: R_U = R_V = 0
        String body = SCHOOL.replace("\"lineCount\": 1, \"lineLength\": 1000", "\"lines\": ["
                + "{\"installation\": \"BURIED\", \"length\": 500, \"environment\": \"SUBURBAN\","
                + " \"shielding\": \"SCREEN_1_TO_5_OHM_PER_KM\", \"withstandVoltage\": \"KV_1_5\","
                + " \"surgeProtection\": \"LPL_I\", \"touchProtection\": \"WARNING_NOTICES\"},"
                + " {\"transformer\": \"HV_LV_TRANSFORMER\", \"shielding\": \"ISOLATING_INTERFACE\"}]");

        JsonNode risk = send("/api/sites/" + id + "/risk", body, 200);

        assertThat(risk.path("complete").asBoolean()).isTrue();
        JsonNode none = risk.path("options").get(0);
        assertThat(none.path("lines")).hasSize(2);
        org.assertj.core.data.Percentage close = org.assertj.core.data.Percentage.withPercentage(1e-6);
        assertThat(none.path("lines").get(0).path("rv").asDouble()).isCloseTo(3.2e-7, close);
        assertThat(none.path("lines").get(0).path("ru").asDouble()).isCloseTo(1.6e-9, close);
        assertThat(none.path("lines").get(1).path("rv").asDouble()).isZero();
        assertThat(none.path("rv").asDouble()).isCloseTo(3.2e-7, close);
        assertThat(risk.path("options").get(2).path("lines").get(0).path("peb").asDouble()).isEqualTo(0.01);
        // without line 1's screen and SPDs the school needed level II; with them, R1 at III is
        // R_A + R_B = 6.07·10⁻⁶ (LineComponentsTest) + 3.2·10⁻⁷ + 1.6·10⁻⁹ = 6.39·10⁻⁶: level III
        assertThat(risk.path("options").get(2).path("r1").asDouble()).isCloseTo(6.3927e-6,
                org.assertj.core.data.Percentage.withPercentage(0.2));
        assertThat(risk.path("lowestSufficientLevel").asString()).isEqualTo("III");

        JsonNode again = json("/api/sites/" + id + "/risk", 200).path("inputs");
        assertThat(again.path("lineCount").asInt()).isEqualTo(2);
        assertThat(again.path("lines").get(0).path("length").asDouble()).isEqualTo(500.0);
        assertThat(again.path("lines").get(0).path("withstandVoltage").asString()).isEqualTo("KV_1_5");
        assertThat(again.path("lines").get(1).path("installation").asString()).isEqualTo("OVERHEAD");
        assertThat(again.path("lines").get(1).path("transformer").asString()).isEqualTo("HV_LV_TRANSFORMER");
        // what GET answers, PUT takes back unchanged
        JsonNode back = send("/api/sites/" + id + "/risk", again.toString(), 200);
        assertThat(back.path("inputs")).isEqualTo(again);
    }

    @Test
    void explosionRiskOrLifeCriticalSystemsGetNoVerdictButWhatToDo() throws Exception {
        long id = RiskSites.upload(mvc, RiskSites.BLOCK, "Explosive block");

        JsonNode risk = send("/api/sites/" + id + "/risk", SCHOOL.replace("\"ORDINARY\"", "\"EXPLOSION\""), 200);

        // R1 of such a structure holds R_C, R_M, R_W and R_Z [IEC 62305-2:2010], not computed here
        assertThat(risk.path("complete").asBoolean()).isTrue();
        assertThat(texts(risk.path("notCovered"))).containsExactly("EXPLOSION_RISK");
        assertThat(risk.path("options")).isEmpty();
        assertThat(risk.path("lowestSufficientLevel").isNull()).isTrue();
        assertThat(risk.path("tolerableWithoutLps").isNull()).isTrue();
        assertThat(risk.path("outcome").asString()).contains("does not cover", "explosion", "R_C", "full method")
                .doesNotContain("tolerable");

        risk = send("/api/sites/" + id + "/risk", SCHOOL.replace("\"lifeCriticalSystems\": \"NO\"",
                "\"lifeCriticalSystems\": \"YES\""), 200);
        assertThat(texts(risk.path("notCovered"))).containsExactly("LIFE_CRITICAL_SYSTEMS");
        assertThat(risk.path("options")).isEmpty();
        assertThat(risk.path("outcome").asString()).contains("does not cover", "life");
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
        e = send(url, "{\"lines\": [{\"installation\": \"FLYING\"}]}", 400);
        assertThat(e.path("field").asString()).isEqualTo("lines[0].installation");
        assertThat(e.path("error").asString()).contains("OVERHEAD", "BURIED");
        e = send(url, "{\"lines\": [{}, {\"length\": -5}]}", 400);
        assertThat(e.path("field").asString()).isEqualTo("lines[1].length");
        e = send(url, "{\"lines\": [{\"colour\": \"red\"}]}", 400);
        assertThat(e.path("field").asString()).isEqualTo("lines[0].colour");
        e = send(url, "{\"lines\": {\"length\": 10}}", 400);
        assertThat(e.path("field").asString()).isEqualTo("lines");
        e = send(url, "{\"lines\": [{}], \"lineCount\": 3}", 400);
        assertThat(e.path("field").asString()).isEqualTo("lineCount");
        e = send(url, "{\"lineCount\": 21}", 400);
        assertThat(e.path("field").asString()).isEqualTo("lineCount");
        e = send(url, "{\"lifeCriticalSystems\": \"MAYBE\"}", 400);
        assertThat(e.path("field").asString()).isEqualTo("lifeCriticalSystems");
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
