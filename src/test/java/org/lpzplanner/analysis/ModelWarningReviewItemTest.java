package org.lpzplanner.analysis;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.lpzplanner.engine.exposure.AnalysisOptions;
import org.lpzplanner.engine.exposure.AnalysisResult;
import org.lpzplanner.engine.exposure.ExposureAnalysis;
import org.lpzplanner.engine.io.SiteDocument;
import org.lpzplanner.engine.io.SiteReader;
import org.lpzplanner.engine.model.ProtectionLevel;
import org.lpzplanner.engine.model.SphereSpec;

/**
 * Model warnings are review items: a hut under a wire strung at 45 m between two masts, at level I
 * (R = 20 m, IEC 62305-3:2010 Table 2): the wire runs more than R above what lies beneath it, where a
 * sphere can pass under it (IEC 62305-3:2010 Annex A).
 */
class ModelWarningReviewItemTest {

    private static String stored() throws Exception {
        SiteDocument document = SiteReader.readGeoJson(Files.readString(ResultGeoJsonTest.WIRE_ABOVE_HUT),
                "wire-above-hut.geojson");
        AnalysisResult result = ExposureAnalysis.analyze(document.site(),
                AnalysisOptions.of(SphereSpec.of(ProtectionLevel.I)));
        return ResultGeoJson.write(document, result);
    }

    @Test
    void theWireIsAReviewItemNamingThePartWithItsHeightAboveTheSurfaceAndTheText() throws Exception {
        List<ReviewItems.Item> warnings = ReviewItems.of(stored()).stream()
                .filter(ReviewItems.Item::isModelWarning).toList();

        assertThat(warnings).hasSize(1);
        ReviewItems.Item item = warnings.get(0);
        assertThat(item.owner()).isEqualTo("Span wire");
        assertThat(item.kind()).isEqualTo("free-span");
        assertThat(item.key()).matches("free-span-[0-9a-f]{12}");
        // more than R = 20 m above the surface beneath, at most the wire's 45 m above the ground
        assertThat(item.heightAboveSurface()).isGreaterThan(20.0).isLessThanOrEqualTo(45.0);
        assertThat(item.text()).contains("Span wire");
        assertThat(item.bottom()).isNull();
    }

    @Test
    void theWarningKeepsItsKeyInALaterAnalysisOfTheSameSite() throws Exception {
        String first = ReviewItems.of(stored()).stream().filter(ReviewItems.Item::isModelWarning).findFirst()
                .orElseThrow().key();
        String again = ReviewItems.of(stored()).stream().filter(ReviewItems.Item::isModelWarning).findFirst()
                .orElseThrow().key();
        assertThat(again).isEqualTo(first);
    }

    @Test
    void anAcceptedWarningLendsNoGeometryToTheProposalsAcceptedItems() throws Exception {
        String stored = stored();
        String key = ReviewItems.of(stored).stream().filter(ReviewItems.Item::isModelWarning).findFirst()
                .orElseThrow().key();
        // accepting a warning says nothing about what lies beneath the wire: nothing there is
        // taken as accepted when air-termination is proposed
        assertThat(ReviewItems.geometries(stored, Set.of(key))).isEmpty();
    }
}
