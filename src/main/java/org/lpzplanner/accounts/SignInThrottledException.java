package org.lpzplanner.accounts;

import java.time.Duration;
import org.springframework.security.core.AuthenticationException;

/** The account is locked after failed sign-ins; the password is not even checked. */
public class SignInThrottledException extends AuthenticationException {

    private static final long serialVersionUID = 1L;

    private final long waitMinutes;

    public SignInThrottledException(Duration wait) {
        super("too many failed sign-ins for this account; try again in " + minutes(wait) + " minute(s)");
        this.waitMinutes = minutes(wait);
    }

    /** Whole minutes until the lock ends, rounded up; at least 1. */
    public long waitMinutes() {
        return waitMinutes;
    }

    private static long minutes(Duration wait) {
        long seconds = Math.max(1, wait.toSeconds() + (wait.toNanosPart() > 0 ? 1 : 0));
        return (seconds + 59) / 60;
    }
}
