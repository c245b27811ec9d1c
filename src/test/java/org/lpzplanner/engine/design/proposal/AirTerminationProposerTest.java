package org.lpzplanner.engine.design.proposal;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.parallel.Execution;
import org.junit.jupiter.api.parallel.ExecutionMode;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.junit.jupiter.params.provider.ValueSource;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Polygon;
import org.lpzplanner.engine.exposure.AnalysisOptions;
import org.lpzplanner.engine.exposure.AnalysisResult;
import org.lpzplanner.engine.exposure.ExposureAnalysis;
import org.lpzplanner.engine.io.SiteReader;
import org.lpzplanner.engine.model.ProtectionLevel;
import org.lpzplanner.engine.model.RoofShape;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.SphereSpec;
import org.lpzplanner.engine.model.Structure;

/**
 * Proposals leave nothing exposed, checked by a fresh full analysis of the site with the proposed
 * parts (not by the proposal's own bookkeeping).
 */
@Execution(ExecutionMode.CONCURRENT) // independent cases over immutable inputs: they share the cores
class AirTerminationProposerTest {

    private static final GeometryFactory GF = new GeometryFactory();
    private static final List<Double> HEIGHTS = List.of(0.5, 1.0, 1.5, 2.0, 3.0);

    static Stream<Arguments> samples() {
        return Stream.of(
                Arguments.of("brookfield-campus.geojson", ProtectionLevel.IV),
                Arguments.of("harbour-warehouse.geojson", ProtectionLevel.II),
                Arguments.of("meridian-tower.geojson", ProtectionLevel.III),
                Arguments.of("meridian-tower.geojson", ProtectionLevel.I),
                Arguments.of("millbrook-hall.geojson", ProtectionLevel.II),
                Arguments.of("courtyard-block.wkt", ProtectionLevel.I));
    }

    @ParameterizedTest(name = "{0} at class {1}")
    @MethodSource("samples")
    void everySampleSiteIsCoveredAsTheFullAnalysisConfirms(String file, ProtectionLevel level) {
        Site site = SiteReader.read(Path.of("sample-sites", file)).site();
        SphereSpec sphere = SphereSpec.of(level);
        // Walls higher than the sphere radius are reached from the side whatever stands on the roof
        // (closed form 4 of the sphere geometry: exposed from R up), and so are their top edges; a
        // designer accepts those walls and rims (side air-termination, natural components), so they
        // are passed as accepted items. The 95 m tower's antenna housing needs rods at its corners.
        List<Geometry> accepted = rimsOfStructuresReachedAboveRadius(site, sphere);
        ProposalOptions options = ProposalOptions.rods(sphere, HEIGHTS).withAccepted(accepted);

        Proposal proposal = AirTerminationProposer.propose(site, options, ProposalMonitor.NONE);

        ProposalChecks.assertFullyCovered(site, proposal, sphere, accepted);
        assertThat(proposal.count()).isPositive().isLessThan(proposal.regularLayoutCount());
        assertThat(proposal.parts()).allSatisfy(p -> assertThat(HEIGHTS).contains(p.rod().height()));
    }

    // classes III and IV: the campus's walls (35 m at most) stay below R (45 and 60 m), so the
    // proposal must be complete with nothing accepted
    @ParameterizedTest(name = "class {0}")
    @ValueSource(strings = {"III", "IV"})
    void campusNeedsAtMostSeventyPercentOfTheRegularLayout(String level) {
        Site site = SiteReader.read(Path.of("sample-sites", "brookfield-campus.geojson")).site();
        SphereSpec sphere = SphereSpec.of(ProtectionLevel.parse(level));
        Proposal proposal = AirTerminationProposer.propose(site, ProposalOptions.rods(sphere, HEIGHTS), ProposalMonitor.NONE);

        ProposalChecks.assertFullyCovered(site, proposal, sphere, List.of());
        assertThat(proposal.shareOfRegular()).isLessThanOrEqualTo(0.70);
    }

    // classes I and II: the 35 m tower (36 m with its parapet) is taller than R (20 and 30 m). Its
    // walls are reached from the side from R up (closed form 4 of the sphere geometry), and so are
    // their top edges, whatever stands on the roof: a designer gives the upper part of such a
    // structure side air-termination and accepts its walls and rims here. Everything else, every
    // roof included, must be covered. At class I a 19.2 m parapet top (the library) is touched by
    // spheres resting on the ground at almost 20 m: only a conductor on the edge itself meets them,
    // so roof-edge conductors are allowed there.
    @ParameterizedTest(name = "class {0}")
    @ValueSource(strings = {"I", "II"})
    void campusAtTheHigherClassesIsCompleteOnceTheTowersUpperWallsAreAccepted(String level) {
        Site site = SiteReader.read(Path.of("sample-sites", "brookfield-campus.geojson")).site();
        SphereSpec sphere = SphereSpec.of(ProtectionLevel.parse(level));
        List<Geometry> accepted = rimsOfStructuresReachedAboveRadius(site, sphere);
        assertThat(accepted).as("only the tower is taller than R").hasSize(1);
        ProposalOptions options = new ProposalOptions(sphere, HEIGHTS, level.equals("I"), false, List.of(), List.of(),
                accepted, null);

        Proposal proposal = AirTerminationProposer.propose(site, options, ProposalMonitor.NONE);

        ProposalChecks.assertFullyCovered(site, proposal, sphere, accepted);
        assertThat(proposal.shareOfRegular()).isLessThanOrEqualTo(0.70);
    }

    @ParameterizedTest(name = "seed {0}")
    @ValueSource(longs = {20_260_101L, 20_260_211L, 20_260_307L})
    void randomSitesAreCoveredAsTheFullAnalysisConfirms(long seed) {
        Site site = randomSite(seed);
        SphereSpec sphere = SphereSpec.of(ProtectionLevel.values()[(int) (seed % 4)]);
        Proposal proposal = AirTerminationProposer.propose(site, ProposalOptions.rods(sphere, HEIGHTS), ProposalMonitor.NONE);

        ProposalChecks.assertFullyCovered(site, proposal, sphere, List.of());
        assertThat(proposal.count()).isLessThanOrEqualTo(proposal.regularLayoutCount());
    }

    @Test
    void noPartStandsInAKeepOutArea() {
        Site site = SiteReader.read(Path.of("sample-sites", "harbour-warehouse.geojson")).site();
        SphereSpec sphere = SphereSpec.of(ProtectionLevel.II);
        // a 4 m walkway across the roof from the south edge to the north edge, and a skylight
        Polygon walkway = rectangle(38, -1, 42, 41);
        Polygon skylight = rectangle(15, 15, 30, 25);
        ProposalOptions options = ProposalOptions.rods(sphere, HEIGHTS).withKeepOut(List.of(walkway, skylight));

        Proposal proposal = AirTerminationProposer.propose(site, options, ProposalMonitor.NONE);

        ProposalChecks.assertFullyCovered(site, proposal, sphere, List.of());
        assertThat(proposal.parts()).allSatisfy(p -> {
            var at = GF.createPoint(new Coordinate(p.rod().x(), p.rod().y()));
            assertThat(walkway.intersects(at)).as("%s in the walkway", p.rod()).isFalse();
            assertThat(skylight.intersects(at)).as("%s on the skylight", p.rod()).isFalse();
        });
    }

    @Test
    void whatNoPartCanReachIsReportedAndTheProposalIsNotComplete() {
        // a 95 m tower at class I (R = 20 m): its walls are exposed from 20 m up whatever is on the roof
        Site site = SiteReader.read(Path.of("sample-sites", "meridian-tower.geojson")).site();
        Proposal proposal = AirTerminationProposer.propose(site,
                ProposalOptions.rods(SphereSpec.of(ProtectionLevel.I), HEIGHTS), ProposalMonitor.NONE);

        assertThat(proposal.complete()).isFalse();
        assertThat(proposal.left()).containsKey("facade");
        assertThat(proposal.beyondReach()).isPositive();
        assertThat(proposal.verification().facades()).isNotEmpty();
    }

    @Test
    void facadeBandsWhereFlashesToTheSideAreNegligibleAreNotLeftToCover() {
        // a 50 m tower at class I (R = 20 m): its walls are touched from 20 m up (closed form 4),
        // but on a structure lower than 60 m flashes to the side are negligible (IEC 62305-3:2010
        // 5.2.3 and Annex A), so there is nothing on them to cover; its rims still are
        Site site = new Site("tower", List.of(new Structure("t", "Tower", rectangle(0, 0, 10, 10), 50,
                new RoofShape.Flat(0))), List.of(), List.of(), List.of());
        Proposal proposal = AirTerminationProposer.propose(site,
                ProposalOptions.rods(SphereSpec.of(ProtectionLevel.I), HEIGHTS), ProposalMonitor.NONE);

        assertThat(proposal.verification().facades()).isNotEmpty();
        assertThat(proposal.left()).doesNotContainKey("facade");
    }

    @Test
    void progressRisesToTheEndAndCancellingStopsTheProposal() {
        Site site = SiteReader.read(Path.of("sample-sites", "courtyard-block.wkt")).site();
        ProposalOptions options = ProposalOptions.rods(SphereSpec.of(ProtectionLevel.III), HEIGHTS);
        List<Double> seen = new ArrayList<>();
        AirTerminationProposer.propose(site, options, new ProposalMonitor() {
            @Override
            public void progress(String stage, double fraction) {
                seen.add(fraction);
            }

            @Override
            public boolean isCancelled() {
                return false;
            }
        });
        assertThat(seen).isNotEmpty().isSorted();
        assertThat(seen.get(seen.size() - 1)).isEqualTo(1.0);

        assertThatThrownBy(() -> AirTerminationProposer.propose(site, options, new ProposalMonitor() {
            @Override
            public void progress(String stage, double fraction) {
            }

            @Override
            public boolean isCancelled() {
                return true;
            }
        })).isInstanceOf(ProposalCancelledException.class);
    }

    @Test
    void optionsRefuseHeightsOutsideTheAllowedRange() {
        SphereSpec sphere = SphereSpec.of(ProtectionLevel.II);
        assertThatThrownBy(() -> ProposalOptions.rods(sphere, List.of(0.0)))
                .hasMessageContaining("rod heights must be between 0.1 m and 10 m");
        assertThatThrownBy(() -> ProposalOptions.rods(sphere, List.of()))
                .hasMessageContaining("allow at least one");
    }

    /** The outlines (wall tops) of the structures with a facade band above R. */
    private static List<Geometry> rimsOfStructuresReachedAboveRadius(Site site, SphereSpec sphere) {
        AnalysisResult bare = ExposureAnalysis.analyze(site, AnalysisOptions.of(sphere));
        List<Geometry> out = new ArrayList<>();
        for (Structure s : site.structures()) {
            boolean reached = bare.facades().stream()
                    .anyMatch(b -> b.ownerId().equals(s.id()) && b.top() > sphere.radius());
            if (reached) {
                out.add(s.footprint().getBoundary());
            }
        }
        return out;
    }

    /** One to three separate buildings, flat (with or without a parapet) or gabled, all lower than 15 m. */
    static Site randomSite(long seed) {
        Random rnd = new Random(seed);
        List<Structure> structures = new ArrayList<>();
        int n = 1 + rnd.nextInt(3);
        for (int i = 0; i < n; i++) {
            double x0 = i * 50 + rnd.nextDouble() * 5, y0 = rnd.nextDouble() * 20;
            double w = 10 + rnd.nextDouble() * 30, d = 8 + rnd.nextDouble() * 20;
            double h = 4 + rnd.nextDouble() * 10;
            RoofShape roof = switch (rnd.nextInt(3)) {
                case 0 -> new RoofShape.Flat(0);
                case 1 -> new RoofShape.Flat(0.5 + rnd.nextDouble());
                default -> new RoofShape.Gable(h + 2 + rnd.nextDouble() * 3, rnd.nextBoolean() ? 0 : 90);
            };
            structures.add(new Structure("S" + i, "Block " + i, rectangle(x0, y0, x0 + w, y0 + d), h, roof));
        }
        return new Site("random " + seed, structures, List.of(), List.of(), List.of());
    }

    static Polygon rectangle(double x0, double y0, double x1, double y1) {
        return GF.createPolygon(new Coordinate[] {new Coordinate(x0, y0), new Coordinate(x1, y0), new Coordinate(x1, y1),
                new Coordinate(x0, y1), new Coordinate(x0, y0)});
    }
}
