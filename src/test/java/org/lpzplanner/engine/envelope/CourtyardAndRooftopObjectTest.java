package org.lpzplanner.engine.envelope;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.assertj.core.data.Offset;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LinearRing;
import org.locationtech.jts.geom.Polygon;
import org.lpzplanner.engine.geom.SiteSurfaceBuilder;
import org.lpzplanner.engine.model.RoofShape;
import org.lpzplanner.engine.model.RooftopObject;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.Structure;

/**
 * Courtyards and rooftop objects against closed forms of the sphere geometry. Tolerance: values
 * are queried exactly with 1 mm tolerance and must lie in [exact − 0.001 − 1e-6, exact + 1e-6].
 */
class CourtyardAndRooftopObjectTest {

    private static final GeometryFactory GF = new GeometryFactory();
    private static final double TOLERANCE = 0.001;
    private static final double ROUNDING = 1e-6;

    @Test
    void narrowCourtyardSagsLikeTwoParallelEdges() {
        // A long courtyard 10 m wide in a 12 m high block, far from its ends: across it the problem
        // is two parallel edges at height H spaced w, so the envelope at the middle is H − p with
        // p = R − √(R² − (w/2)²) (penetration depth, IEC 62305-3 Annex A; R = 30, w = 10:
        // p = 0.4196 m, E = 11.5804 m).
        double r = 30, h = 12, w = 10;
        Polygon block = GF.createPolygon(ring(0, 0, 140, 30), new LinearRing[] {ring(20, 10, 120, 10 + w)});
        Site site = new Site("courtyard", List.of(new Structure("B", "Block", block, h, new RoofShape.Flat(0))),
                List.of(), List.of(), List.of());
        EnvelopeField field = EnvelopeOp.compute(SiteSurfaceBuilder.build(site), r, 0.5);

        double exact = h - (r - Math.sqrt(r * r - w * w / 4));
        double e = field.heightAt(70.13, 15.0, TOLERANCE);
        assertThat(e).isLessThanOrEqualTo(exact + ROUNDING).isGreaterThanOrEqualTo(exact - TOLERANCE - ROUNDING);
        assertThat(exact).isCloseTo(11.5804, Offset.offset(1e-4));
    }

    @Test
    void longPlantBoxShieldsTheRoofBesideItLikeAWallOnOpenGround() {
        // A long box of height b above a wide flat roof at H: the roof acts as the ground, so beside
        // the box E = H + R − √(R² − (d_c − x)²), d_c = √(b(2R − b)) (single wall on open ground,
        // rolling sphere geometry, closed form). R = 20, b = 2: d_c = 8.718 m.
        double r = 20, h = 10, b = 2;
        Polygon roof = GF.createPolygon(ring(0, 0, 200, 120));
        Polygon box = GF.createPolygon(ring(40, 58, 160, 62));
        Site site = new Site("plant", List.of(new Structure("B", "Hall", roof, h, new RoofShape.Flat(0))),
                List.of(new RooftopObject("P", "Plant box", box, h + b)), List.of(), List.of());
        EnvelopeField field = EnvelopeOp.compute(SiteSurfaceBuilder.build(site), r, 0.5);

        double dc = Math.sqrt(b * (2 * r - b));
        for (double x : new double[] {0.01, 0.7, 2.3, 5.1, 8.0}) {
            double exact = h + r - Math.sqrt(r * r - (dc - x) * (dc - x));
            double e = field.heightAt(100.37, 62 + x, TOLERANCE);
            assertThat(e).as("%.2f m beside the box", x)
                    .isLessThanOrEqualTo(exact + ROUNDING).isGreaterThanOrEqualTo(exact - TOLERANCE - ROUNDING);
        }
        // beyond d_c the roof is touched again
        assertThat(field.heightAt(100.37, 62 + dc + 1.5, TOLERANCE)).isCloseTo(h, Offset.offset(TOLERANCE + ROUNDING));
    }

    private static LinearRing ring(double x0, double y0, double x1, double y1) {
        return GF.createLinearRing(new Coordinate[] {new Coordinate(x0, y0), new Coordinate(x1, y0),
            new Coordinate(x1, y1), new Coordinate(x0, y1), new Coordinate(x0, y0)});
    }
}
