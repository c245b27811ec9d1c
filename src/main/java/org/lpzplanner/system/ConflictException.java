package org.lpzplanner.system;

/**
 * The request cannot be done in the present state of what it concerns (for example a revision
 * whose site file is no longer stored). The message says why; answered 409.
 */
public abstract class ConflictException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    private final String field;

    protected ConflictException(String message, String field) {
        super(message);
        this.field = field;
    }

    /** The request value at fault, or null. */
    public String field() {
        return field;
    }
}
