package org.lpzplanner.engine.envelope;

import java.lang.ref.SoftReference;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.concurrent.ConcurrentHashMap;
import org.lpzplanner.engine.geom.SiteSurfaceBuilder;
import org.lpzplanner.engine.reference.ReferenceEnvelope;

/**
 * The random scene of a seed, its query points, and the engine field and reference values for
 * it, computed once per test run and shared by the property classes.
 *
 * <p>Engine settings of every property: resolution {@value #RESOLUTION} m, queries with
 * {@code heightAt(x, y, }{@value #TOLERANCE}{@code )}, whose contract is "never above the true
 * envelope, at most {@value #TOLERANCE} m below it" at every point off the wall lines of
 * structures taller than R (no query point lies on a wall line); {@value #ROUNDING} m covers
 * floating-point rounding.
 */
final class SceneCases {

    static final double RESOLUTION = 0.5;
    static final double TOLERANCE = 0.001;
    static final double ROUNDING = 1e-6;

    private static final Map<Long, SoftReference<EnvelopeField>> FIELDS = new ConcurrentHashMap<>();
    private static final Map<Long, double[]> REFERENCE = new ConcurrentHashMap<>();

    /**
     * The exact query's stated exception (docs/engine.md, "Error bounds"): within
     * {@value #SHORTFALL_REACH} m of a rod whose tip stands at 0.9·R or more above the ground, the
     * value may be further below the true envelope than the tolerance (never above it).
     */
    static boolean inStatedShortfall(RandomScene scene, double x, double y) {
        var surface = org.lpzplanner.engine.geom.SiteSurfaceBuilder.build(RandomScene.site(scene.boxes, scene.rods));
        for (var r : surface.rods()) {
            if (r.tip().getZ() >= 0.9 * scene.radius && Math.hypot(x - r.tip().x, y - r.tip().y) <= SHORTFALL_REACH) {
                return true;
            }
        }
        return false;
    }

    static final double SHORTFALL_REACH = 0.05;

    private SceneCases() {
    }

    static RandomScene scene(long seed) {
        return RandomScene.generate(seed);
    }

    static List<RandomScene.Query> queries(long seed) {
        return scene(seed).queries(new Random(seed * 31 + 7));
    }

    static EnvelopeField field(RandomScene scene) {
        return EnvelopeOp.compute(SiteSurfaceBuilder.build(scene.site()), scene.radius, RESOLUTION);
    }

    /** The engine field of the seed's unmodified scene, computed once while memory allows. */
    static EnvelopeField baseField(long seed) {
        SoftReference<EnvelopeField> ref = FIELDS.get(seed);
        EnvelopeField f = ref == null ? null : ref.get();
        if (f == null) {
            f = field(scene(seed));
            FIELDS.put(seed, new SoftReference<>(f));
        }
        return f;
    }

    /** Reference envelope at each of the seed's query points, in order. */
    static double[] referenceValues(long seed) {
        return REFERENCE.computeIfAbsent(seed, s -> {
            RandomScene scene = scene(s);
            ReferenceEnvelope ref = ReferenceEnvelope.of(scene.site(), scene.radius);
            return queries(s).stream().mapToDouble(q -> ref.heightAt(q.x(), q.y())).toArray();
        });
    }

    static double query(EnvelopeField f, double x, double y) {
        return f.heightAt(x, y, TOLERANCE);
    }
}
