package org.lpzplanner.system;

/**
 * The server cannot take this work now (its workers and queue are full): the client should try
 * again after {@link #retryAfterSeconds()}. Answered 429 with {@code Retry-After}.
 */
public abstract class BusyException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    private final int retryAfterSeconds;

    protected BusyException(String message, int retryAfterSeconds) {
        super(message);
        this.retryAfterSeconds = retryAfterSeconds;
    }

    public int retryAfterSeconds() {
        return retryAfterSeconds;
    }
}
