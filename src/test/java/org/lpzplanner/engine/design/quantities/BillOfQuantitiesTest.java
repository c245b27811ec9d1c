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
        // four drops of the 6 m wall
        assertThat(q.downConductor()).isCloseTo(24, within(1e-9));
        // ⌈1.5 · (20 + 24)⌉ = 66
        assertThat(q.fixings()).isEqualTo(66);
        assertThat(q.testJoints()).isEqualTo(4);
        assertThat(q.earthTerminations()).isEqualTo(4);
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
}
