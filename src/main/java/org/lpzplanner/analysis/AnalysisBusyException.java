package org.lpzplanner.analysis;

/** Every analysis worker is busy and the queue is full: the client should try again later. */
public final class AnalysisBusyException extends RuntimeException {

    private final int retryAfterSeconds;

    public AnalysisBusyException(int retryAfterSeconds) {
        super("the server is busy with other analyses; try again in " + retryAfterSeconds + " s");
        this.retryAfterSeconds = retryAfterSeconds;
    }

    public int retryAfterSeconds() {
        return retryAfterSeconds;
    }
}
