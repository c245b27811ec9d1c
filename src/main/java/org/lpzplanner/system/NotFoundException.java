package org.lpzplanner.system;

/**
 * Something asked for is not stored (a site, a revision, a review item, a job). The message says
 * what, in words fit to show to users; the JSON API answers 404 and pages show a not-found page.
 * Features extend it with their own kind of thing.
 */
public abstract class NotFoundException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    private final String field;

    /** @param field the request value at fault, or null when the path as a whole names the thing */
    protected NotFoundException(String message, String field) {
        super(message);
        this.field = field;
    }

    /** The request value at fault, or null. */
    public String field() {
        return field;
    }
}
