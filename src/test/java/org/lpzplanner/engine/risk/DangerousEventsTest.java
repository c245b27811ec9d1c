package org.lpzplanner.engine.risk;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.junit.jupiter.api.Test;

/** N_D = N_G · A_D · C_D · 10⁻⁶ [IEC 62305-2:2010 Annex A] and the location factor suggestion. */
class DangerousEventsTest {

    @Test
    void dangerousEventsAreFlashDensityTimesAreaTimesLocationFactor() {
        // N_G 4 /km²/yr, A_D 1806.858347 m² (10 × 20 × 5 m rectangle, hand), C_D 0.5 [Table A.1]:
        // 4 · 1806.858347 · 0.5 · 1e-6 = 3.613717e-3 per year (hand)
        DangerousEvents nd = new DangerousEvents(4, CollectionAreaOp.rectangleFormula(10, 20, 5),
                LocationFactor.SURROUNDED_BY_SAME_OR_LOWER);

        assertThat(nd.perYear()).isCloseTo(3.613717e-3, within(1e-9));
    }

    @Test
    void hilltopDoublesAndHigherSurroundingsQuarterTheIsolatedValue() {
        // C_D 2 and 0.25 against 1 [IEC 62305-2:2010 Table A.1]; 10 000 m² at N_G 1: 0.01 isolated (hand)
        double isolated = new DangerousEvents(1, 10_000, LocationFactor.ISOLATED).perYear();

        assertThat(isolated).isCloseTo(0.01, within(1e-15));
        assertThat(new DangerousEvents(1, 10_000, LocationFactor.ISOLATED_ON_HILLTOP).perYear()).isCloseTo(0.02, within(1e-15));
        assertThat(new DangerousEvents(1, 10_000, LocationFactor.SURROUNDED_BY_HIGHER).perYear()).isCloseTo(0.0025, within(1e-15));
    }

    @Test
    void flashDensityFromThunderstormDaysIsOneTenth() {
        // N_G ≈ 0.1 · T_d [IEC 62305-2:2010 Annex A]: 25 days → 2.5
        assertThat(DangerousEvents.flashDensityFromThunderstormDays(25)).isCloseTo(2.5, within(1e-12));
    }

    @Test
    void negativeFlashDensityIsRejectedWithTheValue() {
        assertThatThrownBy(() -> new DangerousEvents(-1, 100, LocationFactor.ISOLATED))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("-1");
    }

    @Test
    void noObjectsWithinThreeHeightsSuggestsIsolated() {
        // H = 10 m, reach 3H = 30 m: objects at 31 m and 50 m are not counted (rule in LocationFactor.suggest)
        assertThat(LocationFactor.suggest(10, List.of(new Neighbour(31, 40), new Neighbour(50, 5))))
                .isEqualTo(LocationFactor.ISOLATED);
        assertThat(LocationFactor.suggest(10, List.of())).isEqualTo(LocationFactor.ISOLATED);
    }

    @Test
    void singleNeighbourDoesNotSurround() {
        assertThat(LocationFactor.suggest(10, List.of(new Neighbour(5, 40)))).isEqualTo(LocationFactor.ISOLATED);
    }

    @Test
    void allNearObjectsHigherSuggestsSurroundedByHigher() {
        // distance 30 m = 3H counts (inclusive)
        assertThat(LocationFactor.suggest(10, List.of(new Neighbour(5, 12), new Neighbour(30, 25), new Neighbour(80, 3))))
                .isEqualTo(LocationFactor.SURROUNDED_BY_HIGHER);
    }

    @Test
    void anyNearObjectOfSameOrLowerHeightSuggestsSameOrLower() {
        // 10 m neighbour is "same height", not higher
        assertThat(LocationFactor.suggest(10, List.of(new Neighbour(5, 12), new Neighbour(8, 10))))
                .isEqualTo(LocationFactor.SURROUNDED_BY_SAME_OR_LOWER);
    }
}
