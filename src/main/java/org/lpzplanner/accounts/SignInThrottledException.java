package org.lpzplanner.accounts;

import org.springframework.security.core.AuthenticationException;

/** Too many failed sign-ins for this account or address; the password is not even checked. */
public class SignInThrottledException extends AuthenticationException {

    private static final long serialVersionUID = 1L;

    public SignInThrottledException(long minutes) {
        super("too many failed sign-ins; try again in " + minutes + " minutes");
    }
}
