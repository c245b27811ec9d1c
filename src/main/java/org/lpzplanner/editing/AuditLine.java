package org.lpzplanner.editing;

/**
 * What the audit trail records of a change: an action ({@code rod-added}, {@code correction}, ...)
 * and its detail in words. A change that says which earlier file keeps the site as it was gets the
 * number of that file appended once it is known ({@link #namingEarlierFile}).
 */
public record AuditLine(String action, String detail, boolean namesEarlierFile) {

    public static AuditLine of(String action, String detail) {
        return new AuditLine(action, detail, false);
    }

    /** A line ending with " (earlier file kept as number N)" once the change is stored. */
    public static AuditLine namingEarlierFile(String action, String detail) {
        return new AuditLine(action, detail, true);
    }

    /** The line as recorded when the file it replaced is kept as earlier file {@code keptNumber}. */
    AuditLine recorded(int keptNumber) {
        return namesEarlierFile ? of(action, detail + " (earlier file kept as number " + keptNumber + ")") : this;
    }
}
