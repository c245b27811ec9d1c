package org.lpzplanner.analysis;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Arrays;
import org.junit.jupiter.api.Test;
import org.lpzplanner.drawing.Layer;
import org.lpzplanner.drawing.PlanItem;
import org.lpzplanner.drawing.PlanStyle;
import org.lpzplanner.drawing.Texts;
import org.lpzplanner.engine.exposure.AnalysisOptions;
import org.lpzplanner.engine.exposure.ExposureAnalysis;
import org.lpzplanner.engine.model.ProtectionLevel;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.SphereSpec;
import org.lpzplanner.sites.SiteFiles;

class PlanSvgTest {

    private static final Texts KEYS = (key, args) -> key + Arrays.toString(args);

    private static String drawing(String wkt, String fileName) {
        Site site = SiteFiles.read(wkt, fileName).site();
        var result = ExposureAnalysis.analyze(site, AnalysisOptions.of(SphereSpec.of(ProtectionLevel.II)));
        return PlanSvg.render(ResultGeoJson.write(site, result), KEYS);
    }

    @Test
    void bareBlockIsDrawnWithExposedRoofEdgesScaleNorthAndLegend() {
        String svg = drawing("POLYGON ((0 0, 20 0, 20 10, 0 10, 0 0)) 8\n", "block.wkt");

        assertThat(svg).startsWith("<svg").endsWith("</svg>")
                .contains("class=\"structure\"", "class=\"exposed-roof\"", "class=\"exposed-edge\"",
                        "class=\"north-arrow\"", "plan.north[]", "class=\"scale-bar\"", "plan.scale[",
                        "plan.legend.roof[]");
    }

    @Test
    void northIsUp() {
        String svg = drawing("POLYGON ((0 0, 10 0, 10 10, 0 10, 0 0)) 5\nPOLYGON ((0 100, 10 100, 10 110, 0 110, 0 100)) 5\n",
                "two.wkt");
        // the southern block (y 0..10) is drawn below the northern one (y 100..110): larger SVG y
        int first = svg.indexOf("class=\"structure\"");
        int second = svg.indexOf("class=\"structure\"", first + 1);
        double southY = firstY(svg.substring(first));
        double northY = firstY(svg.substring(second));
        assertThat(southY).isGreaterThan(northY);
    }

    @Test
    void namesFromTheFileAreEscaped() {
        String geoJson = "{\"type\":\"FeatureCollection\",\"coordinates\":\"local-metres\",\"features\":[{\"type\":\"Feature\","
                + "\"properties\":{\"kind\":\"structure\",\"name\":\"<script>alert(1)</script> & \\\"co\\\"\",\"height\":6},"
                + "\"geometry\":{\"type\":\"Polygon\",\"coordinates\":[[[0,0],[10,0],[10,10],[0,10],[0,0]]]}}]}";
        Site site = SiteFiles.read(geoJson, "x.geojson").site();
        var result = ExposureAnalysis.analyze(site, AnalysisOptions.of(SphereSpec.of(ProtectionLevel.II)));

        String svg = PlanSvg.render(ResultGeoJson.write(site, result), KEYS);

        assertThat(svg).doesNotContain("<script>").contains("&lt;script&gt;alert(1)&lt;/script&gt; &amp; &quot;co&quot;");
    }

    @Test
    void theFrameOnTheSvgElementTurnsDrawingPointsBackIntoLocalMetres() {
        String svg = drawing("POLYGON ((10 20, 30 20, 30 40, 10 40, 10 20)) 8\n", "block.wkt");
        double originX = attribute(svg, "data-origin-x");
        double originY = attribute(svg, "data-origin-y");
        double scale = attribute(svg, "data-scale");
        double margin = attribute(svg, "data-margin");
        assertThat(svg).contains("data-y-flipped=\"true\"");

        // the footprint's first corner (10, 20) is the first point of the structure's path
        String d = svg.substring(svg.indexOf("class=\"structure\""));
        String[] xy = d.substring(d.indexOf("d=\"M ") + 5).split(" ");
        double x = originX + (Double.parseDouble(xy[0]) - margin) / scale;
        double y = originY - (Double.parseDouble(xy[1]) - margin) / scale;
        // the path is written to 0.1 SVG unit, so the corner comes back within 0.1 / scale metres
        assertThat(x).isCloseTo(10, org.assertj.core.api.Assertions.within(0.1 / scale + 1e-9));
        assertThat(y).isCloseTo(20, org.assertj.core.api.Assertions.within(0.1 / scale + 1e-9));
    }

    @Test
    void conductorsCarryTheirIdsForTheEditor() {
        String geoJson = "{\"type\":\"FeatureCollection\",\"coordinates\":\"local-metres\",\"features\":[{\"type\":\"Feature\","
                + "\"properties\":{\"kind\":\"structure\",\"height\":6},"
                + "\"geometry\":{\"type\":\"Polygon\",\"coordinates\":[[[0,0],[10,0],[10,10],[0,10],[0,0]]]}},"
                + "{\"type\":\"Feature\",\"id\":\"ridge \\\"line\\\"\",\"properties\":{\"kind\":\"conductor\",\"heightAboveRoof\":0.2},"
                + "\"geometry\":{\"type\":\"LineString\",\"coordinates\":[[1,5],[9,5]]}}]}";
        Site site = SiteFiles.read(geoJson, "x.geojson").site();
        var result = ExposureAnalysis.analyze(site, AnalysisOptions.of(SphereSpec.of(ProtectionLevel.II)));

        String svg = PlanSvg.render(ResultGeoJson.write(site, result), KEYS);

        assertThat(svg).contains("class=\"conductor\"").contains("data-conductor-id=\"ridge &quot;line&quot;\"");
    }

    @Test
    void aModelWarningsStretchIsDrawnInItsOwnStyleWithItsReviewKeyTextAndALegendRow() throws Exception {
        // a wire strung at 45 m over a 5 m hut, level I (R = 20 m, IEC 62305-3:2010 Table 2): more
        // than R above what lies beneath it (IEC 62305-3:2010 Annex A), so the analysis warns
        Site site = SiteFiles.read(java.nio.file.Files.readString(ResultGeoJsonTest.WIRE_ABOVE_HUT),
                "wire-above-hut.geojson").site();
        var result = ExposureAnalysis.analyze(site, AnalysisOptions.of(SphereSpec.of(ProtectionLevel.I)));
        String geoJson = ResultGeoJson.write(site, result);
        String key = ReviewItems.of(geoJson).stream().filter(ReviewItems.Item::isModelWarning).findFirst()
                .orElseThrow().key();

        String svg = PlanSvg.render(geoJson, KEYS);

        int at = svg.indexOf("<path class=\"model-warning\"");
        assertThat(at).as(svg).isPositive();
        String element = svg.substring(at, svg.indexOf("</path>", at));
        assertThat(element).contains("data-item-key=\"" + key + "\"").contains("stroke=\"" + colour(Layer.MODEL_WARNING) + "\"")
                .contains("<title>").contains("Span wire");
        assertThat(svg).contains("plan.legend.warning[]");
        // its own colour: no other layer of the plan uses it
        assertThat(java.util.Arrays.stream(Layer.values()).filter(l -> l != Layer.MODEL_WARNING).map(PlanSvgTest::colour))
                .doesNotContain(colour(Layer.MODEL_WARNING));

        // accepted with a reason: still drawn, marked accepted, the reason in its title
        String accepted = PlanSvg.render(geoJson, KEYS, java.util.Map.of(key, "fenced <off>"));
        int a = accepted.indexOf("<path class=\"model-warning accepted\"");
        assertThat(a).isPositive();
        assertThat(accepted.substring(a, accepted.indexOf("</path>", a))).contains("fenced &lt;off&gt;");
    }

    @Test
    void aPlanWithoutWarningsHasNoWarningLegendRow() {
        String svg = drawing("POLYGON ((0 0, 20 0, 20 10, 0 10, 0 0)) 8\n", "block.wkt");
        assertThat(svg).doesNotContain("model-warning").doesNotContain("plan.legend.warning");
    }

    private static int count(String text, String part) {
        return text.split(java.util.regex.Pattern.quote(part), -1).length - 1;
    }

    @Test
    void facadeBandsAreDrawnApartByTheTallStructureRuleWithLegendRowsStatingIt() {
        // IEC 62305-3:2010 5.2.3: a 100 m tower needs lateral air-termination on its upper 20 %
        // (80 m to 100 m); below that, and on a 50 m tower everywhere, flashes to the side are
        // negligible. Level I, R = 20 m (Table 2): the sphere touches the walls from 20 m up.
        Site tall = SiteFiles.read("POLYGON ((0 0, 10 0, 10 10, 0 10, 0 0)) 100\n", "tower.wkt").site();
        String svg = PlanSvg.render(ResultGeoJson.write(tall, ExposureAnalysis.analyze(tall,
                AnalysisOptions.of(SphereSpec.of(ProtectionLevel.I)))), KEYS);

        assertThat(count(svg, "<path class=\"facade-band side-flash-negligible\"")).isEqualTo(4);
        assertThat(count(svg, "<path class=\"facade-band\"")).isEqualTo(4);
        // only the needing parts are review items, keyed for the review list
        assertThat(svg).doesNotContainPattern("side-flash-negligible\"[^>]*data-item-key");
        assertThat(count(svg, "data-item-key=\"facade-band-")).isEqualTo(4);
        assertThat(svg).contains("plan.legend.facade[]").contains("plan.legend.facadeNegligible[]")
                .contains("stroke=\"" + colour(Layer.FACADE_NEGLIGIBLE) + "\"");
        assertThat(colour(Layer.FACADE_NEGLIGIBLE)).isNotEqualTo(colour(Layer.FACADE_BAND));

        Site low = SiteFiles.read("POLYGON ((0 0, 10 0, 10 10, 0 10, 0 0)) 50\n", "tower.wkt").site();
        String lowSvg = PlanSvg.render(ResultGeoJson.write(low, ExposureAnalysis.analyze(low,
                AnalysisOptions.of(SphereSpec.of(ProtectionLevel.I)))), KEYS);
        assertThat(count(lowSvg, "<path class=\"facade-band side-flash-negligible\"")).isEqualTo(4);
        assertThat(lowSvg).doesNotContain("data-item-key=\"facade-band-");
    }

    @Test
    void aPlanWithoutNegligibleBandsHasNoLegendRowForThem() {
        String svg = drawing("POLYGON ((0 0, 20 0, 20 10, 0 10, 0 0)) 8\n", "block.wkt");
        assertThat(svg).doesNotContain("plan.legend.facadeNegligible");
    }

    private static String colour(Layer layer) {
        return PlanStyle.of(layer).colour().hex();
    }

    private static double attribute(String svg, String name) {
        int start = svg.indexOf(name + "=\"") + name.length() + 2;
        return Double.parseDouble(svg.substring(start, svg.indexOf('"', start)));
    }

    private static double firstY(String fromPath) {
        String d = fromPath.substring(fromPath.indexOf("d=\"M ") + 5);
        return Double.parseDouble(d.split(" ")[1]);
    }

    @Test
    void storedKeepOutAreasAreHatchedWithALegendRowAndTheirNamesEscaped() {
        Site site = SiteFiles.read("POLYGON ((0 0, 20 0, 20 10, 0 10, 0 0)) 8\n", "block.wkt").site();
        var result = ExposureAnalysis.analyze(site, AnalysisOptions.of(SphereSpec.of(ProtectionLevel.II)));
        String geoJson = ResultGeoJson.write(site, result);
        String without = PlanSvg.render(geoJson, KEYS);
        assertThat(without).doesNotContain("keep-out").doesNotContain("plan.legend.keepOut");

        // an area well east of the block (and of its protected ground) widens the drawn extent to x = 110
        String svg = PlanSvg.render(geoJson, KEYS, java.util.Map.of(), java.util.List.of(new PlanItem.KeepOutArea(
                "<Panels> & \"vents\"", java.util.List.of(new double[] {100, 2}, new double[] {110, 2},
                        new double[] {110, 8}, new double[] {100, 8}))));
        assertThat(svg).contains("<pattern id=\"keep-out-hatch\"").contains("class=\"keep-out-area\"")
                .contains("fill=\"url(#keep-out-hatch)\"").contains("plan.legend.keepOut[]")
                .contains("data-keep-out-name=\"&lt;Panels&gt; &amp; &quot;vents&quot;\"")
                .doesNotContain("<Panels>");
        // the west end of the drawing stays where the result puts it; the width is then what governs the
        // scale: (820 - 2 · 36) SVG units over the metres from there to x = 110
        double west = Double.parseDouble(without.replaceAll("(?s).*?data-origin-x=\"(-?[0-9.]+)\".*", "$1"));
        assertThat(svg).contains("data-origin-x=\"" + String.format(java.util.Locale.ROOT, "%.6f", west) + "\"");
        double scale = Double.parseDouble(svg.replaceAll("(?s).*?data-scale=\"([0-9.]+)\".*", "$1"));
        assertThat(scale).isCloseTo((820 - 2 * 36) / (110 - west), org.assertj.core.api.Assertions.within(1e-5));
    }
}
