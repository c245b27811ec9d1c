package org.lpzplanner.cli;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.Set;
import org.lpzplanner.analysis.ResultGeoJson;
import org.lpzplanner.engine.exposure.AnalysisResult;
import org.lpzplanner.engine.exposure.ExposureAnalysis;
import org.lpzplanner.engine.io.Json;
import org.lpzplanner.engine.io.SiteDocument;

/**
 * {@code analyze}: runs the rolling sphere analysis of a site, prints the summary and, with
 * {@code --out}, writes the results as GeoJSON (see {@link ResultGeoJson}).
 */
final class AnalyzeCommand implements Command {

    static final String OUT = "--out";


    @Override
    public String name() {
        return "analyze";
    }

    @Override
    public Set<String> optionNames() {
        Set<String> names = new HashSet<>(AssessmentSettings.OPTION_NAMES);
        names.add(OUT);
        return names;
    }

    @Override
    public void run(CliOptions options, PrintStream out) {
        AssessmentSettings settings = AssessmentSettings.from(options);
        Path outFile = options.outputFile(OUT);
        SiteDocument document = settings.readSite();
        AnalysisResult result = ExposureAnalysis.analyze(document.site(), settings.analysisOptions());
        new SummaryPrinter(out).print(document, result);
        if (outFile != null) {
            write(outFile, Json.MAPPER.writerWithDefaultPrettyPrinter()
                    .writeValueAsString(ResultGeoJson.published(ResultGeoJson.write(document, result))));
            out.println();
            out.println("Results written to " + outFile);
        }
    }

    private static void write(Path file, String text) {
        try {
            Files.writeString(file, text + System.lineSeparator(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new CliException(OUT + ": cannot write " + file + ": " + e.getMessage(), e);
        }
    }
}
