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

    /**
     * A cross-shaped building given as three touching structures: a 60 × 20 m bar 12 m high
     * (x 0..60, y 20..40) with a 20 × 20 m wing 9 m high on each long side (x 20..40, y 0..20 and
     * y 40..60). The wings are parts of the assessed structure, already inside its collection area
     * A_D, not objects around it; C_D counts only objects outside the structure [IEC 62305-2:2010
     * Annex A, Table A.1]: with nothing else near, the building is isolated, C_D = 1.
     */
    private static Structure[] cross() throws Exception {
        return new Structure[] {box("Hall", "POLYGON ((0 20, 60 20, 60 40, 0 40, 0 20))", 12),
            box("South wing", "POLYGON ((20 0, 40 0, 40 20, 20 20, 20 0))", 9),
            box("North wing", "POLYGON ((20 40, 40 40, 40 60, 20 60, 20 40))", 9)};
    }

    @Test
    void partsOfACrossShapedBuildingAreNotItsSurroundings() throws Exception {
        LocationSuggestion s = LocationSuggestion.of(site(cross()));

        // Table A.1: isolated, C_D = 1 (not 0.5, "surrounded by objects of the same or lower height")
        assertThat(s.factor()).isEqualTo(LocationFactor.ISOLATED);
        assertThat(s.factor().value()).isEqualTo(1.0);
        assertThat(s.near()).isZero();
        assertThat(s.structureName()).isEqualTo("Hall");
    }

    @Test
    void overlappingPartsAreOneBuildingAndItsTopIsTheHighestPart() throws Exception {
        // a 15 m stair tower overlapping the hall's east end by 2 m: part of the building, and the
        // tallest part, so H = 15 m and 3·H = 45 m (IEC 62305-2:2010 Annex A)
        List<Structure> parts = new ArrayList<>(List.of(cross()));
        parts.add(box("Stair tower", "POLYGON ((58 25, 66 25, 66 33, 58 33, 58 25))", 15));
        LocationSuggestion s = LocationSuggestion.of(site(parts.toArray(Structure[]::new)));

        assertThat(s.factor()).isEqualTo(LocationFactor.ISOLATED);
        assertThat(s.near()).isZero();
        assertThat(s.height()).isEqualTo(15.0);
        assertThat(s.reach()).isCloseTo(45, within(1e-12));
    }

    @Test
    void otherBuildingsNearTheCrossStillCountOncePerBuilding() throws Exception {
        // two separate sheds within 3·H = 36 m of the cross: objects outside the structure, lower,
        // so "surrounded by objects of the same or lower height", C_D = 0.5 [Table A.1]; each shed
        // counts once however many parts it has (the east one is two touching boxes)
        List<Structure> parts = new ArrayList<>(List.of(cross()));
        parts.add(box("West shed", "POLYGON ((-20 20, -10 20, -10 30, -20 30, -20 20))", 4));
        parts.add(box("East shed", "POLYGON ((70 20, 80 20, 80 30, 70 30, 70 20))", 5));
        parts.add(box("East shed annex", "POLYGON ((80 20, 85 20, 85 30, 80 30, 80 20))", 3));
        LocationSuggestion s = LocationSuggestion.of(site(parts.toArray(Structure[]::new)));

        assertThat(s.factor()).isEqualTo(LocationFactor.SURROUNDED_BY_SAME_OR_LOWER);
        assertThat(s.near()).isEqualTo(2);
        assertThat(s.higher()).isZero();
    }
}
