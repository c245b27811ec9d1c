package org.lpzplanner.engine.io;

/**
 * Where in a site file something was read from (a feature or a line), so that every check can
 * report its problem at the right spot without knowing the file format.
 */
interface Place {

    /** Short human description, e.g. {@code feature 3 ("North hall")} or {@code line 4}. */
    String label();

    /** An exception for a problem with one field at this place (field may be null). */
    SiteFormatException fail(String field, String problem);
}
