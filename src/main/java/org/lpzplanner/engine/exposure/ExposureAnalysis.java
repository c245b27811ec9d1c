package org.lpzplanner.engine.exposure;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Supplier;
import org.lpzplanner.engine.envelope.EnvelopeField;
import org.lpzplanner.engine.envelope.EnvelopeOp;
import org.lpzplanner.engine.geom.SiteSurface;
import org.lpzplanner.engine.geom.SiteSurfaceBuilder;
import org.lpzplanner.engine.model.Site;

/**
 * Rolling sphere method (IEC 62305-3, 5.2 and Annex A) over a whole site: the protection envelope,
 * and from it the exposed roof areas, edges, corners, facade bands, the parts that intercept, and
 * the protected ground.
 *
 * <p>Safety: every reported envelope value is a lower bound of the true envelope (at most the
 * stated tolerance below it for exact queries), and every decision is taken with a 1 mm margin
 * toward "exposed". Assumes flat ground and everything solid down to the ground.
 *
 * <p>Uses all cores; thread-safe (no shared state between calls).
 */
public final class ExposureAnalysis {

    private ExposureAnalysis() {
    }

    public static AnalysisResult analyze(Site site, AnalysisOptions options) {
        long start = System.nanoTime();
        SiteSurface surface = SiteSurfaceBuilder.build(site);
        double radius = options.sphere().radius();
        double h = options.resolution() != null ? options.resolution() : ResolutionChoice.choose(surface, radius);
        EnvelopeField field = EnvelopeOp.compute(surface, radius, h);
        long envelopeDone = System.nanoTime();
        ExposureContext ctx = new ExposureContext(surface, field, options.tolerance());
        Map<String, Long> stages = new LinkedHashMap<>();
        stages.put("envelope", (envelopeDone - start) / 1_000_000);
        List<EdgeExposure> edges = timed(stages, "edges", () -> EdgeExposureOp.edges(ctx));
        List<RoofExposure> roofs = timed(stages, "roofs", () -> RoofExposureOp.run(ctx, EdgeExposureOp.cellsByOwner(ctx, edges)));
        List<CornerExposure> corners = timed(stages, "corners", () -> EdgeExposureOp.corners(ctx));
        List<FacadeBand> facades = timed(stages, "facades", () -> FacadeExposureOp.run(ctx));
        List<PartInterception> parts = timed(stages, "parts", () -> PartInterceptionOp.run(ctx));
        ProtectedGround ground = timed(stages, "ground", () -> ProtectedGroundOp.run(ctx));
        long end = System.nanoTime();
        return new AnalysisResult(options.sphere(), h, options.tolerance(), roofs, edges, corners, facades, parts,
                ground, field, (envelopeDone - start) / 1_000_000, (end - start) / 1_000_000, ctx.refinedQueries(),
                stages, AssumptionCheck.warnings(surface, radius));
    }

    private static <T> T timed(Map<String, Long> stages, String name, Supplier<T> work) {
        long t = System.nanoTime();
        T out = work.get();
        stages.put(name, (System.nanoTime() - t) / 1_000_000);
        return out;
    }
}
