package org.lpzplanner.engine.envelope;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import java.util.stream.LongStream;
import org.assertj.core.api.SoftAssertions;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.lpzplanner.engine.geom.SiteSurfaceBuilder;

/**
 * A bare flat-roofed box (random size, rotation, roof height 2–80 m, any sphere radius): every roof
 * point is exposed, E = H (rolling sphere geometry, closed form: the sphere resting on the roof
 * touches it at the point, and the solid roof keeps any sphere from reaching lower). The engine
 * must give H − 0.001 ≤ e ≤ H, plus 1e-6 m rounding, anywhere on the roof: checked at points
 * anywhere on it, right inside its edges and right inside its corners.
 */
class BareFlatRoofProperties {

    private static final int TRIES = 40;

    static LongStream seeds() {
        return PropertySeeds.first(TRIES);
    }

    @ParameterizedTest(name = "seed {0}")
    @MethodSource("seeds")
    void everyRoofPointOfABareBoxIsAtRoofHeight(long seed) {
        Random rnd = new Random(seed ^ 0x5EED_0004L);
        double radius = RandomScene.radius(rnd);
        RandomScene.Box box = RandomScene.box(rnd);
        EnvelopeField field = EnvelopeOp.compute(SiteSurfaceBuilder.build(RandomScene.site(List.of(box), List.of())),
                radius, SceneCases.RESOLUTION);
        List<RandomScene.Query> points = new ArrayList<>();
        for (int k = 0; k < 3; k++) {
            double[] p = box.toSite(box.halfW() * (2 * rnd.nextDouble() - 1), box.halfL() * (2 * rnd.nextDouble() - 1));
            points.add(new RandomScene.Query("roof", p[0], p[1]));
        }
        points.add(RandomScene.insideEdge(rnd, box, 0.01, 0.1));
        points.add(RandomScene.insideEdge(rnd, box, 0.01, 0.1));
        points.add(RandomScene.insideEdge(rnd, box, 0.1, 1));
        points.add(RandomScene.insideCorner(rnd, box, 0.01, 0.1));
        points.add(RandomScene.insideCorner(rnd, box, 0.1, 1));
        SoftAssertions soft = new SoftAssertions();
        for (RandomScene.Query q : points) {
            double e = SceneCases.query(field, q.x(), q.y());
            String what = String.format(Locale.ROOT, "seed %d, R %.4f m, box centre (%.6f, %.6f) half sizes %.6f x %.6f "
                    + "angle %.6f rad roof %.6f m, query %s: engine %.9f", seed, radius, box.cx(), box.cy(),
                    box.halfW(), box.halfL(), box.angle(), box.height(), q, e);
            // flat roof of height H: every roof point is exposed, E = H (rolling sphere geometry, closed form)
            soft.assertThat(e).as(what).isLessThanOrEqualTo(box.height() + SceneCases.ROUNDING);
            soft.assertThat(e).as(what).isGreaterThanOrEqualTo(box.height() - SceneCases.TOLERANCE - SceneCases.ROUNDING);
        }
        soft.assertAll();
    }
}
