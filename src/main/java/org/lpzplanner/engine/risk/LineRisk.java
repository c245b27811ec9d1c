package org.lpzplanner.engine.risk;

/**
 * The components of R1 due to flashes to one incoming line, for one protection option
 * [IEC 62305-2:2010 clause 6 and Annexes B, C]:
 * <ul>
 *   <li>R_U = N_L · P_U · L_U, injury to people by touch voltage inside the structure, with
 *       P_U = P_TU · P_EB · P_LD · C_LD and L_U = L_A;</li>
 *   <li>R_V = N_L · P_V · L_V, physical damage (fire) started by the current the flash sends along
 *       the line, with P_V = P_EB · P_LD · C_LD and L_V = L_B.</li>
 * </ul>
 *
 * @param line   the line
 * @param nl     N_L, flashes to the line per year
 * @param peb    P_EB of this option: the SPDs at the entry, or those an LPS of this option brings
 * @param lu     L_U
 * @param lv     L_V
 */
public record LineRisk(IncomingLine line, double nl, double peb, double lu, double lv) {

    /** P_U = P_TU · P_EB · P_LD · C_LD. */
    public double pu() {
        return line.touchProtection().ptu() * pv();
    }

    /** P_V = P_EB · P_LD · C_LD. */
    public double pv() {
        return peb * line.pld() * line.cld();
    }

    /** R_U = N_L · P_U · L_U per year. */
    public double ru() {
        return nl * pu() * lu;
    }

    /** R_V = N_L · P_V · L_V per year. */
    public double rv() {
        return nl * pv() * lv;
    }
}
