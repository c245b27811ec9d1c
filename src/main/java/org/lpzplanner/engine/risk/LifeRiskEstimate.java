package org.lpzplanner.engine.risk;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.List;
import org.lpzplanner.engine.model.ProtectionLevel;

/**
 * Risk of loss of human life R1 due to flashes to the structure, and the lowest protection level
 * that makes it tolerable [IEC 62305-2:2010]:
 * <ul>
 *   <li>R_A = N_D · P_A · L_A, injury by touch and step voltage, P_A = P_TA · P_B,
 *       L_A = r_t · L_T · n_z/n_t · t_z/8760;</li>
 *   <li>R_B = N_D · P_B · L_B, physical damage, L_B = r_p · r_f · h_z · L_F · n_z/n_t · t_z/8760;</li>
 *   <li>P_B = {@link ProtectionLevel#damageProbabilityWithLps()} with an LPS, 1 without;</li>
 *   <li>tolerable when R1 = R_A + R_B ≤ R_T = 10⁻⁵ per year.</li>
 * </ul>
 * Limits: flashes near the structure, to lines and near lines (R_C, R_M, R_U, R_V, R_W, R_Z) are not
 * counted, so R1 here is a lower bound of the full R1 whenever the structure has internal systems
 * or incoming lines that matter for life (explosion risk, hospitals with life-support equipment).
 * The 2024 edition of IEC 62305-2 revised parts of the method; results follow the 2010 edition.
 *
 * <p>Stateless and thread-safe.
 */
public final class LifeRiskEstimate {

    /** R_T for loss of human life, per year [IEC 62305-2:2010 Table 7; table number from memory — check against the standard]. */
    public static final double TOLERABLE_RISK = 1e-5;

    /** The options tried, in order: no LPS (null), then levels IV, III, II, I. */
    private static final List<ProtectionLevel> OPTIONS = Collections.unmodifiableList(
            Arrays.asList(null, ProtectionLevel.IV, ProtectionLevel.III, ProtectionLevel.II, ProtectionLevel.I));

    private LifeRiskEstimate() {
    }

    /**
     * R1 with the given LPS.
     *
     * @param level protection level of the LPS, or null for none
     */
    public static LifeRisk estimate(LifeRiskInputs inputs, ProtectionLevel level) {
        double pb = level == null ? 1.0 : level.damageProbabilityWithLps();
        return new LifeRisk(level, inputs, inputs.touchStep().pta(), pb);
    }

    /** R1 for no LPS and each protection level from IV to I; see {@link LevelChoice#chosen()}. */
    public static LevelChoice choose(LifeRiskInputs inputs) {
        List<LifeRisk> options = new ArrayList<>();
        for (ProtectionLevel level : OPTIONS) {
            options.add(estimate(inputs, level));
        }
        return new LevelChoice(options);
    }
}
