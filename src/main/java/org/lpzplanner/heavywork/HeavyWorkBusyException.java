package org.lpzplanner.heavywork;

import org.lpzplanner.system.BusyException;

/** Every place for long computations of this instance is taken: the client should try again later. */
public final class HeavyWorkBusyException extends BusyException {

    private static final long serialVersionUID = 1L;

    public HeavyWorkBusyException(String what, int retryAfterSeconds) {
        super("the server is busy with other long computations (analyses, design checks, sections, reports) and"
                + " cannot start the " + what + " now; try again in " + retryAfterSeconds + " s", retryAfterSeconds);
    }
}
