package org.lpzplanner.drawing;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * Round lengths of a drawing: the scale bar's length is the greatest and an axis's step the least
 * of the numbers 1, 2, 5 times a power of ten on either side of the target.
 */
class ScaleBarTest {

    /** Whether {@code value} is 1, 2 or 5 times a power of ten (to rounding of the power). */
    private static boolean round(double value) {
        double mantissa = value / Math.pow(10, Math.floor(Math.log10(value) + 1e-9));
        return Math.abs(mantissa - 1) < 1e-9 || Math.abs(mantissa - 2) < 1e-9 || Math.abs(mantissa - 5) < 1e-9;
    }

    /** The round number next below a round {@code value}: 5 → 2, 2 → 1, 1 → 0.5. */
    private static double below(double value) {
        double mantissa = value / Math.pow(10, Math.floor(Math.log10(value) + 1e-9));
        return mantissa > 4 ? value * 2 / 5 : value / 2;
    }

    /** The round number next above a round {@code value}: 1 → 2, 2 → 5, 5 → 10. */
    private static double above(double value) {
        double mantissa = value / Math.pow(10, Math.floor(Math.log10(value) + 1e-9));
        return Math.abs(mantissa - 2) < 1e-9 ? value * 5 / 2 : value * 2;
    }

    @Test
    void theStepIsTheLeastRoundNumberAtLeastTheTarget() {
        Random random = new Random(7);
        for (int i = 0; i < 2000; i++) {
            double target = Math.pow(10, random.nextDouble() * 8 - 3);
            double step = ScaleBar.step(target);
            assertThat(round(step)).as("%s for %s", step, target).isTrue();
            assertThat(step).isGreaterThanOrEqualTo(target * (1 - 1e-12));
            assertThat(below(step)).isLessThan(target);
        }
    }

    @Test
    void theBarIsTheGreatestRoundNumberAtMostTheTarget() {
        Random random = new Random(11);
        for (int i = 0; i < 2000; i++) {
            double target = Math.pow(10, random.nextDouble() * 8 - 3);
            double length = ScaleBar.length(target);
            assertThat(round(length)).as("%s for %s", length, target).isTrue();
            assertThat(length).isLessThanOrEqualTo(target * (1 + 1e-12));
            assertThat(above(length)).isGreaterThan(target);
        }
    }
}
