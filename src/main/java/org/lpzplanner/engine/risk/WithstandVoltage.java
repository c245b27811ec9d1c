package org.lpzplanner.engine.risk;

/**
 * The rated impulse withstand voltage U_W of the equipment connected to a line, the column of
 * P_LD [IEC 62305-2:2010 Table B.8]. It matters only for a screened line whose screen is bonded at
 * the entry; the lowest value is the most conservative.
 */
public enum WithstandVoltage {
    /** U_W = 1 kV. */
    KV_1(1),
    /** U_W = 1.5 kV. */
    KV_1_5(1.5),
    /** U_W = 2.5 kV. */
    KV_2_5(2.5),
    /** U_W = 4 kV. */
    KV_4(4),
    /** U_W = 6 kV. */
    KV_6(6);

    private final double kilovolts;

    WithstandVoltage(double kilovolts) {
        this.kilovolts = kilovolts;
    }

    /** U_W in kV. */
    public double kilovolts() {
        return kilovolts;
    }
}
