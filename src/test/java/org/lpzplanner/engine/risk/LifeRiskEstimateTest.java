package org.lpzplanner.engine.risk;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.assertj.core.data.Percentage;
import org.junit.jupiter.api.Test;
import org.lpzplanner.engine.model.ProtectionLevel;

/**
 * R1 due to flashes to the structure, without incoming lines [IEC 62305-2:2010]; the lines'
 * components are checked in {@link LineComponentsTest}. Factor values are those of the enums,
 * each from the IEC 62305-2:2010 table named beside it. The factor values and table numbers are
 * [from memory — check against the standard]; the formulas and the arithmetic below are not.
 */
class LifeRiskEstimateTest {

    private static final Percentage CLOSE = Percentage.withPercentage(1e-6);

    /**
     * Worked example, hospital 40 × 20 × 10 m, isolated, N_G = 4 flashes/km²/yr, no incoming lines
     * (R_U = R_V = 0), internal systems not life-critical:
     * <pre>
     * A_D = 800 + 2·30·60 + 900π = 4400 + 900π = 7227.433388 m²     [Annex A rectangle formula]
     * N_D = 4 · 7227.433388 · 1 · 1e-6 = 0.028909734 /yr           [C_D isolated = 1, Table A.1]
     * r_t  = 1e-2  agricultural ground or concrete                   [Table C.3]
     * L_T  = 1e-2, L_F = 1e-1  hospital                              [Table C.2]
     * r_p  = 1     no fire provisions                                [Table C.4]
     * r_f  = 1e-2  ordinary fire risk                                [Table C.5]
     * h_z  = 5     difficulty of evacuation                          [Table C.6]
     * P_TA = 1     no touch and step measures                        [Table B.1]
     * occupancy = 1 (everyone, 8760 h)
     * L_A = 1e-2 · 1e-2 · 1 = 1e-4
     * L_B = 1 · 1e-2 · 5 · 1e-1 · 1 = 5e-3
     * P_A = P_TA · P_B = P_B, so R1 = N_D · P_B · (L_A + L_B) = N_D · P_B · 5.1e-3
     * no LPS (P_B 1):  R_A = 2.890973e-6, R_B = 1.445487e-4, R1 = 1.474397e-4
     * IV   (P_B 0.2):  R1 = 2.948793e-5  > 1e-5
     * III  (P_B 0.1):  R1 = 1.474397e-5  > 1e-5
     * II   (P_B 0.05): R_A = 1.445487e-7, R_B = 7.227433e-6, R1 = 7.371982e-6 ≤ 1e-5 → level II
     * R_B dominates: 5e-3 / 5.1e-3 = 98.0 % of R1.                  [P_B: Table B.2]
     * </pre>
     */
    private static LifeRiskInputs hospital() {
        DangerousEvents nd = new DangerousEvents(4, CollectionAreaOp.rectangleFormula(40, 20, 10), LocationFactor.ISOLATED);
        return new LifeRiskInputs(nd, SurfaceType.AGRICULTURAL_OR_CONCRETE, FireRisk.ORDINARY, FireProvisions.NONE,
                SpecialHazard.DIFFICULT_EVACUATION, StructureUse.HOSPITAL_HOTEL_SCHOOL_CIVIC, TouchStepProtection.NONE,
                Occupancy.always(), List.of(), false);
    }

    /** Events giving N_D per year: N_G 1 flash/km²/year on N_D · 10⁶ m², isolated (C_D 1, Table A.1). */
    private static DangerousEvents events(double nd) {
        return new DangerousEvents(1, nd * 1e6, LocationFactor.ISOLATED);
    }

    private static LifeRiskInputs withTouchStep(LifeRiskInputs b, TouchStepProtection touchStep) {
        return new LifeRiskInputs(b.events(), b.surface(), b.fireRisk(), b.fireProvisions(), b.specialHazard(), b.use(),
                touchStep, b.occupancy(), b.lines(), b.lifeCriticalSystems());
    }

    @Test
    void workedHospitalExampleGivesHandComputedComponents() {
        LifeRiskInputs in = hospital();
        LifeRisk none = LifeRiskEstimate.estimate(in, null);

        assertThat(in.dangerousEventsPerYear()).isCloseTo(0.028909734, within(1e-9));
        assertThat(none.la()).isCloseTo(1e-4, CLOSE);
        assertThat(none.lb()).isCloseTo(5e-3, CLOSE);
        assertThat(none.ra()).isCloseTo(2.890973e-6, Percentage.withPercentage(1e-4));
        assertThat(none.rb()).isCloseTo(1.445487e-4, Percentage.withPercentage(1e-4));
        assertThat(none.r1()).isCloseTo(1.474397e-4, Percentage.withPercentage(1e-4));
        assertThat(none.isTolerable()).isFalse();
    }

    @Test
    void workedHospitalExampleNeedsProtectionLevelTwo() {
        LevelChoice choice = LifeRiskEstimate.choose(hospital());

        assertThat(choice.options()).extracting(LifeRisk::level)
                .containsExactly(null, ProtectionLevel.IV, ProtectionLevel.III, ProtectionLevel.II, ProtectionLevel.I);
        assertThat(choice.options().get(1).r1()).isCloseTo(2.948793e-5, Percentage.withPercentage(1e-4));
        assertThat(choice.options().get(2).r1()).isCloseTo(1.474397e-5, Percentage.withPercentage(1e-4));
        LifeRisk two = choice.options().get(3);
        assertThat(two.ra()).isCloseTo(1.445487e-7, Percentage.withPercentage(1e-4));
        assertThat(two.rb()).isCloseTo(7.227433e-6, Percentage.withPercentage(1e-4));
        assertThat(two.r1()).isCloseTo(7.371982e-6, Percentage.withPercentage(1e-4));
        assertThat(choice.level()).contains(ProtectionLevel.II);
        assertThat(choice.needsLps()).isTrue();
    }

    @Test
    void physicalDamageDominatesTheWorkedExampleAndTheSummarySaysSo() {
        LevelChoice choice = LifeRiskEstimate.choose(hospital());
        LifeRisk chosen = choice.chosen().orElseThrow();

        assertThat(chosen.dominant()).isEqualTo(RiskComponent.R_B);
        List<String> summary = choice.summary();
        assertThat(summary.get(0)).contains("lowest protection level").contains("II");
        // 5e-3 / 5.1e-3 = 98.0 % (hand)
        assertThat(summary).anySatisfy(line -> assertThat(line).contains("R_B dominates: 98.0 %"));
        assertThat(summary).anySatisfy(line -> assertThat(line).contains("difficulty of evacuation h_z 5"));
    }

    @Test
    void lowRiskStructureNeedsNoLps() {
        // N_D 0.01, other structure (L_F 1e-2, Table C.2), low fire risk r_f 1e-3 (Table C.5), r_t 1e-5
        // (asphalt, Table C.3), everything else 1: L_A = 1e-5·1e-2 = 1e-7, L_B = 1e-3·1e-2 = 1e-5;
        // R1 = 0.01 · (1e-7 + 1e-5) = 1.01e-7 ≤ 1e-5 (hand)
        LifeRiskInputs in = new LifeRiskInputs(events(0.01), SurfaceType.ASPHALT_LINOLEUM_OR_WOOD, FireRisk.LOW,
                FireProvisions.NONE, SpecialHazard.NONE, StructureUse.OTHER, TouchStepProtection.NONE, Occupancy.always(),
                List.of(), false);
        LevelChoice choice = LifeRiskEstimate.choose(in);

        assertThat(choice.chosen().orElseThrow().r1()).isCloseTo(1.01e-7, CLOSE);
        assertThat(choice.needsLps()).isFalse();
        assertThat(choice.level()).isEmpty();
    }

    @Test
    void whenEvenLevelOneIsNotEnoughNoLevelIsChosen() {
        // N_D 0.1, hospital L_F 1e-1, high fire risk r_f 1e-1, high panic h_z 10, r_p 1, r_t 1e-2:
        // L_B = 1e-1·10·1e-1 = 0.1; with level I (P_B 0.02, Table B.2) R_B = 0.1·0.02·0.1 = 2e-4 > 1e-5 (hand)
        LifeRiskInputs in = new LifeRiskInputs(events(0.1), SurfaceType.AGRICULTURAL_OR_CONCRETE, FireRisk.HIGH,
                FireProvisions.NONE, SpecialHazard.HIGH_PANIC, StructureUse.HOSPITAL_HOTEL_SCHOOL_CIVIC,
                TouchStepProtection.NONE, Occupancy.always(), List.of(), false);
        LevelChoice choice = LifeRiskEstimate.choose(in);

        assertThat(choice.options().get(4).rb()).isCloseTo(2e-4, CLOSE);
        assertThat(choice.chosen()).isEmpty();
        assertThat(choice.summary().get(0)).contains("Even an LPS of protection level I");
    }

    @Test
    void physicalRestrictionsRemoveInjuryByTouchAndStepVoltage() {
        // P_TA = 0 (Table B.1) → P_A = 0 → R_A = 0 whatever the rest
        LifeRiskInputs restricted = withTouchStep(hospital(), TouchStepProtection.PHYSICAL_RESTRICTIONS);

        assertThat(LifeRiskEstimate.estimate(restricted, null).ra()).isZero();
        assertThat(LifeRiskEstimate.estimate(restricted, null).rb()).isCloseTo(1.445487e-4, Percentage.withPercentage(1e-4));
    }

    @Test
    void lpsReducesInjuryProbabilityThroughPb() {
        // P_A = P_TA · P_B: warning notices (P_TA 0.1, Table B.1) with level III (P_B 0.1, Table B.2) → 0.01
        LifeRiskInputs warned = withTouchStep(hospital(), TouchStepProtection.WARNING_NOTICES);

        assertThat(LifeRiskEstimate.estimate(warned, ProtectionLevel.III).pa()).isCloseTo(0.01, CLOSE);
    }

    @Test
    void occupancyScalesBothLosses() {
        // 50 of 200 persons for 4380 h: 0.25 · 0.5 = 0.125 (hand); L_B = 5e-3 · 0.125 = 6.25e-4
        Occupancy part = new Occupancy(50, 200, 4380);
        LifeRiskInputs base = hospital();
        LifeRiskInputs partial = new LifeRiskInputs(base.events(), base.surface(), base.fireRisk(),
                base.fireProvisions(), base.specialHazard(), base.use(), base.touchStep(), part, base.lines(), false);

        assertThat(part.fraction()).isCloseTo(0.125, CLOSE);
        assertThat(partial.lossByPhysicalDamage()).isCloseTo(6.25e-4, CLOSE);
        assertThat(partial.lossByTouchAndStepVoltage()).isCloseTo(1.25e-5, CLOSE);
    }
}
