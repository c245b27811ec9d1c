package org.lpzplanner.engine.risk;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.lpzplanner.engine.model.ProtectionLevel;

/**
 * R1 for one protection option, with every factor kept so a report can show how the figure arises:
 * R1 = R_A + R_B + R_U + R_V per year, R_U and R_V summed over the incoming lines.
 *
 * @param level the LPS's protection level, or null for no LPS
 * @param inputs the user's choices
 * @param pta P_TA of the touch and step measures
 * @param pb P_B of the option (1 without LPS)
 * @param lines R_U and R_V of each incoming line for this option, in the order of the inputs
 */
public record LifeRisk(ProtectionLevel level, LifeRiskInputs inputs, double pta, double pb, List<LineRisk> lines) {

    public LifeRisk {
        lines = List.copyOf(lines);
    }

    /** N_D. */
    public double nd() {
        return inputs.dangerousEventsPerYear();
    }

    /** P_A = P_TA · P_B. */
    public double pa() {
        return pta * pb;
    }

    /** L_A. */
    public double la() {
        return inputs.lossByTouchAndStepVoltage();
    }

    /** L_B. */
    public double lb() {
        return inputs.lossByPhysicalDamage();
    }

    /** R_A = N_D · P_A · L_A per year. */
    public double ra() {
        return nd() * pa() * la();
    }

    /** R_B = N_D · P_B · L_B per year. */
    public double rb() {
        return nd() * pb * lb();
    }

    /** R_U summed over the lines, per year. */
    public double ru() {
        return lines.stream().mapToDouble(LineRisk::ru).sum();
    }

    /** R_V summed over the lines, per year. */
    public double rv() {
        return lines.stream().mapToDouble(LineRisk::rv).sum();
    }

    /** The value of one component. */
    public double component(RiskComponent c) {
        return switch (c) {
            case R_A -> ra();
            case R_B -> rb();
            case R_U -> ru();
            case R_V -> rv();
        };
    }

    /** R1 = R_A + R_B + R_U + R_V per year. */
    public double r1() {
        return ra() + rb() + ru() + rv();
    }

    /** Whether R1 is at or below the tolerable risk {@link LifeRiskEstimate#TOLERABLE_RISK}. */
    public boolean isTolerable() {
        return r1() <= LifeRiskEstimate.TOLERABLE_RISK;
    }

    /** The largest component; on a tie the first of R_B, R_V, R_A, R_U. */
    public RiskComponent dominant() {
        RiskComponent best = RiskComponent.R_B;
        for (RiskComponent c : List.of(RiskComponent.R_V, RiskComponent.R_A, RiskComponent.R_U)) {
            if (component(c) > component(best)) {
                best = c;
            }
        }
        return best;
    }

    /** "no LPS" or "LPS of protection level III". */
    public String optionName() {
        return level == null ? "no LPS" : "LPS of protection level " + level.name();
    }

    /** The figures in plain words, one sentence per line. */
    public List<String> explanation() {
        LifeRiskInputs in = inputs;
        double r1 = r1();
        RiskComponent d = dominant();
        double share = r1 > 0 ? 100 * component(d) / r1 : 0;
        List<String> out = new ArrayList<>(List.of(
                String.format(Locale.ROOT, "With %s, R1 = %.3e per year against the tolerable %.0e: %s.", optionName(), r1,
                        LifeRiskEstimate.TOLERABLE_RISK, isTolerable() ? "tolerable" : "too high"),
                String.format(Locale.ROOT, "Flashes to the structure: N_D = %.4g dangerous events per year.", nd()),
                String.format(Locale.ROOT, "R_A (%s) = N_D × P_A × L_A = %.3e, with P_A = %.3g (%s, P_TA %.3g × P_B %.3g) "
                        + "and L_A = %.3e (surface %s r_t %.0e × L_T %.0e × occupancy %.4g).",
                        RiskComponent.R_A.description(), ra(), pa(), in.touchStep().description(), pta, pb, la(),
                        in.surface().description(), in.surface().rt(), in.use().lt(), in.occupancy().fraction()),
                String.format(Locale.ROOT, "R_B (%s) = N_D × P_B × L_B = %.3e, with P_B = %.3g and L_B = %.3e "
                        + "(%s r_p %.3g × %s r_f %.0e × %s h_z %.3g × %s L_F %.0e × occupancy %.4g).",
                        RiskComponent.R_B.description(), rb(), pb, lb(), in.fireProvisions().description(),
                        in.fireProvisions().rp(), in.fireRisk().description(), in.fireRisk().rf(),
                        in.specialHazard().description(), in.specialHazard().hz(), in.use().description(),
                        in.use().lf(), in.occupancy().fraction())));
        if (lines.isEmpty()) {
            out.add("No incoming lines: R_U = R_V = 0.");
        }
        for (int i = 0; i < lines.size(); i++) {
            LineRisk l = lines.get(i);
            IncomingLine line = l.line();
            out.add(String.format(Locale.ROOT, "Line %d (%s, %.0f m, %s, %s): N_L = N_G × 40 × L_L × C_I %.3g × C_E %.3g"
                    + " × C_T %.3g × 10⁻⁶ = %.4g flashes per year; P_EB %.3g, P_LD %.3g (%s), C_LD %.3g, P_TU %.3g (%s);"
                    + " R_U = N_L × P_U × L_U = %.3e, R_V = N_L × P_V × L_V = %.3e.", i + 1,
                    line.installation().description(), line.length(), line.environment().description(),
                    line.transformer().description(), line.installation().ci(), line.environment().ce(),
                    line.transformer().ct(), l.nl(), l.peb(), line.pld(), line.shielding().description(), line.cld(),
                    line.touchProtection().ptu(), line.touchProtection().description(), l.ru(), l.rv()));
        }
        out.add(String.format(Locale.ROOT, "%s dominates: %.1f %% of R1.", d.name(), share));
        return out;
    }
}
