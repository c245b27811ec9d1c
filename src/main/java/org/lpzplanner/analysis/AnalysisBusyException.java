package org.lpzplanner.analysis;

import org.lpzplanner.system.BusyException;

/** Every analysis worker is busy and the queue is full: the client should try again later. */
public final class AnalysisBusyException extends BusyException {

    private static final long serialVersionUID = 1L;

    public AnalysisBusyException(int retryAfterSeconds) {
        super("the server is busy with other analyses; try again in " + retryAfterSeconds + " s", retryAfterSeconds);
    }
}
