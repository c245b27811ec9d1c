package org.lpzplanner.analysis;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.lpzplanner.engine.exposure.AnalysisOptions;
import org.lpzplanner.engine.exposure.ExposureAnalysis;
import org.lpzplanner.engine.model.ProtectionLevel;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.SphereSpec;
import org.lpzplanner.sites.SiteFiles;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * Facade bands in the result GeoJSON and the review list, classified by IEC 62305-3:2010 5.2.3 and
 * Annex A: flashes to the side are negligible on structures lower than 60 m; on taller ones the
 * upper 20 % of the height and everything above 120 m need lateral air-termination. Towers of
 * 10 m × 10 m at level I (R = 20 m, Table 2): the sphere touches their walls from R up to the top
 * (closed form 4 of the sphere geometry).
 */
class SideFlashOutputTest {

    private static final JsonMapper JSON = JsonMapper.builder().build();

    private static String stored(double height) {
        Site site = SiteFiles.read("POLYGON ((0 0, 10 0, 10 10, 0 10, 0 0)) " + height + "\n", "tower.wkt").site();
        var result = ExposureAnalysis.analyze(site, AnalysisOptions.of(SphereSpec.of(ProtectionLevel.I)));
        return ResultGeoJson.write(site, result);
    }

    private static List<JsonNode> bands(JsonNode collection) {
        List<JsonNode> out = new ArrayList<>();
        collection.path("features").forEach(f -> {
            if (f.path("properties").path("layer").asString().equals("facade-band")) {
                out.add(f.path("properties"));
            }
        });
        return out;
    }

    @Test
    void aFiftyMetreTowersBandsAreNotReviewItems() {
        String stored = stored(50);
        assertThat(bands(JSON.readTree(stored))).isNotEmpty();
        // lower than 60 m: flashes to the side negligible, nothing for the designer to accept
        assertThat(ReviewItems.of(stored)).noneMatch(i -> i.kind().equals("facade-band"));
    }

    @Test
    void aFiftyMetreTowersBandsAreWrittenAsNegligibleWithTheRuleAndClause() {
        JsonNode result = JSON.readTree(stored(50));
        assertThat(bands(result)).isNotEmpty().allSatisfy(p -> {
            assertThat(p.path("sideFlash").asString()).isEqualTo("negligible");
            assertThat(p.path("sideFlashRule").asString()).contains("IEC 62305-3:2010 5.2.3").contains("60 m");
            assertThat(p.path("buildingHeight").asDouble()).isEqualTo(50.0);
            assertThat(p.path("top").asDouble()).isEqualTo(50.0);
        });
        JsonNode summary = result.path("analysis").path("summary");
        assertThat(summary.path("facadeBands").asInt()).isZero();
        assertThat(summary.path("facadeBandLength").asDouble()).isZero();
        assertThat(summary.path("negligibleFacadeBands").asInt()).isEqualTo(bands(result).size());
        assertThat(summary.path("negligibleFacadeBandLength").asDouble()).isPositive();
    }

    @Test
    void aHundredMetreTowersBandsAreWrittenInTwoPartsSplitAtEightyMetres() {
        String stored = stored(100);
        JsonNode result = JSON.readTree(stored);
        List<JsonNode> needing = bands(result).stream()
                .filter(p -> p.path("sideFlash").asString().equals("lateral-air-termination")).toList();
        List<JsonNode> negligible = bands(result).stream()
                .filter(p -> p.path("sideFlash").asString().equals("negligible")).toList();
        // IEC 62305-3:2010 5.2.3, "upper 20 %": of 100 m, from 80 m
        assertThat(needing).isNotEmpty().allSatisfy(p -> {
            assertThat(p.path("bottom").asDouble()).isEqualTo(80.0);
            assertThat(p.path("top").asDouble()).isEqualTo(100.0);
            assertThat(p.path("sideFlashRule").asString()).contains("IEC 62305-3:2010 5.2.3").contains("20 %");
        });
        assertThat(negligible).hasSameSizeAs(needing).allSatisfy(p -> {
            assertThat(p.path("bottom").asDouble()).isCloseTo(20.0, within(0.06));
            assertThat(p.path("top").asDouble()).isEqualTo(80.0);
        });
        // only the parts that need lateral air-termination are review items, with their own heights
        List<ReviewItems.Item> items = ReviewItems.of(stored).stream().filter(i -> i.kind().equals("facade-band"))
                .toList();
        assertThat(items).hasSameSizeAs(needing).allSatisfy(i -> {
            assertThat(i.bottom()).isEqualTo(80.0);
            assertThat(i.top()).isEqualTo(100.0);
        });
        JsonNode summary = result.path("analysis").path("summary");
        assertThat(summary.path("facadeBands").asInt()).isEqualTo(needing.size());
        assertThat(summary.path("negligibleFacadeBands").asInt()).isEqualTo(negligible.size());
    }
}
