package org.lpzplanner.engine.envelope;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Polygon;
import org.lpzplanner.engine.geom.SiteSurface;
import org.lpzplanner.engine.geom.SiteSurfaceBuilder;
import org.lpzplanner.engine.model.RoofShape;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.Structure;

/** An analysis whose grid would not fit is refused before anything is computed, with a resolution that fits. */
class AnalysisSizeLimitTest {

    private static final GeometryFactory GF = new GeometryFactory();

    @Test
    void gridBeyondTheLimitIsRefusedWithAResolutionThatFits() {
        SiteSurface farApart = SiteSurfaceBuilder.build(new Site("far apart", List.of(
                new Structure("A", "A", square(0, 0), 5, new RoofShape.Flat(0)),
                new Structure("B", "B", square(6000, 6000), 5, new RoofShape.Flat(0))), List.of(), List.of(), List.of()));

        assertThatThrownBy(() -> EnvelopeOp.compute(farApart, 30, 0.5))
                .isInstanceOf(AnalysisTooLargeException.class)
                .hasMessageContaining("choose a resolution of")
                .satisfies(e -> {
                    double fits = ((AnalysisTooLargeException) e).suggestedResolution();
                    // the suggestion really fits: the grid at that spacing is within the limit
                    Grid g = EnvelopeOp.gridFor(farApart, Supports.of(farApart, 30), 30, fits);
                    assertThat((long) g.nx() * g.ny()).isLessThanOrEqualTo(EnvelopeOp.MAX_CELLS);
                });
    }

    private static Polygon square(double x, double y) {
        return GF.createPolygon(new Coordinate[] {new Coordinate(x, y), new Coordinate(x + 10, y),
            new Coordinate(x + 10, y + 10), new Coordinate(x, y + 10), new Coordinate(x, y)});
    }
}
