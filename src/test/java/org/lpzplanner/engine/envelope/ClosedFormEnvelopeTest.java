package org.lpzplanner.engine.envelope;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Locale;
import org.assertj.core.api.SoftAssertions;
import org.junit.jupiter.api.Test;
import org.lpzplanner.engine.geom.SiteSurfaceBuilder;
import org.lpzplanner.engine.model.ProtectionLevel;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.reference.ClosedForms;
import org.lpzplanner.engine.reference.TestSites;

/**
 * The engine against envelopes known in closed form (derivations in {@link ClosedForms}).
 *
 * <p>Tolerance: fields are computed at 0.5 m resolution and queried with
 * {@code heightAt(x, y, 0.001)}, whose contract is "never above the true envelope, at most 0.001 m
 * below it" at every point off the wall lines of structures taller than R (on such a line the
 * envelope jumps from the roof height to the facade's value). Every check therefore asserts
 * exact − 0.001 − 1e-6 ≤ E ≤ exact + 1e-6, the 1e-6 m covering floating-point rounding only. Query
 * points are deliberately off the 0.5 m lattice, and each closed form is checked from its support
 * outward: at and right beside rods and conductors, on and right inside roof edges and corners,
 * right beside walls, and further out.
 */
class ClosedFormEnvelopeTest {

    private static final double RESOLUTION = 0.5;
    private static final double QUERY_TOLERANCE = 0.001;
    private static final double ROUNDING = 1e-6;

    private static EnvelopeField field(Site site, double radius) {
        return EnvelopeOp.compute(SiteSurfaceBuilder.build(site), radius, RESOLUTION);
    }

    private static double query(EnvelopeField f, double x, double y) {
        return f.heightAt(x, y, QUERY_TOLERANCE);
    }

    /** Never above the exact envelope, at most the query tolerance below it. */
    private static void assertEnvelope(SoftAssertions soft, double got, double exact, String what) {
        soft.assertThat(got).as(what + ": never above the exact envelope %.6f", exact).isLessThanOrEqualTo(exact + ROUNDING);
        soft.assertThat(got).as(what + ": at most %.3f m below the exact envelope %.6f", QUERY_TOLERANCE, exact)
                .isGreaterThanOrEqualTo(exact - QUERY_TOLERANCE - ROUNDING);
    }

    @Test
    void rodOnOpenGroundProtectsDiscOfRadiusSqrtH2RminusH() {
        SoftAssertions soft = new SoftAssertions();
        for (double[] rh : new double[][] {{20, 6}, {30, 10}, {45, 4.5}, {60, 25}, {20, 20}}) {
            double r = rh[0], h = rh[1];
            double rx = 3.37, ry = -1.13;
            EnvelopeField f = field(TestSites.rods(new double[] {rx, ry, h}), r);
            double dc = ClosedForms.protectedRadius(r, h);
            // at the rod E = h: the sphere resting on the tip
            assertEnvelope(soft, query(f, rx, ry), h, String.format(Locale.ROOT, "R %.0f h %.1f at the rod", r, h));
            for (double x : new double[] {0.01, 0.1, 0.3, 0.75, 1.2, 0.11 * dc, 0.21 * dc, 0.5 * dc, 0.77 * dc, 0.98 * dc}) {
                double a = 0.41 + 2 * x / dc;
                // E(x) = R − √(R² − (d_c − x)²), d_c = √(h(2R − h)): rolling sphere geometry, closed form
                double exact = ClosedForms.beside(r, h, x);
                assertEnvelope(soft, query(f, rx + x * Math.cos(a), ry + x * Math.sin(a)), exact,
                        String.format(Locale.ROOT, "R %.0f h %.1f x %.3f", r, h, x));
            }
        }
        soft.assertAll();
    }

    @Test
    void rodProtectsNothingBeyondItsProtectedRadius() {
        SoftAssertions soft = new SoftAssertions();
        double r = 30, h = 10, rx = -0.71, ry = 2.29;
        EnvelopeField f = field(TestSites.rods(new double[] {rx, ry, h}), r);
        double dc = ClosedForms.protectedRadius(r, h); // √(10·50) = 22.36 m
        for (double x : new double[] {dc + 0.01, dc + 3.3, r + 4.1}) {
            // beyond d_c a sphere resting on the ground reaches the ground: E = 0 (rolling sphere geometry)
            assertEnvelope(soft, query(f, rx + x * Math.cos(2.2), ry + x * Math.sin(2.2)), 0, "x " + x);
        }
        soft.assertAll();
    }

    @Test
    void twoRodsSagMidwayToTheGroundSphereTouchingBothTips() {
        SoftAssertions soft = new SoftAssertions();
        EnvelopeField f = field(TestSites.rods(new double[] {0.13, 0.27, 10}, new double[] {16.13, 0.27, 10}), 30);
        double got = query(f, 8.13, 0.27);
        // R − √((d/2)² + (R − h)²) = 30 − √(8² + 20²) = 8.459 m: rolling sphere geometry, closed form
        assertEnvelope(soft, got, ClosedForms.midwayBetweenRods(30, 10, 16), "R 30 h 10 d 16");
        soft.assertThat(ClosedForms.midwayBetweenRods(30, 10, 16)).isCloseTo(8.459, within(0.0005));
        // h − p = 10 − (30 − √(30² − 8²)) = 8.914 m is the sphere resting on both tips only, not the lowest one
        soft.assertThat(got).isLessThan(8.9);
        soft.assertAll();
    }

    @Test
    void twoRodsFurtherApartThanTwiceTheProtectedRadiusLeaveTheMidpointExposed() {
        SoftAssertions soft = new SoftAssertions();
        EnvelopeField f = field(TestSites.rods(new double[] {0.2, 0.1, 5}, new double[] {30.2, 0.1, 5}), 20);
        // d/2 = 15 m ≥ d_c = √(5·35) = 13.23 m (equivalently h ≤ p = 20 − √(400 − 225) = 6.77 m): E = 0
        assertEnvelope(soft, query(f, 15.2, 0.1), ClosedForms.midwayBetweenRods(20, 5, 30), "R 20 h 5 d 30");
        soft.assertAll();
    }

    @Test
    void parallelConductorsSagMidwayByPenetrationDepth() {
        SoftAssertions soft = new SoftAssertions();
        double r = 20, h = 6, d = 10;
        EnvelopeField f = field(TestSites.conductorsAlongY(h, -60.3, 60.3, -d / 2 + 0.11, d / 2 + 0.11), r);
        // p = R − √(R² − (d/2)²) = 20 − √375 = 0.635 m: IEC 62305-3 Annex A
        soft.assertThat(ClosedForms.penetrationDepth(r, d)).isCloseTo(0.635, within(0.0005));
        // midway E = h − p = 5.365 m; queried far (> R) from the conductor ends
        assertEnvelope(soft, query(f, 0.11, 0.37), ClosedForms.midwayBetweenConductors(r, h, d), "R 20 h 6 d 10");
        soft.assertAll();
    }

    @Test
    void flatRoofBelowSphereRadiusIsItsOwnEnvelope() {
        SoftAssertions soft = new SoftAssertions();
        double r = 30, h = 12;
        EnvelopeField f = field(TestSites.building(TestSites.rectangle(0.1, 0.3, 20.1, 120.3), h), r);
        for (double[] p : new double[][] {{10.37, 60.21}, {0.36, 44.4}, {19.83, 0.61}, {5.5, 119.9}}) {
            // flat roof of height H: every roof point is exposed, E = H (rolling sphere geometry)
            assertEnvelope(soft, query(f, p[0], p[1]), h, String.format(Locale.ROOT, "roof point (%.2f, %.2f)", p[0], p[1]));
        }
        for (double in : new double[] {0, 0.01, 0.05, 0.1}) {
            // flat roof of height H: every roof point is exposed, E = H (rolling sphere geometry);
            // H < R, so E is continuous across the wall line and equals H on the edge itself
            assertEnvelope(soft, query(f, 0.1 + in, 0.3 + in), h, "corner, " + in + " m inside");
            assertEnvelope(soft, query(f, 20.1 - in, 60.37), h, "edge, " + in + " m inside");
        }
        soft.assertAll();
    }

    @Test
    void lowBuildingWallProtectsGroundLikeARodInSection() {
        SoftAssertions soft = new SoftAssertions();
        double r = 30, h = 12;
        EnvelopeField f = field(TestSites.building(TestSites.rectangle(0.1, 0.3, 20.1, 120.3), h), r);
        double dc = ClosedForms.protectedRadius(r, h); // √(12·48) = 24 m
        for (double x : new double[] {0.01, 0.03, 0.07, 0.15, 0.27, 1.3, 7.7, 15.1, 23.6, dc + 1.2}) {
            // beside a long wall: E = R − √(R² − (d_c − x)²), d_c = √(H(2R − H)); 0 beyond d_c
            assertEnvelope(soft, query(f, 0.1 - x, 60.37), ClosedForms.beside(r, h, x), "x " + x);
        }
        soft.assertAll();
    }

    @Test
    void tallBuildingFacadeIsExposedFromSphereRadiusUp() {
        SoftAssertions soft = new SoftAssertions();
        double r = 20;
        EnvelopeField f = field(TestSites.building(TestSites.rectangle(0, 0, 30, 80), 40), r);
        // R = 20, x = 1: E = 20 − √(400 − 361) = 13.755 m, at the exact point (−1, 40.13), not a lattice node
        soft.assertThat(ClosedForms.besideTallWall(r, 1)).isCloseTo(13.755, within(0.0005));
        for (double x : new double[] {0.01, 1, 4.3, 11.9, 19.2}) {
            // E = R − √(R² − (R − x)²): the sphere resting on the ground against the facade
            assertEnvelope(soft, query(f, -x, 40.13), ClosedForms.besideTallWall(r, x), "x " + x);
        }
        // the roof itself: E = H (rolling sphere geometry), also right inside its edge and corner
        assertEnvelope(soft, query(f, 15.2, 40.13), 40, "roof");
        for (double in : new double[] {0.01, 0.1}) {
            assertEnvelope(soft, query(f, in, 40.13), 40, "roof edge, " + in + " m inside");
            assertEnvelope(soft, query(f, in, in), 40, "roof corner, " + in + " m inside");
        }
        soft.assertAll();
    }

    @Test
    void horizontalConductorSectionFollowsTheRodFormula() {
        SoftAssertions soft = new SoftAssertions();
        double r = 45, h = 9;
        EnvelopeField f = field(TestSites.conductorsAlongY(h, -80.2, 80.2, 0.23), r);
        double dc = ClosedForms.protectedRadius(r, h); // √(9·81) = 27 m
        for (double x : new double[] {0, 0.01, 0.05, 0.1, 0.2, 0.31, 0.9, 6.6, 14.2, 26.1, dc + 0.5}) {
            // in section a long horizontal conductor acts as a rod of its height: E = R − √(R² − (d_c − x)²);
            // under the conductor (x = 0) that is its height h
            assertEnvelope(soft, query(f, 0.23 + x, 0.61), ClosedForms.beside(r, h, x), "x " + x);
        }
        soft.assertAll();
    }

    @Test
    void electrogeometricRadiusReproducesTheLevelRadiiWithinTwoMetres() {
        // R = 10·I^0.65 (IEC 62305-1 Annex A): 3 kA → 20.4 m, 16 kA → 60.6 m
        assertThat(ProtectionLevel.strikingDistance(3)).isCloseTo(20.4, within(0.05));
        assertThat(ProtectionLevel.strikingDistance(16)).isCloseTo(60.6, within(0.05));
        for (ProtectionLevel level : ProtectionLevel.values()) {
            // the level's minimum peak current (IEC 62305-1 Table 5) gives about the level's radius (IEC 62305-3 Table 2)
            assertThat(ProtectionLevel.strikingDistance(level.minPeakCurrentKa()))
                    .as("level %s", level).isCloseTo(level.sphereRadius(), within(2.0));
        }
    }

    @Test
    void levelTableMatchesTheStandard() {
        // sphere radius and mesh size: IEC 62305-3:2010 Table 2
        assertThat(ProtectionLevel.values()).extracting(ProtectionLevel::sphereRadius).containsExactly(20.0, 30.0, 45.0, 60.0);
        assertThat(ProtectionLevel.values()).extracting(ProtectionLevel::meshSize).containsExactly(5.0, 10.0, 15.0, 20.0);
        // typical distance between down-conductors: IEC 62305-3:2010 Table 4
        assertThat(ProtectionLevel.values()).extracting(ProtectionLevel::downConductorSpacing)
                .containsExactly(10.0, 10.0, 15.0, 20.0);
        // k_i of the separation distance: IEC 62305-3:2010 Table 10
        assertThat(ProtectionLevel.values()).extracting(ProtectionLevel::ki).containsExactly(0.08, 0.06, 0.04, 0.04);
        // minimum peak current intercepted: IEC 62305-1:2010 Table 5
        assertThat(ProtectionLevel.values()).extracting(ProtectionLevel::minPeakCurrentKa).containsExactly(3.0, 5.0, 10.0, 16.0);
    }
}
