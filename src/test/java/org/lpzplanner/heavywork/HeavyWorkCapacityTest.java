package org.lpzplanner.heavywork;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.lpzplanner.engine.design.proposal.ProposalMonitor;
import org.lpzplanner.engine.exposure.AnalysisOptions;
import org.lpzplanner.engine.exposure.AnalysisProgress;
import org.lpzplanner.engine.exposure.ExposureAnalysis;
import org.lpzplanner.engine.io.SiteReader;
import org.lpzplanner.engine.model.ProtectionLevel;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.SphereSpec;

/**
 * At most the configured number of long computations run at once; a caller beyond that is told to
 * retry; a thread holding a place runs nested work in it; a computation past its time budget is
 * stopped at the engine's next check.
 */
class HeavyWorkCapacityTest {

    /** A plain box, 12 m × 8 m × 6 m (WKT, ISO/IEC 13249-3), analysed in far less than any budget. */
    private static final Site BOX = SiteReader.readWkt("POLYGON ((0 0, 12 0, 12 8, 0 8, 0 0)) 6", "box.wkt").site();

    @Test
    void aCallerBeyondTheBoundIsToldToRetryAndTheNextOneAfterAFinishedRunGetsIn() throws Exception {
        HeavyWorkCapacity capacity = new HeavyWorkCapacity(1, 0.05, 7);
        CountDownLatch running = new CountDownLatch(1);
        CountDownLatch release = new CountDownLatch(1);
        ExecutorService other = Executors.newSingleThreadExecutor();
        try {
            Future<String> first = other.submit(() -> capacity.run("analysis", () -> {
                running.countDown();
                await(release);
                return "first";
            }));
            assertThat(running.await(5, TimeUnit.SECONDS)).isTrue();

            assertThatThrownBy(() -> capacity.run("method check", () -> "second"))
                    .isInstanceOfSatisfying(HeavyWorkBusyException.class, e -> {
                        assertThat(e.retryAfterSeconds()).isEqualTo(7);
                        assertThat(e.getMessage()).contains("busy", "method check", "7 s");
                    });

            release.countDown();
            assertThat(first.get(5, TimeUnit.SECONDS)).isEqualTo("first");
            assertThat(capacity.run("analysis", () -> "third")).isEqualTo("third");
        } finally {
            other.shutdownNow();
        }
    }

    @Test
    void aFailedComputationGivesItsPlaceBack() {
        HeavyWorkCapacity capacity = new HeavyWorkCapacity(1, 0, 5);
        assertThatThrownBy(() -> capacity.run("analysis", () -> {
            throw new IllegalStateException("engine failure");
        })).hasMessage("engine failure");
        assertThat(capacity.holdsPlace()).isFalse();
        assertThat(capacity.run("analysis", () -> "next")).isEqualTo("next");
    }

    @Test
    void nestedWorkRunsInThePlaceTheThreadHoldsWithoutWaitingForASecond() {
        HeavyWorkCapacity capacity = new HeavyWorkCapacity(1, 0, 5);
        String nested = capacity.run("report", () -> capacity.run("analysis",
                () -> capacity.run("separation survey", () -> "inner")));
        assertThat(nested).isEqualTo("inner");
        // the one place is free again after the outermost run
        assertThat(capacity.holdsPlace()).isFalse();
        assertThat(capacity.run("analysis", () -> "after")).isEqualTo("after");
    }

    @Test
    void anAnalysisPastItsBudgetIsStoppedNamingTheBudget() {
        HeavyWorkCapacity capacity = new HeavyWorkCapacity(1, 0, 9, 0);
        AnalysisOptions options = AnalysisOptions.of(SphereSpec.of(ProtectionLevel.II));
        assertThatThrownBy(() -> capacity.run("method check", () -> ExposureAnalysis.analyzeKeepingState(BOX,
                options, capacity.budgeted(AnalysisProgress.NONE))))
                .isInstanceOfSatisfying(HeavyWorkOverBudgetException.class, e -> {
                    assertThat(e.retryAfterSeconds()).isEqualTo(9);
                    assertThat(e.getMessage()).contains("method check", "time budget of 0 s", "nothing was stored");
                });
        assertThat(capacity.holdsPlace()).isFalse();
    }

    @Test
    void anAnalysisWithinItsBudgetRunsToItsEnd() {
        HeavyWorkCapacity capacity = new HeavyWorkCapacity(1, 0, 9, 600);
        AnalysisOptions options = AnalysisOptions.of(SphereSpec.of(ProtectionLevel.II));
        assertThat(capacity.run("analysis", () -> ExposureAnalysis.analyzeKeepingState(BOX, options,
                capacity.budgeted(AnalysisProgress.NONE)).result())).isNotNull();
    }

    @Test
    void aProposalPastItsBudgetIsStoppedAtItsNextCheck() {
        HeavyWorkCapacity capacity = new HeavyWorkCapacity(1, 0, 9, 0);
        assertThatThrownBy(() -> capacity.run("proposal", () -> capacity.budgeted(ProposalMonitor.NONE).isCancelled()))
                .isInstanceOf(HeavyWorkOverBudgetException.class).hasMessageContaining("proposal");
        assertThatThrownBy(() -> capacity.run("report", () -> {
            capacity.checkBudget();
            return null;
        })).isInstanceOf(HeavyWorkOverBudgetException.class).hasMessageContaining("report");
    }

    @Test
    void outsideAPlaceNoBudgetApplies() {
        HeavyWorkCapacity capacity = new HeavyWorkCapacity(1, 0, 9, 0);
        assertThat(capacity.budgeted(AnalysisProgress.NONE)).isSameAs(AnalysisProgress.NONE);
        capacity.checkBudget();
    }

    private static void await(CountDownLatch latch) {
        try {
            latch.await(5, TimeUnit.SECONDS);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }
}
