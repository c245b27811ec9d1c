package org.lpzplanner.analysis;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.time.Clock;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.lpzplanner.engine.exposure.AnalysisProgress;

/**
 * The background pool is bounded: one worker and a queue of one take two jobs, the third is
 * refused; a queued job cancelled never runs, a running one stops at its next check.
 */
class AnalysisJobsTest {

    /** Stands in for the analysis: waits, checking for a cancel like the engine does between items. */
    static final class SlowAnalyses extends AnalysisService {
        final CountDownLatch release = new CountDownLatch(1);
        final CountDownLatch started = new CountDownLatch(1);
        volatile int runs;

        SlowAnalyses() {
            super(null, null, null, null, Clock.systemUTC(), new AnalysisStateCache(0, 0), null, null,
                    new AnalysisCapacity(1, 0, 5));
        }

        @Override
        public void check(long siteId, String level, String radius, String resolution) {
        }

        @Override
        public AnalysisRevision run(long siteId, String level, String radius, String resolution,
                AnalysisProgress progress) {
            runs++;
            started.countDown();
            try {
                while (!release.await(10, TimeUnit.MILLISECONDS)) {
                    progress.stage("envelope", 0.1);
                    progress.checkCancelled();
                }
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
            return new AnalysisRevision(1, siteId, 7, null, 45, 0.5, "", 0, 0, 0, 0, 0, true, "{}", null, 1);
        }
    }

    @Test
    void aFullPoolRefusesWithATimeToRetryAndCancelsStopJobs() throws Exception {
        SlowAnalyses slow = new SlowAnalyses();
        AnalysisJobs jobs = new AnalysisJobs(slow, Clock.systemUTC(), 1, 1, 3);
        try {
            AnalysisJob running = jobs.submit(1, null, null, null);
            assertThat(slow.started.await(5, TimeUnit.SECONDS)).isTrue();
            AnalysisJob queued = jobs.submit(1, null, null, null);
            assertThatThrownBy(() -> jobs.submit(1, null, null, null)).isInstanceOf(AnalysisBusyException.class)
                    .satisfies(e -> assertThat(((AnalysisBusyException) e).retryAfterSeconds()).isEqualTo(3));
            assertThat(queued.snapshot().state()).isEqualTo(AnalysisJob.State.QUEUED);
            jobs.cancel(1, queued.id());
            assertThat(queued.snapshot().state()).isEqualTo(AnalysisJob.State.CANCELLED);
            jobs.cancel(1, running.id());
            for (int k = 0; k < 500 && running.snapshot().state() == AnalysisJob.State.RUNNING; k++) {
                Thread.sleep(10);
            }
            assertThat(running.snapshot().state()).isEqualTo(AnalysisJob.State.CANCELLED);
            assertThat(running.snapshot().revision()).isNull();
            Thread.sleep(100);
            assertThat(slow.runs).as("the cancelled queued job never ran").isEqualTo(1);
            AnalysisJob after = jobs.submit(1, null, null, null);
            slow.release.countDown();
            for (int k = 0; k < 500 && after.snapshot().state() != AnalysisJob.State.DONE; k++) {
                Thread.sleep(10);
            }
            assertThat(after.snapshot().revision()).isEqualTo(7);
        } finally {
            slow.release.countDown();
            jobs.stop();
        }
    }
}
