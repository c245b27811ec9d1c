package org.lpzplanner.engine.design;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.lpzplanner.engine.model.Conductor;
import org.lpzplanner.engine.model.ProtectionLevel;
import org.lpzplanner.engine.model.RoofShape;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.Structure;

class MeshMethodCheckTest {

    private static final Structure ROOF_10 = DesignSites.flatBuilding(DesignSites.rectangle(0, 0, 10, 10), 8);

    private static List<Conductor> edgeLoop(double inset) {
        double a = inset, b = 10 - inset;
        return List.of(DesignSites.onRoof("edge", 0.1, a, a, b, a, b, b, a, b, a, a));
    }

    private static List<Conductor> cross() {
        return List.of(DesignSites.onRoof("ns", 0.1, 5, 0, 5, 10), DesignSites.onRoof("ew", 0.1, 0, 5, 10, 5));
    }

    private static MeshFaceResult checkClassOne(List<Conductor> conductors) {
        Site site = DesignSites.site(ROOF_10, List.of(), conductors);
        List<MeshFaceResult> results = MeshMethodCheck.check(site, ProtectionLevel.I);
        assertThat(results).hasSize(1);
        return results.get(0);
    }

    @Test
    void edgeLoopWithACrossGivesFourCellsOfFiveMetres() {
        // class I mesh 5 m × 5 m (IEC 62305-3:2010 Table 2)
        List<Conductor> cs = new ArrayList<>(edgeLoop(0));
        cs.addAll(cross());
        MeshFaceResult r = checkClassOne(cs);
        assertThat(r.status()).isEqualTo(MeshFaceResult.Status.PASS);
        assertThat(r.cells()).hasSize(4);
        assertThat(r.largestCell()).isCloseTo(5, within(0.01));
        assertThat(r.openArea().isEmpty()).isTrue();
        assertThat(r.reason()).isEmpty();
    }

    @Test
    void edgeLoopAloneIsOneCellTooWideForClassOneButFineForClassTwo() {
        MeshFaceResult r = checkClassOne(edgeLoop(0));
        assertThat(r.status()).isEqualTo(MeshFaceResult.Status.FAIL);
        assertThat(r.cellsTooLarge()).hasSize(1);
        assertThat(r.largestCell()).isCloseTo(10, within(0.01));
        assertThat(r.reason()).contains("wider than 5.0 m");
        // class II mesh 10 m × 10 m (Table 2)
        Site site = DesignSites.site(ROOF_10, List.of(), edgeLoop(0));
        assertThat(MeshMethodCheck.check(site, ProtectionLevel.II).get(0).passes()).isTrue();
    }

    @Test
    void conductorLaidJustInsideTheEdgeCountsAsRunningAlongIt() {
        // 0.3 m inside the edge is within the 0.5 m edge reach (common practice)
        List<Conductor> cs = new ArrayList<>(edgeLoop(0.3));
        cs.addAll(cross());
        MeshFaceResult r = checkClassOne(cs);
        assertThat(r.status()).isEqualTo(MeshFaceResult.Status.PASS);
        assertThat(r.largestCell()).isCloseTo(5, within(0.01));
    }

    @Test
    void missingEdgeConductorLeavesRoofOpenAndTheEdgeUncovered() {
        // loop without the north edge: the two northern 5 × 5 m cells are not closed (50 m², closed form);
        // the north edge is uncovered except within 0.5 m of the side conductors and of the north–south line
        List<Conductor> cs = new ArrayList<>(List.of(DesignSites.onRoof("u", 0.1, 0, 10, 0, 0, 10, 0, 10, 10)));
        cs.addAll(cross());
        MeshFaceResult r = checkClassOne(cs);
        assertThat(r.status()).isEqualTo(MeshFaceResult.Status.FAIL);
        assertThat(r.openArea().getArea()).isCloseTo(50, within(0.5));
        assertThat(r.edgesWithoutConductor().getLength()).isCloseTo(10 - 0.5 - 1 - 0.5, within(0.01));
        assertThat(r.reason()).contains("not enclosed").contains("edge without a conductor");
    }

    @Test
    void rotatedSquareMeshIsMeasuredByItsOwnSidesNotItsBoundingBox() {
        // a 5 × 5 m square roof turned 45°: bounding box 7.07 m, minimum-width rectangle 5 m (closed form)
        double h = 5 / Math.sqrt(2);
        Structure diamond = DesignSites.flatBuilding(DesignSites.polygon(0, -h, h, 0, 0, h, -h, 0), 8);
        Site site = DesignSites.site(diamond, List.of(),
                List.of(DesignSites.onRoof("loop", 0.1, 0, -h, h, 0, 0, h, -h, 0, 0, -h)));
        MeshFaceResult r = MeshMethodCheck.check(site, ProtectionLevel.I).get(0);
        assertThat(r.largestCell()).isCloseTo(5, within(0.01));
        assertThat(r.passes()).isTrue();
    }

    @Test
    void conductorHighAboveTheRoofIsNotARoofConductor() {
        // a catenary 3 m above the roof is above the 1.5 m band of roof conductors (our rule)
        Site site = DesignSites.site(ROOF_10, List.of(), List.of(DesignSites.onRoof("edge", 3, 0, 0, 10, 0, 10, 10, 0, 10, 0, 0)));
        MeshFaceResult r = MeshMethodCheck.check(site, ProtectionLevel.II).get(0);
        assertThat(r.status()).isEqualTo(MeshFaceResult.Status.FAIL);
        assertThat(r.cells()).isEmpty();
        assertThat(r.openArea().getArea()).isCloseTo(100, within(1e-6));
    }

    @Test
    void steepRoofIsNotCheckedByTheMeshMethod() {
        // gable rising 5 m over 5 m: slope 1:1, far above 1:10
        Structure house = new Structure("h", "House", DesignSites.rectangle(0, 0, 10, 10), 6, new RoofShape.Gable(11, 0));
        Site site = DesignSites.site(house, List.of(), List.of());
        List<MeshFaceResult> results = MeshMethodCheck.check(site, ProtectionLevel.III);
        assertThat(results).hasSize(2).allMatch(r -> r.status() == MeshFaceResult.Status.NOT_APPLICABLE);
        assertThat(results.get(0).reason()).contains("1:10");
    }
}
