package org.lpzplanner.analysis;

import org.lpzplanner.system.NotFoundException;

/** No background analysis with this id is known for the site (never, or forgotten long ago). */
public final class AnalysisJobNotFoundException extends NotFoundException {

    public AnalysisJobNotFoundException(long siteId, String jobId) {
        super("no analysis job " + jobId + " for site " + siteId, null);
    }
}
