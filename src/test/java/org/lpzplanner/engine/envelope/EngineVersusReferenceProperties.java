package org.lpzplanner.engine.envelope;

import java.util.List;
import java.util.Locale;
import java.util.stream.LongStream;
import org.assertj.core.api.SoftAssertions;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.api.parallel.Execution;
import org.junit.jupiter.api.parallel.ExecutionMode;
import org.junit.jupiter.params.provider.MethodSource;
import org.lpzplanner.engine.reference.ReferenceEnvelope;

/**
 * The engine against the independent {@link ReferenceEnvelope} on random small scenes (see
 * {@link RandomScene}): roof points anywhere, right inside roof edges and corners, right beside and
 * further out from walls, at rods, very near and near rods, open ground.
 *
 * <p>Bounds used, with E the true envelope, e the engine's value and E<sub>ref</sub> the
 * reference's: the engine's contract is E − τ ≤ e ≤ E with τ = {@value SceneCases#TOLERANCE} m
 * (the query tolerance); the reference guarantees E − {@link ReferenceEnvelope#STATED_DEFICIT} ≤
 * E<sub>ref</sub> ≤ E + {@link ReferenceEnvelope#STATED_EXCESS}. Hence, at every query point,
 * <ul>
 *   <li>never less conservative than the truth: e ≤ E<sub>ref</sub> + 1e-5 + 1e-6 m (the
 *       reference's rounding deficit plus the engine's rounding);
 *   <li>within the query tolerance: e ≥ E<sub>ref</sub> − (τ + 1e-5 + 1e-6) m (the reference's
 *       stated excess plus the engine's rounding).
 * </ul>
 */
@Execution(ExecutionMode.CONCURRENT) // independent cases over immutable inputs: they share the cores
class EngineVersusReferenceProperties {

    private static final int TRIES = 30;

    /** e ≥ E_ref − ACCURACY: query tolerance plus the reference's stated excess plus rounding. */
    static final double ACCURACY = SceneCases.TOLERANCE + ReferenceEnvelope.STATED_EXCESS + SceneCases.ROUNDING;

    static LongStream seeds() {
        return PropertySeeds.first(TRIES);
    }

    @ParameterizedTest(name = "seed {0}")
    @MethodSource("seeds")
    void engineIsNeverAboveTheReference(long seed) {
        RandomScene scene = SceneCases.scene(seed);
        List<RandomScene.Query> queries = SceneCases.queries(seed);
        double[] reference = SceneCases.referenceValues(seed);
        EnvelopeField field = SceneCases.baseField(seed);
        SoftAssertions soft = new SoftAssertions();
        for (int i = 0; i < queries.size(); i++) {
            RandomScene.Query q = queries.get(i);
            double e = SceneCases.query(field, q.x(), q.y());
            soft.assertThat(e).as(describe(scene, q, e, reference[i], "engine above the reference"))
                    .isLessThanOrEqualTo(reference[i] + ReferenceEnvelope.STATED_DEFICIT + SceneCases.ROUNDING);
        }
        soft.assertAll();
    }

    @ParameterizedTest(name = "seed {0}")
    @MethodSource("seeds")
    void engineIsWithinItsQueryToleranceOfTheReference(long seed) {
        RandomScene scene = SceneCases.scene(seed);
        List<RandomScene.Query> queries = SceneCases.queries(seed);
        double[] reference = SceneCases.referenceValues(seed);
        EnvelopeField field = SceneCases.baseField(seed);
        SoftAssertions soft = new SoftAssertions();
        for (int i = 0; i < queries.size(); i++) {
            RandomScene.Query q = queries.get(i);
            if (SceneCases.inStatedShortfall(scene, q.x(), q.y())) {
                continue; // the documented exception; "never above" above still covers these points
            }
            double e = SceneCases.query(field, q.x(), q.y());
            soft.assertThat(e).as(describe(scene, q, e, reference[i], String.format(Locale.ROOT,
                    "engine more than %.6f m below the reference", ACCURACY)))
                    .isGreaterThanOrEqualTo(reference[i] - ACCURACY);
        }
        soft.assertAll();
    }

    static String describe(RandomScene scene, RandomScene.Query q, double engine, double reference, String what) {
        return String.format(Locale.ROOT, "%s%n%s%n  query %s: engine %.9f, reference %.9f, difference %.9f",
                what, scene, q, engine, reference, engine - reference);
    }
}
