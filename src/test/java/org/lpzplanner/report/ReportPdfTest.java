package org.lpzplanner.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import javax.imageio.ImageIO;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.rendering.PDFRenderer;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.lpzplanner.analysis.AnalysisService;
import org.lpzplanner.analysis.ResultGeoJson;
import org.lpzplanner.analysis.ReviewItems;
import org.lpzplanner.common.Cautions;
import org.lpzplanner.engine.design.Building;
import org.lpzplanner.engine.design.DownConductorPlan;
import org.lpzplanner.engine.exposure.AnalysisOptions;
import org.lpzplanner.engine.exposure.AnalysisResult;
import org.lpzplanner.engine.exposure.ExposureAnalysis;
import org.lpzplanner.engine.io.SiteDocument;
import org.lpzplanner.engine.model.ProtectionLevel;
import org.lpzplanner.engine.model.SphereSpec;
import org.lpzplanner.engine.model.Structure;
import org.lpzplanner.sites.SiteFiles;

/**
 * Reads generated reports back with PDFBox's text extraction and checks them against the analysis
 * they print, and renders pages to prove they draw.
 */
class ReportPdfTest {

    private static final Path CAMPUS = Path.of("sample-sites/brookfield-campus.geojson");
    private static String campusText;
    private static ReportSource campus;
    private static byte[] campusPdf;

    @BeforeAll
    static void printCampus() throws Exception {
        campusText = Files.readString(CAMPUS);
        campus = source(campusText, "brookfield-campus.geojson", ProtectionLevel.II, Map.of());
        campusPdf = PdfReportRenderer.render(ReportAssembler.assemble(campus));
    }

    static ReportSource source(String text, String name, ProtectionLevel level, Map<String, String> accepted) {
        SiteDocument doc = SiteFiles.read(text, name);
        AnalysisResult result = ExposureAnalysis.analyze(doc.site(),
                new AnalysisOptions(SphereSpec.of(level), null, AnalysisOptions.DEFAULT_TOLERANCE));
        return new ReportSource(doc.site().name(), name, text, SphereSpec.of(level), result.resolution(),
                result.tolerance(), 3, Instant.parse("2026-11-30T10:15:00Z"), AnalysisService.sha256(text),
                ResultGeoJson.write(doc.site(), result), accepted, List.of());
    }

    static List<String> pages(byte[] pdf) throws Exception {
        try (PDDocument doc = Loader.loadPDF(pdf)) {
            List<String> out = new ArrayList<>();
            PDFTextStripper stripper = new PDFTextStripper();
            for (int i = 1; i <= doc.getNumberOfPages(); i++) {
                stripper.setStartPage(i);
                stripper.setEndPage(i);
                out.add(stripper.getText(doc));
            }
            return out;
        }
    }

    private static String flat(String text) {
        return text.replaceAll("\\s+", " ");
    }

    @Test
    void everyPageCarriesTheCautionsAndItsNumberOfTheTotal() throws Exception {
        List<String> pages = pages(campusPdf);
        assertThat(pages.size()).isGreaterThan(5);
        for (int i = 0; i < pages.size(); i++) {
            String page = flat(pages.get(i));
            assertThat(page).contains("Page " + (i + 1) + " of " + pages.size());
            for (String caution : Cautions.lines()) {
                assertThat(page).as("page %d", i + 1).contains(flat(caution));
            }
        }
        // The first page also has the boxed cautions: each caution twice.
        assertThat(flat(pages.get(0)).split("licensed lightning-protection designer must review", -1)).hasSize(3);
    }

    @Test
    void coverAndMethodStateLevelRadiusRevisionAndChecksum() throws Exception {
        String all = flat(String.join(" ", pages(campusPdf)));
        // IEC 62305-3:2010 Table 2: level II rolls a 30 m sphere.
        assertThat(all).contains("Protection level II, R = 30 m");
        assertThat(all).contains("Revision 3").contains("2026-11-30 10:15 UTC");
        assertThat(all).contains(AnalysisService.sha256(campusText));
        assertThat(all).contains("Brookfield Campus").contains("IEC 62305-3:2010");
        // Table 4: typical down-conductor spacing 10 m at level II; Table 10: ki = 0.06.
        assertThat(all).contains("Typical down-conductor spacing 10.00 m").contains("ki 0.06");
        assertThat(all).contains("Scale 1:").contains("Licensed reviewer").contains("Licence number");
    }

    @Test
    void schedulesMatchTheAnalysis() throws Exception {
        String all = flat(String.join(" ", pages(campusPdf)));
        List<ReviewItems.Item> items = ReviewItems.of(campus.resultGeoJson());
        assertThat(items).isNotEmpty();
        assertThat(all).contains("Before review: " + items.size() + " exposed items. Accepted by the designer: 0."
                + " Remaining: " + items.size() + ".");
        assertThat(all).contains("E" + items.size() + " ");
        var site = SiteFiles.read(campusText, "brookfield-campus.geojson").site();
        int parts = site.rods().size() + site.conductors().size();
        assertThat(all).contains("A" + parts + " ");
        for (String type : List.of(" rod", " mast", " conductor")) {
            assertThat(all).doesNotContain("A" + (parts + 1) + type);
        }
        // per building: structures whose footprints overlap or touch (the Rowan Wing's two arms) are planned
        // on the outline of the whole, IEC 62305-3:2010 5.3 and Table 4 (10 m at level II)
        int downConductors = 0;
        for (Building b : Building.of(site)) {
            downConductors += DownConductorPlan.plan(b, ProtectionLevel.II.downConductorSpacing(), List.of()).count();
        }
        for (Structure s : site.structures()) {
            assertThat(all).contains(s.name());
        }
        assertThat(all).contains("D" + downConductors + " ");
        // the bill of quantities counts one test joint and one earth termination per down-conductor
        // (common practice) and each air-termination part
        assertThat(all).contains("Bill of quantities").contains("Test joint pcs " + downConductors + " ")
                .contains("Earth termination pcs " + downConductors + " ");
        // Separation distances: l along the route to a down-conductor and down it, the route stated;
        // a row fails when the distance is below s (IEC 62305-3:2010 6.3); at or above it, it passes
        // along a drawn route and is "not confirmed" where the route assumes a straight link (l, s lower bounds)
        assertThat(all).contains("Schedule of separation distances").contains("Route of l").contains(" m down it ");
        var verdicts = java.util.regex.Pattern.compile("m down it (\\d+\\.\\d+) (\\d+\\.\\d+) (passes|fails|not confirmed)").matcher(all);
        int rows = 0;
        while (verdicts.find()) {
            rows++;
            boolean clear = Double.parseDouble(verdicts.group(2)) >= Double.parseDouble(verdicts.group(1));
            if (clear) {
                assertThat(verdicts.group(3)).isIn("passes", "not confirmed");
            } else {
                assertThat(verdicts.group(3)).isEqualTo("fails");
            }
        }
        assertThat(rows).as("separation rows of the campus's rooftop objects").isEqualTo(site.rooftopObjects().size());
        assertThat(all).contains("Section through");
    }

    @Test
    void acceptedItemsPrintWithTheirReasonAndLowerTheRemainingCount() throws Exception {
        List<ReviewItems.Item> items = ReviewItems.of(campus.resultGeoJson());
        ReportSource reviewed = new ReportSource(campus.siteName(), campus.sourceName(), campus.sourceText(),
                campus.sphere(), campus.resolution(), campus.tolerance(), campus.revision(), campus.analysedAt(),
                campus.inputsSha256(), campus.resultGeoJson(), Map.of(items.get(0).key(), "covered by a steel gutter"),
                List.of());
        String all = flat(String.join(" ", pages(PdfReportRenderer.render(ReportAssembler.assemble(reviewed)))));
        assertThat(all).contains("accepted: covered by a steel gutter");
        assertThat(all).contains("Accepted by the designer: 1. Remaining: " + (items.size() - 1) + ".");
    }

    @Test
    void aSectionWithoutColumnsPrintsItsTitleAndNotes() throws Exception {
        var leftOut = new org.lpzplanner.common.ReportSection("Risk estimate (IEC 62305-2)", List.of(), List.of(),
                List.of("Not included: no stored risk inputs."));
        String text = Files.readString(Path.of("sample-sites/harbour-warehouse.geojson"));
        ReportSource source = source(text, "harbour-warehouse.geojson", ProtectionLevel.III, Map.of());
        String all = flat(String.join(" ", pages(PdfReportRenderer.render(ReportAssembler.assemble(source, null,
                StoredDesign.NONE, List.of(leftOut))))));
        assertThat(all).contains(ReportAssembler.APPENDIX + " Risk estimate (IEC 62305-2) Not included: no stored"
                + " risk inputs.").doesNotContain("as stored for the site");
    }

    @Test
    void theSameRevisionPrintsTheSameText() throws Exception {
        byte[] again = PdfReportRenderer.render(ReportAssembler.assemble(campus));
        assertThat(pages(again)).isEqualTo(pages(campusPdf));
    }

    @Test
    void pagesRenderToImagesWithDrawingOnThem() throws Exception {
        Path dir = Path.of("target/report-pages");
        Files.createDirectories(dir);
        try (PDDocument doc = Loader.loadPDF(campusPdf)) {
            PDFRenderer renderer = new PDFRenderer(doc);
            for (int i = 0; i < Math.min(4, doc.getNumberOfPages()); i++) {
                BufferedImage image = renderer.renderImageWithDPI(i, 50);
                ImageIO.write(image, "png", dir.resolve("campus-" + (i + 1) + ".png").toFile());
                assertThat(nonWhiteShare(image)).as("page %d", i + 1).isGreaterThan(0.01);
            }
        }
    }

    @Test
    void namesTheFontCannotShowAreSubstitutedNotFatal() throws Exception {
        String text = Files.readString(Path.of("sample-sites/harbour-warehouse.geojson"))
                .replaceFirst("\"name\": *\"[^\"]*\"", "\"name\": \"Zoë \\\\u5de5\\\\u5834 <&> \\\\ud83d\\\\ude80 \\\\u0007end\"");
        ReportSource source = source(text, "odd.geojson", ProtectionLevel.III, Map.of());
        String all = flat(String.join(" ", pages(PdfReportRenderer.render(ReportAssembler.assemble(source)))));
        assertThat(source.siteName()).contains("工場");
        assertThat(all).contains("Zoë ?? <&> ? end");
    }

    @Test
    void aSuperscriptMinusTheFontLacksPrintsAsAHyphen() throws Exception {
        ReportContent content = new ReportContent("T", "Footer", Cautions.lines(),
                List.of(new ReportBlock.Paragraph("R1 = 1.94 \u00d7 10\u207b\u2075 per year")));
        assertThat(flat(String.join(" ", pages(PdfReportRenderer.render(content))))).contains("10-\u2075 per year");
    }

    @Test
    void longSchedulesContinueOnTheNextPageWithTheirHeadings() throws Exception {
        List<List<String>> rows = new ArrayList<>();
        for (int i = 1; i <= 150; i++) {
            rows.add(List.of("R" + i, "a long cell ".repeat(i % 7 + 1)));
        }
        ReportContent content = new ReportContent("T", "Footer title", Cautions.lines(),
                List.of(Schedule.of("Long schedule", List.of("Row", "Text"), rows)));
        List<String> pages = pages(PdfReportRenderer.render(content));
        assertThat(pages.size()).isGreaterThan(2);
        assertThat(flat(pages.get(1))).contains("Long schedule (continued)").contains("Row Text");
        String all = flat(String.join(" ", pages));
        for (int i = 1; i <= 150; i++) {
            assertThat(all).contains("R" + i + " ");
        }
    }

    private static double nonWhiteShare(BufferedImage image) {
        long count = 0;
        for (int y = 0; y < image.getHeight(); y++) {
            for (int x = 0; x < image.getWidth(); x++) {
                if ((image.getRGB(x, y) & 0xffffff) != 0xffffff) {
                    count++;
                }
            }
        }
        return (double) count / ((long) image.getWidth() * image.getHeight());
    }
}
