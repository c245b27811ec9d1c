package org.lpzplanner.keepout;

import java.sql.Timestamp;
import java.time.Clock;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.List;
import org.locationtech.jts.geom.Polygon;
import org.lpzplanner.audit.AuditTrail;
import org.lpzplanner.common.Formats;
import org.lpzplanner.drawing.PlanItem;
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
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * Keep-out areas stored for a site (table {@code site_keep_out_areas}): the design page draws and
 * lists them, proposals avoid them by default, the plan page and the report draw them. Every call
 * reads the site first, so another team's site is unknown here too. Like saved cuts, each area is a
 * row of its own (no site version is raised: areas change no analysis); adding, renaming and
 * removing go into the audit trail.
 */
@Service
public class KeepOutAreaService {

    /** Longest name, in characters. */
    public static final int MAX_NAME = 100;
    /** Most areas one site keeps. */
    public static final int MAX_AREAS = 50;

    private final JdbcClient jdbc;
    private final SiteService sites;
    private final AuditTrail audit;
    private final Clock clock;
    private final JsonMapper json;

    public KeepOutAreaService(JdbcClient jdbc, SiteService sites, AuditTrail audit, Clock clock, JsonMapper json) {
        this.jdbc = jdbc;
        this.sites = sites;
        this.audit = audit;
        this.clock = clock;
        this.json = json;
    }

    /**
     * Stores an area under a name.
     *
     * @throws SiteNotFoundException when the team has no such site
     * @throws InvalidInputException naming {@code name} or {@code corners…} when either is unusable, or
     *                               {@code corners} when the site already keeps {@value #MAX_AREAS} areas
     */
    @Transactional
    public KeepOutArea save(long siteId, String name, List<double[]> corners) {
        sites.get(siteId);
        String n = name(name);
        List<double[]> outline = KeepOutOutline.checked(corners, "corners");
        long count = jdbc.sql("SELECT COUNT(*) FROM site_keep_out_areas WHERE site_id = ?").param(siteId)
                .query(Long.class).single();
        if (count >= MAX_AREAS) {
            throw new InvalidInputException("corners", "the site already keeps " + count + " keep-out areas, the"
                    + " most it may; remove one first");
        }
        Instant now = clock.instant().truncatedTo(ChronoUnit.MILLIS);
        KeyHolder keys = new GeneratedKeyHolder();
        jdbc.sql("INSERT INTO site_keep_out_areas (site_id, name, corners, created_at) VALUES (?, ?, ?, ?)")
                .params(siteId, n, json.writeValueAsString(outline), Timestamp.from(now))
                .update(keys, "id");
        long id = keys.getKeyAs(Number.class).longValue();
        double area = KeepOutOutline.area(outline);
        audit.record(siteId, "keep-out-added", "\"" + n + "\", " + outline.size() + " corners, "
                + Formats.area(area) + " m²");
        return new KeepOutArea(id, siteId, n, outline, area, now);
    }

    /** The site's areas, oldest first. */
    @Transactional(readOnly = true)
    public List<KeepOutArea> areas(long siteId) {
        sites.get(siteId);
        return jdbc.sql("SELECT id, site_id, name, corners, created_at FROM site_keep_out_areas WHERE site_id = ?"
                        + " ORDER BY created_at, id").param(siteId)
                .query((rs, i) -> {
                    List<double[]> corners = corners(rs.getString("corners"));
                    return new KeepOutArea(rs.getLong("id"), rs.getLong("site_id"), rs.getString("name"), corners,
                            KeepOutOutline.area(corners), rs.getTimestamp("created_at").toInstant());
                })
                .list();
    }

    /** The site's areas as polygons in local metres, for a proposal. */
    @Transactional(readOnly = true)
    public List<Polygon> polygons(long siteId) {
        return areas(siteId).stream().map(a -> KeepOutOutline.polygon(a.corners())).toList();
    }

    /** The site's areas as the plan drawing takes them. */
    @Transactional(readOnly = true)
    public List<PlanItem.KeepOutArea> forPlan(long siteId) {
        return areas(siteId).stream().map(a -> new PlanItem.KeepOutArea(a.name(), a.corners())).toList();
    }

    /**
     * @throws SiteNotFoundException when the team has no such site, or the site no such area
     * @throws InvalidInputException naming {@code name}
     */
    @Transactional
    public KeepOutArea rename(long siteId, long areaId, String name) {
        KeepOutArea area = find(siteId, areaId);
        String n = name(name);
        jdbc.sql("UPDATE site_keep_out_areas SET name = ? WHERE site_id = ? AND id = ?").params(n, siteId, areaId)
                .update();
        audit.record(siteId, "keep-out-renamed", "\"" + area.name() + "\" to \"" + n + "\"");
        return new KeepOutArea(area.id(), siteId, n, area.corners(), area.area(), area.createdAt());
    }

    /** @throws SiteNotFoundException when the team has no such site, or the site no such area */
    @Transactional
    public void delete(long siteId, long areaId) {
        KeepOutArea area = find(siteId, areaId);
        jdbc.sql("DELETE FROM site_keep_out_areas WHERE site_id = ? AND id = ?").params(siteId, areaId).update();
        audit.record(siteId, "keep-out-removed", "\"" + area.name() + "\"");
    }

    private KeepOutArea find(long siteId, long areaId) {
        return areas(siteId).stream().filter(a -> a.id() == areaId).findFirst().orElseThrow(() ->
                new SiteNotFoundException(siteId, "site " + siteId + " has no keep-out area " + areaId));
    }

    private static String name(String name) {
        String n = name == null ? "" : name.strip();
        if (n.isEmpty()) {
            throw new InvalidInputException("name", "the keep-out area needs a name, e.g. \"North skylight\"");
        }
        if (n.length() > MAX_NAME) {
            throw new InvalidInputException("name", "a keep-out area's name must be at most " + MAX_NAME
                    + " characters, got " + n.length());
        }
        return n;
    }

    /** Corners as stored: a JSON array of [x, y]. */
    private List<double[]> corners(String stored) {
        List<double[]> out = new ArrayList<>();
        for (JsonNode p : json.readTree(stored)) {
            out.add(new double[] {p.get(0).asDouble(), p.get(1).asDouble()});
        }
        return out;
    }

    /** A copied site keeps the original's keep-out areas (the same file, so the same local frame). */
    @EventListener
    void copyFor(SiteDuplicated copy) {
        jdbc.sql("INSERT INTO site_keep_out_areas (site_id, name, corners, created_at)"
                + " SELECT ?, name, corners, created_at FROM site_keep_out_areas WHERE site_id = ? ORDER BY id")
                .params(copy.to(), copy.from()).update();
    }
}
