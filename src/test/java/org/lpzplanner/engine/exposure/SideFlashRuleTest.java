package org.lpzplanner.engine.exposure;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.lpzplanner.engine.model.ProtectionLevel;
import org.lpzplanner.engine.model.RoofShape;
import org.lpzplanner.engine.model.RooftopObject;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.SphereSpec;
import org.lpzplanner.engine.model.Structure;
import org.lpzplanner.engine.reference.TestSites;

/**
 * Facade bands classified by the tall-structure rule of IEC 62305-3:2010 5.2.3 and Annex A: flashes
 * to the side are negligible on structures lower than 60 m; on taller ones the upper part, typically
 * the top 20 % of the height, needs lateral air-termination, and so does everything above 120 m.
 * The bands themselves follow from the sphere: a wall taller than R is touched from R up to its top
 * (closed form 4 of the sphere geometry), R = 20 m at level I (IEC 62305-3:2010
 * Table 2). Band bottoms are at most 0.05 m below R (the engine's stated band tolerance).
 */
class SideFlashRuleTest {

    private static final double R = 20;

    private static Site tower(double height) {
        return new Site("tower", List.of(new Structure("t", "Tower", TestSites.rectangle(0, 0, 10, 10), height,
                new RoofShape.Flat(0))), List.of(), List.of(), List.of());
    }

    private static AnalysisResult levelOne(Site site) {
        return ExposureAnalysis.analyze(site, AnalysisOptions.of(SphereSpec.of(ProtectionLevel.I)));
    }

    /** The result with only its facade bands, parts and warnings: nothing else exposed. */
    private static AnalysisResult onlyBands(AnalysisResult r) {
        return new AnalysisResult(r.sphere(), r.resolution(), r.tolerance(), List.of(), List.of(), List.of(),
                r.facades(), r.parts(), r.protectedGround(), r.envelope(), r.envelopeMillis(), r.totalMillis(),
                r.refinedQueries(), r.stageMillis(), List.of(), r.facadeParts());
    }

    @Test
    void aFiftyMetreTowersBandsRunFromRToItsTopAndAreAllNegligible() {
        AnalysisResult result = levelOne(tower(50));

        assertThat(result.facades()).isNotEmpty();
        assertThat(result.facadeParts()).hasSameSizeAs(result.facades()).allSatisfy(p -> {
            assertThat(p.bottom()).isCloseTo(R, within(0.05)).isLessThanOrEqualTo(R);
            assertThat(p.top()).isEqualTo(50.0);
            assertThat(p.buildingHeight()).isEqualTo(50.0);
            // IEC 62305-3:2010 5.2.3 / Annex A: lower than 60 m, flashes to the side negligible
            assertThat(p.need()).isEqualTo(SideFlashRule.Need.NEGLIGIBLE);
        });
    }

    @Test
    void aFiftyMetreTowerWithNothingElseExposedIsFullyProtected() {
        AnalysisResult bandsOnly = onlyBands(levelOne(tower(50)));
        assertThat(bandsOnly.facades()).isNotEmpty();
        assertThat(bandsOnly.isFullyProtected()).isTrue();
    }

    @Test
    void aHundredMetreTowersBandIsSplitAtEightyMetresAndOnlyTheUpperPartNeedsLateralAirTermination() {
        AnalysisResult result = levelOne(tower(100));

        assertThat(result.facades()).isNotEmpty();
        assertThat(result.facadeParts()).hasSize(2 * result.facades().size());
        for (FacadeBand band : result.facades()) {
            List<SideFlashRule.Part> parts = result.facadeParts().stream().filter(p -> p.band() == band).toList();
            assertThat(parts).hasSize(2);
            // IEC 62305-3:2010 5.2.3: the upper 20 % of a 100 m structure, from 80 m
            assertThat(parts.get(0).need()).isEqualTo(SideFlashRule.Need.NEGLIGIBLE);
            assertThat(parts.get(0).bottom()).isCloseTo(R, within(0.05));
            assertThat(parts.get(0).top()).isCloseTo(80.0, within(1e-9));
            assertThat(parts.get(1).need()).isEqualTo(SideFlashRule.Need.LATERAL_AIR_TERMINATION);
            assertThat(parts.get(1).bottom()).isCloseTo(80.0, within(1e-9));
            assertThat(parts.get(1).top()).isEqualTo(100.0);
        }
        assertThat(onlyBands(result).isFullyProtected()).isFalse();
    }

    @Test
    void aHundredAndFiftyMetreTowerNeedsLateralAirTerminationFromOneHundredAndTwentyMetres() {
        AnalysisResult result = levelOne(tower(150));

        assertThat(result.facadeParts()).isNotEmpty();
        // IEC 62305-3:2010 5.2.3: min(0.8 · 150 = 120, everything above 120 m) = 120 m
        assertThat(result.facadeParts().stream().filter(SideFlashRule.Part::needsLateralAirTermination))
                .isNotEmpty().allSatisfy(p -> {
                    assertThat(p.bottom()).isCloseTo(120.0, within(1e-9));
                    assertThat(p.top()).isEqualTo(150.0);
                });
        assertThat(result.facadeParts().stream().filter(p -> !p.needsLateralAirTermination()))
                .allSatisfy(p -> assertThat(p.top()).isCloseTo(120.0, within(1e-9)));
    }

    @Test
    void lateralAirTerminationStartsAtTheUpperFifthOrAtOneHundredAndTwentyMetresWhicheverIsLower() {
        // IEC 62305-3:2010 5.2.3: lower than 60 m negligible; upper 20 %; everything above 120 m
        assertThat(SideFlashRule.lateralFrom(59.99)).isEqualTo(Double.POSITIVE_INFINITY);
        assertThat(SideFlashRule.lateralFrom(60)).isCloseTo(48.0, within(1e-9)); // 60 m itself: toward "needs"
        assertThat(SideFlashRule.lateralFrom(100)).isCloseTo(80.0, within(1e-9));
        assertThat(SideFlashRule.lateralFrom(200)).isEqualTo(120.0); // 0.8 · 200 = 160 > 120
    }

    @Test
    void aPodiumsBandsTakeTheHeightOfTheTowerTheyTouch() {
        // a 100 m tower standing against a 30 m podium: one building of 100 m; the podium's bands
        // (20 m to 30 m) lie below 80 m, so flashes to its side are negligible (5.2.3)
        Site site = new Site("tower on podium", List.of(
                new Structure("t", "Tower", TestSites.rectangle(0, 0, 10, 10), 100, new RoofShape.Flat(0)),
                new Structure("p", "Podium", TestSites.rectangle(10, 0, 40, 30), 30, new RoofShape.Flat(0))),
                List.of(), List.of(), List.of());

        AnalysisResult result = levelOne(site);

        List<SideFlashRule.Part> podium = result.facadeParts().stream().filter(p -> p.band().ownerId().equals("p"))
                .toList();
        assertThat(podium).isNotEmpty().allSatisfy(p -> {
            assertThat(p.buildingHeight()).isEqualTo(100.0);
            assertThat(p.need()).isEqualTo(SideFlashRule.Need.NEGLIGIBLE);
        });
        assertThat(result.facadeParts().stream().filter(p -> p.band().ownerId().equals("t"))
                .filter(SideFlashRule.Part::needsLateralAirTermination)).isNotEmpty()
                .allSatisfy(p -> assertThat(p.bottom()).isGreaterThanOrEqualTo(80.0 - 1e-9));
    }

    @Test
    void aRooftopObjectsBandsTakeTheHeightOfTheBuildingItStandsOn() {
        // a 10 m plant room on the roof of a 100 m tower: its walls reach 110 m; the building is
        // 100 m tall, so lateral air-termination is needed from 80 m (5.2.3), all of the room's band
        Site site = new Site("tower with plant", List.of(new Structure("t", "Tower", TestSites.rectangle(0, 0, 20, 20),
                100, new RoofShape.Flat(0))), List.of(new RooftopObject("t", "Plant room",
                TestSites.rectangle(2, 2, 8, 8), 110)), List.of(), List.of());

        List<SideFlashRule.Part> parts = SideFlashRule.classify(site, List.of(
                new FacadeBand("t", "Plant room", 0, TestSites.rectangle(2, 2, 8, 8).getExteriorRing()
                        .getFactory().createLineString(new org.locationtech.jts.geom.Coordinate[] {
                            new org.locationtech.jts.geom.Coordinate(2, 2), new org.locationtech.jts.geom.Coordinate(8, 2)}),
                        6, 100, 110)));

        assertThat(parts).hasSize(1);
        assertThat(parts.get(0).buildingHeight()).isEqualTo(100.0);
        assertThat(parts.get(0).need()).isEqualTo(SideFlashRule.Need.LATERAL_AIR_TERMINATION);
    }
}
