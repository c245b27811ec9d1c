package org.lpzplanner.engine.risk;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.List;
import org.lpzplanner.engine.model.ProtectionLevel;

/**
 * Risk of loss of human life R1 and the lowest protection level that makes it tolerable
 * [IEC 62305-2:2010]:
 * <ul>
 *   <li>R_A = N_D · P_A · L_A, injury by touch and step voltage, P_A = P_TA · P_B,
 *       L_A = r_t · L_T · n_z/n_t · t_z/8760;</li>
 *   <li>R_B = N_D · P_B · L_B, physical damage, L_B = r_p · r_f · h_z · L_F · n_z/n_t · t_z/8760;</li>
 *   <li>for each incoming line ({@link LineRisk}): R_U = N_L · P_U · L_U and R_V = N_L · P_V · L_V,
 *       P_U = P_TU · P_EB · P_LD · C_LD, P_V = P_EB · P_LD · C_LD, L_U = L_A, L_V = L_B;</li>
 *   <li>P_B = {@link ProtectionLevel#damageProbabilityWithLps()} with an LPS, 1 without;</li>
 *   <li>P_EB: without an LPS, that of the SPDs already at the line's entry; with an LPS, at most
 *       that of SPDs for the LPS's level ({@link EntrySurgeProtection#ofLevel}), because an LPS
 *       includes the lightning equipotential bonding of every incoming line at its entry
 *       [IEC 62305-3:2010 6.2]: an option with an LPS stands for the LPS with that bonding;</li>
 *   <li>tolerable when R1 = R_A + R_B + R_U + R_V ≤ R_T = 10⁻⁵ per year.</li>
 * </ul>
 * That is the whole R1 of IEC 62305-2:2010 for a structure without a risk of explosion and where no
 * failure of internal systems immediately endangers life. For those, R1 also holds R_C, R_M, R_W
 * and R_Z, which are not computed: the estimate refuses them ({@link LifeRiskInputs#outsideEstimate()}).
 * Flashes to a structure at the far end of a line (N_DJ, which adds to N_L in R_U and R_V) are not
 * counted. The 2024 edition of IEC 62305-2 revised parts of the method; results follow the 2010 edition.
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
     * @throws IllegalArgumentException for a structure outside this estimate ({@link LifeRiskInputs#outsideEstimate()})
     */
    public static LifeRisk estimate(LifeRiskInputs inputs, ProtectionLevel level) {
        List<OutsideEstimate> outside = inputs.outsideEstimate();
        if (!outside.isEmpty()) {
            throw new IllegalArgumentException("R1 is not estimated here when "
                    + String.join("; and when ", outside.stream().map(OutsideEstimate::description).toList()));
        }
        double pb = level == null ? 1.0 : level.damageProbabilityWithLps();
        List<LineRisk> lines = new ArrayList<>();
        for (IncomingLine line : inputs.lines()) {
            double peb = line.surgeProtection().peb();
            if (level != null) {
                peb = Math.min(peb, EntrySurgeProtection.ofLevel(level).peb());
            }
            lines.add(new LineRisk(line, line.flashesPerYear(inputs.flashDensity()), peb,
                    inputs.lossByTouchAndStepVoltage(), inputs.lossByPhysicalDamage()));
        }
        return new LifeRisk(level, inputs, inputs.touchStep().pta(), pb, lines);
    }

    /**
     * R1 for no LPS and each protection level from IV to I; see {@link LevelChoice#chosen()}.
     *
     * @throws IllegalArgumentException for a structure outside this estimate
     */
    public static LevelChoice choose(LifeRiskInputs inputs) {
        List<LifeRisk> options = new ArrayList<>();
        for (ProtectionLevel level : OPTIONS) {
            options.add(estimate(inputs, level));
        }
        return new LevelChoice(options);
    }
}
