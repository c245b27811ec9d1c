package org.lpzplanner.analysis;

import java.time.Instant;
import org.lpzplanner.engine.exposure.AnalysisProgress;

/**
 * One background analysis: where it is, how far it got, and how it ended. Thread-safe: the worker
 * reports progress while requests read it and may ask it to stop.
 */
public final class AnalysisJob implements AnalysisProgress {

    /** Where a job is. */
    public enum State { QUEUED, RUNNING, DONE, FAILED, CANCELLED }

    private final String id;
    private final long siteId;
    private final Instant submittedAt;
    private State state = State.QUEUED;
    private String stage;
    private double fraction;
    private Integer revision;
    private String error;
    private volatile boolean cancelRequested;

    AnalysisJob(String id, long siteId, Instant submittedAt) {
        this.id = id;
        this.siteId = siteId;
        this.submittedAt = submittedAt;
    }

    public String id() {
        return id;
    }

    public long siteId() {
        return siteId;
    }

    /** A consistent copy of where the job is, for an answer. */
    public synchronized Snapshot snapshot() {
        return new Snapshot(id, siteId, state, stage, fraction, revision, error, submittedAt);
    }

    /**
     * @param fraction share done, 0..1 (an estimate from the stages)
     * @param revision the stored revision number once done
     * @param error    why the job failed, in plain words
     */
    public record Snapshot(String id, long siteId, State state, String stage, double fraction, Integer revision,
            String error, Instant submittedAt) {
    }

    @Override
    public synchronized void stage(String name, double fractionDone) {
        stage = name;
        fraction = fractionDone;
    }

    @Override
    public boolean cancelled() {
        return cancelRequested;
    }

    synchronized boolean start() {
        if (cancelRequested) {
            state = State.CANCELLED;
            return false;
        }
        state = State.RUNNING;
        return true;
    }

    synchronized void requestCancel() {
        if (state == State.QUEUED || state == State.RUNNING) {
            cancelRequested = true;
            if (state == State.QUEUED) {
                state = State.CANCELLED;
            }
        }
    }

    synchronized void finish(int revisionNumber) {
        state = State.DONE;
        fraction = 1;
        stage = null;
        revision = revisionNumber;
    }

    synchronized void markCancelled() {
        state = State.CANCELLED;
    }

    synchronized void fail(String message) {
        state = State.FAILED;
        error = message;
    }
}
