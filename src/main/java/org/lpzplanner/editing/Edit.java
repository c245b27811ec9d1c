package org.lpzplanner.editing;

import org.lpzplanner.analysis.AnalysisRevision;

/**
 * A stored change of a site.
 *
 * @param siteId   the site
 * @param version  the site's version now: after the change and, when the analysis ran, after the
 *                 analysis marked the site; the version the next change must send
 * @param outcome  what the change gave back (a new part's id, a part as it was, the new site)
 * @param audit    what the audit trail recorded of the change
 * @param analysis the analysis after it: the new revision, or why it is pending
 * @param <T>      the outcome's type
 */
public record Edit<T>(long siteId, long version, T outcome, AuditLine audit, AnalysisUpdate analysis) {

    /** The new revision, or null while the analysis is pending. */
    public AnalysisRevision revision() {
        return analysis.revision();
    }
}
