package org.lpzplanner.engine.risk;

/**
 * The screen of an incoming line and how it is bonded at the entry, giving the probability P_LD
 * that a flash to the line fails internal systems or starts a fire through the line
 * [IEC 62305-2:2010 Table B.8, by the screen's resistance R_S and the withstand voltage U_W] and the
 * factor C_LD of the line's shielding, grounding and isolation [Table B.4]. Every value is
 * [from memory — check against the standard].
 *
 * <p>P_LD by U_W = 1, 1.5, 2.5, 4, 6 kV:
 * <pre>
 * unshielded, or screen not bonded to the bonding bar the equipment is bonded to   1    1    1    1    1
 * screen bonded there, 5 Ω/km &lt; R_S ≤ 20 Ω/km                                     1    1    0.95 0.9  0.8
 * screen bonded there, 1 Ω/km &lt; R_S ≤ 5 Ω/km                                      0.9  0.8  0.6  0.3  0.1
 * screen bonded there, R_S ≤ 1 Ω/km                                                0.6  0.4  0.2  0.04 0.02
 * </pre>
 * A bonded screen of more than 20 Ω/km, or of unknown resistance, counts as unshielded. C_LD = 1
 * for all of these; C_LD = 0 for a lightning-protective cable or wiring in lightning-protective
 * ducts, metal conduits or tubes bonded at the entry, and for a line behind isolating interfaces
 * (IEC 62305-4) [Table B.4].
 */
public enum LineShielding {
    UNSHIELDED(new double[] {1, 1, 1, 1, 1}, 1,
            "unshielded, or screen not bonded at the entry (or of unknown or over 20 Ω/km resistance)"),
    SCREEN_5_TO_20_OHM_PER_KM(new double[] {1, 1, 0.95, 0.9, 0.8}, 1,
            "screen bonded at the entry, 5 to 20 Ω/km"),
    SCREEN_1_TO_5_OHM_PER_KM(new double[] {0.9, 0.8, 0.6, 0.3, 0.1}, 1,
            "screen bonded at the entry, 1 to 5 Ω/km"),
    SCREEN_UP_TO_1_OHM_PER_KM(new double[] {0.6, 0.4, 0.2, 0.04, 0.02}, 1,
            "screen bonded at the entry, at most 1 Ω/km"),
    LIGHTNING_PROTECTIVE_CABLE_OR_DUCT(new double[] {1, 1, 1, 1, 1}, 0,
            "lightning-protective cable, or in lightning-protective duct, metal conduit or tube, bonded at the entry"),
    ISOLATING_INTERFACE(new double[] {1, 1, 1, 1, 1}, 0, "isolating interfaces at the entry (IEC 62305-4)");

    private final double[] pld;
    private final double cld;
    private final String description;

    LineShielding(double[] pld, double cld, String description) {
        this.pld = pld;
        this.cld = cld;
        this.description = description;
    }

    /** P_LD for equipment of this withstand voltage. */
    public double pld(WithstandVoltage withstand) {
        return pld[withstand.ordinal()];
    }

    /** C_LD. */
    public double cld() {
        return cld;
    }

    /** Whether the withstand voltage changes P_LD (a bonded screen). */
    public boolean dependsOnWithstand() {
        return pld[0] != pld[pld.length - 1];
    }

    /** Plain-words name for reports. */
    public String description() {
        return description;
    }
}
