package org.lpzplanner.analysis;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.lpzplanner.engine.exposure.AnalysisOptions;
import org.lpzplanner.engine.exposure.AnalysisProgress;
import org.lpzplanner.engine.exposure.AnalysisState;
import org.lpzplanner.engine.exposure.ExposureAnalysis;
import org.lpzplanner.engine.io.SiteReader;
import org.lpzplanner.engine.model.ProtectionLevel;
import org.lpzplanner.engine.model.SphereSpec;

/** The kept analyses stay within their count and cell budget, one per site, latest version first. */
class AnalysisStateCacheTest {

    private static final AnalysisState HARBOUR = ExposureAnalysis.analyzeKeepingState(
            SiteReader.read(Path.of("sample-sites/harbour-warehouse.geojson")).site(),
            AnalysisOptions.of(SphereSpec.of(ProtectionLevel.III)).withResolution(1.0), AnalysisProgress.NONE);

    @Test
    void keepsOneStatePerSiteAndForgetsTheLeastRecentlyUsedBeyondTheCount() {
        AnalysisStateCache cache = new AnalysisStateCache(2, Long.MAX_VALUE);
        cache.keep(1, 4, HARBOUR);
        cache.keep(1, 5, HARBOUR);
        assertThat(cache.size()).isEqualTo(1);
        assertThat(cache.closest(1, 9)).containsSame(HARBOUR);
        cache.keep(2, 1, HARBOUR);
        cache.closest(1, 5);
        cache.keep(3, 1, HARBOUR);
        assertThat(cache.size()).isEqualTo(2);
        assertThat(cache.closest(2, 1)).as("least recently used").isEmpty();
        assertThat(cache.closest(1, 5)).isPresent();
        assertThat(cache.closest(3, 1)).isPresent();
    }

    @Test
    void theCellBudgetLimitsWhatIsKept() {
        long cells = HARBOUR.gridCells();
        AnalysisStateCache cache = new AnalysisStateCache(10, cells * 2);
        cache.keep(1, 1, HARBOUR);
        cache.keep(2, 1, HARBOUR);
        cache.keep(3, 1, HARBOUR);
        assertThat(cache.size()).isEqualTo(2);
        assertThat(cache.closest(1, 1)).isEmpty();
        AnalysisStateCache tiny = new AnalysisStateCache(10, cells - 1);
        tiny.keep(1, 1, HARBOUR);
        assertThat(tiny.size()).isZero();
    }
}
