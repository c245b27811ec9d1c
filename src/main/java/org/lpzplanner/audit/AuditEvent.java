package org.lpzplanner.audit;

import java.time.Instant;

/**
 * One recorded change of a site.
 *
 * @param actor  the e-mail of the account that made it, or the name of a task of the app
 * @param action what kind of change, e.g. {@code upload}, {@code rename}, {@code rod-moved}
 * @param detail what changed, in words (user-supplied text included verbatim: escape when shown)
 */
public record AuditEvent(long siteId, String actor, String action, String detail, Instant at) {
}
