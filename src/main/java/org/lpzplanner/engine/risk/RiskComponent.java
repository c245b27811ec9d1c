package org.lpzplanner.engine.risk;

/** The risk components of R1 due to flashes to the structure [IEC 62305-2:2010 clause 6]. */
public enum RiskComponent {
    /** R_A = N_D · P_A · L_A. */
    R_A("injury to people by touch and step voltage"),
    /** R_B = N_D · P_B · L_B. */
    R_B("physical damage (fire, explosion, mechanical damage)");

    private final String description;

    RiskComponent(String description) {
        this.description = description;
    }

    /** Plain-words meaning for reports. */
    public String description() {
        return description;
    }
}
