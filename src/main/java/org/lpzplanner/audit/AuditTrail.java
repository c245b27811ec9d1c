package org.lpzplanner.audit;

import java.sql.Timestamp;
import java.time.Clock;
import java.time.temporal.ChronoUnit;
import java.util.List;
import org.lpzplanner.accounts.CurrentAccount;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.stereotype.Service;

/**
 * Who changed what and when, per site, in the {@code audit_events} table. Callers record inside
 * the transaction of the change, so a change and its record are stored together or not at all.
 * Reading the trail does not check ownership: callers read the site (which does) first.
 */
@Service
public class AuditTrail {

    /** Longest detail kept; longer ones are cut with an ellipsis. */
    static final int MAX_DETAIL = 1000;

    private final JdbcClient jdbc;
    private final Clock clock;

    public AuditTrail(JdbcClient jdbc, Clock clock) {
        this.jdbc = jdbc;
        this.clock = clock;
    }

    /** Records a change of a site by whoever acts on this thread ({@link CurrentAccount#actorName()}). */
    public void record(long siteId, String action, String detail) {
        String d = detail == null ? "" : detail;
        if (d.length() > MAX_DETAIL) {
            d = d.substring(0, MAX_DETAIL - 1) + "\u2026";
        }
        jdbc.sql("INSERT INTO audit_events (site_id, team_id, actor, action, detail, created_at)"
                        + " VALUES (?, ?, ?, ?, ?, ?)")
                .params(siteId, CurrentAccount.teamId(), CurrentAccount.actorName(), action, d,
                        Timestamp.from(clock.instant().truncatedTo(ChronoUnit.MILLIS)))
                .update();
    }

    /** The site's changes, newest first, at most {@code limit}. */
    public List<AuditEvent> forSite(long siteId, int limit) {
        return jdbc.sql("SELECT site_id, actor, action, detail, created_at FROM audit_events WHERE site_id = ?"
                        + " ORDER BY created_at DESC, id DESC FETCH FIRST " + Math.max(1, limit) + " ROWS ONLY")
                .param(siteId)
                .query((rs, n) -> new AuditEvent(rs.getLong("site_id"), rs.getString("actor"), rs.getString("action"),
                        rs.getString("detail"), rs.getTimestamp("created_at").toInstant()))
                .list();
    }

    /** The deletions recorded for the team, newest first: deleted sites have no page any more. */
    public List<AuditEvent> deletions(long teamId, int limit) {
        return jdbc.sql("SELECT site_id, actor, action, detail, created_at FROM audit_events WHERE team_id = ?"
                        + " AND action = 'delete' ORDER BY created_at DESC, id DESC FETCH FIRST "
                        + Math.max(1, limit) + " ROWS ONLY")
                .param(teamId)
                .query((rs, n) -> new AuditEvent(rs.getLong("site_id"), rs.getString("actor"), rs.getString("action"),
                        rs.getString("detail"), rs.getTimestamp("created_at").toInstant()))
                .list();
    }
}
