package org.lpzplanner.engine.envelope;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import java.util.stream.LongStream;
import org.assertj.core.api.SoftAssertions;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.api.parallel.Execution;
import org.junit.jupiter.api.parallel.ExecutionMode;
import org.junit.jupiter.params.provider.MethodSource;
import org.lpzplanner.engine.model.Rod;

/**
 * Monotonicity of the engine's envelope on random small scenes, at every query point of the scene
 * (see {@link RandomScene#queries}).
 *
 * <p>Adding solid (a rod) only adds constraints on the sphere, so the true envelope never drops;
 * a sphere of radius R<sub>1</sub> &lt; R<sub>2</sub> fits inside any admissible sphere of radius
 * R<sub>2</sub>, tangent to it at its lowest point over a column, so the smaller sphere reaches at
 * least as low everywhere: E<sub>R1</sub> ≤ E<sub>R2</sub> (rolling sphere geometry). Each engine
 * value lies in [E − τ, E] by contract (τ = {@value SceneCases#TOLERANCE} m), so one value may be
 * up to τ low while the other is exact: the checks allow 2τ plus 1e-6 m rounding.
 */
@Execution(ExecutionMode.CONCURRENT) // independent cases over immutable inputs: they share the cores
class EnvelopeMonotonicityProperties {

    private static final int TRIES = 30;
    private static final double SLACK = 2 * SceneCases.TOLERANCE + SceneCases.ROUNDING;

    static LongStream seeds() {
        return PropertySeeds.first(TRIES);
    }

    /**
     * Checked at the scene's query points and around the added rod: its column, a point 0–0.5 m and
     * one 0–12 m from it, and three points in the 26 m square centred on it.
     */
    @ParameterizedTest(name = "seed {0}")
    @MethodSource("seeds")
    void addingARodNeverLowersTheEnvelope(long seed) {
        RandomScene scene = SceneCases.scene(seed);
        Random rnd = new Random(seed ^ 0x5EED_0001L);
        List<Rod> rods = new ArrayList<>(scene.rods);
        Rod extra = RandomScene.rod(rnd, scene.boxes, rods.size());
        rods.add(extra);
        RandomScene with = scene.withRods(rods);
        List<RandomScene.Query> points = new ArrayList<>(SceneCases.queries(seed));
        points.addAll(RandomScene.aroundRod(rnd, extra));
        double[] around = {extra.x() - 1, extra.y() - 1, extra.x() + 1, extra.y() + 1};
        for (int k = 0; k < 3; k++) {
            points.add(RandomScene.pointAround(rnd, "around the added rod", around, 12));
        }
        EnvelopeField without = SceneCases.baseField(seed);
        EnvelopeField withRod = SceneCases.field(with);
        SoftAssertions soft = new SoftAssertions();
        for (RandomScene.Query q : points) {
            double before = SceneCases.query(without, q.x(), q.y()), after = SceneCases.query(withRod, q.x(), q.y());
            soft.assertThat(after).as(String.format(Locale.ROOT, "envelope dropped after adding the rod at (%.6f, %.6f) "
                    + "of %.6f m%n%s%n  query %s: before %.9f, after %.9f",
                    extra.x(), extra.y(), extra.height(), scene, q, before, after))
                    .isGreaterThanOrEqualTo(before - SLACK);
        }
        soft.assertAll();
    }

    @ParameterizedTest(name = "seed {0}")
    @MethodSource("seeds")
    void aSmallerSphereNeverProtectsMore(long seed) {
        RandomScene scene = SceneCases.scene(seed);
        Random rnd = new Random(seed ^ 0x5EED_0002L);
        double other = RandomScene.radius(rnd);
        while (Math.abs(other - scene.radius) < 1) {
            other = RandomScene.radius(rnd);
        }
        EnvelopeField base = SceneCases.baseField(seed);
        EnvelopeField changed = SceneCases.field(scene.withRadius(other));
        boolean baseIsSmaller = scene.radius < other;
        EnvelopeField small = baseIsSmaller ? base : changed, large = baseIsSmaller ? changed : base;
        double rSmall = Math.min(scene.radius, other), rLarge = Math.max(scene.radius, other);
        SoftAssertions soft = new SoftAssertions();
        for (RandomScene.Query q : SceneCases.queries(seed)) {
            double eSmall = SceneCases.query(small, q.x(), q.y()), eLarge = SceneCases.query(large, q.x(), q.y());
            soft.assertThat(eSmall).as(String.format(Locale.ROOT, "sphere of %.4f m protects more than one of %.4f m%n%s%n"
                    + "  query %s: E small %.9f, E large %.9f", rSmall, rLarge, scene, q, eSmall, eLarge))
                    .isLessThanOrEqualTo(eLarge + SLACK);
        }
        soft.assertAll();
    }
}
