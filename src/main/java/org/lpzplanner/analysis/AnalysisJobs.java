package org.lpzplanner.analysis;

import java.time.Clock;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;
import java.util.UUID;
import java.util.concurrent.ArrayBlockingQueue;
import java.util.concurrent.RejectedExecutionException;
import java.util.concurrent.ThreadPoolExecutor;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import org.lpzplanner.engine.exposure.AnalysisCancelledException;
import org.lpzplanner.engine.envelope.AnalysisTooLargeException;
import org.lpzplanner.sites.SiteNotFoundException;
import org.lpzplanner.system.InvalidInputException;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.springframework.beans.factory.annotation.Value;
import org.springframework.dao.OptimisticLockingFailureException;
import org.springframework.stereotype.Service;

/**
 * Runs analyses in the background on a small, bounded pool of workers with a short queue, so long
 * analyses show progress and can be cancelled, and a burst of requests is refused
 * ({@link AnalysisBusyException}) instead of piling up. Finished jobs are remembered for a while
 * (the most recent {@value #KEPT_JOBS}) so their outcome can be read.
 */
@Service
public class AnalysisJobs {

    private static final Logger LOG = LoggerFactory.getLogger(AnalysisJobs.class);
    static final int KEPT_JOBS = 200;

    private final AnalysisService analyses;
    private final Clock clock;
    private final ThreadPoolExecutor pool;
    private final int retryAfterSeconds;
    private final Map<String, AnalysisJob> jobs = new LinkedHashMap<>();

    public AnalysisJobs(AnalysisService analyses, Clock clock, @Value("${lpz.analysis.workers:2}") int workers,
            @Value("${lpz.analysis.queue:4}") int queue, @Value("${lpz.analysis.retry-after-seconds:5}") int retryAfter) {
        this.analyses = analyses;
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
    public AnalysisJob submit(long siteId, String level, String radius, String resolution) {
        analyses.check(siteId, level, radius, resolution); // bad input: 4xx now rather than a failed job later
        AnalysisJob job = new AnalysisJob(UUID.randomUUID().toString(), siteId, clock.instant());
        synchronized (jobs) {
            jobs.put(job.id(), job);
            while (jobs.size() > KEPT_JOBS) {
                String oldest = jobs.keySet().iterator().next();
                jobs.remove(oldest);
            }
        }
        try {
            pool.execute(() -> runJob(job, level, radius, resolution));
        } catch (RejectedExecutionException e) {
            synchronized (jobs) {
                jobs.remove(job.id());
            }
            throw new AnalysisBusyException(retryAfterSeconds);
        }
        return job;
    }

    private void runJob(AnalysisJob job, String level, String radius, String resolution) {
        if (!job.start()) {
            return; // cancelled while queued
        }
        try {
            AnalysisRevision revision = analyses.run(job.siteId(), level, radius, resolution, job);
            job.finish(revision.revision());
        } catch (AnalysisCancelledException e) {
            job.markCancelled();
        } catch (InvalidInputException | AnalysisTooLargeException | SiteNotFoundException
                | OptimisticLockingFailureException e) {
            job.fail(e.getMessage());
        } catch (RuntimeException e) {
            LOG.error("analysis job {} of site {} failed", job.id(), job.siteId(), e);
            job.fail("the analysis failed unexpectedly; the site is unchanged");
        }
    }

    /** The job, if it is known and belongs to this site. */
    public Optional<AnalysisJob> find(long siteId, String jobId) {
        synchronized (jobs) {
            return Optional.ofNullable(jobs.get(jobId)).filter(j -> j.siteId() == siteId);
        }
    }

    /** Asks the job to stop; a queued job never starts, a running one stops at its next check. */
    public Optional<AnalysisJob> cancel(long siteId, String jobId) {
        Optional<AnalysisJob> job = find(siteId, jobId);
        job.ifPresent(AnalysisJob::requestCancel);
        return job;
    }

    @jakarta.annotation.PreDestroy
    void stop() {
        pool.shutdownNow();
    }
}
