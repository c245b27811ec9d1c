package org.lpzplanner.bench;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import org.lpzplanner.analysis.AnalysisService;
import org.lpzplanner.analysis.ResultGeoJson;
import org.lpzplanner.engine.exposure.AnalysisOptions;
import org.lpzplanner.engine.exposure.AnalysisResult;
import org.lpzplanner.engine.exposure.ExposureAnalysis;
import org.lpzplanner.engine.io.SiteDocument;
import org.lpzplanner.engine.model.ProtectionLevel;
import org.lpzplanner.engine.model.SphereSpec;
import org.lpzplanner.report.PdfReportRenderer;
import org.lpzplanner.report.ReportAssembler;
import org.lpzplanner.report.ReportContent;
import org.lpzplanner.report.ReportSource;
import org.lpzplanner.sites.SiteFiles;

/**
 * Times printing the campus sample from a stored revision (what the web application does: read the
 * stored file, compute the envelope for the sections, assemble, lay out and save the PDF), at
 * levels I and IV: median of 5 runs after 2 warm-up runs. Run from the IDE or with
 * {@code scripts/benchmark}-style exec of the test classpath; prints a Markdown table.
 */
public final class ReportBenchmark {

    private ReportBenchmark() {
    }

    public static void main(String[] args) throws Exception {
        String text = Files.readString(Path.of("sample-sites/brookfield-campus.geojson"));
        var os = (com.sun.management.OperatingSystemMXBean) java.lang.management.ManagementFactory
                .getOperatingSystemMXBean();
        System.out.printf("load average at start: %.1f on %d cores%n", os.getSystemLoadAverage(),
                os.getAvailableProcessors());
        System.out.println("| site | level | pages | assemble ms | render ms | total ms (median of 5) | CPU ms (all threads) | goal |");
        System.out.println("|---|---|---|---|---|---|---|---|");
        for (ProtectionLevel level : List.of(ProtectionLevel.I, ProtectionLevel.IV)) {
            SiteDocument doc = SiteFiles.read(text, "brookfield-campus.geojson");
            AnalysisResult result = ExposureAnalysis.analyze(doc.site(),
                    new AnalysisOptions(SphereSpec.of(level), null, AnalysisOptions.DEFAULT_TOLERANCE));
            ReportSource source = new ReportSource(doc.site().name(), "brookfield-campus.geojson", text,
                    SphereSpec.of(level), result.resolution(), result.tolerance(), 1, Instant.now(),
                    AnalysisService.sha256(text), ResultGeoJson.write(doc.site(), result), Map.of(), List.of());
            long[] assemble = new long[5], render = new long[5], cpu = new long[5];
            int pages = 0;
            for (int run = -2; run < 5; run++) {
                long c0 = os.getProcessCpuTime();
                long t0 = System.nanoTime();
                ReportContent content = ReportAssembler.assemble(source);
                long t1 = System.nanoTime();
                byte[] pdf = PdfReportRenderer.render(content);
                long t2 = System.nanoTime();
                if (run >= 0) {
                    assemble[run] = (t1 - t0) / 1_000_000;
                    render[run] = (t2 - t1) / 1_000_000;
                    cpu[run] = (os.getProcessCpuTime() - c0) / 1_000_000;
                }
                try (var d = org.apache.pdfbox.Loader.loadPDF(pdf)) {
                    pages = d.getNumberOfPages();
                }
            }
            long[] total = new long[5];
            for (int i = 0; i < 5; i++) {
                total[i] = assemble[i] + render[i];
            }
            long median = median(total);
            System.out.printf("| campus sample | %s | %d | %d | %d | %d | %d | ≤ 3,000 ms: %s |%n", level, pages,
                    median(assemble), median(render), median, median(cpu), median <= 3000 ? "met" : "NOT met");
            System.out.printf("load average now: %.1f%n", os.getSystemLoadAverage());
        }
    }

    private static long median(long[] values) {
        long[] sorted = values.clone();
        Arrays.sort(sorted);
        return sorted[sorted.length / 2];
    }
}
