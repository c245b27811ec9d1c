package org.lpzplanner.editing;

import org.lpzplanner.analysis.AnalysisRevision;
import org.lpzplanner.analysis.AnalysisSummary;

/**
 * What became of the analysis after a change: the new revision with its summary, or, when it could
 * not run now (every analysis place taken, a grid too large, settings the engine refuses, the site
 * changed again meanwhile), why it is pending. A pending analysis leaves the change stored; the
 * site's latest revision then still shows the site before the change until it is analysed again.
 *
 * @param revision      the new revision with its result GeoJSON; null while pending
 * @param summary       its numbers as the API shows them; null while pending
 * @param pendingReason why the analysis did not run, in words; null when it ran
 */
public record AnalysisUpdate(AnalysisRevision revision, AnalysisSummary summary, String pendingReason) {

    static AnalysisUpdate done(AnalysisRevision revision, AnalysisSummary summary) {
        return new AnalysisUpdate(revision, summary, null);
    }

    static AnalysisUpdate pending(String reason) {
        return new AnalysisUpdate(null, null, reason);
    }

    /** Whether the analysis is still to be done. */
    public boolean isPending() {
        return revision == null;
    }
}
