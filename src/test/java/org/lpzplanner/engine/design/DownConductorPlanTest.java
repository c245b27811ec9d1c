package org.lpzplanner.engine.design;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Polygon;
import org.lpzplanner.engine.model.ProtectionLevel;
import org.lpzplanner.engine.model.RoofShape;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.SphereSpec;
import org.lpzplanner.engine.model.Structure;

class DownConductorPlanTest {

    private static final GeometryFactory GF = new GeometryFactory();

    private static final Structure HALL = DesignSites.flatBuilding(DesignSites.rectangle(0, 0, 40, 20), 8);

    @Test
    void rectangleAtClassOneGetsOneDownConductorPerTenMetres() {
        // perimeter 120 m / 10 m (IEC 62305-3:2010 Table 4) = 12
        DownConductorLayout layout = DownConductorPlan.plan(HALL, ProtectionLevel.I);
        assertThat(layout.perimeter()).isCloseTo(120, within(1e-9));
        assertThat(layout.count()).isEqualTo(12);
        assertThat(layout.largestSpacing()).isCloseTo(10, within(1e-9));
        assertThat(layout.meanSpacing()).isCloseTo(10, within(1e-9));
        assertContainsPoints(layout, new double[][] {{0, 0}, {40, 0}, {40, 20}, {0, 20}});
    }

    @Test
    void rectangleAtClassFourGetsOneDownConductorPerTwentyMetres() {
        // 120 m / 20 m (Table 4) = 6: four corners plus the middle of each long side
        DownConductorLayout layout = DownConductorPlan.plan(HALL, ProtectionLevel.IV);
        assertThat(layout.count()).isEqualTo(6);
        assertThat(layout.largestSpacing()).isCloseTo(20, within(1e-9));
        assertContainsPoints(layout, new double[][] {{0, 0}, {40, 0}, {40, 20}, {0, 20}, {20, 0}, {20, 20}});
    }

    @Test
    void smallBoxGetsTheMinimumOfTwoOnOppositeCorners() {
        // perimeter 20 m / 10 m = 2, which is also the minimum (IEC 62305-3:2010 5.3)
        Structure box = DesignSites.flatBuilding(DesignSites.rectangle(0, 0, 5, 5), 4);
        DownConductorLayout layout = DownConductorPlan.plan(box, ProtectionLevel.I);
        assertThat(layout.count()).isEqualTo(2);
        assertThat(layout.largestSpacing()).isCloseTo(10, within(1e-9));
        assertContainsPoints(layout, new double[][] {{0, 0}, {5, 5}});
    }

    @Test
    void tinyStructureStillGetsTwo() {
        Structure kiosk = DesignSites.flatBuilding(DesignSites.rectangle(0, 0, 2, 1), 3);
        assertThat(DownConductorPlan.plan(kiosk, ProtectionLevel.IV).count()).isEqualTo(2);
    }

    @Test
    void lShapeUsesItsFiveOutsideCornersFirst() {
        // perimeter 80 m / 10 m = 8; outside corners (0,0) (20,0) (20,10) (10,20) (0,20); (10,10) is an inside corner
        Structure ell = DesignSites.flatBuilding(DesignSites.polygon(0, 0, 20, 0, 20, 10, 10, 10, 10, 20, 0, 20), 6);
        DownConductorLayout layout = DownConductorPlan.plan(ell, ProtectionLevel.I);
        assertThat(layout.count()).isEqualTo(8);
        assertThat(layout.largestSpacing()).isCloseTo(10, within(1e-9));
        assertContainsPoints(layout, new double[][] {{0, 0}, {20, 0}, {20, 10}, {10, 20}, {0, 20}});
    }

    @Test
    void exposedCornersAreTakenFirstWhenThereAreMoreCornersThanDownConductors() {
        Structure box = DesignSites.flatBuilding(DesignSites.rectangle(0, 0, 5, 5), 4);
        DownConductorLayout layout = DownConductorPlan.plan(box, 10, List.of(new Coordinate(6, -1), new Coordinate(-1, 6)));
        assertThat(layout.count()).isEqualTo(2);
        assertContainsPoints(layout, new double[][] {{5, 0}, {0, 5}});
    }

    @Test
    void everyPositionLiesOnTheFootprintOutline() {
        Structure ell = DesignSites.flatBuilding(DesignSites.polygon(0, 0, 33, 0, 33, 7, 12, 7, 12, 25, 0, 25), 6);
        DownConductorLayout layout = DownConductorPlan.plan(ell, ProtectionLevel.III);
        for (Coordinate c : layout.positions()) {
            assertThat(ell.footprint().getBoundary().distance(new org.locationtech.jts.geom.GeometryFactory().createPoint(c)))
                    .isLessThan(1e-9);
        }
        // 116 m / 15 m = 7.7, rounded up to 8
        assertThat(layout.count()).isEqualTo(8);
    }

    @Test
    void fixedCornersCanLeaveAGapLongerThanTheTypicalSpacing() {
        // hand count: outside-corner gaps along the ring 33, 7, 39, 12, 25 m; three more positions split 39, 33
        // and 25 m, so the longest gap is 39 / 2 = 19.5 m although 116 m / 8 = 14.5 m on average
        Structure ell = DesignSites.flatBuilding(DesignSites.polygon(0, 0, 33, 0, 33, 7, 12, 7, 12, 25, 0, 25), 6);
        DownConductorLayout layout = DownConductorPlan.plan(ell, ProtectionLevel.III);
        assertThat(layout.largestSpacing()).isCloseTo(19.5, within(1e-9));
        assertThat(layout.meanSpacing()).isCloseTo(14.5, within(1e-9));
        assertThat(layout.exceedsTypicalSpacing()).isTrue();
        assertThat(DownConductorPlan.plan(HALL, ProtectionLevel.I).exceedsTypicalSpacing()).isFalse();
    }

    private static void assertContainsPoints(DownConductorLayout layout, double[][] points) {
        for (double[] p : points) {
            assertThat(layout.positions()).as("position (%s, %s)", p[0], p[1])
                    .anyMatch(c -> Math.hypot(c.x - p[0], c.y - p[1]) < 1e-9);
        }
    }

    @Test
    void editedPositionsAreMeasuredAlongTheOutline() {
        // 40 m × 20 m: perimeter 120 m; two opposite corners split it into 60 m and 60 m, two
        // neighbouring corners into 40 m and 80 m (closed-form rectangle)
        var opposite = DownConductorPlan.edited(HALL, 10, List.of(new Coordinate(0, 0), new Coordinate(40, 20)));
        assertThat(opposite.perimeter()).isCloseTo(120, within(1e-9));
        assertThat(opposite.largestSpacing()).isCloseTo(60, within(1e-9));
        var neighbours = DownConductorPlan.edited(HALL, 10, List.of(new Coordinate(40, 0), new Coordinate(0, 0)));
        assertThat(neighbours.largestSpacing()).isCloseTo(80, within(1e-9));
        assertThat(neighbours.exceedsTypicalSpacing()).isTrue();
        // a position 0.5 m outside the wall counts at its nearest point of the outline
        var outside = DownConductorPlan.edited(HALL, 10, List.of(new Coordinate(20, -0.5), new Coordinate(20, 20.5)));
        assertThat(outside.largestSpacing()).isCloseTo(60, within(1e-9));
        // one position leaves the whole outline as one gap
        assertThat(DownConductorPlan.edited(HALL, 10, List.of(new Coordinate(0, 0))).largestSpacing())
                .isCloseTo(120, within(1e-9));
    }

    /** Two 30 × 10 m parts of one building overlapping in a 10 × 10 m corner: an L, 30 m along each arm. */
    private static Site twoPartEll() {
        return new Site("test", List.of(
                new Structure("S1", "East arm", DesignSites.rectangle(0, 0, 30, 10), 10, new RoofShape.Flat(0)),
                new Structure("S2", "North arm", DesignSites.rectangle(0, 0, 10, 30), 10, new RoofShape.Flat(0))),
                List.of(), List.of(), List.of());
    }

    @Test
    void overlappingPartsArePlannedOnTheOutlineOfTheBuildingAsAWhole() {
        // the union of the two parts is the L (0,0) (30,0) (30,10) (10,10) (10,30) (0,30): perimeter
        // 30 + 10 + 20 + 20 + 10 + 30 = 120 m; class III typical spacing 15 m [IEC 62305-3:2010 Table 4]:
        // ⌈120 / 15⌉ = 8 down-conductors [IEC 62305-3:2010 5.3] (each part on its own: ⌈80 / 15⌉ = 6,
        // 12 in all, (0, 0) twice)
        Site site = twoPartEll();
        List<Coordinate> positions = new ArrayList<>();
        DownConductorPlan.planSite(site, SphereSpec.of(ProtectionLevel.III)).forEach(l -> positions.addAll(l.positions()));

        assertThat(positions).hasSize(8);
        for (int i = 0; i < positions.size(); i++) {
            for (int j = i + 1; j < positions.size(); j++) {
                assertThat(positions.get(i).distance(positions.get(j))).as("positions %d and %d", i, j).isGreaterThan(0.01);
            }
        }
        Geometry union = site.structures().get(0).footprint().union(site.structures().get(1).footprint());
        for (Coordinate c : positions) {
            // on the outline of the whole, none inside either part
            assertThat(union.getBoundary().distance(GF.createPoint(c))).as("position %s", c).isLessThan(1e-9);
        }
        // its five outside corners first [IEC 62305-3:2010 5.3]; (10, 10) is an inside corner
        assertThat(positions).anyMatch(c -> c.distance(new Coordinate(0, 0)) < 1e-9)
                .anyMatch(c -> c.distance(new Coordinate(30, 0)) < 1e-9)
                .anyMatch(c -> c.distance(new Coordinate(30, 10)) < 1e-9)
                .anyMatch(c -> c.distance(new Coordinate(10, 30)) < 1e-9)
                .anyMatch(c -> c.distance(new Coordinate(0, 30)) < 1e-9);
    }

    @Test
    void aCourtyardOfMoreThanThirtyMetresGetsDownConductorsOfItsOwn() {
        // 30 × 30 m around a 10 × 10 m courtyard, class III: outline 120 m / 15 m = 8 [IEC 62305-3:2010
        // Table 4]; courtyard perimeter 40 m > 30 m, so down-conductors at the typical spacing there too
        // [IEC 62305-3:2010 Annex E, from memory]: ⌈40 / 15⌉ = 3; 11 in all
        Polygon ring = GF.createPolygon(GF.createLinearRing(DesignSites.rectangle(0, 0, 30, 30).getCoordinates()),
                new org.locationtech.jts.geom.LinearRing[] {GF.createLinearRing(DesignSites.rectangle(10, 10, 20, 20)
                        .reverse().getCoordinates())});
        Site site = new Site("test", List.of(new Structure("S1", "Ring", ring, 10, new RoofShape.Flat(0))), List.of(),
                List.of(), List.of());
        List<Coordinate> positions = DownConductorPlan.planSite(site, SphereSpec.of(ProtectionLevel.III)).get(0).positions();
        assertThat(positions).hasSize(11);
        assertThat(positions.stream().filter(c -> c.x >= 10 && c.x <= 20 && c.y >= 10 && c.y <= 20)).hasSize(3);

        // a 6 × 6 m courtyard (24 m, not over 30 m) gets none: 8
        Polygon small = GF.createPolygon(GF.createLinearRing(DesignSites.rectangle(0, 0, 30, 30).getCoordinates()),
                new org.locationtech.jts.geom.LinearRing[] {GF.createLinearRing(DesignSites.rectangle(12, 12, 18, 18)
                        .reverse().getCoordinates())});
        Site smallYard = new Site("test", List.of(new Structure("S1", "Ring", small, 10, new RoofShape.Flat(0))),
                List.of(), List.of(), List.of());
        assertThat(DownConductorPlan.planSite(smallYard, SphereSpec.of(ProtectionLevel.III)).get(0).positions()).hasSize(8);
    }
}
