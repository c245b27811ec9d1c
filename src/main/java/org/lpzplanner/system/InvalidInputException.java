package org.lpzplanner.system;

/**
 * A request value that cannot be used (an unknown protection level, a radius out of range, …). The
 * message says which value and why, in words fit to show to users; the web layer answers 400.
 */
public class InvalidInputException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    private final String field;

    public InvalidInputException(String field, String message) {
        super(message);
        this.field = field;
    }

    /** The request parameter at fault. */
    public String field() {
        return field;
    }
}
