/**
 * The per-site audit trail: who changed what and when, written by every feature that changes a
 * site, read on the site's page and carried read-only by exports.
 *
 * <p>Rules of the package: depends on accounts only; an event is text a person reads, never parsed.
 */
package org.lpzplanner.audit;
