package org.lpzplanner.engine.risk;

/**
 * A line (power or telecommunication) entering the structure, with what the flashes to it depend
 * on [IEC 62305-2:2010 Annexes A and B]:
 * <ul>
 *   <li>collection area A_L = 40 · L_L m² and the ground near it A_I = 4000 · L_L m² [Annex A];</li>
 *   <li>flashes to the line N_L = N_G · A_L · C_I · C_E · C_T · 10⁻⁶ per year, near it
 *       N_I = N_G · A_I · C_I · C_E · C_T · 10⁻⁶ [Annex A];</li>
 *   <li>P_LD and C_LD of its screen ({@link LineShielding}), P_EB of the SPDs at the entry, P_TU of
 *       the touch protection there [Annex B].</li>
 * </ul>
 * Flashes to a structure at the far end of the line (N_DJ) are not counted: see the limits in
 * docs/risk.md.
 *
 * @param installation    overhead or buried (C_I)
 * @param length          L_L in metres, the section from the structure to the first node; &gt; 0
 * @param environment     rural to urban (C_E)
 * @param transformer     HV/LV transformer or none (C_T)
 * @param surgeProtection SPDs already at the entry (P_EB); an LPS option may improve it
 * @param shielding       screen and its bonding (P_LD, C_LD)
 * @param withstand       U_W of the connected equipment (P_LD of a bonded screen)
 * @param touchProtection measures against touch voltage at the entry (P_TU)
 */
public record IncomingLine(LineInstallation installation, double length, LineEnvironment environment,
        LineTransformer transformer, EntrySurgeProtection surgeProtection, LineShielding shielding,
        WithstandVoltage withstand, LineTouchProtection touchProtection) {

    /** Metres of collection width per metre of line: A_L = 40 · L_L [IEC 62305-2:2010 Annex A; from memory]. */
    public static final double COLLECTION_WIDTH = 40;
    /** Metres of ground width per metre of line near it: A_I = 4000 · L_L [IEC 62305-2:2010 Annex A; from memory]. */
    public static final double NEAR_WIDTH = 4000;

    public IncomingLine {
        if (!(length > 0) || Double.isInfinite(length)) {
            throw new IllegalArgumentException("line length must be a positive number of metres, got " + length);
        }
        if (installation == null || environment == null || transformer == null || surgeProtection == null
                || shielding == null || withstand == null || touchProtection == null) {
            throw new IllegalArgumentException("every factor of a line must be chosen (installation, environment,"
                    + " transformer, surge protection, shielding, withstand voltage, touch protection)");
        }
    }

    /** A_L in m². */
    public double collectionArea() {
        return COLLECTION_WIDTH * length;
    }

    /** A_I in m². */
    public double nearArea() {
        return NEAR_WIDTH * length;
    }

    /** C_I · C_E · C_T. */
    public double lineFactors() {
        return installation.ci() * environment.ce() * transformer.ct();
    }

    /** N_L per year for a ground flash density N_G in flashes/km²/year. */
    public double flashesPerYear(double flashDensity) {
        return flashDensity * collectionArea() * lineFactors() * 1e-6;
    }

    /** N_I per year, flashes to the ground near the line. */
    public double flashesNearPerYear(double flashDensity) {
        return flashDensity * nearArea() * lineFactors() * 1e-6;
    }

    /** P_LD. */
    public double pld() {
        return shielding.pld(withstand);
    }

    /** C_LD. */
    public double cld() {
        return shielding.cld();
    }
}
