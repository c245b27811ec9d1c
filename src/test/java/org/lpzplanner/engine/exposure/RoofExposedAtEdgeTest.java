package org.lpzplanner.engine.exposure;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.Polygon;
import org.lpzplanner.engine.model.ProtectionLevel;
import org.lpzplanner.engine.model.Rod;
import org.lpzplanner.engine.model.RoofShape;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.SphereSpec;
import org.lpzplanner.engine.model.Structure;
import org.lpzplanner.engine.reference.TestSites;

/**
 * Roof cells that count as exposed only because an exposed edge of the same structure crosses
 * them, told apart from roof that is exposed in itself.
 */
class RoofExposedAtEdgeTest {

    private static final double H = 0.5;
    private static final Polygon FOOTPRINT = TestSites.rectangle(0.3, 0.2, 20.3, 20.2);

    /**
     * A flat-roofed building with the given parapet and, optionally, 3 m rods on an 11 × 11 grid
     * from 0.3 m inside one rim to 0.3 m inside the other (1.94 m apart).
     */
    private static Site tower(double height, double parapet, boolean rods) {
        List<Rod> parts = new ArrayList<>();
        if (rods) {
            int n = 0;
            for (int i = 0; i <= 10; i++) {
                for (int j = 0; j <= 10; j++) {
                    parts.add(new Rod("r" + n, "rod " + n++, 0.6 + 1.94 * i, 0.5 + 1.94 * j, 3));
                }
            }
        }
        return new Site("tower", List.of(new Structure("T", "Tower", FOOTPRINT, height, new RoofShape.Flat(parapet))),
                List.of(), parts, List.of());
    }

    private static RoofExposure roof(AnalysisResult result) {
        return result.roofs().stream().filter(r -> r.ownerId().equals("T")).findFirst().orElseThrow();
    }

    @Test
    void rimOfATowerTallerThanRIsTheEdgesExposureNotTheRoofs() {
        // R = 30 m at level II (IEC 62305-3 Table 2). A wall taller than R is reached from the side
        // from R up to its top (closed form 4 of the sphere geometry), so its top edge is exposed
        // whatever stands on the roof; 3 m rods every 2 m leave no sag on the roof between them
        // (sag of a 30 m sphere across their 2.74 m diagonal: 30 − √(900 − 1.9) = 0.03 m ≪ 3 m).
        AnalysisResult result = ExposureAnalysis.analyze(tower(40, 1, true),
                AnalysisOptions.of(SphereSpec.of(ProtectionLevel.II)).withResolution(H));
        RoofExposure roof = roof(result);

        assertThat(result.edges()).filteredOn(e -> e.ownerId().equals("T")).isNotEmpty();
        assertThat(roof.isExposed()).isTrue();
        // every exposed roof cell is one the rim crosses: nothing farther in than a cell's diagonal
        Geometry inner = FOOTPRINT.buffer(-H * Math.sqrt(2));
        assertThat(roof.exposed().intersection(inner).getArea()).isLessThan(1e-6);
        // and all of it is put down to the exposed edges
        assertThat(roof.exposedAtEdges().getArea()).isCloseTo(roof.exposedPlanArea(), within(1e-6));
    }

    @Test
    void aRoofExposedInItselfIsNeverPutDownToItsEdges() {
        // without air-termination or parapet the whole flat roof is exposed (closed form 3: E = H on
        // the roof), up to its rim: no cell of it is exposed only through an edge
        AnalysisResult result = ExposureAnalysis.analyze(tower(12, 0, false),
                AnalysisOptions.of(SphereSpec.of(ProtectionLevel.II)).withResolution(H));
        RoofExposure roof = roof(result);

        assertThat(roof.exposedPlanArea()).isCloseTo(FOOTPRINT.getArea(), within(1e-6));
        assertThat(roof.exposedAtEdges().isEmpty()).isTrue();
    }

    @Test
    void aLowBuildingWithRodsHasNoRimStripLeft() {
        // 13 m < R: the walls are not reached from the side. The sphere resting on the ground that
        // touches the 13 m parapet top has its centre 30 m up and √(30² − 17²) = 24.7 m out; a
        // 3 m rod on the parapet 0.3 m inside, at most 0.97 m along the rim, is
        // √(25.0² + 0.97² + 14²) = 28.7 m < 30 m from that centre: the rods meet it first.
        AnalysisResult result = ExposureAnalysis.analyze(tower(12, 1, true),
                AnalysisOptions.of(SphereSpec.of(ProtectionLevel.II)).withResolution(H));

        assertThat(roof(result).isExposed()).isFalse();
        assertThat(roof(result).exposedAtEdges().isEmpty()).isTrue();
    }
}
