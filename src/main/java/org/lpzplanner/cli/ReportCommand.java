package org.lpzplanner.cli;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.lpzplanner.analysis.AnalysisService;
import org.lpzplanner.analysis.ResultGeoJson;
import org.lpzplanner.engine.exposure.AnalysisResult;
import org.lpzplanner.engine.exposure.ExposureAnalysis;
import org.lpzplanner.engine.io.SiteDocument;
import org.lpzplanner.engine.io.SiteFormatException;
import org.lpzplanner.report.PdfReportRenderer;
import org.lpzplanner.report.ReportAssembler;
import org.lpzplanner.report.ReportSource;
import org.lpzplanner.report.StoredDesign;
import org.lpzplanner.common.ReportSection;
import org.lpzplanner.sites.CoverDetails;
import org.lpzplanner.sites.SiteFiles;
import org.lpzplanner.system.InvalidInputException;

/**
 * {@code report}: analyses a site (with the parts of {@code --parts} added) and writes the printed
 * assessment as PDF, the same report the web application prints for a stored revision.
 */
final class ReportCommand implements Command {

    static final String OUT = "--out";
    static final String PARTS = "--parts";
    static final String ADDRESS = "--address";
    static final String DESIGNER = "--designer";

    /**
     * The risk estimate needs the site's stored risk inputs (flash density, use, occupancy, lines);
     * printing it with default inputs would state a risk nobody assessed, so the command line leaves
     * it out and says so.
     */
    static final ReportSection RISK_LEFT_OUT = new ReportSection("Risk estimate (IEC 62305-2)", List.of(), List.of(),
            List.of("Not included: a report printed on the command line has no stored risk inputs (ground flash"
                    + " density, location, use, occupancy, service lines), and an estimate from default inputs"
                    + " would state a risk nobody assessed. Enter the inputs on the site's risk page in the web app"
                    + " and print the report there to include the risk estimate."));

    @Override
    public String name() {
        return "report";
    }

    @Override
    public Set<String> optionNames() {
        Set<String> names = new HashSet<>(AssessmentSettings.OPTION_NAMES);
        names.add(OUT);
        names.add(PARTS);
        names.add(ADDRESS);
        names.add(DESIGNER);
        return names;
    }

    @Override
    public void run(CliOptions options, PrintStream out) {
        AssessmentSettings settings = AssessmentSettings.from(options);
        options.required(OUT, "FILE");
        ReportSource.Cover cover = new ReportSource.Cover(coverText(options, ADDRESS), coverText(options, DESIGNER),
                null);
        Path outFile = options.outputFile(OUT);
        String siteName = settings.site().getFileName().toString();
        String text = read(settings.site(), AssessmentSettings.SITE);
        SiteDocument document;
        if (options.has(PARTS)) {
            Path parts = options.inputFile(PARTS, "FILE");
            String partsName = parts.getFileName().toString();
            text = PartsFile.merge(text, siteName, read(parts, PARTS), partsName);
            document = PartsFile.read(text, siteName, PartsFile.featureCount(text)
                    - PartsFile.featureCount(read(parts, PARTS)), partsName);
        } else {
            try {
                document = SiteFiles.read(text, siteName);
            } catch (SiteFormatException e) {
                throw new CliException(e.getMessage(), e);
            }
        }
        AnalysisResult result = ExposureAnalysis.analyze(document.site(), settings.analysisOptions());
        ReportSource source = new ReportSource(document.site().name(), siteName, text, settings.sphere(),
                result.resolution(), result.tolerance(), 0, Instant.now().truncatedTo(ChronoUnit.SECONDS),
                AnalysisService.sha256(text), ResultGeoJson.write(document, result), Map.of(), List.of(), cover);
        byte[] pdf = PdfReportRenderer.render(ReportAssembler.assemble(source, result.envelope(), StoredDesign.NONE,
                List.of(RISK_LEFT_OUT)));
        try {
            Files.write(outFile, pdf);
        } catch (IOException e) {
            throw new CliException(OUT + ": cannot write " + outFile + ": " + e.getMessage(), e);
        }
        out.println("Report written to " + outFile + " (" + pdf.length / 1024 + " KiB)");
    }

    /** An optional cover detail, checked as the web app checks it; empty when not given. */
    private static String coverText(CliOptions options, String option) {
        try {
            String value = CoverDetails.check(option, options.value(option));
            return value == null ? "" : value;
        } catch (InvalidInputException e) {
            throw new CliException(e.getMessage(), e);
        }
    }

    private static String read(Path file, String option) {
        try {
            String text = Files.readString(file, StandardCharsets.UTF_8);
            return text.startsWith("\uFEFF") ? text.substring(1) : text;
        } catch (CharacterCodingException e) {
            throw new CliException(option + ": " + file.getFileName() + " is not UTF-8 text; save it as UTF-8", e);
        } catch (IOException e) {
            throw new CliException(option + ": cannot read " + file + ": " + e.getMessage(), e);
        }
    }
}
