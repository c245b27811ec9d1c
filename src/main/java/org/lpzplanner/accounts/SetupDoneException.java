package org.lpzplanner.accounts;

/** The first administrator exists already, so the setup page is closed for good. */
public class SetupDoneException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    public SetupDoneException() {
        super("the app is set up already; sign in instead");
    }
}
