package org.lpzplanner.engine.risk;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.io.WKTReader;
import org.lpzplanner.engine.model.RoofShape;
import org.lpzplanner.engine.model.Structure;

/**
 * Which structures form the assessed building and which are objects around it. C_D judges only
 * objects outside the structure; the structure's own parts lie inside its collection area A_D
 * [IEC 62305-2:2010 Annex A, Table A.1]. Distances are between footprints, in metres (hand).
 */
class BuildingSurroundingsTest {

    private static Structure box(String name, String wkt, double height) throws Exception {
        return new Structure(name, name, new WKTReader().read(wkt), height, new RoofShape.Flat(0));
    }

    @Test
    void partsTouchingTheTallestStructureFormItsBuildingAndOthersAreNeighbours() throws Exception {
        Structure hall = box("Hall", "POLYGON ((0 0, 40 0, 40 20, 0 20, 0 0))", 12);
        Structure wing = box("Wing", "POLYGON ((40 0, 60 0, 60 10, 40 10, 40 0))", 8); // shares the hall's east wall
        Structure porch = box("Porch", "POLYGON ((60.05 0, 64 0, 64 4, 60.05 4, 60.05 0))", 3); // 5 cm from the wing
        Structure shed = box("Shed", "POLYGON ((0 30, 10 30, 10 36, 0 36, 0 30))", 5); // 10 m north of the hall
        Structure kiosk = box("Kiosk", "POLYGON ((70 0, 74 0, 74 4, 70 4, 70 0))", 14); // 6 m east of the porch

        BuildingSurroundings b = BuildingSurroundings.of(List.of(shed, wing, hall, porch, kiosk));

        // the kiosk is the tallest structure: its building is itself alone
        assertThat(b.tallest()).isSameAs(kiosk);
        assertThat(b.parts()).containsExactly(kiosk);
        assertThat(b.height()).isEqualTo(14.0);
        // the hall, wing and porch are one building 6 m away (porch to kiosk), top 12 m; the shed another
        assertThat(b.neighbours()).hasSize(2);
        assertThat(b.neighbours()).anySatisfy(n -> {
            assertThat(n.distance()).isCloseTo(6, within(1e-9));
            assertThat(n.height()).isEqualTo(12.0);
        });
        // shed corner (10, 30) to kiosk corner (70, 4): √(60² + 26²) = 65.39 m
        assertThat(b.neighbours()).anySatisfy(n -> {
            assertThat(n.distance()).isCloseTo(Math.hypot(60, 26), within(1e-9));
            assertThat(n.height()).isEqualTo(5.0);
        });
    }

    @Test
    void aGapWiderThanTheToleranceSeparatesBuildings() throws Exception {
        Structure a = box("A", "POLYGON ((0 0, 10 0, 10 10, 0 10, 0 0))", 10);
        Structure b = box("B", "POLYGON ((10.5 0, 20 0, 20 10, 10.5 10, 10.5 0))", 6);

        BuildingSurroundings s = BuildingSurroundings.of(List.of(a, b));

        assertThat(s.parts()).containsExactly(a);
        assertThat(s.neighbours()).singleElement().satisfies(n -> assertThat(n.distance()).isCloseTo(0.5, within(1e-9)));
    }

    @Test
    void aSiteWithoutStructuresHasNoBuilding() {
        BuildingSurroundings s = BuildingSurroundings.of(List.of());
        assertThat(s.tallest()).isNull();
        assertThat(s.parts()).isEmpty();
        assertThat(s.neighbours()).isEmpty();
    }
}
