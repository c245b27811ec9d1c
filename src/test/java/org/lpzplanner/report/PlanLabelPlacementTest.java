package org.lpzplanner.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Number labels on the plan: placed beside their point where they overlap no other label. */
class PlanLabelPlacementTest {

    @Test
    void aFreeNumberGoesUpAndToTheRightOfItsPoint() {
        float[] at = PdfPlanPainter.placeNumber(new ArrayList<>(), 100, 200, 12, 5.5f);
        assertThat(at).containsExactly(103f, 202f);
    }

    @Test
    void upToFourNumbersAtTheSamePointNeverOverlap() {
        List<float[]> taken = new ArrayList<>();
        // a down-conductor and an exposed corner at the same corner, and two more numbers there:
        // one at each corner of the point
        for (int i = 0; i < 4; i++) {
            float[] at = PdfPlanPainter.placeNumber(taken, 100, 200, 12, 5.5f);
            float[] box = PdfPlanPainter.box(at[0], at[1], 12, 5.5f);
            assertThat(taken).noneMatch(t -> PdfPlanPainter.overlap(t, box));
            taken.add(box);
        }
    }

    @Test
    void whenEveryPlaceIsTakenTheNumberIsStillPlacedWhereItOverlapsLeast() {
        List<float[]> taken = new ArrayList<>(List.of(new float[] {0, 0, 400, 400}));
        assertThat(PdfPlanPainter.placeNumber(taken, 100, 200, 12, 5.5f)).containsExactly(103f, 202f);
        // everything taken but a strip below the point: the label below it on the right overlaps least
        List<float[]> mostly = new ArrayList<>(List.of(new float[] {0, 196, 400, 400}, new float[] {0, 0, 400, 191.5f}));
        assertThat(PdfPlanPainter.placeNumber(mostly, 100, 200, 12, 5.5f)).containsExactly(103f, 192.5f);
    }

    @Test
    void boxesThatOnlyTouchDoNotOverlap() {
        assertThat(PdfPlanPainter.overlap(new float[] {0, 0, 10, 10}, new float[] {10, 0, 20, 10})).isFalse();
        assertThat(PdfPlanPainter.overlap(new float[] {0, 0, 10, 10}, new float[] {9, 9, 20, 20})).isTrue();
    }
}
