package org.lpzplanner.jobs;

import java.time.Instant;

/**
 * A background job as stored: readable by every app instance on the database.
 *
 * @param kind         {@link JobStore#ANALYSIS} or {@link JobStore#PROPOSAL}
 * @param state        QUEUED, RUNNING, DONE, FAILED or CANCELLED
 * @param siteVersion  the site's version the job started from (proposals), else null
 * @param settingsJson what was asked, as JSON (proposals: level and radius), else null
 * @param revision     the stored analysis revision once done (analyses), else null
 * @param outcomeJson  the result as JSON once done (proposals), else null
 * @param acceptedJson what accepting the result added, as JSON; null until accepted and after an undo
 * @param error        why the job failed, in plain words
 */
public record StoredJob(String id, String kind, long siteId, long teamId, String account, String state, String stage,
        double fraction, Long siteVersion, String settingsJson, Integer revision, String outcomeJson,
        String acceptedJson, String error, boolean cancelRequested, String instanceName, Instant createdAt,
        Instant heartbeatAt, Instant finishedAt) {

    /** Queued or running: not finished yet. */
    public boolean active() {
        return JobStore.QUEUED.equals(state) || JobStore.RUNNING.equals(state);
    }
}
