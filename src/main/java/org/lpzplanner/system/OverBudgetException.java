package org.lpzplanner.system;

/**
 * A computation ran past the time it may take and was stopped; nothing of it was kept. The client
 * may try again after {@link #retryAfterSeconds()} (the machine may be less busy then). Answered 503
 * with {@code Retry-After}.
 */
public abstract class OverBudgetException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    private final int retryAfterSeconds;

    protected OverBudgetException(String message, int retryAfterSeconds) {
        super(message);
        this.retryAfterSeconds = retryAfterSeconds;
    }

    public int retryAfterSeconds() {
        return retryAfterSeconds;
    }
}
