package org.lpzplanner.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ReportCommandTest {

    @TempDir
    Path dir;

    private static final String LOCAL_BLOCK = """
            {"type": "FeatureCollection", "name": "Test block", "coordinates": "local-metres", "features": [
              {"type": "Feature", "properties": {"kind": "structure", "name": "Block", "height": 10},
               "geometry": {"type": "Polygon", "coordinates": [[[0,0],[20,0],[20,10],[0,10],[0,0]]]}}]}
            """;

    private static String text(Path pdf) throws Exception {
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            return new PDFTextStripper().getText(doc).replaceAll("\\s+", " ");
        }
    }

    @Test
    void writesThePdfWithThePartsOfThePartsFileAdded() throws Exception {
        Path site = TestFiles.write(dir, "block.geojson", LOCAL_BLOCK);
        Path parts = TestFiles.write(dir, "parts.geojson", """
                {"type": "FeatureCollection", "coordinates": "local-metres", "features": [
                  {"type": "Feature", "properties": {"kind": "rod", "name": "Corner rod", "height": 2},
                   "geometry": {"type": "Point", "coordinates": [1, 1]}}]}
                """);
        Path out = dir.resolve("report.pdf");
        CliRun run = CliRun.of("report", "--site", site.toString(), "--level", "II", "--parts", parts.toString(),
                "--out", out.toString());
        assertThat(run.exitCode()).as(run.err()).isZero();
        String text = text(out);
        // IEC 62305-3:2010 Table 2: level II, R = 30 m.
        assertThat(text).contains("Protection level II, R = 30 m").contains("Test block");
        assertThat(text).contains("A1 rod Corner rod 1.00 1.00 2.00 Block 12.00");
        assertThat(text).contains("Unsaved analysis (command line)");
        // the command line has no stored risk inputs: the report says the risk estimate is left out and why
        assertThat(text).contains("Risk estimate (IEC 62305-2) Not included: a report printed on the command line has no"
                + " stored risk inputs");
    }

    @Test
    void addressAndDesignerGivenOnTheCommandLinePrintOnTheCover() throws Exception {
        Path site = TestFiles.write(dir, "block.geojson", LOCAL_BLOCK);
        Path out = dir.resolve("report.pdf");
        CliRun run = CliRun.of("report", "--site", site.toString(), "--level", "II", "--address",
                "12 Larch Street, Pellby", "--designer=Ida Marsh", "--out", out.toString());
        assertThat(run.exitCode()).as(run.err()).isZero();
        assertThat(text(out)).contains("Address 12 Larch Street, Pellby").contains("Designer Ida Marsh")
                .contains("Address and designer as given on the command line.");

        Path blank = dir.resolve("blank.pdf");
        assertThat(CliRun.of("report", "--site", site.toString(), "--level", "II", "--out", blank.toString())
                .exitCode()).isZero();
        assertThat(text(blank)).contains("Address and designer not given: write them on the lines above.");
    }

    @Test
    void aBadAddressIsRefusedBeforeAnyWork() {
        Path site = TestFiles.write(dir, "block.geojson", LOCAL_BLOCK);
        CliRun run = CliRun.of("report", "--site", site.toString(), "--level", "II", "--address", "x".repeat(201),
                "--out", dir.resolve("r.pdf").toString());
        assertThat(run.exitCode()).isEqualTo(CommandLine.INVALID);
        assertThat(run.errLines()).containsExactly("error: --address must be at most 200 characters, got 201");
        CliRun tab = CliRun.of("report", "--site", site.toString(), "--level", "II", "--designer", "Ida\tMarsh",
                "--out", dir.resolve("r.pdf").toString());
        assertThat(tab.exitCode()).isEqualTo(CommandLine.INVALID);
        assertThat(tab.err()).startsWith("error: --designer must be one line of text");
        assertThat(Files.exists(dir.resolve("r.pdf"))).isFalse();
    }

    @Test
    void aPartsFileWithAStructureIsRefusedInOneLine() {
        Path site = TestFiles.write(dir, "block.geojson", LOCAL_BLOCK);
        Path parts = TestFiles.write(dir, "parts.geojson", LOCAL_BLOCK);
        CliRun run = CliRun.of("report", "--site", site.toString(), "--level", "II", "--parts", parts.toString(),
                "--out", dir.resolve("r.pdf").toString());
        assertThat(run.exitCode()).isEqualTo(CommandLine.INVALID);
        assertThat(run.errLines()).containsExactly("error: parts.geojson: feature 0, field \"kind\": must be \"rod\""
                + " or \"conductor\" in a parts file, got \"structure\"");
        assertThat(Files.exists(dir.resolve("r.pdf"))).isFalse();
    }

    @Test
    void aBadPartIsReportedAgainstThePartsFile() {
        Path site = TestFiles.write(dir, "block.geojson", LOCAL_BLOCK);
        Path parts = TestFiles.write(dir, "parts.geojson", """
                {"type": "FeatureCollection", "coordinates": "local-metres", "features": [
                  {"type": "Feature", "properties": {"kind": "rod", "name": "Bad", "height": -1},
                   "geometry": {"type": "Point", "coordinates": [1, 1]}}]}
                """);
        CliRun run = CliRun.of("report", "--site", site.toString(), "--level", "II", "--parts", parts.toString(),
                "--out", dir.resolve("r.pdf").toString());
        assertThat(run.exitCode()).isEqualTo(CommandLine.INVALID);
        assertThat(run.errLines()).hasSize(1);
        assertThat(run.err()).startsWith("error: parts.geojson: feature 0 (\"Bad\"), field \"height\"");
    }

    @Test
    void theOutputFileIsRequired() {
        Path site = TestFiles.write(dir, "block.geojson", LOCAL_BLOCK);
        CliRun run = CliRun.of("report", "--site", site.toString(), "--level", "II");
        assertThat(run.exitCode()).isEqualTo(CommandLine.INVALID);
        assertThat(run.errLines()).containsExactly("error: report needs --out FILE; see --help");
    }
}
