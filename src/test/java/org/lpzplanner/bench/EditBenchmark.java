package org.lpzplanner.bench;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import org.lpzplanner.analysis.PlanSvg;
import org.lpzplanner.analysis.ResultGeoJson;
import org.lpzplanner.engine.exposure.AnalysisOptions;
import org.lpzplanner.engine.exposure.AnalysisProgress;
import org.lpzplanner.engine.exposure.AnalysisState;
import org.lpzplanner.engine.exposure.ExposureAnalysis;
import org.lpzplanner.engine.io.SiteReader;
import org.lpzplanner.engine.model.ProtectionLevel;
import org.lpzplanner.engine.model.Rod;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.SphereSpec;

/**
 * Speed of the analysis after an edit on the campus sample, levels I to IV, at the resolution the
 * app chooses: moving a rod 2 m, adding a rod and removing it again, each analysed afresh and as an
 * update of the analysis before. Also times writing the result GeoJSON and the plan drawing, which
 * the app does after every edit. Prints a Markdown table (medians of 9 after 3 warm-ups). Run with
 * {@code scripts/benchmark edits}; not a test.
 */
public final class EditBenchmark {

    private static final int WARMUPS = 3;
    private static final int RUNS = 9;

    private EditBenchmark() {
    }

    public static void main(String[] args) {
        Site campus = SiteReader.read(Path.of("sample-sites/brookfield-campus.geojson")).site();
        StringBuilder out = new StringBuilder();
        out.append(String.format(Locale.ROOT, "Machine: %d cores, max heap %d MiB, Java %s%n%n",
                Runtime.getRuntime().availableProcessors(), Runtime.getRuntime().maxMemory() >> 20,
                System.getProperty("java.version")));
        out.append("| level | edit | fresh analysis ms | update ms | result GeoJSON + plan drawing ms |\n");
        out.append("|---|---|---|---|---|\n");
        for (ProtectionLevel level : ProtectionLevel.values()) {
            AnalysisOptions options = AnalysisOptions.of(SphereSpec.of(level));
            measure(out, level, "move a rod 2 m", options, campus, moved(campus, 2), moved(campus, -2));
            Site added = withRod(campus);
            measure(out, level, "add a rod, then remove it", options, campus, added, campus);
        }
        System.out.print(out);
    }

    /** Alternates between two sites, analysing each as an update of the other and afresh. */
    private static void measure(StringBuilder out, ProtectionLevel level, String edit, AnalysisOptions options,
            Site start, Site a, Site b) {
        AnalysisState state = ExposureAnalysis.analyzeKeepingState(start, options, AnalysisProgress.NONE);
        long[] fresh = new long[RUNS], update = new long[RUNS], drawing = new long[RUNS];
        for (int k = 0; k < WARMUPS + RUNS; k++) {
            Site next = k % 2 == 0 ? a : b;
            long t0 = System.nanoTime();
            state = ExposureAnalysis.update(state, next, options, AnalysisProgress.NONE);
            long t1 = System.nanoTime();
            ExposureAnalysis.analyze(next, options);
            long t2 = System.nanoTime();
            String geoJson = ResultGeoJson.write(next, state.result());
            PlanSvg.render(geoJson, (key, args) -> key);
            long t3 = System.nanoTime();
            if (k >= WARMUPS) {
                update[k - WARMUPS] = (t1 - t0) / 1_000_000;
                fresh[k - WARMUPS] = (t2 - t1) / 1_000_000;
                drawing[k - WARMUPS] = (t3 - t2) / 1_000_000;
            }
        }
        out.append(String.format(Locale.ROOT, "| %s | %s | %d | %d | %d |%n", level, edit, median(fresh),
                median(update), median(drawing)));
    }

    private static Site moved(Site site, double dx) {
        List<Rod> rods = new ArrayList<>(site.rods());
        Rod r = rods.get(0);
        rods.set(0, new Rod(r.id(), r.name(), r.x() + dx, r.y(), r.height()));
        return site.withAirTermination(rods, site.conductors());
    }

    private static Site withRod(Site site) {
        List<Rod> rods = new ArrayList<>(site.rods());
        Rod r = rods.get(0);
        rods.add(new Rod("bench", "Bench rod", r.x() + 6, r.y() + 4, 2));
        return site.withAirTermination(rods, site.conductors());
    }

    private static long median(long[] values) {
        long[] sorted = values.clone();
        Arrays.sort(sorted);
        return sorted[sorted.length / 2];
    }
}
