package org.lpzplanner.analysis;

import java.time.Instant;
import org.lpzplanner.engine.exposure.AnalysisProgress;
import org.lpzplanner.jobs.JobInstance;
import org.lpzplanner.jobs.LiveJob;
import org.lpzplanner.jobs.StoredJob;

/**
 * One background analysis as the worker running it sees it: it reports the engine's stages to the
 * job's {@link LiveJob} and stops when a cancel was asked for on any instance. What readers see is
 * the stored row ({@link Snapshot#of}). Thread-safe: the stages run on several threads.
 */
public final class AnalysisJob implements AnalysisProgress {

    /** Where a job is. */
    public enum State { QUEUED, RUNNING, DONE, FAILED, CANCELLED }

    private final LiveJob live;
    private final JobInstance instance;

    AnalysisJob(LiveJob live, JobInstance instance) {
        this.live = live;
        this.instance = instance;
    }

    String id() {
        return live.id();
    }

    /**
     * Where a job is, as the API shows it.
     *
     * @param fraction share done, 0..1 (an estimate from the stages)
     * @param revision the stored revision number once done
     * @param error    why the job failed, in plain words
     */
    public record Snapshot(String id, long siteId, State state, String stage, double fraction, Integer revision,
            String error, Instant submittedAt) {

        static Snapshot of(StoredJob job) {
            return new Snapshot(job.id(), job.siteId(), State.valueOf(job.state()), job.stage(), job.fraction(),
                    job.revision(), job.error(), job.createdAt());
        }
    }

    @Override
    public void stage(String name, double fractionDone) {
        live.progress(name, fractionDone);
    }

    @Override
    public boolean cancelled() {
        return instance.cancelRequested(live.id());
    }
}
