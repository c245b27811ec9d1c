package org.lpzplanner.report;

import org.lpzplanner.system.ConflictException;

/**
 * A revision cannot be printed because the site file it analysed is no longer stored (it was
 * analysed before files were kept with revisions, and the file has since been replaced).
 */
public class RevisionInputsMissingException extends ConflictException {

    private static final long serialVersionUID = 1L;

    public RevisionInputsMissingException(String message) {
        super(message, "revision");
    }
}
