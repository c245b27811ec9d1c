package org.lpzplanner.risk;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.io.WKTReader;
import org.lpzplanner.engine.model.RoofShape;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.Structure;
import org.lpzplanner.engine.risk.LocationFactor;

/**
 * The suggestion judges the tallest structure against the others within 3·H (the reach of the
 * collection area, IEC 62305-2:2010 Annex A; the classes of Table A.1; the counting rule is common
 * practice and ours, see LocationFactor.suggest). Distances are between footprints, in metres.
 */
class LocationSuggestionTest {

    private static Structure box(String name, String wkt, double height) throws Exception {
        Geometry footprint = new WKTReader().read(wkt);
        return new Structure(name, name, footprint, height, new RoofShape.Flat(0));
    }

    private static Site site(Structure... structures) {
        return new Site("Test", List.of(structures), List.of(), List.of(), List.of());
    }

    /** A 10 m high block at x 0..20, y 0..10; 3·H = 30 m. */
    private static Structure tower() throws Exception {
        return box("Tower", "POLYGON ((0 0, 20 0, 20 10, 0 10, 0 0))", 10);
    }

    @Test
    void twoLowerNeighboursWithinThreeTimesTheHeightSurroundTheStructure() throws Exception {
        // sheds 5 m east (x 25..30) and 29 m north (y 39..44) of the tower: both within 30 m
        LocationSuggestion s = LocationSuggestion.of(site(tower(),
                box("East shed", "POLYGON ((25 0, 30 0, 30 5, 25 5, 25 0))", 4),
                box("North shed", "POLYGON ((0 39, 5 39, 5 44, 0 44, 0 39))", 6)));

        assertThat(s.factor()).isEqualTo(LocationFactor.SURROUNDED_BY_SAME_OR_LOWER);
        assertThat(s.structureName()).isEqualTo("Tower");
        assertThat(s.reach()).isCloseTo(30, within(1e-12));
        assertThat(s.near()).isEqualTo(2);
        assertThat(s.higher()).isZero();
    }

    @Test
    void oneNeighbourOrNeighboursBeyondThreeTimesTheHeightLeaveItIsolated() throws Exception {
        Structure east = box("East shed", "POLYGON ((25 0, 30 0, 30 5, 25 5, 25 0))", 4);
        // 31 m north of the tower's north wall: beyond 3·H = 30 m
        Structure far = box("Far shed", "POLYGON ((0 41, 5 41, 5 46, 0 46, 0 41))", 6);

        assertThat(LocationSuggestion.of(site(tower(), east)).factor()).isEqualTo(LocationFactor.ISOLATED);
        LocationSuggestion s = LocationSuggestion.of(site(tower(), east, far));
        assertThat(s.factor()).isEqualTo(LocationFactor.ISOLATED);
        assertThat(s.near()).isEqualTo(1);
        assertThat(LocationSuggestion.of(site(tower())).factor()).isEqualTo(LocationFactor.ISOLATED);
    }

    @Test
    void theTallestStructureIsTheOneJudged() throws Exception {
        List<Structure> structures = new ArrayList<>();
        structures.add(box("Low hall", "POLYGON ((-30 0, -10 0, -10 10, -30 10, -30 0))", 5));
        structures.add(tower());
        LocationSuggestion s = LocationSuggestion.of(site(structures.toArray(Structure[]::new)));
        assertThat(s.structureName()).isEqualTo("Tower");
        assertThat(s.height()).isEqualTo(10.0);
    }
}
