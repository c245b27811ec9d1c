package org.lpzplanner.engine.risk;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.assertj.core.data.Percentage;
import org.junit.jupiter.api.Test;
import org.lpzplanner.engine.model.ProtectionLevel;

/**
 * R_U and R_V, the components of R1 due to flashes to an incoming line [IEC 62305-2:2010 clause 6,
 * Annexes A to C]: N_L = N_G · A_L · C_I · C_E · C_T · 10⁻⁶ with A_L = 40 · L_L; R_U = N_L · P_U · L_U,
 * P_U = P_TU · P_EB · P_LD · C_LD, L_U = L_A; R_V = N_L · P_V · L_V, P_V = P_EB · P_LD · C_LD, L_V = L_B.
 * The factor values (Tables A.2 to A.4, B.2, B.4, B.6 to B.8, C.2 to C.6) are those of the enums and
 * are [from memory — check against the standard]; the formulas and the arithmetic are not.
 */
class LineComponentsTest {

    private static final Percentage CLOSE = Percentage.withPercentage(1e-4);

    /** An overhead low-voltage line, unshielded, no SPD, no touch protection: every factor 1. */
    private static IncomingLine plainLine(double length) {
        return new IncomingLine(LineInstallation.OVERHEAD, length, LineEnvironment.RURAL, LineTransformer.NONE,
                EntrySurgeProtection.NONE, LineShielding.UNSHIELDED, WithstandVoltage.KV_1, LineTouchProtection.NONE);
    }

    /**
     * The worked school: 40 × 20 × 10 m, N_G = 4 flashes/km²/year, isolated (C_D = 1, Table A.1),
     * one overhead low-voltage line of 1 km.
     * <pre>
     * A_D = 4400 + 900π = 7227.433 m² (Annex A), N_D = 4 · 7227.433 · 10⁻⁶ = 0.028909734
     * school L_T 10⁻², L_F 10⁻¹ (C.2); concrete r_t 10⁻² (C.3); r_p 1 (C.4); ordinary r_f 10⁻² (C.5);
     * low panic h_z 2 (C.6); P_TA 1 (B.1); occupancy 1
     * L_A = L_U = 10⁻⁴, L_B = L_V = 2·10⁻³
     * N_L = 4 · 40 000 · 1 · 1 · 1 · 10⁻⁶ = 0.16 (C_I 1 A.2, C_E 1 A.4, C_T 1 A.3)
     * P_LD 1 (B.8, unshielded), C_LD 1 (B.4), P_TU 1 (B.6); P_EB 1 without SPD, and with an LPS
     * that of SPDs for its level, 0.05 (III, IV), 0.02 (II), 0.01 (I) (B.7); P_B (B.2)
     *          R_A           R_B           R_U       R_V       R1
     * no LPS   2.890973e-6   5.781947e-5   1.6e-5    3.2e-4    3.967104e-4
     * IV       5.781947e-7   1.156389e-5   8e-7      1.6e-5    2.894209e-5
     * III      2.890973e-7   5.781947e-6   8e-7      1.6e-5    2.287104e-5   (6.07e-6 without the line)
     * II       1.445487e-7   2.890973e-6   3.2e-7    6.4e-6    9.755522e-6 ≤ 10⁻⁵
     * I        5.781947e-8   1.156389e-6   1.6e-7    3.2e-6    4.574209e-6
     * </pre>
     */
    private static LifeRiskInputs school(List<IncomingLine> lines) {
        DangerousEvents nd = new DangerousEvents(4, CollectionAreaOp.rectangleFormula(40, 20, 10), LocationFactor.ISOLATED);
        return new LifeRiskInputs(nd, SurfaceType.AGRICULTURAL_OR_CONCRETE, FireRisk.ORDINARY, FireProvisions.NONE,
                SpecialHazard.LOW_PANIC, StructureUse.HOSPITAL_HOTEL_SCHOOL_CIVIC, TouchStepProtection.NONE,
                Occupancy.always(), lines, false);
    }

    @Test
    void schoolWithAnOverheadLineNeedsLevelTwoNotThree() {
        LevelChoice choice = LifeRiskEstimate.choose(school(List.of(plainLine(1000))));

        LifeRisk none = choice.options().get(0);
        assertThat(none.lines()).singleElement().satisfies(l -> assertThat(l.nl()).isCloseTo(0.16, within(1e-12)));
        assertThat(none.ra()).isCloseTo(2.890973e-6, CLOSE);
        assertThat(none.rb()).isCloseTo(5.781947e-5, CLOSE);
        assertThat(none.ru()).isCloseTo(1.6e-5, CLOSE);
        assertThat(none.rv()).isCloseTo(3.2e-4, CLOSE);
        assertThat(none.r1()).isCloseTo(3.967104e-4, CLOSE);
        assertThat(none.dominant()).isEqualTo(RiskComponent.R_V);
        assertThat(choice.options().get(1).r1()).isCloseTo(2.894209e-5, CLOSE);
        LifeRisk three = choice.options().get(2);
        assertThat(three.lines().get(0).peb()).isEqualTo(0.05);
        assertThat(three.r1()).isCloseTo(2.287104e-5, CLOSE);
        assertThat(three.isTolerable()).isFalse();
        LifeRisk two = choice.options().get(3);
        assertThat(two.lines().get(0).peb()).isEqualTo(0.02);
        assertThat(two.ru()).isCloseTo(3.2e-7, CLOSE);
        assertThat(two.rv()).isCloseTo(6.4e-6, CLOSE);
        assertThat(two.r1()).isCloseTo(9.755522e-6, CLOSE);
        assertThat(choice.options().get(4).r1()).isCloseTo(4.574209e-6, CLOSE);
        assertThat(choice.level()).contains(ProtectionLevel.II);
        // the same school without its line: R1 at level III is 6.07·10⁻⁶ and III would do
        LevelChoice alone = LifeRiskEstimate.choose(school(List.of()));
        assertThat(alone.options().get(2).r1()).isCloseTo(6.071044e-6, CLOSE);
        assertThat(alone.level()).contains(ProtectionLevel.III);
    }

    @Test
    void lineFactorsScaleTheFlashesToTheLine() {
        // buried C_I 0.5 (A.2), urban C_E 0.1 (A.4), HV/LV transformer C_T 0.2 (A.3), 500 m:
        // A_L = 20 000 m², N_L = 4 · 20 000 · 0.5 · 0.1 · 0.2 · 10⁻⁶ = 8·10⁻⁴; A_I = 2·10⁶ m², N_I = 0.08 (hand)
        IncomingLine line = new IncomingLine(LineInstallation.BURIED, 500, LineEnvironment.URBAN,
                LineTransformer.HV_LV_TRANSFORMER, EntrySurgeProtection.NONE, LineShielding.UNSHIELDED,
                WithstandVoltage.KV_1, LineTouchProtection.NONE);

        assertThat(line.collectionArea()).isEqualTo(20_000.0);
        assertThat(line.flashesPerYear(4)).isCloseTo(8e-4, within(1e-15));
        assertThat(line.nearArea()).isEqualTo(2_000_000.0);
        assertThat(line.flashesNearPerYear(4)).isCloseTo(0.08, within(1e-12));
    }

    @Test
    void bondedScreenAndTouchProtectionEnterPuAndPv() {
        // screen bonded at the entry, 1 to 5 Ω/km, U_W 2.5 kV: P_LD 0.6 (B.8), C_LD 1 (B.4); SPDs for
        // LPL II, P_EB 0.02 (B.7); warning notices P_TU 0.1 (B.6): P_V = 0.02 · 0.6 = 0.012,
        // P_U = 0.1 · 0.012 = 0.0012; N_L = 0.16 (1 km, N_G 4): R_V = 0.16 · 0.012 · 2·10⁻³ = 3.84·10⁻⁶,
        // R_U = 0.16 · 0.0012 · 10⁻⁴ = 1.92·10⁻⁸ (hand)
        IncomingLine line = new IncomingLine(LineInstallation.OVERHEAD, 1000, LineEnvironment.RURAL,
                LineTransformer.NONE, EntrySurgeProtection.LPL_II, LineShielding.SCREEN_1_TO_5_OHM_PER_KM,
                WithstandVoltage.KV_2_5, LineTouchProtection.WARNING_NOTICES);
        LineRisk r = LifeRiskEstimate.estimate(school(List.of(line)), null).lines().get(0);

        assertThat(line.pld()).isEqualTo(0.6);
        assertThat(r.pv()).isCloseTo(0.012, CLOSE);
        assertThat(r.pu()).isCloseTo(0.0012, CLOSE);
        assertThat(r.rv()).isCloseTo(3.84e-6, CLOSE);
        assertThat(r.ru()).isCloseTo(1.92e-8, CLOSE);
        // an LPS of level III brings SPDs for LPL III–IV (0.05): the better ones already there stay
        assertThat(LifeRiskEstimate.estimate(school(List.of(line)), ProtectionLevel.III).lines().get(0).peb())
                .isEqualTo(0.02);
    }

    @Test
    void isolatingInterfaceRemovesTheLineComponents() {
        // C_LD = 0 for isolating interfaces (Table B.4): P_U = P_V = 0 whatever else
        IncomingLine isolated = new IncomingLine(LineInstallation.OVERHEAD, 1000, LineEnvironment.RURAL,
                LineTransformer.NONE, EntrySurgeProtection.NONE, LineShielding.ISOLATING_INTERFACE,
                WithstandVoltage.KV_1, LineTouchProtection.NONE);
        LifeRisk r = LifeRiskEstimate.estimate(school(List.of(isolated)), null);

        assertThat(r.ru()).isZero();
        assertThat(r.rv()).isZero();
        assertThat(r.r1()).isCloseTo(6.071044e-5, CLOSE); // R_A + R_B of the school without LPS (hand)
    }

    @Test
    void eachLineAddsItsOwnComponents() {
        // two plain lines of 1 km: R_V twice 3.2·10⁻⁴ without an LPS (hand)
        LifeRisk r = LifeRiskEstimate.estimate(school(List.of(plainLine(1000), plainLine(1000))), null);
        assertThat(r.rv()).isCloseTo(6.4e-4, CLOSE);
        assertThat(r.ru()).isCloseTo(3.2e-5, CLOSE);
    }

    @Test
    void spdsOfAnLpsFollowItsLevel() {
        // Table B.7: SPDs for LPL I 0.01, II 0.02, III and IV 0.05
        assertThat(EntrySurgeProtection.ofLevel(ProtectionLevel.I).peb()).isEqualTo(0.01);
        assertThat(EntrySurgeProtection.ofLevel(ProtectionLevel.II).peb()).isEqualTo(0.02);
        assertThat(EntrySurgeProtection.ofLevel(ProtectionLevel.III).peb()).isEqualTo(0.05);
        assertThat(EntrySurgeProtection.ofLevel(ProtectionLevel.IV).peb()).isEqualTo(0.05);
    }

    @Test
    void explosionRiskAndLifeCriticalSystemsAreRefusedNotUnderstated() {
        // R_C, R_M, R_W, R_Z count for these [IEC 62305-2:2010, composition of R1]; they are not computed
        LifeRiskInputs b = school(List.of(plainLine(1000)));
        LifeRiskInputs explosive = new LifeRiskInputs(b.events(), b.surface(), FireRisk.EXPLOSION, b.fireProvisions(),
                b.specialHazard(), b.use(), b.touchStep(), b.occupancy(), b.lines(), false);
        LifeRiskInputs lifeSupport = new LifeRiskInputs(b.events(), b.surface(), b.fireRisk(), b.fireProvisions(),
                b.specialHazard(), b.use(), b.touchStep(), b.occupancy(), b.lines(), true);

        assertThat(b.outsideEstimate()).isEmpty();
        assertThat(explosive.outsideEstimate()).containsExactly(OutsideEstimate.EXPLOSION_RISK);
        assertThat(lifeSupport.outsideEstimate()).containsExactly(OutsideEstimate.LIFE_CRITICAL_SYSTEMS);
        assertThatThrownBy(() -> LifeRiskEstimate.choose(explosive)).isInstanceOf(IllegalArgumentException.class)
                .hasMessageContaining("explosion");
        assertThatThrownBy(() -> LifeRiskEstimate.estimate(lifeSupport, ProtectionLevel.I))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("life-saving");
    }
}
