package org.lpzplanner.editing;

import org.lpzplanner.engine.io.SiteDocument;
import org.lpzplanner.sites.StoredSite;

/**
 * A change of a stored site's file: what to do to its text. It is given the site as stored and its
 * file as read, and answers the changed text, the line the audit trail records and whatever the
 * caller wants back (a new part's id, a part as it was). It stores nothing itself: {@link
 * EditPipeline} reads the changed text back like an upload, stores it and records it.
 *
 * @param <T> what the change gives back to its caller
 */
@FunctionalInterface
public interface SiteChange<T> {

    /**
     * @param site     the site at the version the change was asked for
     * @param document its file as read: shared, read it and never change it
     * @throws org.lpzplanner.system.InvalidInputException when a value cannot be used, naming the
     *         field (nothing is stored)
     * @throws org.lpzplanner.system.NotFoundException when the change names a part the site does not
     *         hold (nothing is stored)
     */
    Changed<T> apply(StoredSite site, SiteDocument document);

    /**
     * What a change made of the file.
     *
     * @param text    the whole changed file, in the file's own format
     * @param audit   what the audit trail records of the change
     * @param outcome what the change gives back to its caller (may be null)
     */
    record Changed<T>(String text, AuditLine audit, T outcome) {
    }
}
