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
import org.lpzplanner.engine.model.ProtectionLevel;

/**
 * The printed report of a 100 m tower, 10 m × 10 m, at level I (R = 20 m, IEC 62305-3:2010 Table 2):
 * the sphere touches its walls from 20 m up (closed form 4 of the sphere geometry); by
 * IEC 62305-3:2010 5.2.3 only the upper 20 %, from 80 m, needs lateral air-termination.
 * The report lists the two kinds apart and states the rule.
 */
class SideFlashReportTest {

    private static List<String> pages;

    @BeforeAll
    static void print() throws Exception {
        ReportSource source = ReportPdfTest.source("POLYGON ((0 0, 10 0, 10 10, 0 10, 0 0)) 100\n", "tower.wkt",
                ProtectionLevel.I, Map.of());
        byte[] pdf = PdfReportRenderer.render(ReportAssembler.assemble(source));
        pages = ReportPdfTest.pages(pdf);
        Path dir = Path.of("target/report-pages");
        Files.createDirectories(dir);
        try (PDDocument doc = Loader.loadPDF(pdf)) {
            PDFRenderer renderer = new PDFRenderer(doc);
            for (int i = 0; i < Math.min(6, doc.getNumberOfPages()); i++) {
                BufferedImage image = renderer.renderImageWithDPI(i, 110);
                ImageIO.write(image, "png", dir.resolve("side-flash-" + (i + 1) + ".png").toFile());
            }
        }
    }

    private static String flat(String text) {
        return text.replaceAll("\\s+", " ");
    }

    @Test
    void negligibleBandsHaveTheirOwnScheduleStatingTheRule() {
        String all = flat(String.join(" ", pages));
        int at = all.indexOf("Facade bands where flashes to the side are negligible");
        assertThat(at).as(all).isPositive();
        String schedule = all.substring(at, Math.min(all.length(), at + 1500));
        // four walls, each from R = 20 m (at most 0.05 m below it) to 80 m, on a 100 m building
        assertThat(schedule.split("10\\.00 (19\\.9[5-9]|20\\.00) 80\\.00 100\\.00", -1)).hasSize(5);
        assertThat(schedule).contains("IEC 62305-3:2010 5.2.3").contains("lower than 60 m").contains("20 %");
    }

    @Test
    void exposedFacadeBandsAreTheUpperFifthAndSayWhy() {
        String all = flat(String.join(" ", pages));
        int at = all.indexOf(ExposedItemSchedule.TITLE);
        assertThat(at).isPositive();
        String schedule = all.substring(at, Math.min(all.length(), at + 3000));
        // 5.2.3, "upper 20 %": from 80 m to the 100 m top
        assertThat(schedule.split("facade-band 10\\.00 80\\.00 100\\.00", -1)).hasSize(5);
        assertThat(schedule).contains("IEC 62305-3:2010 5.2.3");
    }

    @Test
    void pageOneCountsTheNegligibleBandsApart() {
        String first = flat(pages.get(0));
        assertThat(first).contains("4 facade bands needing lateral air-termination")
                .contains("Negligible facade bands 4 where flashes to the side are negligible (IEC 62305-3:2010 5.2.3");
    }
}
