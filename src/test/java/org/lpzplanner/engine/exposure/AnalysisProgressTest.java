package org.lpzplanner.engine.exposure;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.lpzplanner.engine.io.SiteReader;
import org.lpzplanner.engine.model.ProtectionLevel;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.SphereSpec;

/** An analysis reports its stages in order and stops, returning nothing, when asked to. */
class AnalysisProgressTest {

    private static final Site HARBOUR = SiteReader.read(Path.of("sample-sites/harbour-warehouse.geojson")).site();
    private static final AnalysisOptions OPTIONS = AnalysisOptions.of(SphereSpec.of(ProtectionLevel.III)).withResolution(1.0);

    @Test
    void stagesAreReportedInOrderWithGrowingShares() {
        List<String> stages = new ArrayList<>();
        List<Double> shares = new ArrayList<>();
        ExposureAnalysis.analyzeKeepingState(HARBOUR, OPTIONS, new AnalysisProgress() {
            @Override
            public synchronized void stage(String stage, double fractionDone) {
                stages.add(stage);
                shares.add(fractionDone);
            }
        });
        assertThat(stages).containsExactly("envelope", "edges", "roofs", "corners", "facades", "parts", "ground");
        assertThat(shares).isSorted().allSatisfy(f -> assertThat(f).isBetween(0.0, 1.0));
        assertThat(shares.get(0)).isZero();
    }

    @Test
    void aCancelStopsTheAnalysisAtTheNextCheck() {
        List<String> stages = new ArrayList<>();
        AnalysisProgress cancelAtRoofs = new AnalysisProgress() {
            volatile boolean stop;

            @Override
            public synchronized void stage(String stage, double fractionDone) {
                stages.add(stage);
                stop = stop || stage.equals("roofs");
            }

            @Override
            public boolean cancelled() {
                return stop;
            }
        };
        assertThatThrownBy(() -> ExposureAnalysis.analyzeKeepingState(HARBOUR, OPTIONS, cancelAtRoofs))
                .isInstanceOf(AnalysisCancelledException.class);
        assertThat(stages).containsExactly("envelope", "edges", "roofs");
    }
}
