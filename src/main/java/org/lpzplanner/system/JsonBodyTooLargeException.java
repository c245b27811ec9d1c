package org.lpzplanner.system;

/** A JSON request body larger than {@link JsonBodyLimit} takes; answered 413 naming the limit. */
public class JsonBodyTooLargeException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    JsonBodyTooLargeException(String message) {
        super(message);
    }
}
