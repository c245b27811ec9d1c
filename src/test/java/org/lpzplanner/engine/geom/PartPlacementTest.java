package org.lpzplanner.engine.geom;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Polygon;
import org.lpzplanner.engine.model.Conductor;
import org.lpzplanner.engine.model.RoofShape;
import org.lpzplanner.engine.model.Rod;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.Structure;

/**
 * Where rods and conductors stand: on what lies under their own position, a conductor fixed to the
 * roof following every face and step it crosses. The check values are the site's own geometry
 * (roof and parapet heights plus the part's height), exact to rounding.
 */
class PartPlacementTest {

    private static final GeometryFactory GF = new GeometryFactory();
    private static final double EXACT = 1e-9;

    private static Polygon rectangle(double x0, double y0, double x1, double y1) {
        return GF.createPolygon(new Coordinate[] {new Coordinate(x0, y0), new Coordinate(x1, y0),
            new Coordinate(x1, y1), new Coordinate(x0, y1), new Coordinate(x0, y0)});
    }

    /** A 10 m roof on x ∈ [0, 20] joined to a 5 m roof on x ∈ [20, 50], both y ∈ [0, 20]. */
    private static List<Structure> steppedRoofs() {
        return List.of(new Structure("a", "Upper", rectangle(0, 0, 20, 20), 10, new RoofShape.Flat(0)),
                new Structure("b", "Lower", rectangle(20, 0, 50, 20), 5, new RoofShape.Flat(0)));
    }

    private static SiteSurface surface(List<Structure> structures, List<Rod> rods, List<Conductor> conductors) {
        return SiteSurfaceBuilder.build(new Site("s", structures, List.of(), rods, conductors));
    }

    private static void assertPath(List<Coordinate> got, double[]... expected) {
        assertThat(got).hasSize(expected.length);
        for (int i = 0; i < expected.length; i++) {
            assertThat(got.get(i).x).as("x of point %d", i).isCloseTo(expected[i][0], within(EXACT));
            assertThat(got.get(i).y).as("y of point %d", i).isCloseTo(expected[i][1], within(EXACT));
            assertThat(got.get(i).getZ()).as("z of point %d", i).isCloseTo(expected[i][2], within(EXACT));
        }
    }

    @Test
    void roofConductorRunsDownTheWallOfAStepInsteadOfFloatingAcrossIt() {
        // 0.1 m above the roof from (10, 10) on the 10 m roof to (45, 10) on the 5 m roof: over the
        // upper roof at 10.1 m, down the wall of the step at x = 20, on at 5.1 m. Taken as a
        // straight line between its ends it would be at 10.1 − 5·20/35 = 7.24 m at x = 30.
        SiteSurface s = surface(steppedRoofs(), List.of(), List.of(new Conductor("c", "Roof conductor",
                List.of(new Coordinate(10, 10), new Coordinate(45, 10)), 0.1)));
        SiteSurface.PlacedConductor c = s.conductors().get(0);
        assertPath(c.path(), new double[] {10, 10, 10.1}, new double[] {20, 10, 10.1}, new double[] {20, 10, 5.1},
                new double[] {45, 10, 5.1});
        assertThat(c.clearances()).extracting(SiteSurface.Clearance::max)
                .allSatisfy(v -> assertThat(v).isCloseTo(0.1, within(EXACT)));
    }

    @Test
    void roofConductorClimbsOverAParapetAndDownToTheGround() {
        // roof at 6 m with a 1 m parapet on x ∈ [0, 10]; from (5, 5) out to (14, 5) at 0.1 m: up the
        // parapet's inner face at x = 10, over its top (7 m), down the wall to the ground
        SiteSurface s = surface(List.of(new Structure("p", "Shed", rectangle(0, 0, 10, 10), 6, new RoofShape.Flat(1))),
                List.of(), List.of(new Conductor("c", "Conductor", List.of(new Coordinate(5, 5), new Coordinate(14, 5)), 0.1)));
        assertPath(s.conductors().get(0).path(), new double[] {5, 5, 6.1}, new double[] {10, 5, 6.1},
                new double[] {10, 5, 7.1}, new double[] {10, 5, 0.1}, new double[] {14, 5, 0.1});
    }

    @Test
    void roofConductorOverARidgeFollowsBothSlopes() {
        // gable, walls 6 m, ridge 9 m along x through y = 5 of the 10 m deep footprint: slopes 3/5
        SiteSurface s = surface(List.of(new Structure("g", "House", rectangle(0, 0, 20, 10), 6,
                new RoofShape.Gable(9, 90))), List.of(), List.of(new Conductor("c", "Conductor",
                        List.of(new Coordinate(8, 1), new Coordinate(8, 9)), 0.1)));
        // z = 6 + 0.6·(distance from the eave) + 0.1: 6.7 at y = 1, 9.1 at the ridge, 6.7 at y = 9
        assertPath(s.conductors().get(0).path(), new double[] {8, 1, 6.7}, new double[] {8, 5, 9.1},
                new double[] {8, 9, 6.7});
    }

    @Test
    void wireKeepsItsStraightLineAndKnowsItsClearanceOverEachPiece() {
        // a wire from (−10, 10, 30) to (60, 10, 23) over both roofs: split at x = 0, 20 and 50;
        // clearance = its height less the roof (or ground) beneath
        SiteSurface s = surface(steppedRoofs(), List.of(), List.of(new Conductor("w", "Wire",
                List.of(new Coordinate(-10, 10, 30), new Coordinate(60, 10, 23)), null)));
        SiteSurface.PlacedConductor w = s.conductors().get(0);
        assertPath(w.path(), new double[] {-10, 10, 30}, new double[] {0, 10, 29}, new double[] {20, 10, 27},
                new double[] {50, 10, 24}, new double[] {60, 10, 23});
        double[][] expected = {{30, 29}, {19, 17}, {22, 19}, {24, 23}};
        assertThat(w.clearances()).hasSize(expected.length);
        for (int i = 0; i < expected.length; i++) {
            assertThat(w.clearances().get(i).start()).as("clearance at the start of piece %d", i)
                    .isCloseTo(expected[i][0], within(1e-9));
            assertThat(w.clearances().get(i).end()).as("clearance at the end of piece %d", i)
                    .isCloseTo(expected[i][1], within(1e-9));
        }
    }

    @Test
    void rodBesideAParapetStandsOnWhatIsUnderItAndOnTheParapetOnlyOnItsLine() {
        // 10 m walls with a 1 m parapet on x ∈ [0, 10]; 2 m rods
        List<Structure> block = List.of(new Structure("p", "Block", rectangle(0, 0, 10, 10), 10, new RoofShape.Flat(1)));
        SiteSurface s = surface(block, List.of(new Rod("out", "Outside", 10.2, 5, 2), new Rod("in", "Inside", 9.8, 5, 2),
                new Rod("on", "On the parapet", 10.004, 5, 2)), List.of());
        // 0.2 m outside the wall: on the ground, tip 2 m (not 13 m on the parapet)
        assertThat(s.rods().get(0).tip().getZ()).isCloseTo(2, within(EXACT));
        // 0.2 m inside: on the roof behind the parapet, tip 12 m
        assertThat(s.rods().get(1).tip().getZ()).isCloseTo(12, within(EXACT));
        // 4 mm off the line (within the 1 cm of stored coordinates): on the parapet, placed on its line
        assertThat(s.rods().get(2).tip().getZ()).isCloseTo(13, within(EXACT));
        assertThat(s.rods().get(2).tip().x).isCloseTo(10, within(EXACT));
    }
}
