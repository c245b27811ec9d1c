package org.lpzplanner.jobs;

/**
 * A job running (or waiting for a worker) in this instance: the worker writes where it is here, and
 * reads whether it should stop. {@link JobInstance} copies the progress to the database and the
 * cancel flag from it at every heartbeat, so neither costs the worker a database call. Thread-safe.
 */
public final class LiveJob {

    private final String id;
    private volatile String stage;
    private volatile double fraction;
    private volatile boolean cancelRequested;

    LiveJob(String id, String stage) {
        this.id = id;
        this.stage = stage;
    }

    public String id() {
        return id;
    }

    public String stage() {
        return stage;
    }

    public double fraction() {
        return fraction;
    }

    public void progress(String stageName, double fractionDone) {
        stage = stageName;
        fraction = Math.max(0, Math.min(1, fractionDone));
    }

    public boolean cancelRequested() {
        return cancelRequested;
    }

    void requestCancel() {
        cancelRequested = true;
    }
}
