package org.lpzplanner.engine.design.quantities;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.lpzplanner.engine.model.Conductor;
import org.lpzplanner.engine.model.Rod;
import org.lpzplanner.engine.model.RoofShape;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.Structure;

/** Quantities by hand on a 20 × 10 m flat roof 6 m high (invented). */
class BillOfQuantitiesTest {

    private static final GeometryFactory GF = new GeometryFactory();

    private static Site site(List<Rod> rods, List<Conductor> conductors) {
        Structure block = new Structure("S1", "Block", GF.createPolygon(new Coordinate[] {new Coordinate(0, 0),
                new Coordinate(20, 0), new Coordinate(20, 10), new Coordinate(0, 10), new Coordinate(0, 0)}), 6,
                new RoofShape.Flat(0));
        return new Site("Block", List.of(block), List.of(), rods, conductors);
    }

    @Test
    void rodsMastsConductorsDownConductorsFixingsAndJoints() {
        Site site = site(List.of(new Rod("r1", null, 5, 5, 1), new Rod("r2", null, 15, 5, 1), new Rod("r3", null, 10, 5, 2),
                        new Rod("m1", null, 30, 5, 10)),
                List.of(
                        // along the south edge 0.1 m above the roof: 20 m of roof conductor
                        new Conductor("c1", null, List.of(new Coordinate(0, 0.1), new Coordinate(20, 0.1)), 0.1),
                        // from the mast top (10 m) to a rod tip 5 m away and 3 m lower, high above the roof: catenary
                        new Conductor("w1", null, List.of(new Coordinate(30, 5, 10), new Coordinate(26, 8, 10)), null)));
        List<Coordinate> downs = List.of(new Coordinate(0, 0), new Coordinate(20, 0), new Coordinate(20, 10),
                new Coordinate(0, 10));

        BillOfQuantities.Quantities q = BillOfQuantities.compute(site, downs, 1.5);

        assertThat(q.rodsByHeight()).isEqualTo(Map.of(1.0, 2, 2.0, 1));
        assertThat(q.mastsByHeight()).isEqualTo(Map.of(10.0, 1));
        assertThat(q.roofConductor()).isCloseTo(20, within(1e-9));
        assertThat(q.ridgeConductor()).isZero();
        // plan 4 × 3 m at the same height: 5 m (3-4-5 triangle)
        assertThat(q.catenary()).isCloseTo(5, within(1e-9));
        // four drops of the 6 m wall; the two on the south corners start at the roof conductor 0.1 m
        // above the roof that passes 0.1 m from them: 6.1 + 6.1 + 6 + 6
        assertThat(q.downConductor()).isCloseTo(24.2, within(1e-9));
        // ⌈1.5 · (20 + 24.2)⌉ = ⌈66.3⌉ = 67
        assertThat(q.fixings()).isEqualTo(67);
        assertThat(q.testJoints()).isEqualTo(4);
        assertThat(q.earthTerminations()).isEqualTo(4);
    }

    @Test
    void downConductorsOfAFlatRoofWithAParapetRunFromTheParapetTop() {
        // 20 × 10 m, walls 7 m, parapet 1 m (invented): the air-termination level at the wall is the
        // parapet's top, 7 + 1 = 8 m above ground [closed form]
        Structure block = new Structure("S1", "Block", rectangle(0, 0, 20, 10), 7, new RoofShape.Flat(1));
        Site site = new Site("Block", List.of(block), List.of(), List.of(), List.of());
        List<Coordinate> downs = List.of(new Coordinate(0, 0), new Coordinate(10, 0), new Coordinate(20, 0),
                new Coordinate(20, 10), new Coordinate(10, 10), new Coordinate(0, 10));

        BillOfQuantities.Quantities q = BillOfQuantities.compute(site, downs, 1);

        // 6 × 8 m = 48 m (the wall top alone would give 6 × 7 = 42 m)
        assertThat(q.downConductor()).isCloseTo(48, within(1e-9));
        assertThat(q.fixings()).isEqualTo(48);
    }

    @Test
    void downConductorsOfAGableBuildingFollowTheRoofHeightAtTheirPointOfThePerimeter() {
        // 24 × 10 m, eaves 6 m, ridge 9 m running east-west along y = 5 (invented). On the long sides
        // the wall top is the eaves, 6 m; on a gable end at distance d from the ridge line it is
        // 9 − 3·d/5 [closed form: the roof planes fall 3 m over the 5 m half-span]
        Structure hall = new Structure("S1", "Hall", rectangle(0, 0, 24, 10), 6, new RoofShape.Gable(9, 90));
        Site site = new Site("Hall", List.of(hall), List.of(), List.of(), List.of());
        List<Coordinate> downs = List.of(
                new Coordinate(0, 0),      // corner: eaves, 6
                new Coordinate(12, 0),     // south eaves, 6
                new Coordinate(24, 5),     // east gable under the ridge, 9
                new Coordinate(0, 2.5),    // west gable 2.5 m from the ridge line: 9 − 1.5 = 7.5
                new Coordinate(12, 10.4)); // 0.4 m outside the north eaves: projected onto them, 6

        BillOfQuantities.Quantities q = BillOfQuantities.compute(site, downs, 0);

        // 6 + 6 + 9 + 7.5 + 6 = 34.5 m
        assertThat(q.downConductor()).isCloseTo(34.5, within(1e-9));
        assertThat(q.downConductors()).isEqualTo(5);
    }

    private static org.locationtech.jts.geom.Polygon rectangle(double x0, double y0, double x1, double y1) {
        return GF.createPolygon(new Coordinate[] {new Coordinate(x0, y0), new Coordinate(x1, y0), new Coordinate(x1, y1),
                new Coordinate(x0, y1), new Coordinate(x0, y0)});
    }

    @Test
    void tableHasOneRowPerItemAndCsvQuotesAsRfc4180() {
        BillOfQuantities.Quantities q = BillOfQuantities.compute(site(List.of(new Rod("r1", null, 5, 5, 1.5)), List.of()),
                List.of(new Coordinate(0, 0), new Coordinate(20, 10)), 1);
        QuantityTable table = BillOfQuantities.table(q);
        assertThat(table.columns()).containsExactly("Item", "Unit", "Quantity", "Basis");
        assertThat(table.rows()).anySatisfy(r -> assertThat(r).containsExactly("Air-termination rod 1.5 m", "pcs", "1",
                "on a roof or rooftop object"));
        assertThat(table.rows()).anySatisfy(r -> assertThat(r.subList(0, 3)).containsExactly("Down-conductor", "m", "12"));

        QuantityTable quoted = new QuantityTable("t", List.of("a", "b"), List.of(List.of("x, y", "say \"hi\"")));
        // RFC 4180 section 2: fields with commas or quotes are enclosed in quotes, quotes doubled; CRLF line ends
        assertThat(quoted.toCsv()).isEqualTo("a,b\r\n\"x, y\",\"say \"\"hi\"\"\"\r\n");
    }

    @Test
    void refusesAnUnusableFixingRate() {
        assertThatThrownBy(() -> BillOfQuantities.compute(site(List.of(), List.of()), List.of(), -1))
                .hasMessageContaining("fixings per metre");
    }

    @Test
    void anLOfTwoPartsCountsTheDownConductorsOfTheBuildingOnce() {
        // two 30 × 10 m parts, walls 10 m, overlapping in a corner: one L-shaped building of perimeter 120 m,
        // class III: ⌈120 / 15⌉ = 8 down-conductors [IEC 62305-3:2010 5.3, Table 4], each 10 m from the wall
        // top to ground [closed form]: 80 m, 8 test joints and earth terminations (one each, common practice)
        Site site = new Site("L", List.of(
                new Structure("S1", "East arm", rectangle(0, 0, 30, 10), 10, new RoofShape.Flat(0)),
                new Structure("S2", "North arm", rectangle(0, 0, 10, 30), 10, new RoofShape.Flat(0))),
                List.of(), List.of(), List.of());
        List<Coordinate> downs = new java.util.ArrayList<>();
        org.lpzplanner.engine.design.DownConductorPlan.planSite(site,
                org.lpzplanner.engine.model.SphereSpec.of(org.lpzplanner.engine.model.ProtectionLevel.III))
                .forEach(l -> downs.addAll(l.positions()));

        BillOfQuantities.Quantities q = BillOfQuantities.compute(site, downs, 1);

        assertThat(q.downConductors()).isEqualTo(8);
        assertThat(q.downConductor()).isCloseTo(80, within(1e-9));
        assertThat(q.testJoints()).isEqualTo(8);
        assertThat(q.earthTerminations()).isEqualTo(8);
    }
}
