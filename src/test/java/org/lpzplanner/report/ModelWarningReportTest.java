package org.lpzplanner.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import javax.imageio.ImageIO;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.rendering.PDFRenderer;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.lpzplanner.analysis.ReviewItems;
import org.lpzplanner.engine.model.ProtectionLevel;

/**
 * The printed report of a hut under a wire strung at 45 m between two 45 m masts, at level I
 * (R = 20 m, IEC 62305-3:2010 Table 2): the wire runs more than R above what lies beneath it, where
 * a sphere can pass under it (IEC 62305-3:2010 Annex A). Page 1 and a schedule carry the warning;
 * no page says that no exposed items remain while it stands, accepted or not.
 */
class ModelWarningReportTest {

    private static final Path WIRE_ABOVE_HUT = Path.of("src/test/resources/sites/wire-above-hut.geojson");
    private static final String NONE_REMAIN = "No exposed items remain";

    private static ReportSource open;
    private static List<String> openPages;
    private static String warningKey;

    @BeforeAll
    static void print() throws Exception {
        open = ReportPdfTest.source(Files.readString(WIRE_ABOVE_HUT), "wire-above-hut.geojson", ProtectionLevel.I,
                Map.of());
        byte[] pdf = PdfReportRenderer.render(ReportAssembler.assemble(open));
        openPages = ReportPdfTest.pages(pdf);
        warningKey = ReviewItems.of(open.resultGeoJson()).stream().filter(ReviewItems.Item::isModelWarning)
                .findFirst().orElseThrow().key();
        Path dir = Path.of("target/report-pages");
        Files.createDirectories(dir);
        try (PDDocument doc = Loader.loadPDF(pdf)) {
            PDFRenderer renderer = new PDFRenderer(doc);
            for (int i = 0; i < Math.min(5, doc.getNumberOfPages()); i++) {
                BufferedImage image = renderer.renderImageWithDPI(i, 110);
                ImageIO.write(image, "png", dir.resolve("model-warning-" + (i + 1) + ".png").toFile());
            }
        }
    }

    private static String flat(String text) {
        return text.replaceAll("\\s+", " ");
    }

    @Test
    void pageOneStatusAndFindingsNameTheWarningAndGiveNoVerdictOfProtection() {
        String first = flat(openPages.get(0));
        assertThat(first).contains("No verdict of full protection: 1 model warning stands (Span wire;")
                .doesNotContain(NONE_REMAIN);
        assertThat(first).contains("Model warnings 1: Span wire, up to");
    }

    @Test
    void aScheduleListsEachWarningWithThePartItsHeightAboveTheSurfaceAndTheText() {
        String all = flat(String.join(" ", openPages));
        assertThat(all).contains("Schedule of model warnings");
        int at = all.indexOf("Schedule of model warnings");
        String schedule = all.substring(at, Math.min(all.length(), at + 1500));
        // the part, its greatest height above the surface beneath it (more than R = 20 m), the radius
        assertThat(schedule).containsPattern("Span wire \\(wire\\) .*free span .*\\d+\\.\\d\\d .*20\\.00");
        assertThat(schedule).contains("Protect what lies beneath by other air-termination, or lower the conductor.");
        assertThat(schedule).contains("not yet accepted");
    }

    @Test
    void anAcceptedWarningPrintsItsReasonAndStillGivesNoVerdictOfProtection() throws Exception {
        ReportSource accepted = new ReportSource(open.siteName(), open.sourceName(), open.sourceText(), open.sphere(),
                open.resolution(), open.tolerance(), open.revision(), open.analysedAt(), open.inputsSha256(),
                open.resultGeoJson(), Map.of(warningKey, "ground beneath the span is fenced off"), List.of());
        List<String> pages = ReportPdfTest.pages(PdfReportRenderer.render(ReportAssembler.assemble(accepted)));
        String first = flat(pages.get(0));
        assertThat(first).contains("No verdict of full protection").doesNotContain(NONE_REMAIN);
        String all = flat(String.join(" ", pages));
        assertThat(all).contains("accepted: ground beneath the span is fenced off");
        assertThat(all).doesNotContain(NONE_REMAIN);
    }
}
