package org.lpzplanner.drawing;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.junit.jupiter.api.Test;

class PlanDrawingTest {

    private static final List<List<double[]>> BLOCK = List.of(List.of(new double[] {0, 0}, new double[] {20, 0},
            new double[] {20, 10}, new double[] {0, 10}, new double[] {0, 0}));
    private static final List<double[]> HATCH = List.of(new double[] {2, 2}, new double[] {6, 2}, new double[] {6, 5},
            new double[] {2, 5});

    private static PlanDrawing.Builder block() {
        return PlanDrawing.builder().add(new PlanItem.Structure("Block", 8, BLOCK))
                .add(new PlanItem.ExposedEdge(List.of(new double[] {0, 10}, new double[] {20, 10}),
                        new PlanItem.Review("roof-edge-1", "E1", null)))
                .add(new PlanItem.ExposedCorner(20, 0, new PlanItem.Review("corner-1", "E2", "fenced off")))
                .add(new PlanItem.Rod("rod-1", "Rod", 30, 5, "A1"))
                .add(new PlanItem.KeepOutArea("Hatch", HATCH, "K1"));
    }

    @Test
    void itemsAreDrawnLayerByLayerAndTheFrameHoldsThemAll() {
        PlanDrawing drawing = block().build();

        assertThat(drawing.items()).extracting(PlanItem::layer).isSorted();
        // the rod at x = 30 lies east of the block
        assertThat(drawing.frame()).isEqualTo(new PlanFrame(0, 0, 30, 10));
        // an accepted corner is drawn apart, as accepted
        assertThat(drawing.has(Layer.ACCEPTED_ITEM)).isTrue();
        assertThat(drawing.has(Layer.EXPOSED_CORNER)).isFalse();
    }

    @Test
    void aDrawingByNamesNamesStructuresWithTheirHeightAndKeepOutAreasInTheirCorner() {
        PlanDrawing drawing = block().build();

        assertThat(drawing.labels()).extracting(PlanLabel::text).containsExactly("Block (8.00 m)", "Hatch");
        PlanLabel hatch = drawing.labels().get(1);
        assertThat(hatch.kind()).isEqualTo(PlanLabel.Kind.AREA_NAME);
        assertThat(new double[] {hatch.x(), hatch.y()}).containsExactly(2, 5);
    }

    @Test
    void aNumberedDrawingWritesEveryItemsNumberBesideIt() {
        PlanDrawing drawing = block().numbered().build();

        assertThat(drawing.labels()).extracting(PlanLabel::text).containsExactly("Block (8.00 m)", "E1", "E2", "A1",
                "K1");
        // an edge's number at the middle of its first segment
        PlanLabel edge = drawing.labels().get(1);
        assertThat(new double[] {edge.x(), edge.y()}).containsExactly(10, 10);
    }

    @Test
    void theLegendHasOneRowPerEntryOfWhatIsDrawnOrListed() {
        PlanDrawing drawing = block().add(new PlanItem.Conductor("c-1", "Ridge", List.of(new double[] {0, 5},
                new double[] {20, 5}), "A2")).list(Layer.PROTECTED_GROUND).build();

        // rods and conductors share a row; protected ground is listed though none is drawn
        assertThat(drawing.legend()).containsExactly(Layer.STRUCTURE, Layer.PROTECTED_GROUND, Layer.EXPOSED_EDGE,
                Layer.ACCEPTED_ITEM, Layer.ROD, Layer.KEEP_OUT);
    }

    @Test
    void theHighestStructureIsShadedDarkest() {
        PlanDrawing drawing = PlanDrawing.builder().add(new PlanItem.Structure("Low", 5, BLOCK))
                .add(new PlanItem.Structure("High", 20, BLOCK)).build();

        assertThat(drawing.shade((PlanItem.Structure) drawing.items().get(0))).isEqualTo(0.25);
        assertThat(drawing.shade((PlanItem.Structure) drawing.items().get(1))).isEqualTo(1);
    }
}
