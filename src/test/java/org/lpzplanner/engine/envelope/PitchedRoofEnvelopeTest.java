package org.lpzplanner.engine.envelope;

import java.util.List;
import java.util.Random;
import org.assertj.core.api.SoftAssertions;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Polygon;
import org.lpzplanner.engine.geom.RoofFace;
import org.lpzplanner.engine.geom.SiteSurface;
import org.lpzplanner.engine.geom.SiteSurfaceBuilder;
import org.lpzplanner.engine.model.RoofShape;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.Structure;

/**
 * A bare pitched roof standing alone (rolling sphere geometry, closed form). The roof is convex
 * from above, so at a roof point p on a plane of slope factor s = √(1 + a² + b²) the only sphere
 * that can touch p rests tangent to the plane, with its centre R/s above p's height. That sphere
 * is free exactly when its centre is at least R above the ground: where roof(p) ≥ R·(1 − 1/s),
 * E(p) = roof(p); lower on a steep plane the ground holds the sphere off and E(p) > roof(p).
 * The engine is checked on both sides where the closed form holds (never above, at most the query
 * tolerance below), and never below the roof minus the tolerance elsewhere.
 */
class PitchedRoofEnvelopeTest {

    private static final double TOLERANCE = 0.001;
    private static final double ROUNDING = 1e-6;
    private static final GeometryFactory GF = new GeometryFactory();

    @ParameterizedTest(name = "sphere radius {0} m")
    @ValueSource(doubles = {20, 30, 45, 60})
    void gableRoofPointsAreTouchedWhereTheTangentSphereClearsTheGround(double radius) {
        check(new Structure("G", "Gable", rectangle(0, 0, 30, 12), 8, new RoofShape.Gable(11, 90)), radius);
    }

    @ParameterizedTest(name = "sphere radius {0} m")
    @ValueSource(doubles = {20, 30, 45, 60})
    void hipRoofPointsAreTouchedWhereTheTangentSphereClearsTheGround(double radius) {
        check(new Structure("H", "Hip", rectangle(0, 0, 24, 16), 9, new RoofShape.Hip(14)), radius);
    }

    @ParameterizedTest(name = "sphere radius {0} m")
    @ValueSource(doubles = {20, 30, 45, 60})
    void shedRoofPointsAreTouchedWhereTheTangentSphereClearsTheGround(double radius) {
        check(new Structure("S", "Shed", rectangle(0, 0, 20, 14), 6, new RoofShape.Shed(9, 0)), radius);
    }

    private static void check(Structure structure, double radius) {
        Site site = new Site("pitched", List.of(structure), List.of(), List.of(), List.of());
        SiteSurface surface = SiteSurfaceBuilder.build(site);
        EnvelopeField field = EnvelopeOp.compute(surface, radius, 0.5);
        var env = structure.footprint().getEnvelopeInternal();
        Random rnd = new Random(11);
        SoftAssertions soft = new SoftAssertions();
        int closedFormPoints = 0;
        for (int k = 0; k < 60; k++) {
            // interior points, some right beside ridges, hips and eaves
            double inset = k % 4 == 0 ? 0.01 + 0.1 * rnd.nextDouble() : 0.3;
            double x = env.getMinX() + inset + rnd.nextDouble() * (env.getWidth() - 2 * inset);
            double y = env.getMinY() + inset + rnd.nextDouble() * (env.getHeight() - 2 * inset);
            double roof = surface.topHeight(x, y);
            double e = field.heightAt(x, y, TOLERANCE);
            soft.assertThat(e).as("E at (%.3f, %.3f), roof %.4f", x, y, roof)
                    .isGreaterThanOrEqualTo(roof - TOLERANCE - ROUNDING);
            double s = slopeFactorAt(surface, x, y);
            if (roof >= radius * (1 - 1 / s) + 0.01) {
                closedFormPoints++;
                soft.assertThat(e).as("E at (%.3f, %.3f), roof %.4f, touched by the tangent sphere", x, y, roof)
                        .isLessThanOrEqualTo(roof + ROUNDING);
            }
        }
        soft.assertThat(closedFormPoints).as("points where the closed form holds").isGreaterThan(10);
        soft.assertAll();
    }

    /** Slope factor of the steepest face over the point (faces meet only along ridges and hips). */
    private static double slopeFactorAt(SiteSurface surface, double x, double y) {
        double s = 1;
        for (int i = 0; i < surface.faces().size(); i++) {
            RoofFace f = surface.faces().get(i);
            if (surface.facePolygon(i).contains(x, y)) {
                s = Math.max(s, f.plane().slopeFactor());
            }
        }
        return s;
    }

    private static Polygon rectangle(double x0, double y0, double x1, double y1) {
        return GF.createPolygon(new Coordinate[] {new Coordinate(x0, y0), new Coordinate(x1, y0),
            new Coordinate(x1, y1), new Coordinate(x0, y1), new Coordinate(x0, y0)});
    }
}
