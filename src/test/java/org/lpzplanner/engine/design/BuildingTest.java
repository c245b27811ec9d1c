package org.lpzplanner.engine.design;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.lpzplanner.engine.model.RoofShape;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.Structure;

/** Structures grouped into buildings for their down-conductors; areas are closed forms of rectangles. */
class BuildingTest {

    private static Structure flat(String id, String name, double x0, double y0, double x1, double y1) {
        return new Structure(id, name, DesignSites.rectangle(x0, y0, x1, y1), 10, new RoofShape.Flat(0));
    }

    private static final Structure EAST = flat("S1", "East arm", 0, 0, 30, 10);
    private static final Structure NORTH = flat("S2", "North arm", 0, 0, 10, 30);

    @Test
    void structuresThatOverlapOrTouchAreOneBuildingAlsoThroughAChain() {
        // the north arm overlaps the east arm in a corner; the annex shares the east arm's east wall (touches);
        // the kiosk stands apart
        Structure annex = flat("S3", "Annex", 30, 0, 40, 10);
        Structure kiosk = flat("S4", null, 60, 0, 62, 2);
        List<Building> buildings = Building.of(new Site("test", List.of(EAST, kiosk, NORTH, annex), List.of(), List.of(),
                List.of()));

        assertThat(buildings).hasSize(2);
        Building main = buildings.get(0);
        assertThat(main.id()).isEqualTo("S1");
        assertThat(main.structureIds()).containsExactly("S1", "S2", "S3");
        assertThat(main.name()).isEqualTo("East arm + North arm + Annex");
        assertThat(main.answersTo("S3")).isTrue();
        // 300 + 300 − 100 (overlap) + 100 = 600 m², one polygon
        assertThat(main.outline().getArea()).isCloseTo(600, within(1e-9));
        assertThat(main.outline().getNumGeometries()).isEqualTo(1);
        assertThat(buildings.get(1).name()).isEqualTo("S4");
    }

    @Test
    void positionsStoredPerStructureAreReadForTheBuildingAsAWhole() {
        Building ell = Building.of(new Site("test", List.of(EAST, NORTH), List.of(), List.of(), List.of())).get(0);
        // (0, 0) stored under both structures counts once; (5, 10) stood on the east arm's north wall, which now
        // lies inside the L, 5 m from its outline (more than the 2 m an edited position may stand from it)
        Building.StoredPositions read = ell.storedPositions(Map.of(
                "S1", List.of(new Coordinate(0, 0), new Coordinate(30, 0), new Coordinate(5, 10)),
                "S2", List.of(new Coordinate(0, 0), new Coordinate(10, 30)),
                "S9", List.of(new Coordinate(100, 100))));
        assertThat(read.edited()).isTrue();
        assertThat(read.positions()).containsExactly(new Coordinate(0, 0), new Coordinate(30, 0), new Coordinate(10, 30));
        assertThat(read.dropped()).containsExactly(new Coordinate(5, 10));
        assertThat(ell.storedPositions(Map.of("S9", List.of(new Coordinate(1, 1)))).edited()).isFalse();
    }
}
