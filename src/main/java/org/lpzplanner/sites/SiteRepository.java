package org.lpzplanner.sites;

import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Timestamp;
import java.time.Instant;
import java.util.List;
import java.util.Optional;
import org.lpzplanner.engine.model.ProtectionLevel;
import org.springframework.dao.OptimisticLockingFailureException;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.jdbc.support.GeneratedKeyHolder;
import org.springframework.jdbc.support.KeyHolder;
import org.springframework.stereotype.Repository;

/** Reads and writes the {@code sites} table. Does no validation: callers store checked sites only. */
@Repository
public class SiteRepository {

    private static final String COLUMNS = "id, name, protection_level, custom_radius, source_name, source_text,"
            + " created_at, updated_at, version, address, designer_name";

    private final JdbcClient jdbc;

    public SiteRepository(JdbcClient jdbc) {
        this.jdbc = jdbc;
    }

    /** Stores a new site of a team (version 0, both timestamps {@code now}) and returns it with its id. */
    public StoredSite insert(long teamId, String name, ProtectionLevel level, Double customRadius, String sourceName,
            String sourceText, Instant now) {
        return insert(teamId, name, level, customRadius, sourceName, sourceText, "", "", now);
    }

    /** Stores a new site with its cover details (address and designer, checked by the caller). */
    public StoredSite insert(long teamId, String name, ProtectionLevel level, Double customRadius, String sourceName,
            String sourceText, String address, String designer, Instant now) {
        KeyHolder keys = new GeneratedKeyHolder();
        jdbc.sql("INSERT INTO sites (name, protection_level, custom_radius, source_name, source_text, created_at,"
                        + " updated_at, version, team_id, address, designer_name) VALUES (?, ?, ?, ?, ?, ?, ?, 0, ?, ?, ?)")
                .params(name, level.name(), customRadius, sourceName, sourceText, Timestamp.from(now),
                        Timestamp.from(now), teamId, address, designer)
                .update(keys, "id");
        long id = keys.getKeyAs(Number.class).longValue();
        return new StoredSite(id, name, level, customRadius, sourceName, sourceText, now, now, 0, address, designer);
    }

    public Optional<StoredSite> findById(long id) {
        return jdbc.sql("SELECT " + COLUMNS + " FROM sites WHERE id = ?").param(id).query(SiteRepository::row)
                .optional();
    }

    /** The site if it belongs to the team; another team's site is as absent as a missing one. */
    public Optional<StoredSite> findById(long id, long teamId) {
        return jdbc.sql("SELECT " + COLUMNS + " FROM sites WHERE id = ? AND team_id = ?").params(id, teamId)
                .query(SiteRepository::row).optional();
    }

    /** All sites, most recently changed first. */
    public List<StoredSite> findAll() {
        return jdbc.sql("SELECT " + COLUMNS + " FROM sites ORDER BY updated_at DESC, id DESC")
                .query(SiteRepository::row).list();
    }

    /** The team's sites, most recently changed first. */
    public List<StoredSite> findAll(long teamId) {
        return jdbc.sql("SELECT " + COLUMNS + " FROM sites WHERE team_id = ? ORDER BY updated_at DESC, id DESC")
                .param(teamId).query(SiteRepository::row).list();
    }

    public long count() {
        return jdbc.sql("SELECT COUNT(*) FROM sites").query(Long.class).single();
    }

    /** Deletes a site and, through the foreign key, its analyses; false when there was none. */
    public boolean delete(long id) {
        return jdbc.sql("DELETE FROM sites WHERE id = ?").param(id).update() > 0;
    }

    /**
     * Records a change of the site at {@code now}, provided nobody changed it since
     * {@code expectedVersion} was read.
     *
     * @throws OptimisticLockingFailureException when the stored version differs
     */
    public void touch(long id, long expectedVersion, Instant now) {
        int rows = jdbc.sql("UPDATE sites SET updated_at = ?, version = version + 1 WHERE id = ? AND version = ?")
                .params(Timestamp.from(now), id, expectedVersion).update();
        if (rows == 0) {
            throw new OptimisticLockingFailureException("site " + id + " was changed or deleted meanwhile");
        }
    }

    /**
     * Changes name, level and custom radius, provided nobody changed the site since
     * {@code expectedVersion} was read.
     *
     * @throws OptimisticLockingFailureException when the stored version differs
     */
    public void updateSettings(long id, long expectedVersion, String name, ProtectionLevel level,
            Double customRadius, Instant now) {
        int rows = jdbc.sql("UPDATE sites SET name = ?, protection_level = ?, custom_radius = ?, updated_at = ?,"
                        + " version = version + 1 WHERE id = ? AND version = ?")
                .params(name, level.name(), customRadius, Timestamp.from(now), id, expectedVersion).update();
        if (rows == 0) {
            throw stale(id);
        }
    }

    /**
     * Changes the address and designer printed on the report's cover, provided nobody changed the
     * site since {@code expectedVersion} was read.
     *
     * @throws OptimisticLockingFailureException when the stored version differs
     */
    public void updateCoverDetails(long id, long expectedVersion, String address, String designer, Instant now) {
        int rows = jdbc.sql("UPDATE sites SET address = ?, designer_name = ?, updated_at = ?, version = version + 1"
                        + " WHERE id = ? AND version = ?")
                .params(address, designer, Timestamp.from(now), id, expectedVersion).update();
        if (rows == 0) {
            throw stale(id);
        }
    }

    /**
     * Replaces the site file text, provided nobody changed the site since {@code expectedVersion}.
     *
     * @throws OptimisticLockingFailureException when the stored version differs
     */
    public void replaceFile(long id, long expectedVersion, String sourceText, Instant now) {
        int rows = jdbc.sql("UPDATE sites SET source_text = ?, updated_at = ?, version = version + 1"
                        + " WHERE id = ? AND version = ?")
                .params(sourceText, Timestamp.from(now), id, expectedVersion).update();
        if (rows == 0) {
            throw stale(id);
        }
    }

    /**
     * Deletes a site provided nobody changed it since {@code expectedVersion}; false when there was
     * no such site.
     *
     * @throws OptimisticLockingFailureException when the site exists at another version
     */
    public boolean delete(long id, long expectedVersion) {
        if (jdbc.sql("DELETE FROM sites WHERE id = ? AND version = ?").params(id, expectedVersion).update() > 0) {
            return true;
        }
        if (findById(id).isPresent()) {
            throw stale(id);
        }
        return false;
    }

    /** Keeps a replaced site file as the site's next earlier file and returns it. */
    public SiteFileVersion insertFileVersion(long siteId, String sourceName, String sourceText, Instant replacedAt) {
        Integer max = jdbc.sql("SELECT MAX(file_number) FROM site_file_versions WHERE site_id = ?").param(siteId)
                .query(Integer.class).optional().orElse(null);
        int number = max == null ? 1 : max + 1;
        jdbc.sql("INSERT INTO site_file_versions (site_id, file_number, source_name, source_text, replaced_at)"
                        + " VALUES (?, ?, ?, ?, ?)")
                .params(siteId, number, sourceName, sourceText, Timestamp.from(replacedAt)).update();
        return new SiteFileVersion(number, sourceName, sourceText, replacedAt);
    }

    /** The site's earlier files, oldest first. */
    public List<SiteFileVersion> findFileVersions(long siteId) {
        return jdbc.sql("SELECT file_number, source_name, source_text, replaced_at FROM site_file_versions"
                        + " WHERE site_id = ? ORDER BY file_number")
                .param(siteId).query(SiteRepository::fileRow).list();
    }

    public Optional<SiteFileVersion> findFileVersion(long siteId, int number) {
        return jdbc.sql("SELECT file_number, source_name, source_text, replaced_at FROM site_file_versions"
                        + " WHERE site_id = ? AND file_number = ?")
                .params(siteId, number).query(SiteRepository::fileRow).optional();
    }

    private static OptimisticLockingFailureException stale(long id) {
        return new OptimisticLockingFailureException("site " + id + " was changed or deleted meanwhile");
    }

    private static SiteFileVersion fileRow(ResultSet rs, int rowNum) throws SQLException {
        return new SiteFileVersion(rs.getInt("file_number"), rs.getString("source_name"),
                rs.getString("source_text"), rs.getTimestamp("replaced_at").toInstant());
    }

    private static StoredSite row(ResultSet rs, int rowNum) throws SQLException {
        double radius = rs.getDouble("custom_radius");
        Double customRadius = rs.wasNull() ? null : radius;
        return new StoredSite(rs.getLong("id"), rs.getString("name"),
                ProtectionLevel.valueOf(rs.getString("protection_level")), customRadius,
                rs.getString("source_name"), rs.getString("source_text"),
                rs.getTimestamp("created_at").toInstant(), rs.getTimestamp("updated_at").toInstant(),
                rs.getLong("version"), rs.getString("address"), rs.getString("designer_name"));
    }
}
