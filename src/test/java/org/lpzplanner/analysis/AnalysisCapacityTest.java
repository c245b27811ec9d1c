package org.lpzplanner.analysis;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;

/** At most the configured number of analyses run at once; a caller beyond that is told to retry. */
class AnalysisCapacityTest {

    @Test
    void aCallerBeyondTheBoundIsToldToRetryAndTheNextOneAfterAFinishedRunGetsIn() throws Exception {
        AnalysisCapacity capacity = new AnalysisCapacity(1, 0.05, 7);
        CountDownLatch running = new CountDownLatch(1);
        CountDownLatch release = new CountDownLatch(1);
        ExecutorService other = Executors.newSingleThreadExecutor();
        try {
            Future<String> first = other.submit(() -> capacity.run(() -> {
                running.countDown();
                await(release);
                return "first";
            }));
            assertThat(running.await(5, TimeUnit.SECONDS)).isTrue();

            assertThatThrownBy(() -> capacity.run(() -> "second"))
                    .isInstanceOfSatisfying(AnalysisBusyException.class,
                            e -> assertThat(e.retryAfterSeconds()).isEqualTo(7));

            release.countDown();
            assertThat(first.get(5, TimeUnit.SECONDS)).isEqualTo("first");
            assertThat(capacity.run(() -> "third")).isEqualTo("third");
        } finally {
            other.shutdownNow();
        }
    }

    @Test
    void aFailedAnalysisGivesItsPlaceBack() {
        AnalysisCapacity capacity = new AnalysisCapacity(1, 0, 5);
        assertThatThrownBy(() -> capacity.run(() -> {
            throw new IllegalStateException("engine failure");
        })).hasMessage("engine failure");
        assertThat(capacity.run(() -> "next")).isEqualTo("next");
    }

    private static void await(CountDownLatch latch) {
        try {
            latch.await(5, TimeUnit.SECONDS);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }
}
