package org.lpzplanner.sections;

import java.sql.Timestamp;
import java.time.Clock;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.List;
import org.lpzplanner.audit.AuditTrail;
import org.lpzplanner.common.Formats;
import org.lpzplanner.sites.SiteDuplicated;
import org.lpzplanner.sites.SiteNotFoundException;
import org.lpzplanner.sites.SiteService;
import org.lpzplanner.system.InvalidInputException;
import org.springframework.context.event.EventListener;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.jdbc.support.GeneratedKeyHolder;
import org.springframework.jdbc.support.KeyHolder;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;

/**
 * Section cuts saved for a site (table {@code site_cuts}), which the section page lists and the
 * report draws. Every call reads the site first, so another team's site is unknown here too.
 * Saving and deleting go into the audit trail.
 */
@Service
public class SiteCutService {

    /** Longest cut name, in characters. */
    public static final int MAX_NAME = 100;

    private final JdbcClient jdbc;
    private final SiteService sites;
    private final AuditTrail audit;
    private final Clock clock;

    public SiteCutService(JdbcClient jdbc, SiteService sites, AuditTrail audit, Clock clock) {
        this.jdbc = jdbc;
        this.sites = sites;
        this.audit = audit;
        this.clock = clock;
    }

    /**
     * Saves a cut; the numbers as typed (x1, y1, x2, y2), checked like the section page checks them.
     *
     * @throws SiteNotFoundException when the team has no such site
     * @throws InvalidInputException when the name is blank or too long, or a number or the cut's length is unusable
     */
    @Transactional
    public SiteCut save(long siteId, String name, String[] ends) {
        String n = checkedName(siteId, name);
        return store(siteId, n, SectionPage.cut(ends));
    }

    /**
     * Saves a cut given as numbers (x1, y1, x2, y2), checked as {@link #save(long, String, String[])}
     * checks typed ones.
     */
    @Transactional
    public SiteCut save(long siteId, String name, double[] ends) {
        String n = checkedName(siteId, name);
        return store(siteId, n, SectionPage.checked(ends));
    }

    private String checkedName(long siteId, String name) {
        sites.get(siteId);
        String n = name == null ? "" : name.strip();
        if (n.isEmpty()) {
            throw new InvalidInputException("name", "the cut needs a name, e.g. \"North gable\"");
        }
        if (n.length() > MAX_NAME) {
            throw new InvalidInputException("name", "a cut name must be at most " + MAX_NAME + " characters, got "
                    + n.length());
        }
        return n;
    }

    private SiteCut store(long siteId, String n, double[] c) {
        Instant now = clock.instant().truncatedTo(ChronoUnit.MILLIS);
        KeyHolder keys = new GeneratedKeyHolder();
        jdbc.sql("INSERT INTO site_cuts (site_id, name, x1, y1, x2, y2, created_at) VALUES (?, ?, ?, ?, ?, ?, ?)")
                .params(siteId, n, c[0], c[1], c[2], c[3], Timestamp.from(now))
                .update(keys, "id");
        long id = keys.getKeyAs(Number.class).longValue();
        audit.record(siteId, "save cut", "\"" + n + "\" from (" + Formats.coordinate(c[0]) + ", " + Formats.coordinate(c[1])
                + ") to (" + Formats.coordinate(c[2]) + ", " + Formats.coordinate(c[3]) + ")");
        return new SiteCut(id, siteId, n, c[0], c[1], c[2], c[3], now);
    }

    /** The site's saved cuts, oldest first. */
    @Transactional(readOnly = true)
    public List<SiteCut> cuts(long siteId) {
        sites.get(siteId);
        return jdbc.sql("SELECT id, site_id, name, x1, y1, x2, y2, created_at FROM site_cuts WHERE site_id = ?"
                        + " ORDER BY created_at, id").param(siteId)
                .query((rs, i) -> new SiteCut(rs.getLong("id"), rs.getLong("site_id"), rs.getString("name"),
                        rs.getDouble("x1"), rs.getDouble("y1"), rs.getDouble("x2"), rs.getDouble("y2"),
                        rs.getTimestamp("created_at").toInstant()))
                .list();
    }

    /**
     * @throws SiteNotFoundException when the team has no such site, or the site no such cut
     */
    @Transactional
    public void delete(long siteId, long cutId) {
        sites.get(siteId);
        List<String> names = jdbc.sql("SELECT name FROM site_cuts WHERE site_id = ? AND id = ?")
                .params(siteId, cutId).query(String.class).list();
        if (names.isEmpty()) {
            throw new SiteNotFoundException(siteId, "site " + siteId + " has no saved cut " + cutId);
        }
        jdbc.sql("DELETE FROM site_cuts WHERE site_id = ? AND id = ?").params(siteId, cutId).update();
        audit.record(siteId, "delete cut", "\"" + names.get(0) + "\"");
    }

    /** A copied site keeps the original's saved cuts (the same file, so the same local frame). */
    @EventListener
    void copyFor(SiteDuplicated copy) {
        jdbc.sql("INSERT INTO site_cuts (site_id, name, x1, y1, x2, y2, created_at)"
                + " SELECT ?, name, x1, y1, x2, y2, created_at FROM site_cuts WHERE site_id = ? ORDER BY id")
                .params(copy.to(), copy.from()).update();
    }
}
