package org.lpzplanner.jobs;

import static org.assertj.core.api.Assertions.assertThat;

import java.time.Duration;
import java.time.Instant;
import org.junit.jupiter.api.Test;
import org.lpzplanner.accounts.CurrentAccount;
import org.lpzplanner.accounts.SignedIn;
import org.lpzplanner.sites.SiteService;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.jdbc.core.simple.JdbcClient;

/**
 * The stored jobs stay bounded without losing live ones: of a site's finished jobs the newest 20
 * stay, finished jobs older than a day go, unfinished jobs are never pruned; and a cancel of a
 * queued job stops it for good, while a running one is only flagged for its instance.
 */
@SpringBootTest
@AutoConfigureMockMvc // the suite's shared context has MockMvc; this class does not use it
@SignedIn
class JobStoreTest {

    @Autowired
    JobStore store;
    @Autowired
    SiteService sites;
    @Autowired
    JdbcClient jdbc;

    private long site() {
        return sites.create("yard.wkt", "POLYGON ((0 0, 12 0, 12 8, 0 8, 0 0)) 6".getBytes(), "Job yard", null, null)
                .id();
    }

    private void job(String id, long site, String state, Instant at) {
        store.insert(new JobStore.NewJob(id, JobStore.ANALYSIS, site, CurrentAccount.teamId(), "test", state, null,
                null, null, "instance-test"), at);
    }

    @Test
    void pruningKeepsTheNewestFinishedJobsOfASiteAndEveryUnfinishedOne() {
        long site = site();
        Instant now = Instant.now();
        for (int i = 0; i < 25; i++) {
            Instant at = now.minusSeconds(100 - i);
            job("done-" + i, site, JobStore.RUNNING, at);
            store.finish("done-" + i, JobStore.DONE, i, null, null, at);
        }
        job("old", site, JobStore.RUNNING, now.minus(Duration.ofDays(2)));
        store.finish("old", JobStore.FAILED, null, null, "x", now.minus(Duration.ofDays(2)));
        job("running", site, JobStore.RUNNING, now);

        store.prune(site, JobStore.ANALYSIS, 20, now.minus(Duration.ofDays(1)));

        assertThat(jdbc.sql("SELECT id FROM background_jobs WHERE site_id = ? AND finished_at IS NOT NULL")
                .param(site).query(String.class).list()).hasSize(20).doesNotContain("old", "done-0", "done-4")
                .contains("done-5", "done-24");
        assertThat(store.find("running")).isPresent();
    }

    @Test
    void aCancelledQueuedJobNeverStartsAndARunningOneIsFlagged() {
        long site = site();
        Instant now = Instant.now();
        job("queued-" + site, site, JobStore.QUEUED, now);
        job("flagged-" + site, site, JobStore.RUNNING, now);
        store.requestCancel("queued-" + site, true, now);
        store.requestCancel("flagged-" + site, true, now);
        assertThat(store.find("queued-" + site).orElseThrow().state()).isEqualTo(JobStore.CANCELLED);
        assertThat(store.markRunning("queued-" + site, now)).isFalse();
        StoredJob running = store.find("flagged-" + site).orElseThrow();
        assertThat(running.state()).isEqualTo(JobStore.RUNNING);
        assertThat(running.cancelRequested()).isTrue();
        assertThat(store.cancelRequested("instance-test")).contains("flagged-" + site);
        // another team does not find the job
        assertThat(store.find(JobStore.ANALYSIS, site, CurrentAccount.teamId() + 1000, "flagged-" + site)).isEmpty();
    }
}
