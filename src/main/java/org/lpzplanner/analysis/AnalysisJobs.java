package org.lpzplanner.analysis;

import java.time.Clock;
import java.time.Duration;
import java.util.Optional;
import java.util.UUID;
import java.util.concurrent.ArrayBlockingQueue;
import java.util.concurrent.RejectedExecutionException;
import java.util.concurrent.ThreadPoolExecutor;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import org.lpzplanner.accounts.CurrentAccount;
import org.lpzplanner.engine.envelope.AnalysisTooLargeException;
import org.lpzplanner.engine.exposure.AnalysisCancelledException;
import org.lpzplanner.jobs.JobInstance;
import org.lpzplanner.jobs.JobStore;
import org.lpzplanner.jobs.StoredJob;
import org.lpzplanner.sites.SiteNotFoundException;
import org.lpzplanner.system.InvalidInputException;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.beans.factory.annotation.Value;
import org.springframework.dao.OptimisticLockingFailureException;
import org.springframework.stereotype.Service;

/**
 * Runs analyses in the background on a small, bounded pool of workers with a short queue, so long
 * analyses show progress and can be cancelled, and a burst of requests is refused
 * ({@link AnalysisBusyException}) instead of piling up. The pool is this instance's; the jobs are
 * rows in the database ({@link JobStore}), so any instance answers a poll or a cancel, and a job
 * survives a restart as its outcome (or as interrupted). Finished jobs are kept for a day, at most
 * {@value #KEPT_PER_SITE} per site.
 */
@Service
public class AnalysisJobs {

    private static final Logger LOG = LoggerFactory.getLogger(AnalysisJobs.class);
    static final int KEPT_PER_SITE = 20;
    static final Duration KEPT_FOR = Duration.ofDays(1);

    private final AnalysisService analyses;
    private final JobStore store;
    private final JobInstance instance;
    private final Clock clock;
    private final ThreadPoolExecutor pool;
    private final int retryAfterSeconds;

    @Autowired
    public AnalysisJobs(AnalysisService analyses, JobStore store, JobInstance instance, Clock clock,
            @Value("${lpz.analysis.workers:2}") int workers, @Value("${lpz.analysis.queue:4}") int queue,
            @Value("${lpz.analysis.retry-after-seconds:5}") int retryAfter) {
        this.analyses = analyses;
        this.store = store;
        this.instance = instance;
        this.clock = clock;
        this.retryAfterSeconds = retryAfter;
        AtomicInteger count = new AtomicInteger();
        this.pool = new ThreadPoolExecutor(Math.max(1, workers), Math.max(1, workers), 30, TimeUnit.SECONDS,
                new ArrayBlockingQueue<>(Math.max(1, queue)), r -> {
                    Thread t = new Thread(r, "analysis-" + count.incrementAndGet());
                    t.setDaemon(true);
                    return t;
                }, new ThreadPoolExecutor.AbortPolicy());
        pool.allowCoreThreadTimeOut(true);
    }

    /**
     * Queues an analysis of the site with these settings (as {@link AnalysisService#run}).
     *
     * @throws SiteNotFoundException when no site has this id
     * @throws InvalidInputException when a setting cannot be used
     * @throws AnalysisBusyException when every worker is busy and the queue is full
     */
    public AnalysisJob.Snapshot submit(long siteId, String level, String radius, String resolution) {
        analyses.check(siteId, level, radius, resolution); // bad input: 4xx now rather than a failed job later
        String id = UUID.randomUUID().toString();
        long teamId = CurrentAccount.teamId();
        store.insert(new JobStore.NewJob(id, JobStore.ANALYSIS, siteId, teamId, CurrentAccount.actorName(),
                JobStore.QUEUED, null, null, null, instance.name()), clock.instant());
        AnalysisJob job = new AnalysisJob(instance.track(id, null), instance);
        try {
            pool.execute(CurrentAccount.carry(() -> runJob(job, siteId, level, radius, resolution)));
        } catch (RejectedExecutionException e) {
            instance.untrack(id);
            store.delete(id);
            throw new AnalysisBusyException(retryAfterSeconds);
        }
        store.prune(siteId, JobStore.ANALYSIS, KEPT_PER_SITE, clock.instant().minus(KEPT_FOR));
        return find(siteId, id).orElseThrow();
    }

    private void runJob(AnalysisJob job, long siteId, String level, String radius, String resolution) {
        try {
            if (!store.markRunning(job.id(), clock.instant())) {
                return; // cancelled while queued
            }
            try {
                AnalysisRevision revision = analyses.run(siteId, level, radius, resolution, job);
                store.finish(job.id(), JobStore.DONE, revision.revision(), null, null, clock.instant());
            } catch (AnalysisCancelledException e) {
                store.finish(job.id(), JobStore.CANCELLED, null, null, null, clock.instant());
            } catch (InvalidInputException | AnalysisTooLargeException | SiteNotFoundException
                    | OptimisticLockingFailureException | org.lpzplanner.system.BusyException
                    | org.lpzplanner.system.OverBudgetException e) {
                store.finish(job.id(), JobStore.FAILED, null, null, e.getMessage(), clock.instant());
            } catch (RuntimeException e) {
                LOG.error("analysis job {} of site {} failed", job.id(), siteId, e);
                store.finish(job.id(), JobStore.FAILED, null, null,
                        "the analysis failed unexpectedly; the site is unchanged", clock.instant());
            }
        } catch (RuntimeException e) {
            LOG.error("analysis job {} of site {}: its state could not be stored", job.id(), siteId, e);
        } finally {
            instance.untrack(job.id());
        }
    }

    /** The job, if it is known and belongs to this site of the caller's team. */
    public Optional<AnalysisJob.Snapshot> find(long siteId, String jobId) {
        return stored(siteId, jobId).map(AnalysisJob.Snapshot::of);
    }

    private Optional<StoredJob> stored(long siteId, String jobId) {
        return store.find(JobStore.ANALYSIS, siteId, CurrentAccount.teamId(), jobId).map(instance::current);
    }

    /**
     * Asks the job to stop, whichever instance runs it: a queued job never starts, a running one
     * stops at its next check after the request reaches it.
     */
    public Optional<AnalysisJob.Snapshot> cancel(long siteId, String jobId) {
        Optional<StoredJob> job = stored(siteId, jobId);
        if (job.isEmpty()) {
            return Optional.empty();
        }
        store.requestCancel(jobId, true, clock.instant());
        instance.cancelLocally(jobId);
        return find(siteId, jobId);
    }

    @jakarta.annotation.PreDestroy
    void stop() {
        pool.shutdownNow();
    }
}
