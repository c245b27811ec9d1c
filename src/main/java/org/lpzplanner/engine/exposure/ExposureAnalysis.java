package org.lpzplanner.engine.exposure;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.function.Supplier;
import java.util.stream.IntStream;
import org.lpzplanner.engine.envelope.EnvelopeField;
import org.lpzplanner.engine.envelope.EnvelopeOp;
import org.lpzplanner.engine.envelope.Grid;
import org.lpzplanner.engine.envelope.Supports;
import org.lpzplanner.engine.geom.RoofEdge;
import org.lpzplanner.engine.geom.SiteSurface;
import org.lpzplanner.engine.geom.SiteSurfaceBuilder;
import org.lpzplanner.engine.geom.Wall;
import org.lpzplanner.engine.model.Site;

/**
 * Rolling sphere method (IEC 62305-3, 5.2 and Annex A) over a whole site: the protection envelope,
 * and from it the exposed roof areas, edges, corners, facade bands, the parts that intercept, and
 * the protected ground.
 *
 * <p>Safety: every reported envelope value is a lower bound of the true envelope (at most the
 * stated tolerance below it for exact queries), and every decision is taken with a 1 mm margin
 * toward "exposed". Assumes flat ground; structures, rooftop objects and rods are solid down to the
 * ground, conductors held clear of the surface have free space beneath them.
 *
 * <p>Edits: {@link #update} redoes an analysis after the air-termination changed. The centre
 * surface changes only within R of a changed part and the envelope only within 2R, so only the
 * edges, corners, walls and roof and ground cells within 2R (plus four cells) of the change are
 * decided again and everything else is taken over; the result is the same as a fresh analysis.
 *
 * <p>Uses all cores; thread-safe (no shared state between calls).
 */
public final class ExposureAnalysis {

    private static final String[] STAGES = {"envelope", "edges", "roofs", "corners", "facades", "parts", "ground"};

    /** Rough share of the whole time each stage takes (from the campus and district benchmarks). */
    private static final double[] STAGE_SHARE = {0.55, 0.07, 0.25, 0.02, 0.03, 0.01, 0.07};

    private ExposureAnalysis() {
    }

    public static AnalysisResult analyze(Site site, AnalysisOptions options) {
        return analyzeKeepingState(site, options, AnalysisProgress.NONE).result();
    }

    /**
     * A fresh analysis, kept with its decisions for a later {@link #update}.
     *
     * @throws AnalysisCancelledException when {@code progress} asked to stop
     */
    public static AnalysisState analyzeKeepingState(Site site, AnalysisOptions options, AnalysisProgress progress) {
        return run(site, options, progress, null);
    }

    /**
     * The analysis of {@code site} with {@code options}, reusing {@code previous} where an edit
     * cannot have changed anything. Any previous state may be passed: when its site differs in more
     * than the air-termination parts, or its options or grid differ, this is a fresh analysis.
     *
     * @throws AnalysisCancelledException when {@code progress} asked to stop
     */
    public static AnalysisState update(AnalysisState previous, Site site, AnalysisOptions options,
            AnalysisProgress progress) {
        return run(site, options, progress, previous);
    }

    /**
     * Refuses an analysis whose grid would not fit before anything is computed (as the analysis
     * itself would at its start), so that a request can be refused before it is queued.
     *
     * @throws org.lpzplanner.engine.envelope.AnalysisTooLargeException with a resolution that fits
     */
    public static void checkSize(Site site, AnalysisOptions options) {
        SiteSurface surface = SiteSurfaceBuilder.build(site);
        double radius = options.sphere().radius();
        double h = options.resolution() != null ? options.resolution() : ResolutionChoice.choose(surface, radius);
        EnvelopeOp.checkSize(surface, radius, h);
    }

    private static AnalysisState run(Site site, AnalysisOptions options, AnalysisProgress progress,
            AnalysisState previous) {
        long start = System.nanoTime();
        Map<String, Long> stages = new LinkedHashMap<>();
        progress.checkCancelled();
        progress.stage(STAGES[0], 0);
        SiteSurface surface = SiteSurfaceBuilder.build(site);
        double radius = options.sphere().radius();
        double h = options.resolution() != null ? options.resolution() : ResolutionChoice.choose(surface, radius);
        AnalysisState base = reusable(previous, site, options, surface, radius, h);
        ChangeWindow window = ChangeWindow.ALL;
        ChangeBound changeBound = null;
        EnvelopeField field;
        if (base == null) {
            field = EnvelopeOp.compute(surface, radius, h);
        } else {
            double[] box = base.changedPartsBox(site);
            if (AnalysisState.isEmpty(box)) {
                window = ChangeWindow.NONE;
                field = base.field;
            } else {
                window = ChangeWindow.around(box, radius, h);
                field = EnvelopeOp.update(base.field, surface, box[0], box[1], box[2], box[3]);
                changeBound = ChangeBound.of(base.field, field, box);
            }
        }
        long envelopeDone = System.nanoTime();
        stages.put("envelope", (envelopeDone - start) / 1_000_000);
        ExposureContext ctx = new ExposureContext(surface, field, options.tolerance());
        ChangeWindow w = window;
        ChangeBound cb = changeBound;

        List<List<EdgeExposure>> edgesByEdge = timed(stages, 1, progress, () -> IntStream.range(0, surface.edges().size())
                .parallel().mapToObj(k -> {
                    RoofEdge e = surface.edges().get(k);
                    double x0 = Math.min(e.p0().x, e.p1().x), y0 = Math.min(e.p0().y, e.p1().y);
                    double x1 = Math.max(e.p0().x, e.p1().x), y1 = Math.max(e.p0().y, e.p1().y);
                    if (base != null && (!w.intersects(x0, y0, x1, y1) || (cb != null && cb.cannotReach(x0, y0, x1, y1,
                            Math.max(e.p0().getZ(), e.p1().getZ()) + ExposureContext.MARGIN)))) {
                        return base.edgesByEdge.get(k);
                    }
                    progress.checkCancelled();
                    return EdgeExposureOp.edge(ctx, e);
                }).toList());
        List<EdgeExposure> edges = edgesByEdge.stream().flatMap(List::stream).toList();
        var edgeCells = EdgeExposureOp.cellsByOwner(ctx, edges);

        List<RoofExposureOp.FaceResult> faces = timed(stages, 2, progress, () -> IntStream
                .range(0, surface.faces().size()).parallel().mapToObj(k -> {
                    String owner = surface.faces().get(k).ownerId();
                    Set<Integer> cells = edgeCells.getOrDefault(owner, Set.of());
                    if (base == null) {
                        progress.checkCancelled();
                        return RoofExposureOp.face(ctx, k, cells, null, null, w, null);
                    }
                    Set<Integer> before = base.exposedEdgeCells.getOrDefault(owner, Set.of());
                    var poly = surface.facePolygon(k);
                    if (!w.intersects(poly.minX() - h, poly.minY() - h, poly.maxX() + h, poly.maxY() + h)
                            && cells.equals(before)) {
                        return new RoofExposureOp.FaceResult(base.faceCells[k], base.roofs[k]);
                    }
                    progress.checkCancelled();
                    return RoofExposureOp.face(ctx, k, cells,
                            new RoofExposureOp.FaceResult(base.faceCells[k], base.roofs[k]), before, w, cb);
                }).toList());
        RoofExposureOp.FaceCells[] faceCells = faces.stream().map(RoofExposureOp.FaceResult::cells)
                .toArray(RoofExposureOp.FaceCells[]::new);
        RoofExposure[] roofArray = faces.stream().map(RoofExposureOp.FaceResult::exposure).toArray(RoofExposure[]::new);

        List<SiteSurface.Corner> cornerList = base != null ? base.corners : EdgeExposureOp.uniqueCorners(surface);
        CornerExposure[] cornerByIndex = timed(stages, 3, progress, () -> IntStream.range(0, cornerList.size())
                .parallel().mapToObj(k -> {
                    SiteSurface.Corner c = cornerList.get(k);
                    double x = c.point().x, y = c.point().y;
                    if (base != null && (!w.intersects(x, y, x, y)
                            || (cb != null && cb.cannotReach(x, y, x, y, c.point().getZ() + ExposureContext.MARGIN)))) {
                        return base.cornerByIndex[k];
                    }
                    progress.checkCancelled();
                    return EdgeExposureOp.corner(ctx, c);
                }).toArray(CornerExposure[]::new));
        List<CornerExposure> corners = new ArrayList<>();
        for (CornerExposure c : cornerByIndex) {
            if (c != null) {
                corners.add(c);
            }
        }

        List<List<FacadeBand>> bandsByWall = timed(stages, 4, progress, () -> IntStream.range(0, surface.walls().size())
                .parallel().mapToObj(k -> {
                    Wall wall = surface.walls().get(k);
                    // a band reads the centre surface R out from the wall
                    double reach = radius + 2 * h;
                    if (base != null && !w.intersects(Math.min(wall.p0().x, wall.p1().x) - reach,
                            Math.min(wall.p0().y, wall.p1().y) - reach, Math.max(wall.p0().x, wall.p1().x) + reach,
                            Math.max(wall.p0().y, wall.p1().y) + reach)) {
                        return base.bandsByWall.get(k);
                    }
                    progress.checkCancelled();
                    return FacadeExposureOp.wall(ctx, wall);
                }).toList());
        List<FacadeBand> facades = bandsByWall.stream().flatMap(List::stream).toList();

        List<PartInterception> parts = timed(stages, 5, progress, () -> PartInterceptionOp.run(ctx));
        ProtectedGroundOp.GroundResult ground = timed(stages, 6, progress,
                () -> ProtectedGroundOp.run(ctx, base != null ? base.ground : null, w));
        long end = System.nanoTime();
        AnalysisResult result = new AnalysisResult(options.sphere(), h, options.tolerance(), List.of(roofArray), edges,
                corners, facades, parts, ground.ground(), field, (envelopeDone - start) / 1_000_000,
                (end - start) / 1_000_000, ctx.refinedQueries(), stages, FreeSpanCheck.warnings(surface, radius),
                SideFlashRule.classify(site, facades));
        return new AnalysisState(site, options, surface, field, result, edgesByEdge, edgeCells, cornerList,
                cornerByIndex, bandsByWall, faceCells, roofArray, ground.cells());
    }

    /**
     * The previous state when its decisions can be taken over: same options, same resolution, same
     * structures and objects (so the same faces, edges, corners and walls in the same order), and a
     * grid that an edited site still needs exactly.
     */
    private static AnalysisState reusable(AnalysisState previous, Site site, AnalysisOptions options,
            SiteSurface surface, double radius, double h) {
        if (previous == null || !previous.options.sphere().equals(options.sphere())
                || previous.options.tolerance() != options.tolerance()
                || previous.result.resolution() != h || previous.changedPartsBox(site) == null
                || previous.surface.edges().size() != surface.edges().size()
                || previous.surface.faces().size() != surface.faces().size()
                || previous.surface.walls().size() != surface.walls().size()) {
            return null;
        }
        Grid needed = EnvelopeOp.gridFor(surface, Supports.of(surface, radius), radius, h);
        return needed.equals(previous.field.grid()) ? previous : null;
    }

    private static <T> T timed(Map<String, Long> stages, int stage, AnalysisProgress progress, Supplier<T> work) {
        double done = 0;
        for (int k = 0; k < stage; k++) {
            done += STAGE_SHARE[k];
        }
        progress.checkCancelled();
        progress.stage(STAGES[stage], done);
        long t = System.nanoTime();
        T out = work.get();
        stages.put(STAGES[stage], (System.nanoTime() - t) / 1_000_000);
        return out;
    }
}
