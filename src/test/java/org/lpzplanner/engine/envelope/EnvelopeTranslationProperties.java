package org.lpzplanner.engine.envelope;

import static org.assertj.core.api.Assertions.within;

import java.util.Locale;
import java.util.Random;
import java.util.stream.LongStream;
import org.assertj.core.api.SoftAssertions;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Moving the whole site moves the envelope with it: the true envelope is translation invariant,
 * while the engine's lattice is anchored to absolute coordinates, so an offset that is not a
 * multiple of the 0.5 m resolution puts the lattice differently over the geometry. Each engine
 * value lies in [E − τ, E] by contract (τ = {@value SceneCases#TOLERANCE} m), so one may be up to τ
 * low while the other is exact: the check allows 2τ plus 1e-6 m rounding, at every query point of
 * the scene (see {@link RandomScene#queries}).
 */
class EnvelopeTranslationProperties {

    private static final int TRIES = 30;
    private static final double SLACK = 2 * SceneCases.TOLERANCE + SceneCases.ROUNDING;

    static LongStream seeds() {
        return PropertySeeds.first(TRIES);
    }

    /** An offset in [−40, 40] m whose distance to the nearest multiple of the resolution is at least a fifth of it. */
    static double offset(Random rnd) {
        while (true) {
            double d = -40 + 80 * rnd.nextDouble();
            double frac = d / SceneCases.RESOLUTION - Math.floor(d / SceneCases.RESOLUTION);
            if (frac > 0.2 && frac < 0.8) {
                return d;
            }
        }
    }

    @ParameterizedTest(name = "seed {0}")
    @MethodSource("seeds")
    void shiftingTheSiteShiftsTheEnvelope(long seed) {
        RandomScene scene = SceneCases.scene(seed);
        Random rnd = new Random(seed ^ 0x5EED_0003L);
        double dx = offset(rnd), dy = offset(rnd);
        EnvelopeField base = SceneCases.baseField(seed);
        EnvelopeField moved = SceneCases.field(scene.shifted(dx, dy));
        SoftAssertions soft = new SoftAssertions();
        for (RandomScene.Query q : SceneCases.queries(seed)) {
            double e = SceneCases.query(base, q.x(), q.y()), eMoved = SceneCases.query(moved, q.x() + dx, q.y() + dy);
            soft.assertThat(eMoved).as(String.format(Locale.ROOT, "envelope changed under a shift by (%.6f, %.6f)%n%s%n"
                    + "  query %s: %.9f, shifted %.9f", dx, dy, scene, q, e, eMoved))
                    .isCloseTo(e, within(SLACK));
        }
        soft.assertAll();
    }
}
