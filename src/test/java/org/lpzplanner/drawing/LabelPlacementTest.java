package org.lpzplanner.drawing;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

class LabelPlacementTest {

    private static LabelPlacement.Wanted wanted(String text, double x, double y, PlanLabel.Kind kind) {
        return new LabelPlacement.Wanted(new PlanLabel(text, x, y, kind, Layer.STRUCTURE), x, y, 5 * text.length(),
                kind.size());
    }

    @Test
    void namesAreCentredOnTheirPointAndPlacedBeforeNumbersWhateverTheOrder() {
        List<LabelPlacement.Placed> placed = LabelPlacement.placeAll(List.of(wanted("E1", 100, 100,
                PlanLabel.Kind.NUMBER), wanted("Hall (9.00 m)", 100, 100, PlanLabel.Kind.NAME)), 1);

        assertThat(placed.get(0).label().text()).isEqualTo("Hall (9.00 m)");
        assertThat(placed.get(0).centreX()).isEqualTo(100);
        // the baseline a third of the size under the point centres the letters on it
        assertThat(placed.get(0).baseline()).isEqualTo(100 - PlanStyle.NAME_SIZE / 3);
        LabelPlacement.Box name = box(placed.get(0));
        assertThat(box(placed.get(1)).overlaps(name)).isFalse();
    }

    @Test
    void anAreasNameStepsDownPastANameUnderItsCorner() {
        // a structure's name written right under the area's top left corner (10, 100)
        List<LabelPlacement.Placed> placed = LabelPlacement.placeAll(List.of(
                wanted("Area", 10, 100, PlanLabel.Kind.AREA_NAME), wanted("Tower (96.20 m)", 40, 94,
                        PlanLabel.Kind.NAME)), 1);

        LabelPlacement.Placed area = placed.get(1);
        assertThat(area.x()).isEqualTo(10 + 0.3 * PlanStyle.AREA_NAME_SIZE);
        assertThat(area.baseline()).isLessThan(100 - 1.1 * PlanStyle.AREA_NAME_SIZE);
        assertThat(box(area).overlaps(box(placed.get(0)))).isFalse();
    }

    @Test
    void numbersAtOnePointTakeDifferentPlaces() {
        List<LabelPlacement.Wanted> wanted = new ArrayList<>();
        for (String n : List.of("D44", "E120", "A3", "E7")) {
            wanted.add(wanted(n, 200, 200, PlanLabel.Kind.NUMBER));
        }
        List<LabelPlacement.Placed> placed = LabelPlacement.placeAll(wanted, 1);
        for (int i = 0; i < placed.size(); i++) {
            for (int j = i + 1; j < placed.size(); j++) {
                assertThat(box(placed.get(i)).overlaps(box(placed.get(j)))).as(i + " and " + j).isFalse();
            }
        }
    }

    @Test
    void offsetsGrowWithTheRenderersUnitsPerPoint() {
        LabelPlacement onPaper = new LabelPlacement(1);
        LabelPlacement onScreen = new LabelPlacement(PlanStyle.WEB_UNITS_PER_POINT);

        assertThat(onPaper.beside(0, 0, 10, 5)).containsExactly(3, 2);
        assertThat(onScreen.beside(0, 0, 10, 5)[0]).isCloseTo(5, org.assertj.core.api.Assertions.within(1e-9));
    }

    private static LabelPlacement.Box box(LabelPlacement.Placed p) {
        return LabelPlacement.box(p.x(), p.baseline(), p.width(), p.size(), 1);
    }
}
