package org.lpzplanner.analysis;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.time.Clock;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.lpzplanner.accounts.SignedIn;
import org.lpzplanner.engine.exposure.AnalysisProgress;
import org.lpzplanner.jobs.JobInstance;
import org.lpzplanner.jobs.JobStore;
import org.lpzplanner.sites.SiteService;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.jdbc.core.simple.JdbcClient;

/**
 * The background pool is bounded: one worker and a queue of one take two jobs, the third is
 * refused; a queued job cancelled never runs, a running one stops at its next check.
 */
@SpringBootTest
@AutoConfigureMockMvc // the suite's shared context has MockMvc; this class does not use it
@SignedIn
class AnalysisJobsTest {

    @Autowired
    SiteService sites;
    @Autowired
    JobStore store;
    @Autowired
    JobInstance instance;
    @Autowired
    JdbcClient jdbc;

    /** Stands in for the analysis: waits, checking for a cancel like the engine does between items. */
    static final class SlowAnalyses extends AnalysisService {
        final CountDownLatch release = new CountDownLatch(1);
        final CountDownLatch started = new CountDownLatch(1);
        volatile int runs;

        SlowAnalyses() {
            super(null, null, null, Clock.systemUTC(), new AnalysisStateCache(0, 0), null, null,
                    new org.lpzplanner.heavywork.HeavyWorkCapacity(1, 0, 5), new ParsedResults(0, org.lpzplanner.engine.io.Json.MAPPER));
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
        long site = sites.create("yard.wkt", "POLYGON ((0 0, 12 0, 12 8, 0 8, 0 0)) 6".getBytes(), "Pool yard", null,
                null).id();
        SlowAnalyses slow = new SlowAnalyses();
        AnalysisJobs jobs = new AnalysisJobs(slow, store, instance, Clock.systemUTC(), 1, 1, 3);
        try {
            String running = jobs.submit(site, null, null, null).id();
            assertThat(slow.started.await(5, TimeUnit.SECONDS)).isTrue();
            String queued = jobs.submit(site, null, null, null).id();
            assertThatThrownBy(() -> jobs.submit(site, null, null, null)).isInstanceOf(AnalysisBusyException.class)
                    .satisfies(e -> assertThat(((AnalysisBusyException) e).retryAfterSeconds()).isEqualTo(3));
            assertThat(state(jobs, site, queued)).isEqualTo(AnalysisJob.State.QUEUED);
            jobs.cancel(site, queued);
            assertThat(state(jobs, site, queued)).isEqualTo(AnalysisJob.State.CANCELLED);
            jobs.cancel(site, running);
            for (int k = 0; k < 500 && state(jobs, site, running) == AnalysisJob.State.RUNNING; k++) {
                Thread.sleep(10);
            }
            assertThat(state(jobs, site, running)).isEqualTo(AnalysisJob.State.CANCELLED);
            assertThat(jobs.find(site, running).orElseThrow().revision()).isNull();
            Thread.sleep(100);
            assertThat(slow.runs).as("the cancelled queued job never ran").isEqualTo(1);
            String after = jobs.submit(site, null, null, null).id();
            slow.release.countDown();
            for (int k = 0; k < 500 && state(jobs, site, after) != AnalysisJob.State.DONE; k++) {
                Thread.sleep(10);
            }
            assertThat(jobs.find(site, after).orElseThrow().revision()).isEqualTo(7);
            // the refused job left no row behind: the running, the queued and the last one are stored
            assertThat(jdbc.sql("SELECT COUNT(*) FROM background_jobs WHERE site_id = ?").param(site)
                    .query(Long.class).single()).isEqualTo(3);
        } finally {
            slow.release.countDown();
            jobs.stop();
        }
    }

    private static AnalysisJob.State state(AnalysisJobs jobs, long site, String id) {
        return jobs.find(site, id).orElseThrow().state();
    }
}
