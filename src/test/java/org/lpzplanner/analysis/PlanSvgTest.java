package org.lpzplanner.analysis;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Arrays;
import org.junit.jupiter.api.Test;
import org.lpzplanner.engine.exposure.AnalysisOptions;
import org.lpzplanner.engine.exposure.ExposureAnalysis;
import org.lpzplanner.engine.model.ProtectionLevel;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.SphereSpec;
import org.lpzplanner.sites.SiteFiles;

class PlanSvgTest {

    private static final PlanSvg.Labels KEYS = (key, args) -> key + Arrays.toString(args);

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

    private static double firstY(String fromPath) {
        String d = fromPath.substring(fromPath.indexOf("d=\"M ") + 5);
        return Double.parseDouble(d.split(" ")[1]);
    }
}
