package org.lpzplanner.bench;

import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import org.lpzplanner.engine.envelope.CentreSurface;
import org.lpzplanner.engine.envelope.EnvelopeOp;
import org.lpzplanner.engine.geom.SiteSurface;
import org.lpzplanner.engine.geom.SiteSurfaceBuilder;
import org.lpzplanner.engine.model.Rod;
import org.lpzplanner.engine.envelope.EnvelopeField;
import org.lpzplanner.engine.envelope.Grid;
import org.lpzplanner.engine.exposure.AnalysisOptions;
import org.lpzplanner.engine.exposure.AnalysisResult;
import org.lpzplanner.engine.exposure.ExposureAnalysis;
import org.lpzplanner.engine.io.SiteReader;
import org.lpzplanner.engine.model.ProtectionLevel;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.SphereSpec;

/**
 * Speed of the engine on the campus sample and a generated 200-building district, levels I and IV,
 * at 0.5 m. Prints a Markdown report. Run with {@code scripts/benchmark} (argument {@code campus}: the
 * campus only); not a test.
 */
public final class EngineBenchmark {

    private static final int WARMUPS = 2;
    private static final int RUNS = 3;

    private EngineBenchmark() {
    }

    public static void main(String[] args) {
        Site campus = SiteReader.read(Path.of("sample-sites/brookfield-campus.geojson")).site();
        Site district = DistrictGenerator.district(200, 600, 7);
        boolean campusOnly = args.length > 0 && args[0].equals("campus");
        StringBuilder out = new StringBuilder();
        out.append(String.format(Locale.ROOT, "Machine: %d cores, max heap %d MiB, Java %s%n%n",
                Runtime.getRuntime().availableProcessors(), Runtime.getRuntime().maxMemory() >> 20,
                System.getProperty("java.version")));
        out.append("| site | level | grid cells | envelope ms | total ms (median of 3) | refined decisions | peak heap MiB |\n");
        out.append("|---|---|---|---|---|---|---|\n");
        List<AnalysisResult> campusResults = new ArrayList<>();
        Object[][] cases = campusOnly ? new Object[][] {{"campus sample", campus}}
                : new Object[][] {{"campus sample", campus}, {"district, 200 buildings", district}};
        for (Object[] c : cases) {
            for (ProtectionLevel level : new ProtectionLevel[] {ProtectionLevel.I, ProtectionLevel.IV}) {
                AnalysisResult r = measure(out, (String) c[0], (Site) c[1], level);
                if (c[1] == campus) {
                    campusResults.add(r);
                }
            }
        }
        out.append('\n');
        for (AnalysisResult r : campusResults) {
            queries(out, r);
        }
        naiveRatio(out, campusResults.get(campusResults.size() - 1));
        for (ProtectionLevel level : ProtectionLevel.values()) {
            moveOneRod(out, campus, level);
        }
        System.out.print(out);
    }

    private static AnalysisResult measure(StringBuilder out, String name, Site site, ProtectionLevel level) {
        AnalysisOptions opts = new AnalysisOptions(SphereSpec.of(level), 0.5, AnalysisOptions.DEFAULT_TOLERANCE);
        for (int i = 0; i < WARMUPS; i++) {
            ExposureAnalysis.analyze(site, opts);
        }
        long[] totals = new long[RUNS];
        long[] envelopes = new long[RUNS];
        AnalysisResult last = null;
        System.gc();
        resetPeaks();
        for (int i = 0; i < RUNS; i++) {
            last = ExposureAnalysis.analyze(site, opts);
            totals[i] = last.totalMillis();
            envelopes[i] = last.envelopeMillis();
        }
        Arrays.sort(totals);
        Arrays.sort(envelopes);
        Grid g = last.envelope().grid();
        out.append(String.format(Locale.ROOT, "| %s | %s | %,d | %d | %d | %,d | %d |%n", name, level,
                (long) g.nx() * g.ny(), envelopes[RUNS / 2], totals[RUNS / 2], last.refinedQueries(), peakHeapMiB()));
        System.err.println(name + " " + level + " stages " + last.stageMillis());
        return last;
    }

    private static void queries(StringBuilder out, AnalysisResult r) {
        EnvelopeField f = r.envelope();
        Grid g = f.grid();
        Random rnd = new Random(3);
        double[][] pts = new double[1000][2];
        for (double[] p : pts) {
            p[0] = g.x0() + rnd.nextDouble() * (g.x1() - g.x0());
            p[1] = g.y0() + rnd.nextDouble() * (g.y1() - g.y0());
        }
        for (int warm = 0; warm < 2; warm++) {
            for (double[] p : pts) {
                f.heightAt(p[0], p[1], 0.001);
            }
        }
        long t = System.nanoTime();
        for (double[] p : pts) {
            f.heightAt(p[0], p[1], 0.001);
        }
        out.append(String.format(Locale.ROOT, "Envelope query, campus, level %s: 1,000 random points in %d ms "
                + "(exact at each point, tolerance 1 mm).%n%n", r.sphere().level(), (System.nanoTime() - t) / 1_000_000));
    }

    /**
     * The naive method: brute-force erosion of the same cell bounds by the ball, every centre
     * within R for every vertex, O(cells · (R/h)²). Timed on a band of rows and scaled to the grid.
     */
    private static void naiveRatio(StringBuilder out, AnalysisResult r) {
        CentreSurface cs = r.envelope().centres();
        Grid g = cs.grid();
        double h = g.h(), radius = cs.radius();
        int reach = (int) Math.floor(radius / h);
        int rows = 6;
        int j0 = g.ny() / 2;
        long t = System.nanoTime();
        double sink = 0;
        for (int j = j0; j < j0 + rows; j++) {
            for (int i = 0; i < g.nx(); i++) {
                double best = Double.POSITIVE_INFINITY;
                for (int dj = -reach; dj <= reach; dj++) {
                    int sj = j + dj;
                    if (sj < 0 || sj >= g.ny()) {
                        continue;
                    }
                    for (int di = -reach; di <= reach; di++) {
                        int si = i + di;
                        double d2 = (di * di + dj * dj) * h * h;
                        if (si < 0 || si >= g.nx() || d2 > radius * radius) {
                            continue;
                        }
                        best = Math.min(best, cs.cellLower(si, sj) - Math.sqrt(radius * radius - d2));
                    }
                }
                sink += best;
            }
        }
        double naiveMs = (System.nanoTime() - t) / 1e6 * g.ny() / rows;
        out.append(String.format(Locale.ROOT, "Naive brute-force erosion, campus, level %s: %.0f ms estimated "
                + "(%d of %d rows timed, scaled); the engine's whole envelope stage: %d ms; ratio %.0f× (check %.1f).%n",
                r.sphere().level(), naiveMs, rows, g.ny(), r.envelopeMillis(), naiveMs / Math.max(1, r.envelopeMillis()),
                sink / rows / g.nx()));
    }

    /** Envelope update after moving one rod 2 m, against a fresh computation (median of 5). */
    private static void moveOneRod(StringBuilder out, Site campus, ProtectionLevel level) {
        double radius = level.sphereRadius();
        SiteSurface before = SiteSurfaceBuilder.build(campus);
        EnvelopeField field = EnvelopeOp.compute(before, radius, 0.5);
        Rod rod = campus.rods().get(0);
        long[] updates = new long[5];
        long[] fresh = new long[5];
        for (int k = 0; k < 7; k++) {
            Rod moved = new Rod(rod.id(), rod.name(), rod.x() + (k % 2 == 0 ? 2 : -2), rod.y(), rod.height());
            List<Rod> rods = new ArrayList<>(campus.rods());
            rods.set(0, moved);
            long t0 = System.nanoTime();
            SiteSurface after = SiteSurfaceBuilder.build(campus.withAirTermination(rods, campus.conductors()));
            EnvelopeOp.update(field, after, Math.min(rod.x(), moved.x()), rod.y(), Math.max(rod.x(), moved.x()), rod.y());
            long t1 = System.nanoTime();
            EnvelopeOp.compute(after, radius, 0.5);
            long t2 = System.nanoTime();
            if (k >= 2) {
                updates[k - 2] = (t1 - t0) / 1_000_000;
                fresh[k - 2] = (t2 - t1) / 1_000_000;
            }
        }
        Arrays.sort(updates);
        Arrays.sort(fresh);
        out.append(String.format(Locale.ROOT, "Envelope update after moving one rod, campus, level %s: %d ms "
                + "(fresh envelope: %d ms).%n", level, updates[2], fresh[2]));
    }

    private static void resetPeaks() {
        for (MemoryPoolMXBean p : ManagementFactory.getMemoryPoolMXBeans()) {
            p.resetPeakUsage();
        }
    }

    private static long peakHeapMiB() {
        long sum = 0;
        for (MemoryPoolMXBean p : ManagementFactory.getMemoryPoolMXBeans()) {
            if (p.getType() == MemoryType.HEAP) {
                sum += p.getPeakUsage().getUsed();
            }
        }
        return sum >> 20;
    }
}
