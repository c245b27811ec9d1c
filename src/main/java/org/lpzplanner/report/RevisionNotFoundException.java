package org.lpzplanner.report;

import org.lpzplanner.system.NotFoundException;

/** The site exists but has no analysis revision with the number asked for. */
public class RevisionNotFoundException extends NotFoundException {

    private static final long serialVersionUID = 1L;

    public RevisionNotFoundException(String message) {
        super(message, "revision");
    }
}
