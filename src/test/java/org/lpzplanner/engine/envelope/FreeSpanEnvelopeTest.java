package org.lpzplanner.engine.envelope;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.Locale;
import org.assertj.core.api.SoftAssertions;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.lpzplanner.engine.geom.SiteSurfaceBuilder;
import org.lpzplanner.engine.model.Conductor;
import org.lpzplanner.engine.model.RoofShape;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.Structure;
import org.lpzplanner.engine.reference.ClosedForms;
import org.lpzplanner.engine.reference.ReferenceEnvelope;
import org.lpzplanner.engine.reference.TestSites;

/**
 * Wires and conductors held clear of what lies beneath them: a sphere may pass under them. Checked
 * against the closed form of a long wire over open ground ({@link ClosedForms#underHighWire}) and
 * against the independent reference, which models every conductor as a thin line in the air.
 *
 * <p>Tolerance as in {@link ClosedFormEnvelopeTest}: exact − 0.001 − 1e-6 ≤ E ≤ exact + 1e-6.
 */
class FreeSpanEnvelopeTest {

    private static final double RESOLUTION = 0.5;
    private static final double QUERY_TOLERANCE = 0.001;
    private static final double ROUNDING = 1e-6;

    private static EnvelopeField field(Site site, double radius) {
        return EnvelopeOp.compute(SiteSurfaceBuilder.build(site), radius, RESOLUTION);
    }

    private static Site wireAlongY(double x, double h, double y0, double y1) {
        return new Site("wire", List.of(), List.of(), List.of(), List.of(new Conductor("w", "Wire",
                List.of(new Coordinate(x, y0, h), new Coordinate(x, y1, h)), null)));
    }

    private static void assertEnvelope(SoftAssertions soft, double got, double exact, String what) {
        soft.assertThat(got).as(what + ": never above the exact envelope %.6f", exact).isLessThanOrEqualTo(exact + ROUNDING);
        soft.assertThat(got).as(what + ": at most %.3f m below the exact envelope %.6f", QUERY_TOLERANCE, exact)
                .isGreaterThanOrEqualTo(exact - QUERY_TOLERANCE - ROUNDING);
    }

    @Test
    void wireBetweenRAndTwoRAboveGroundProtectsOnlyTheStripNoSphereCanPassUnder() {
        SoftAssertions soft = new SoftAssertions();
        // R 20 m, wire at 30 m (class I) and R 45 m, wire at 70 m (class III): both at least 4R/3
        for (double[] rh : new double[][] {{20, 30}, {45, 70}}) {
            double r = rh[0], h = rh[1], wx = 0.37;
            EnvelopeField f = field(wireAlongY(wx, h, -3 * r, 3 * r), r);
            double u0 = Math.sqrt(r * r - (h - r) * (h - r));
            for (double x : new double[] {0, 0.01, 0.3, 2.2, 0.4 * u0, 0.77 * u0, 0.99 * u0, u0 + 0.2, u0 + 3.1}) {
                // E = R − √(R² − (u0 − |x|)²), u0 = √(R² − (H − R)²): rolling sphere geometry, closed form
                double exact = ClosedForms.underHighWire(r, h, x);
                assertEnvelope(soft, f.heightAt(wx + x, 1.13, QUERY_TOLERANCE), exact,
                        String.format(Locale.ROOT, "R %.0f H %.0f x %.3f", r, h, x));
            }
        }
        soft.assertAll();
        // with the space beneath filled in, the envelope right under a 30 m wire would be R = 20 m;
        // a sphere resting on the ground beside it reaches down to 10 m there (closed form above)
        assertThat(field(wireAlongY(0, 30, -60, 60), 20).heightAt(0, 0.5, QUERY_TOLERANCE))
                .isLessThanOrEqualTo(10 + ROUNDING);
    }

    @Test
    void wireTwiceRAboveGroundProtectsNoGroundBeneathIt() {
        // from H = 2R on a sphere resting on the ground passes under the wire (closed form)
        EnvelopeField f = field(wireAlongY(0, 45, -60, 60), 20);
        SoftAssertions soft = new SoftAssertions();
        for (double x : new double[] {0, 0.5, 3, 12}) {
            assertEnvelope(soft, f.heightAt(x, -0.7, QUERY_TOLERANCE), 0, "x " + x);
        }
        soft.assertAll();
    }

    @Test
    void wireWithinRAboveGroundProtectsAsASolidConductor() {
        // H ≤ R: no sphere on the ground fits under it, so the familiar conductor envelope
        // R − √(R² − (d_c − x)²), d_c = √(H(2R − H)) holds (rolling sphere geometry, closed form)
        double r = 20, h = 15;
        EnvelopeField f = field(wireAlongY(0, h, -60, 60), r);
        SoftAssertions soft = new SoftAssertions();
        for (double x : new double[] {0, 0.3, 4.4, 11, 17.2, 19.5}) {
            assertEnvelope(soft, f.heightAt(x, 0.3, QUERY_TOLERANCE), ClosedForms.beside(r, h, x), "x " + x);
        }
        soft.assertAll();
    }

    @Test
    void wireAboveATallRoofNearItsEdgeLetsSpheresReachTheEdgeFromTheSide() {
        // a 15 m building at R = 20 m with a wire 10 m above its roof, 1 m in from the edge x = 0: a
        // sphere grazing the edge from outside passes under the wire (its centre stays more than R
        // from the wire), so the edge is exposed; the reference models the wire as a line
        double r = 20;
        Site site = new Site("edge", List.of(new Structure("b", "Block", TestSites.rectangle(0, -20, 30, 20), 15,
                new RoofShape.Flat(0))), List.of(), List.of(), List.of(new Conductor("w", "Wire",
                        List.of(new Coordinate(1, -60, 25), new Coordinate(1, 60, 25)), null)));
        EnvelopeField f = field(site, r);
        ReferenceEnvelope ref = ReferenceEnvelope.of(site, r);
        SoftAssertions soft = new SoftAssertions();
        for (double[] p : new double[][] {{0.02, 0.3}, {0.5, -1.7}, {1.0, 2.9}, {2.5, 0.1}, {-0.6, 0.4}, {-3.3, 1.2}}) {
            double e = f.heightAt(p[0], p[1], QUERY_TOLERANCE), expected = ref.heightAt(p[0], p[1]);
            String where = String.format(Locale.ROOT, "(%.2f, %.2f)", p[0], p[1]);
            soft.assertThat(e).as(where + " not above the reference")
                    .isLessThanOrEqualTo(expected + ReferenceEnvelope.STATED_DEFICIT + ROUNDING);
            soft.assertThat(e).as(where + " close to the reference").isGreaterThanOrEqualTo(
                    expected - QUERY_TOLERANCE - ReferenceEnvelope.STATED_EXCESS - ROUNDING);
        }
        soft.assertAll();
        // the sphere centred 19.36 m out at 20 m touches the edge (0, 15) and stays √439.5 = 20.96 m
        // from the wire (1, 25): the edge is reached, E = 15 there (were the space under the wire
        // solid, the wire would hold every sphere touching the edge off it)
        assertThat(f.heightAt(0, 0.3, QUERY_TOLERANCE)).as("the roof edge is reached")
                .isLessThanOrEqualTo(15 + ROUNDING);
    }

    @Test
    void conductorOnTheRoofIsSolidDownAndAWireAboveIsNot() {
        // fixed within √(2·R·0.004 m) of the surface beneath (0.40 m at R = 20 m), a conductor is solid down
        assertThat(Supports.solidClearance(20)).isCloseTo(0.4, org.assertj.core.api.Assertions.within(1e-12));
        Site site = new Site("two", List.of(new Structure("b", "Block", TestSites.rectangle(0, 0, 20, 20), 8,
                new RoofShape.Flat(0))), List.of(), List.of(), List.of(
                        new Conductor("c", "Ridge", List.of(new Coordinate(2, 10), new Coordinate(18, 10)), 0.1),
                        new Conductor("w", "Wire", List.of(new Coordinate(2, 5, 9), new Coordinate(18, 5, 9)), null)));
        List<Support> supports = Supports.of(SiteSurfaceBuilder.build(site), 20);
        assertThat(supports.stream().filter(Support::hasSpaceBelow).count()).as("the wire 1 m above the roof").isEqualTo(1);
        assertThat(supports.stream().filter(s -> s instanceof SegmentSupport).count())
                .as("the roof's four edges and the conductor 0.1 m above it").isEqualTo(5);
    }
}
