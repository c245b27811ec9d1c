package org.lpzplanner.report;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.put;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.imageio.ImageIO;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.rendering.PDFRenderer;
import org.junit.jupiter.api.Test;
import org.lpzplanner.accounts.SignedIn;
import org.lpzplanner.airtermination.RodEdits;
import org.lpzplanner.airtermination.RodInput;
import org.lpzplanner.analysis.AnalysisService;
import org.lpzplanner.common.ReportSection;
import org.lpzplanner.design.MetalInstallationService;
import org.lpzplanner.design.QuantityService;
import org.lpzplanner.design.DownConductorService;
import org.lpzplanner.keepout.KeepOutAreaService;
import org.lpzplanner.risk.RiskService;
import org.lpzplanner.sections.SiteCutService;
import org.lpzplanner.sites.SiteService;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.MediaType;
import org.springframework.test.web.servlet.MockMvc;

/**
 * A printed revision carries the site's data kept beside its revisions: the risk estimate, the bill
 * of quantities, the designer's edited down-conductors and marked metal installations. The PDF is
 * read back and compared with what the risk and design features compute, and with closed-form values.
 */
@SpringBootTest
@AutoConfigureMockMvc
@SignedIn
class ReportSiteDataTest {

    @Autowired
    MockMvc mvc;
    @Autowired
    SiteService sites;
    @Autowired
    AnalysisService analyses;
    @Autowired
    RodEdits rods;
    @Autowired
    MetalInstallationService installations;
    @Autowired
    QuantityService quantityService;
    @Autowired
    DownConductorService downConductors;
    @Autowired
    RiskService risk;
    @Autowired
    ReportService reports;
    @Autowired
    SiteCutService cuts;
    @Autowired
    KeepOutAreaService keepOut;

    /** The 80 m × 40 m warehouse (wall 10 m, parapet 1 m) at level III with one 2.5 m rod at (3, 4). */
    private long designedWarehouse() throws Exception {
        long id = sites.create("harbour-warehouse.geojson",
                Files.readAllBytes(Path.of("sample-sites/harbour-warehouse.geojson")), "Cold store", "III", null).id();
        rods.add(id, sites.get(id).version(), new RodInput(null, "Corner rod", 3.0, 4.0, "2.5"));
        mvc.perform(put("/api/sites/" + id + "/risk").contentType(MediaType.APPLICATION_JSON)
                        .content("{\"flashDensity\": \"4\", \"location\": \"isolated\", \"lineCount\": 1,"
                                + " \"fireRisk\": \"ORDINARY\", \"specialHazard\": \"NONE\","
                                + " \"structureUse\": \"INDUSTRIAL_COMMERCIAL\", \"lifeCriticalSystems\": \"NO\"}"))
                .andExpect(status().isOk());
        String building = downConductors.list(id).get(0).buildingId();
        downConductors.save(id, building, List.of(new double[] {0, 0}, new double[] {80, 0},
                new double[] {80, 40}, new double[] {0, 40}));
        installations.add(id, "Vent pipe", 5.0, 6.0, 12.0, "CONCRETE_OR_BRICK");
        return id;
    }

    private static String text(byte[] pdf) throws Exception {
        // the font has no superscript minus or minus sign: they print as a hyphen
        return String.join(" ", ReportPdfTest.pages(pdf)).replaceAll("\\s+", " ").replace('\u207B', '-')
                .replace('\u2212', '-');
    }

    private static String printable(String cell) {
        return cell.replaceAll("\\s+", " ").replace('\u207B', '-').replace('\u2212', '-');
    }

    @Test
    void riskEstimateAndBillOfQuantitiesPrintAsTheFeaturesComputeThem() throws Exception {
        long id = designedWarehouse();
        String text = text(reports.pdf(id, 1));

        ReportSection riskSection = risk.reportSection(id, Locale.ENGLISH);
        assertThat(riskSection.rows()).hasSize(5);
        assertThat(text).contains(riskSection.title());
        for (List<String> row : riskSection.rows()) {
            // every option's row prints its figures in column order
            assertThat(text).contains(printable(String.join(" ", row)));
        }
        assertThat(text).contains(printable(riskSection.notes().get(0)));
        assertThat(text).containsPattern("from the site's data as stored for the site on \\d{4}-\\d\\d-\\d\\d \\d\\d:\\d\\d UTC"
                + " when this report was printed");

        ReportSection quantities = quantityService.quantitiesSection(id, 1.0);
        assertThat(text).contains("Bill of quantities");
        for (List<String> row : quantities.rows()) {
            assertThat(text).contains(row.get(0) + " " + row.get(1) + " " + row.get(2));
        }
        // closed form: four down-conductors from the parapet's top, 10 m wall + 1 m parapet = 11 m,
        // to ground; one test joint and one earth termination each (common practice)
        assertThat(text).contains("Down-conductor m 44 ").contains("Test joint pcs 4 ")
                .contains("Earth termination pcs 4 ");
    }

    @Test
    void editedDownConductorsAndMetalInstallationsEnterTheSchedules() throws Exception {
        long id = designedWarehouse();
        byte[] pdf = reports.pdf(id, 1);
        String text = text(pdf);

        // four corners of the 80 m × 40 m rectangle: gaps of 80 m and 40 m along the outline;
        // IEC 62305-3:2010 Table 4: 15 m typical spacing at level III, so ⌈240 / 15⌉ = 16 needed
        assertThat(text).contains("Warehouse edited 240.00 15.00 4 (fewer than 16: check) 60.00 80.00 (over typical: check)");
        assertThat(text).contains("D1 Warehouse 0.00 0.00").contains("D3 Warehouse 80.00 40.00").doesNotContain("D5 ");
        assertThat(text).containsPattern("Edited: the designer's positions, as stored for the site on \\d{4}-");

        // s = ki·(kc/km)·l [IEC 62305-3:2010 6.3]: ki = 0.04 at level III (Table 10), kc = 0.44 for four
        // down-conductors (Table 12, simplified), km = 0.5 in concrete or brick (Table 11): k = 0.0352.
        // The installation (5, 6, 12) is √8 = 2.828 m in plan from the rod (3, 4), foot on the 10 m roof,
        // tip 12.5 m. From height z on the rod: z − 10 m down the rod, no conductor drawn, so straight
        // across to the top of D1 at the parapet (0, 0, 11): √(3² + 4² + 1²) = √26 m; 11 m down:
        // l = z + 1 + √26. Every point counts; with u = z − 12 the margin √(8 + u²) − k·(13 + √26 + u)
        // is least, a·√(1 − k²) − k·(13 + √26) with a = √8, at u = k·a / √(1 − k²) = 0.0996 m
        // [closed form]: l = 18.20 m, s = 0.641 m < 2.830 m; the straight link is assumed (the shortest
        // route there can be), so the row is "not confirmed" rather than a pass
        double k = 0.04 * 0.44 / 0.5, a = Math.sqrt(8), u = k * a / Math.sqrt(1 - k * k);
        // the rod is joined to no down-conductor: kc counts the four of the building its route reaches
        Matcher m = Pattern.compile("Metal installation: Vent pipe concrete or brick A1 4 \\(D1, D2, D3, D4\\) ([0-9.]+)"
                + " ([0-9.]+) m along drawn air-termination and 5\\.10 m straight across the roof where no conductor is"
                + " drawn \\(assumed\\) to down-conductor D1 at \\(0\\.0, 0\\.0\\), 11\\.00 m down it ([0-9.]+) ([0-9.]+)"
                + " not confirmed").matcher(text);
        assertThat(m.find()).as(text).isTrue();
        double l = Double.parseDouble(m.group(1)), along = Double.parseDouble(m.group(2));
        double s = Double.parseDouble(m.group(3)), d = Double.parseDouble(m.group(4));
        // printed to the centimetre; the margin is found to 1 mm, its place (where the margin is flat,
        // curvature 1 / a) to √(2 · 0.001 · a) = 7.5 cm
        assertThat(d - s).isCloseTo(a * Math.sqrt(1 - k * k) - k * (13 + Math.sqrt(26)), org.assertj.core.data.Offset.offset(0.011));
        assertThat(along).isCloseTo(2 + u, org.assertj.core.data.Offset.offset(0.08));
        assertThat(l).isCloseTo(along + Math.sqrt(26) + 11, org.assertj.core.data.Offset.offset(0.011));
        assertThat(s).isCloseTo(k * l, org.assertj.core.data.Offset.offset(0.006));
        assertThat(text).contains("Metal installations: marked by the designer for the site, as stored for the site on");
        assertThat(text).contains("Down-conductors 4, placed by the designer on 1 of 1 buildings");

        Path dir = Path.of("target/report-pages");
        Files.createDirectories(dir);
        try (PDDocument doc = Loader.loadPDF(pdf)) {
            PDFRenderer renderer = new PDFRenderer(doc);
            for (int i = Math.max(0, doc.getNumberOfPages() - 4); i < doc.getNumberOfPages(); i++) {
                BufferedImage image = renderer.renderImageWithDPI(i, 70);
                ImageIO.write(image, "png", dir.resolve("site-data-" + (i + 1) + ".png").toFile());
            }
        }
    }

    @Test
    void savedCutsPrintAsSectionsNamedByTheirNamesAsStoredWhenPrinted() throws Exception {
        long id = designedWarehouse();
        // saved after the revision: saved cuts belong to the site and print as stored when printed
        cuts.save(id, "Quay section", new String[] {"-10", "20", "90", "20"});
        long gone = cuts.save(id, "Dropped cut", new String[] {"0", "0", "0", "30"}).id();
        cuts.delete(id, gone);
        String text = text(reports.pdf(id, 1));

        int at = text.indexOf("Saved cut: Quay section");
        assertThat(at).as(text).isPositive();
        assertThat(text).doesNotContain("Dropped cut");
        int next = text.indexOf("Section through", at);
        String section = text.substring(at, next > at ? next : text.length());
        assertThat(section).contains("from (-10.00, 20.00) to (90.00, 20.00), local metres.")
                .contains("Saved for the site; drawn as stored when this report was printed.")
                // the drawing's distance axis runs the cut's length: 90 - (-10) = 100 m (closed form)
                .contains("m along the cut").containsPattern("\\b100\\b");
        // drawn before the automatic cuts
        assertThat(text.indexOf("Section through")).isGreaterThan(at);
    }

    @Test
    void keepOutAreasAreHatchedOnThePlanAndListedWithTheirAreaAsStoredWhenPrinted() throws Exception {
        long id = designedWarehouse();
        String before = text(reports.pdf(id, 1));
        assertThat(before).contains("No keep-out areas are stored for the site").doesNotContain("Keep-out area, hatched");

        // stored after the revision: keep-out areas belong to the site and print as stored when printed
        // a 4 m × 3 m roof hatch around the rod A1 at (3, 4): 12 m² (closed form), A1 inside it
        keepOut.save(id, "Roof hatch", List.of(new double[] {1, 3}, new double[] {5, 3}, new double[] {5, 6},
                new double[] {1, 6}));
        // a 20 m × 15 m solar array: 300 m², no part inside
        keepOut.save(id, "Solar array", List.of(new double[] {50, 20}, new double[] {70, 20}, new double[] {70, 35},
                new double[] {50, 35}));
        long gone = keepOut.save(id, "Removed walkway", List.of(new double[] {20, 20}, new double[] {30, 20},
                new double[] {30, 22})).id();
        keepOut.delete(id, gone);
        byte[] pdf = reports.pdf(id, 1);
        String text = text(pdf);

        assertThat(text).contains("Keep-out area, hatched (K1, …)").doesNotContain("Removed walkway")
                .doesNotContain("No keep-out areas are stored");
        int at = text.indexOf("Keep-out areas No. Name Area (m²)");
        assertThat(at).as(text).isPositive();
        String schedule = text.substring(at, Math.min(text.length(), at + 1200));
        assertThat(schedule).contains("K1 Roof hatch 12.00").contains("K2 Solar array 300.00")
                .contains("(1.00, 3.00)").contains("(70.00, 35.00)").contains("(1.00, 6.00) A1 K2").contains("(50.00, 35.00) none")
                .containsPattern("area in plan\\. As stored for the site on \\d{4}-\\d{2}-\\d{2} \\d{2}:\\d{2}"
                        + " UTC when this report was printed")
                .contains("move them, or confirm with whoever uses the area");

        Path dir = Path.of("target/report-pages");
        Files.createDirectories(dir);
        try (PDDocument doc = Loader.loadPDF(pdf)) {
            PDFRenderer renderer = new PDFRenderer(doc);
            List<String> pages = ReportPdfTest.pages(pdf);
            for (int i = 0; i < pages.size(); i++) {
                if (pages.get(i).contains("Plan, scale") || pages.get(i).contains("Keep-out areas")) {
                    ImageIO.write(renderer.renderImageWithDPI(i, 100), "png",
                            dir.resolve("keep-out-" + (i + 1) + ".png").toFile());
                }
            }
        }
    }
}
