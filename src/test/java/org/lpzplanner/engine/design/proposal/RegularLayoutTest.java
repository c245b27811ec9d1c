package org.lpzplanner.engine.design.proposal;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

/** The regular layout's count by hand on simple outlines (the definition in RegularLayout). */
class RegularLayoutTest {

    @Test
    void rectangleFortyByTwentyAtTenMetreMesh() {
        // outline: sides 40, 20, 40, 20 m → 4 + 2 + 4 + 2 = 12 rods (every corner once);
        // grid nodes at x = 10, 20, 30 and y = 10, each 10 m from the outline (≥ 5 m) → 3 rods
        assertThat(RegularLayout.count(AirTerminationProposerTest.rectangle(0, 0, 40, 20), 10)).isEqualTo(15);
    }

    @Test
    void smallSquareGetsItsFourCornersOnly() {
        // 8 × 8 m at 10 m mesh: one rod per side (its first corner), no grid node inside
        assertThat(RegularLayout.count(AirTerminationProposerTest.rectangle(0, 0, 8, 8), 10)).isEqualTo(4);
    }

    @Test
    void courtyardRingCountsToo() {
        // 30 × 30 m with a 10 × 10 m courtyard in the middle at 10 m mesh: outer 3·4 = 12, inner 4;
        // grid nodes (10,10), (10,20), (20,10), (20,20) lie on the courtyard outline (< 5 m) → none
        var outer = AirTerminationProposerTest.rectangle(0, 0, 30, 30);
        var hole = AirTerminationProposerTest.rectangle(10, 10, 20, 20);
        var withCourtyard = outer.getFactory().createPolygon(outer.getExteriorRing(),
                new org.locationtech.jts.geom.LinearRing[] {hole.getExteriorRing()});
        assertThat(RegularLayout.count(withCourtyard, 10)).isEqualTo(16);
    }
}
