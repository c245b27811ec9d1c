package org.lpzplanner.engine.risk;

import java.util.List;
import java.util.Locale;
import org.lpzplanner.engine.model.ProtectionLevel;

/**
 * R1 due to flashes to the structure for one protection option, with every factor kept so a report
 * can show how the figure arises. R1 = R_A + R_B per year.
 *
 * @param level the LPS's protection level, or null for no LPS
 * @param inputs the user's choices
 * @param pta P_TA of the touch and step measures
 * @param pb P_B of the option (1 without LPS)
 */
public record LifeRisk(ProtectionLevel level, LifeRiskInputs inputs, double pta, double pb) {

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

    /** R1 = R_A + R_B per year (components due to flashes to the structure only). */
    public double r1() {
        return ra() + rb();
    }

    /** Whether R1 is at or below the tolerable risk {@link LifeRiskEstimate#TOLERABLE_RISK}. */
    public boolean isTolerable() {
        return r1() <= LifeRiskEstimate.TOLERABLE_RISK;
    }

    /** The larger component; R_B when they are equal. */
    public RiskComponent dominant() {
        return ra() > rb() ? RiskComponent.R_A : RiskComponent.R_B;
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
        double share = r1 > 0 ? 100 * (d == RiskComponent.R_A ? ra() : rb()) / r1 : 0;
        return List.of(
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
                        in.use().lf(), in.occupancy().fraction()),
                String.format(Locale.ROOT, "%s dominates: %.1f %% of R1.", d.name(), share));
    }
}
