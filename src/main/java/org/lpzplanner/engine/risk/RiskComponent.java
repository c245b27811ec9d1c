package org.lpzplanner.engine.risk;

/**
 * The risk components of R1 this estimate computes [IEC 62305-2:2010 clause 6]: due to flashes to
 * the structure (R_A, R_B) and to an incoming line (R_U, R_V).
 */
public enum RiskComponent {
    /** R_A = N_D · P_A · L_A. */
    R_A("injury to people by touch and step voltage"),
    /** R_B = N_D · P_B · L_B. */
    R_B("physical damage (fire, explosion, mechanical damage)"),
    /** R_U = N_L · P_U · L_U, summed over the incoming lines. */
    R_U("injury to people by touch voltage from flashes to an incoming line"),
    /** R_V = N_L · P_V · L_V, summed over the incoming lines. */
    R_V("physical damage from flashes to an incoming line (currents along the line)");

    private final String description;

    RiskComponent(String description) {
        this.description = description;
    }

    /** Plain-words meaning for reports. */
    public String description() {
        return description;
    }
}
