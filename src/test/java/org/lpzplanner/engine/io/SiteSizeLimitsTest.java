package org.lpzplanner.engine.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.lpzplanner.bench.DistrictGenerator;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.Structure;

/**
 * A site file with more structures, air-termination parts or vertices than a site may have is
 * refused before its features are built, naming the count and the limit; the campus sample and a
 * 200-building district stay far below every limit.
 */
class SiteSizeLimitsTest {

    @Test
    void moreStructuresThanTheLimitAreRefusedNamingCountAndLimit() {
        List<String> features = new ArrayList<>();
        for (int k = 0; k < SiteLimits.MAX_STRUCTURES + 1; k++) {
            features.add(structure(k));
        }
        assertThatThrownBy(() -> SiteReader.readGeoJson(collection(features), "city.geojson"))
                .isInstanceOfSatisfying(SiteFormatException.class, e -> {
                    assertThat(e.field()).isEqualTo("features");
                    assertThat(e.getMessage()).contains("city.geojson", "the site has 5,001 structures",
                            "at most 5,000");
                });
    }

    @Test
    void moreRodsAndConductorsThanTheLimitAreRefusedNamingCountAndLimit() {
        List<String> features = new ArrayList<>();
        features.add(structure(0));
        for (int k = 0; k < SiteLimits.MAX_PARTS; k++) {
            features.add(feature("\"kind\": \"rod\", \"height\": 2", point(1 + (k % 50) * 0.1, 1 + (k / 50) * 0.05)));
        }
        features.add(feature("\"kind\": \"conductor\", \"elevation\": 6", "{\"type\": \"LineString\", \"coordinates\":"
                + " [[0.5, 0.5], [3.5, 0.5]]}"));
        assertThatThrownBy(() -> SiteReader.readGeoJson(collection(features), "rods.geojson"))
                .isInstanceOf(SiteFormatException.class)
                .hasMessageContaining("the site has 5,001 rods and conductors together")
                .hasMessageContaining("at most 5,000");
    }

    @Test
    void moreVerticesThanTheLimitAreRefusedNamingCountAndLimit() {
        // 100 regular polygons of 2,000 sides: 2,001 positions each with the closing one
        List<String> features = new ArrayList<>();
        for (int k = 0; k < 100; k++) {
            features.add(feature("\"kind\": \"structure\", \"height\": 5", polygon(k * 30, 0, 10, 2000)));
        }
        assertThatThrownBy(() -> SiteReader.readGeoJson(collection(features), "fine.geojson"))
                .isInstanceOf(SiteFormatException.class)
                .hasMessageContaining("200,100 vertices")
                .hasMessageContaining("at most 200,000");
    }

    @Test
    void aWktFileWithMoreStructuresThanTheLimitIsRefusedBeforeItsLinesAreRead() {
        StringBuilder text = new StringBuilder();
        for (int k = 0; k < SiteLimits.MAX_STRUCTURES + 1; k++) {
            int x = (k % 100) * 20, y = (k / 100) * 20;
            text.append(String.format(Locale.ROOT, "POLYGON ((%d %d, %d %d, %d %d, %d %d, %d %d)) 6%n", x, y, x + 10, y,
                    x + 10, y + 10, x, y + 10, x, y));
        }
        assertThatThrownBy(() -> SiteReader.readWkt(text.toString(), "city.wkt"))
                .isInstanceOf(SiteFormatException.class)
                .hasMessageContaining("city.wkt")
                .hasMessageContaining("the site has 5,001 structures")
                .hasMessageContaining("at most 5,000");
    }

    @Test
    void theCampusSampleAndA200BuildingDistrictReadWellWithinTheLimits() {
        Site campus = SiteReader.read(Path.of("sample-sites", "brookfield-campus.geojson")).site();
        assertThat(campus.structures().size()).isLessThan(SiteLimits.MAX_STRUCTURES / 10);
        assertThat(vertices(campus)).isLessThan(SiteLimits.MAX_VERTICES / 10);

        Site district = DistrictGenerator.district(200, 1500, 7);
        StringBuilder wkt = new StringBuilder();
        for (Structure s : district.structures()) {
            wkt.append(s.footprint().toText()).append(' ').append(s.height()).append('\n');
        }
        Site read = SiteReader.readWkt(wkt.toString(), "district.wkt").site();
        assertThat(read.structures()).hasSize(200);
        assertThat(vertices(read)).isLessThan(SiteLimits.MAX_VERTICES / 10);
    }

    private static long vertices(Site site) {
        return site.structures().stream().mapToLong(s -> s.footprint().getNumPoints()).sum();
    }

    private static String collection(List<String> features) {
        return "{\"type\": \"FeatureCollection\", \"coordinates\": \"local-metres\", \"features\": ["
                + String.join(",\n", features) + "]}";
    }

    private static String structure(int k) {
        double x = (k % 100) * 20.0, y = (k / 100) * 20.0;
        return feature("\"kind\": \"structure\", \"height\": 6", String.format(Locale.ROOT,
                "{\"type\": \"Polygon\", \"coordinates\": [[[%s, %s], [%s, %s], [%s, %s], [%s, %s], [%s, %s]]]}",
                x, y, x + 10, y, x + 10, y + 10, x, y + 10, x, y));
    }

    private static String feature(String properties, String geometry) {
        return "{\"type\": \"Feature\", \"properties\": {" + properties + "}, \"geometry\": " + geometry + "}";
    }

    private static String point(double x, double y) {
        return String.format(Locale.ROOT, "{\"type\": \"Point\", \"coordinates\": [%s, %s]}", x, y);
    }

    private static String polygon(double cx, double cy, double r, int sides) {
        StringBuilder ring = new StringBuilder("[");
        for (int i = 0; i <= sides; i++) {
            double a = 2 * Math.PI * (i % sides) / sides;
            ring.append(String.format(Locale.ROOT, "%s[%.6f, %.6f]", i == 0 ? "" : ", ", cx + r * Math.cos(a),
                    cy + r * Math.sin(a)));
        }
        return "{\"type\": \"Polygon\", \"coordinates\": [" + ring + "]]}";
    }
}
