package org.lpzplanner.engine.reference;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.lpzplanner.engine.model.Conductor;
import org.lpzplanner.engine.model.RoofShape;
import org.lpzplanner.engine.model.Rod;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.Structure;

/**
 * Checks the reference itself against closed-form envelopes, so that the property tests can lean
 * on it: every value must lie in [exact − {@link ReferenceEnvelope#STATED_DEFICIT},
 * exact + {@link ReferenceEnvelope#STATED_EXCESS}].
 */
class ReferenceEnvelopeTest {

    private static void assertWithinReferenceBound(double reference, double exact, String what) {
        assertThat(reference).as(what + ": reference never below the true envelope")
                .isGreaterThanOrEqualTo(exact - ReferenceEnvelope.STATED_DEFICIT);
        assertThat(reference).as(what + ": reference at most its stated excess above it")
                .isLessThanOrEqualTo(exact + ReferenceEnvelope.STATED_EXCESS);
    }

    @Test
    void centreHeightOverRodIsTipPlusSphereSectionAndRadiusBeyondProtectedRadius() {
        double r = 30, h = 10;
        ReferenceEnvelope ref = ReferenceEnvelope.of(TestSites.rods(new double[] {1.3, -2.1, h}), r);
        for (double d : new double[] {0, 3.7, 12.5, 22.3}) {
            // D = max(R, h + √(R² − d²)): the sphere touching the tip from above, or resting on the ground
            double exact = Math.max(r, h + Math.sqrt(r * r - d * d));
            assertThat(ref.centreHeight(1.3 + d, -2.1)).as("D at %s m", d).isCloseTo(exact, within(1e-12));
        }
    }

    @Test
    void centreHeightBesideFlatRoofFollowsTheNearestRoofPoint() {
        double r = 20, h = 8;
        ReferenceEnvelope ref = ReferenceEnvelope.of(TestSites.building(TestSites.rectangle(0, 0, 10, 30), h), r);
        // over the roof the sphere rests on it: D = H + R
        assertThat(ref.centreHeight(4.2, 17.9)).isCloseTo(h + r, within(1e-12));
        // beside a wall at distance w: D = H + √(R² − w²), the sphere touching the roof edge
        assertThat(ref.centreHeight(-6.5, 15)).isCloseTo(h + Math.sqrt(r * r - 6.5 * 6.5), within(1e-12));
        // beyond a corner: distance to the corner point
        assertThat(ref.centreHeight(13, 34)).isCloseTo(h + Math.sqrt(r * r - 25), within(1e-12));
        // out of reach: the sphere rests on the ground, D = R
        assertThat(ref.centreHeight(-25, 15)).isEqualTo(r);
    }

    @Test
    void rodOnRoofStandsOnTheRoof() {
        Site site = new Site("s", List.of(new Structure("b", "B", TestSites.rectangle(0, 0, 10, 10), 12, new RoofShape.Flat(0))),
                List.of(), List.of(new Rod("r", "R", 5, 5, 3)), List.of());
        ReferenceEnvelope ref = ReferenceEnvelope.of(site, 20);
        // tip at roof 12 m + rod 3 m; D over the tip is tip + R
        assertThat(ref.centreHeight(5, 5)).isCloseTo(15 + 20, within(1e-12));
        assertThat(ref.solidTop(5, 5)).isEqualTo(12);
    }

    @Test
    void centreHeightOfSlopingConductorMatchesDenseSamplingOfTheLeg() {
        double r = 25;
        Site site = new Site("s", List.of(), List.of(), List.of(), List.of(new Conductor("c", "C",
                List.of(new Coordinate(0, 0, 5), new Coordinate(10, 3, 12)), null)));
        ReferenceEnvelope ref = ReferenceEnvelope.of(site, r);
        for (double[] c : new double[][] {{4, 7}, {-6, -1}, {12, -4}, {20, 15}, {5, 1.5}}) {
            // brute force: max over 200 001 points of the leg of z(q) + √(R² − |c − q|²), and R for the ground
            double best = r;
            for (int i = 0; i <= 200_000; i++) {
                double s = i / 200_000.0, qx = 10 * s, qy = 3 * s, qz = 5 + 7 * s;
                double d2 = (c[0] - qx) * (c[0] - qx) + (c[1] - qy) * (c[1] - qy);
                if (d2 <= r * r) {
                    best = Math.max(best, qz + Math.sqrt(r * r - d2));
                }
            }
            assertThat(ref.centreHeight(c[0], c[1])).as("D at (%s, %s)", c[0], c[1]).isCloseTo(best, within(1e-6));
        }
    }

    @Test
    void fourTimesDenserSearchFindsNoLowerSphere() {
        // a tall and a low box, a rod on each roof and one on the ground
        Site site = new Site("mixed", List.of(
                new Structure("t", "Tall", TestSites.rectangle(-6.3, -4.1, 3.9, 7.7), 52.4, new RoofShape.Flat(0)),
                new Structure("l", "Low", TestSites.rectangle(6.2, -9.5, 19.1, 2.3), 9.6, new RoofShape.Flat(0))),
                List.of(),
                List.of(new Rod("a", "A", -1.1, 2.2, 4.5), new Rod("b", "B", 12.7, -3.3, 6.1), new Rod("c", "C", 4.9, 11.8, 12.2)),
                List.of());
        ReferenceEnvelope ref = ReferenceEnvelope.of(site, 30);
        ReferenceEnvelope dense = ref.withSearch(4 * 360, 24);
        double[][] points = {{-0.7, 2.9}, {5.1, 0.4}, {12.1, -2.8}, {20.3, -4.4}, {4.3, 11.1}, {-9.8, 1.7}, {-25.2, 16.6}};
        for (double[] p : points) {
            double normal = ref.heightAt(p[0], p[1]), denser = dense.heightAt(p[0], p[1]);
            // both are attained by real spheres; the default search may only be the stated excess higher
            assertThat(normal).as("at (%s, %s)", p[0], p[1]).isLessThanOrEqualTo(denser + ReferenceEnvelope.STATED_EXCESS);
        }
    }

    @Test
    void rodEnvelopeMatchesClosedFormAtEveryDistance() {
        for (double[] rh : new double[][] {{20, 5}, {30, 10}, {45, 30}, {60, 15}}) {
            double r = rh[0], h = rh[1];
            ReferenceEnvelope ref = ReferenceEnvelope.of(TestSites.rods(new double[] {0.37, -0.81, h}), r);
            double dc = ClosedForms.protectedRadius(r, h);
            for (double f : new double[] {0, 0.05, 0.3, 0.6, 0.95, 1.2}) {
                double x = f * dc, a = 0.7 + f;
                double got = ref.heightAt(0.37 + x * Math.cos(a), -0.81 + x * Math.sin(a));
                // E(x) = R − √(R² − (d_c − x)²) below d_c, 0 beyond: rolling sphere geometry, closed form
                assertWithinReferenceBound(got, ClosedForms.beside(r, h, x), "R " + r + " h " + h + " x " + x);
            }
        }
    }

    @Test
    void twoRodsMidpointMatchesGroundSphereTouchingBothTips() {
        ReferenceEnvelope ref = ReferenceEnvelope.of(TestSites.rods(new double[] {0, 0, 10}, new double[] {16, 0, 10}), 30);
        // R − √((d/2)² + (R − h)²) = 30 − √(64 + 400) = 8.459 m: rolling sphere geometry, closed form
        assertWithinReferenceBound(ref.heightAt(8, 0), ClosedForms.midwayBetweenRods(30, 10, 16), "R 30 h 10 d 16");
        ReferenceEnvelope apart = ReferenceEnvelope.of(TestSites.rods(new double[] {0, 0, 5}, new double[] {30, 0, 5}), 20);
        // d/2 = 15 m ≥ d_c = √(5·35) = 13.23 m: a sphere on the ground reaches the midpoint, E = 0
        assertWithinReferenceBound(apart.heightAt(15, 0), 0, "R 20 h 5 d 30");
    }

    @Test
    void parallelConductorsMidwaySagByPenetrationDepth() {
        double r = 20, h = 6, d = 10;
        ReferenceEnvelope ref = ReferenceEnvelope.of(TestSites.conductorsAlongY(h, -70, 70, -d / 2, d / 2), r);
        // E = h − p, p = R − √(R² − (d/2)²) = 0.635 m: IEC 62305-3 Annex A, rolling sphere geometry
        assertWithinReferenceBound(ref.heightAt(0, 0.3), ClosedForms.midwayBetweenConductors(r, h, d), "conductors");
    }

    @Test
    void lowBuildingRoofIsItsOwnEnvelopeAndWallSideFollowsEdgeFormula() {
        double r = 30, h = 12;
        ReferenceEnvelope ref = ReferenceEnvelope.of(TestSites.building(TestSites.rectangle(0, 0, 20, 150), h), r);
        // flat roof of height H: every roof point is exposed, E = H (rolling sphere geometry)
        assertWithinReferenceBound(ref.heightAt(10.3, 75.2), h, "roof centre");
        assertWithinReferenceBound(ref.heightAt(0.2, 70.1), h, "roof near edge");
        for (double x : new double[] {0.01, 0.03, 0.05, 1, 7.5, 15, 23, 30}) {
            // beside a long wall: E = R − √(R² − (d_c − x)²), d_c = √(H(2R − H)), as for a rod in section
            assertWithinReferenceBound(ref.heightAt(-x, 74.6), ClosedForms.beside(r, h, x), "x " + x);
        }
    }

    @Test
    void tallBuildingFacadeExposedFromSphereRadiusUp() {
        for (double[] rh : new double[][] {{20, 40}, {80, 100}}) {
            double r = rh[0];
            ReferenceEnvelope ref = ReferenceEnvelope.of(TestSites.building(TestSites.rectangle(0, 0, 30, 100), rh[1]), r);
            for (double x : new double[] {0.01, 0.03, 0.05, 1, 5, 12.5, 19}) {
                // E = R − √(R² − (R − x)²); R = 20, x = 1 gives 13.755 m: rolling sphere geometry, closed form
                assertWithinReferenceBound(ref.heightAt(-x, 50.3), ClosedForms.besideTallWall(r, x), "R " + r + " x " + x);
            }
        }
    }

    @Test
    void horizontalConductorEnvelopeInSectionIsTheRodFormula() {
        double r = 45, h = 9;
        ReferenceEnvelope ref = ReferenceEnvelope.of(TestSites.conductorsAlongY(h, -100, 100, 0), r);
        for (double x : new double[] {0, 2.5, 10, 20, 27}) {
            // section through a long horizontal conductor: E = R − √(R² − (d_c − x)²), 0 beyond d_c
            assertWithinReferenceBound(ref.heightAt(x, 0.4), ClosedForms.beside(r, h, x), "x " + x);
        }
    }
}
