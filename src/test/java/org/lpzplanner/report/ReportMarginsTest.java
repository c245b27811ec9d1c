package org.lpzplanner.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.apache.pdfbox.text.TextPosition;
import org.junit.jupiter.api.Test;
import org.lpzplanner.engine.model.ProtectionLevel;

/**
 * Nothing is printed outside the margins: every character the text extraction finds on the pages
 * of text and tables lies within the A4 page's 42 pt margins, even with the longest address and
 * designer a site can store (one of them a single 200-character word) on the cover. Plan sheets are
 * left out: their labels are clipped to the drawing's frame, which lies within the margins.
 */
class ReportMarginsTest {

    @Test
    void longCoverDetailsWrapAndNoCharacterLeavesTheMargins() throws Exception {
        String text = Files.readString(Path.of("sample-sites/harbour-warehouse.geojson"));
        ReportSource plain = ReportPdfTest.source(text, "harbour-warehouse.geojson", ProtectionLevel.III, Map.of());
        String address = "Q".repeat(200);
        String designer = "Mara Quill, chartered engineer, for Quill & Marsh Lightning Design of Pellby Heath, "
                + "Northwold, acting for the owner of the warehouse at the quay (invented) and signing for them";
        ReportSource source = new ReportSource(plain.siteName(), plain.sourceName(), plain.sourceText(),
                plain.sphere(), plain.resolution(), plain.tolerance(), plain.revision(), plain.analysedAt(),
                plain.inputsSha256(), plain.resultGeoJson(), plain.accepted(), plain.savedCuts(),
                new ReportSource.Cover(address, designer, null));
        byte[] pdf = PdfReportRenderer.render(ReportAssembler.assemble(source));

        List<String> outside = new ArrayList<>();
        StringBuilder cover = new StringBuilder();
        try (PDDocument doc = Loader.loadPDF(pdf)) {
            for (int page = 1; page <= doc.getNumberOfPages(); page++) {
                int number = page;
                PDFTextStripper stripper = new PDFTextStripper() {
                    @Override
                    protected void writeString(String line, List<TextPosition> glyphs) throws IOException {
                        for (TextPosition g : glyphs) {
                            float left = g.getXDirAdj();
                            float right = left + g.getWidthDirAdj();
                            float baseline = g.getYDirAdj();
                            if (left < PdfPages.MARGIN - 0.5f || right > PdfPages.WIDTH - PdfPages.MARGIN + 0.5f
                                    || baseline > PdfPages.HEIGHT - PdfPages.MARGIN + 0.5f
                                    || baseline < PdfPages.MARGIN) {
                                outside.add("page " + number + ": \"" + line + "\" at " + left + ".." + right);
                                return;
                            }
                        }
                        super.writeString(line, glyphs);
                    }
                };
                stripper.setStartPage(page);
                stripper.setEndPage(page);
                String pageText = stripper.getText(doc);
                if (page == 1) {
                    cover.append(pageText);
                }
                if (pageText.contains("Overview, scale") || pageText.contains("Detail sheet")) {
                    outside.removeIf(o -> o.startsWith("page " + number + ":"));
                }
            }
        }
        assertThat(outside).isEmpty();
        // the 200-character word is split over lines, every character kept
        String flat = cover.toString().replaceAll("\\s+", "");
        assertThat(flat).contains("Q".repeat(200)).contains("signingforthem");
    }
}
