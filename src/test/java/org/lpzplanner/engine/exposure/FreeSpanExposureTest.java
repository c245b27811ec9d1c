package org.lpzplanner.engine.exposure;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.lpzplanner.engine.model.Conductor;
import org.lpzplanner.engine.model.ProtectionLevel;
import org.lpzplanner.engine.model.RoofShape;
import org.lpzplanner.engine.model.Rod;
import org.lpzplanner.engine.model.RooftopObject;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.SphereSpec;
import org.lpzplanner.engine.model.Structure;
import org.lpzplanner.engine.reference.ReferenceEnvelope;
import org.lpzplanner.engine.reference.TestSites;

/** Exposure under wires held high and past roof steps, where a sphere can pass under a conductor. */
class FreeSpanExposureTest {

    @Test
    void hutUnderAWireHighAboveItIsExposedAndTheWireIsNamed() {
        // a 10 × 10 m hut, 5 m high, under a wire at 45 m between two 45 m masts 100 m apart, class I
        // (R = 20 m): the sphere resting on the hut's roof has its centre at 25 m, exactly R below the
        // wire, so it touches the wire without entering it and reaches the whole roof (rolling sphere
        // geometry)
        Site site = new Site("yard", List.of(new Structure("hut", "Hut", TestSites.rectangle(45, -5, 55, 5), 5,
                new RoofShape.Flat(0))), List.of(), List.of(new Rod("m1", "Mast west", 0, 0, 45),
                        new Rod("m2", "Mast east", 100, 0, 45)),
                List.of(new Conductor("w1", "Span wire", List.of(new Coordinate(0, 0, 45), new Coordinate(100, 0, 45)), null)));
        AnalysisResult r = ExposureAnalysis.analyze(site, AnalysisOptions.of(SphereSpec.of(ProtectionLevel.I)));

        assertThat(r.totalExposedRoofArea()).as("the whole roof, 100 m²").isCloseTo(100, within(1e-6));
        assertThat(r.isFullyProtected()).isFalse();
        assertThat(r.warnings()).singleElement().satisfies(w -> {
            assertThat(w.kind()).isEqualTo(ModelWarning.Kind.FREE_SPAN);
            assertThat(w.partId()).isEqualTo("w1");
            assertThat(w.partName()).isEqualTo("Span wire");
            // 45 m above the open ground at its ends, 40 m above the hut: more than R all along
            assertThat(w.value()).isCloseTo(45, within(1e-9));
            assertThat(w.limit()).isEqualTo(20);
            assertThat(w.where().getLength()).as("the whole 100 m span").isCloseTo(100, within(1e-9));
            assertThat(w.text()).contains("Span wire").contains("45.0 m").contains("20.0 m");
        });
    }

    @Test
    void wireWithinRAboveWhatLiesBeneathGivesNoWarning() {
        Site site = new Site("yard", List.of(new Structure("hut", "Hut", TestSites.rectangle(45, -5, 55, 5), 5,
                new RoofShape.Flat(0))), List.of(), List.of(), List.of(new Conductor("w1", "Low wire",
                        List.of(new Coordinate(40, 0, 18), new Coordinate(60, 0, 18)), null)));
        AnalysisResult r = ExposureAnalysis.analyze(site, AnalysisOptions.of(SphereSpec.of(ProtectionLevel.I)));
        // 18 m above the ground and 13 m above the hut: at most R = 20 m
        assertThat(r.warnings()).isEmpty();
    }

    @Test
    void ventPastARoofStepIsReachedOnceTheConductorFollowsTheStep() {
        // a 10 m roof (x 0–20) joined to a 5 m roof (x 20–50); a roof conductor 0.1 m above the roof
        // from (10, 10) to (45, 10) runs down the step and on at 5.1 m. A 0.5 × 0.5 m vent, top 6 m,
        // centred at (35, 11.5) stands 0.9 m above it there. Were the conductor a straight line from
        // 10.1 m to 5.1 m it would pass at 6.53 m and shelter the vent; along the roof it does not.
        Site site = new Site("steps", List.of(
                new Structure("a", "Upper", TestSites.rectangle(0, 0, 20, 20), 10, new RoofShape.Flat(0)),
                new Structure("b", "Lower", TestSites.rectangle(20, 0, 50, 20), 5, new RoofShape.Flat(0))),
                List.of(new RooftopObject("v", "Vent", TestSites.rectangle(34.75, 11.25, 35.25, 11.75), 6)), List.of(),
                List.of(new Conductor("c", "Roof conductor", List.of(new Coordinate(10, 10), new Coordinate(45, 10)), 0.1)));
        AnalysisResult r = ExposureAnalysis.analyze(site, AnalysisOptions.of(SphereSpec.of(ProtectionLevel.I)));
        RoofExposure vent = r.roofs().stream().filter(f -> f.ownerId().equals("v")).findFirst().orElseThrow();
        assertThat(vent.exposedShare()).as("the vent's whole top").isCloseTo(1, within(1e-9));

        // the independent reference, given the conductor's true course, finds the vent reached; given
        // the straight line it finds it sheltered
        Site stepped = withConductor(site, List.of(new Coordinate(10, 10, 10.1), new Coordinate(20, 10, 10.1),
                new Coordinate(20, 10, 5.1), new Coordinate(45, 10, 5.1)));
        Site straight = withConductor(site, List.of(new Coordinate(10, 10, 10.1), new Coordinate(45, 10, 5.1)));
        assertThat(ReferenceEnvelope.of(stepped, 20).heightAt(35, 11.5)).isLessThanOrEqualTo(6 + 1e-5);
        assertThat(ReferenceEnvelope.of(straight, 20).heightAt(35, 11.5)).isGreaterThan(6.01);
    }

    private static Site withConductor(Site site, List<Coordinate> path) {
        return new Site(site.name(), site.structures(), site.rooftopObjects(), List.of(),
                List.of(new Conductor("c", "Roof conductor", path, null)));
    }
}
