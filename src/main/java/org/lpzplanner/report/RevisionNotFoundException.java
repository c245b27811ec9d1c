package org.lpzplanner.report;

/** The site exists but has no analysis revision with the number asked for. */
public class RevisionNotFoundException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    public RevisionNotFoundException(String message) {
        super(message);
    }
}
