package org.lpzplanner.engine.design;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

/** The branch-and-bound search for the least separation margin, against closed forms of its minimum. */
class LeastMarginSearchTest {

    @Test
    void findsTheLeastOfDistanceLessKTimesLengthToTheTolerance() {
        // a 20 m stretch passing 0.7 m from a point at 6 m along it; margin m(x) = √(0.49 + (x − 6)²) − 0.1·x.
        // Least at x − 6 = k·a / √(1 − k²), value a·√(1 − k²) − 6k [closed form, a = 0.7, k = 0.1];
        // slope (1 + k)·20 per unit of t (distance and length change at most 1 m per metre)
        double a = 0.7, k = 0.1;
        LeastMarginSearch.Least least = LeastMarginSearch.minimise(new double[] {(1 + k) * 20},
                (i, t) -> Math.hypot(a, 20 * t - 6) - k * 20 * t, 1e-4);
        double exact = a * Math.sqrt(1 - k * k) - 6 * k;
        assertThat(least.value()).isBetween(exact, exact + 1e-4);
        assertThat(least.lowerBound()).isBetween(exact - 1e-4, exact);
        assertThat(20 * least.t()).isCloseTo(6 + k * a / Math.sqrt(1 - k * k), within(0.02));
    }

    @Test
    void aNarrowDipBetweenCoarseSamplesIsFound() {
        // a V of slope 1 per metre reaching −0.3 at x = 13.37 m on a 40 m stretch, held at 1 beyond 1.3 m
        // from it: m(x) = min(1, −0.3 + |x − 13.37|); samples every metre would see 0.07 at best (x = 13),
        // samples at the ends only 1; the bound finds −0.3 [closed form]
        LeastMarginSearch.Least least = LeastMarginSearch.minimise(new double[] {40},
                (i, t) -> Math.min(1, -0.3 + Math.abs(40 * t - 13.37)), 1e-3);
        assertThat(least.value()).isBetween(-0.3, -0.3 + 1e-3);
        assertThat(least.lowerBound()).isLessThanOrEqualTo(-0.3);
    }

    @Test
    void theLeastOverSeveralStretchesIsOnTheRightOne() {
        // stretch 0: constant 2; stretch 1: 1 − t (least 0 at its end) [closed form]
        LeastMarginSearch.Least least = LeastMarginSearch.minimise(new double[] {0, 1},
                (i, t) -> i == 0 ? 2 : 1 - t, 1e-3);
        assertThat(least.stretch()).isEqualTo(1);
        assertThat(least.value()).isCloseTo(0, within(1e-12));
        assertThat(LeastMarginSearch.minimise(new double[0], (i, t) -> 0, 1e-3)).isNull();
    }
}
