package org.lpzplanner.jobs;

import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Timestamp;
import java.time.Instant;
import java.util.List;
import java.util.Optional;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.stereotype.Repository;

/**
 * Reads and writes the {@code background_jobs} table. Every change of state is one conditional
 * {@code UPDATE}, so instances racing on one job (a cancel here, the worker finishing there) each
 * see a consistent row.
 */
@Repository
public class JobStore {

    public static final String ANALYSIS = "analysis";
    public static final String PROPOSAL = "proposal";
    public static final String QUEUED = "QUEUED";
    public static final String RUNNING = "RUNNING";
    public static final String DONE = "DONE";
    public static final String FAILED = "FAILED";
    public static final String CANCELLED = "CANCELLED";

    private static final String ACTIVE = "state IN ('QUEUED', 'RUNNING')";
    private static final String COLUMNS = "id, kind, site_id, team_id, account, state, stage, fraction, site_version,"
            + " settings_json, revision, outcome_json, accepted_json, error, cancel_requested, instance_name,"
            + " created_at, heartbeat_at, finished_at";

    private final JdbcClient jdbc;

    public JobStore(JdbcClient jdbc) {
        this.jdbc = jdbc;
    }

    /** A job about to be stored: who asked for what, on which instance it will run. */
    public record NewJob(String id, String kind, long siteId, long teamId, String account, String state, String stage,
            Long siteVersion, String settingsJson, String instanceName) {
    }

    public void insert(NewJob job, Instant now) {
        jdbc.sql("INSERT INTO background_jobs (id, kind, site_id, team_id, account, state, stage, fraction, site_version,"
                        + " settings_json, cancel_requested, instance_name, created_at, heartbeat_at)"
                        + " VALUES (?, ?, ?, ?, ?, ?, ?, 0, ?, ?, FALSE, ?, ?, ?)")
                .params(job.id(), job.kind(), job.siteId(), job.teamId(), job.account(), job.state(), job.stage(),
                        job.siteVersion(), job.settingsJson(), job.instanceName(), Timestamp.from(now),
                        Timestamp.from(now))
                .update();
    }

    /** The job of this kind and site, if it belongs to the team. */
    public Optional<StoredJob> find(String kind, long siteId, long teamId, String id) {
        return jdbc.sql("SELECT " + COLUMNS + " FROM background_jobs WHERE id = ? AND kind = ? AND site_id = ?"
                        + " AND team_id = ?")
                .params(id, kind, siteId, teamId).query(JobStore::row).optional();
    }

    public Optional<StoredJob> find(String id) {
        return jdbc.sql("SELECT " + COLUMNS + " FROM background_jobs WHERE id = ?").param(id).query(JobStore::row)
                .optional();
    }

    /** A queued job starts unless it was cancelled meanwhile; false when it must not run. */
    public boolean markRunning(String id, Instant now) {
        return jdbc.sql("UPDATE background_jobs SET state = 'RUNNING', heartbeat_at = ? WHERE id = ?"
                        + " AND state = 'QUEUED' AND cancel_requested = FALSE")
                .params(Timestamp.from(now), id).update() > 0;
    }

    /** The running instance's sign of life, with where the job is. */
    public void beat(String id, String stage, double fraction, Instant now) {
        jdbc.sql("UPDATE background_jobs SET stage = ?, fraction = ?, heartbeat_at = ? WHERE id = ? AND " + ACTIVE)
                .params(truncate(stage, 200), fraction, Timestamp.from(now), id).update();
    }

    /**
     * The job ended. Written whatever the stored state, so that a job another instance took for
     * dead but that did finish says so.
     */
    public void finish(String id, String state, Integer revision, String outcomeJson, String error, Instant now) {
        boolean done = DONE.equals(state);
        jdbc.sql("UPDATE background_jobs SET state = ?, revision = ?, outcome_json = ?, error = ?, heartbeat_at = ?,"
                        + " finished_at = ?" + (done ? ", fraction = 1, stage = NULL" : "") + " WHERE id = ?")
                .params(state, revision, outcomeJson, truncate(error, 2000), Timestamp.from(now), Timestamp.from(now), id)
                .update();
    }

    /**
     * Asks the job to stop: a queued one is cancelled at once (it never starts), a running one is
     * flagged for its instance to see.
     */
    public void requestCancel(String id, boolean queuedStopsNow, Instant now) {
        if (queuedStopsNow) {
            jdbc.sql("UPDATE background_jobs SET state = 'CANCELLED', cancel_requested = TRUE, finished_at = ?"
                    + " WHERE id = ? AND state = 'QUEUED'").params(Timestamp.from(now), id).update();
        }
        jdbc.sql("UPDATE background_jobs SET cancel_requested = TRUE WHERE id = ? AND " + ACTIVE).param(id).update();
    }

    /** Ids of this instance's unfinished jobs whose cancel was asked for (perhaps through another instance). */
    public List<String> cancelRequested(String instanceName) {
        return jdbc.sql("SELECT id FROM background_jobs WHERE instance_name = ? AND " + ACTIVE
                + " AND cancel_requested = TRUE").param(instanceName).query(String.class).list();
    }

    /** Marks unfinished jobs of a stopped instance (created before {@code before}) as failed. */
    public int interruptInstance(String instanceName, Instant before, String message, Instant now) {
        return jdbc.sql("UPDATE background_jobs SET state = 'FAILED', error = ?, finished_at = ? WHERE instance_name = ?"
                        + " AND created_at < ? AND " + ACTIVE)
                .params(message, Timestamp.from(now), instanceName, Timestamp.from(before)).update();
    }

    /** Marks unfinished jobs whose instance gave no sign of life since {@code cutoff} as failed. */
    public int interruptStale(Instant cutoff, String message, Instant now) {
        return jdbc.sql("UPDATE background_jobs SET state = 'FAILED', error = ?, finished_at = ? WHERE heartbeat_at < ?"
                        + " AND " + ACTIVE)
                .params(message, Timestamp.from(now), Timestamp.from(cutoff)).update();
    }

    /** Records what accepting a finished job's result added (null: taken back). */
    public void setAccepted(String id, String acceptedJson) {
        jdbc.sql("UPDATE background_jobs SET accepted_json = ? WHERE id = ?").params(acceptedJson, id).update();
    }

    public void delete(String id) {
        jdbc.sql("DELETE FROM background_jobs WHERE id = ?").param(id).update();
    }

    /**
     * Keeps finished jobs bounded: of a site's finished jobs of this kind the newest {@code keep}
     * stay; finished jobs of any site older than {@code olderThan} go.
     */
    public void prune(long siteId, String kind, int keep, Instant olderThan) {
        jdbc.sql("DELETE FROM background_jobs WHERE finished_at IS NOT NULL AND finished_at < ?")
                .param(Timestamp.from(olderThan)).update();
        List<String> finished = jdbc.sql("SELECT id FROM background_jobs WHERE site_id = ? AND kind = ?"
                        + " AND finished_at IS NOT NULL ORDER BY created_at DESC, id")
                .params(siteId, kind).query(String.class).list();
        for (String id : finished.subList(Math.min(keep, finished.size()), finished.size())) {
            delete(id);
        }
    }

    private static String truncate(String text, int max) {
        return text == null || text.length() <= max ? text : text.substring(0, max - 1) + "…";
    }

    private static StoredJob row(ResultSet rs, int n) throws SQLException {
        long version = rs.getLong("site_version");
        Long siteVersion = rs.wasNull() ? null : version;
        int revision = rs.getInt("revision");
        Integer rev = rs.wasNull() ? null : revision;
        return new StoredJob(rs.getString("id"), rs.getString("kind"), rs.getLong("site_id"), rs.getLong("team_id"),
                rs.getString("account"), rs.getString("state"), rs.getString("stage"), rs.getDouble("fraction"),
                siteVersion, rs.getString("settings_json"), rev, rs.getString("outcome_json"),
                rs.getString("accepted_json"), rs.getString("error"), rs.getBoolean("cancel_requested"),
                rs.getString("instance_name"), instant(rs, "created_at"), instant(rs, "heartbeat_at"),
                instant(rs, "finished_at"));
    }

    private static Instant instant(ResultSet rs, String column) throws SQLException {
        Timestamp t = rs.getTimestamp(column);
        return t == null ? null : t.toInstant();
    }
}
