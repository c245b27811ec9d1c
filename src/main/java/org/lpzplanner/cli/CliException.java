package org.lpzplanner.cli;

/**
 * Something the user asked for cannot be done as given: an unknown command or option, a missing or
 * invalid value, an unreadable or invalid input file. The message is one line, says what is wrong
 * and, where it helps, what to do; it is shown after {@code error: } with exit code 2.
 */
final class CliException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    CliException(String message) {
        super(message);
    }

    CliException(String message, Throwable cause) {
        super(message, cause);
    }
}
