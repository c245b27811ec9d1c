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
            + " created_at, updated_at, version";

    private final JdbcClient jdbc;

    public SiteRepository(JdbcClient jdbc) {
        this.jdbc = jdbc;
    }

    /** Stores a new site (version 0, both timestamps {@code now}) and returns it with its id. */
    public StoredSite insert(String name, ProtectionLevel level, Double customRadius, String sourceName,
            String sourceText, Instant now) {
        KeyHolder keys = new GeneratedKeyHolder();
        jdbc.sql("INSERT INTO sites (name, protection_level, custom_radius, source_name, source_text, created_at,"
                        + " updated_at, version) VALUES (?, ?, ?, ?, ?, ?, ?, 0)")
                .params(name, level.name(), customRadius, sourceName, sourceText, Timestamp.from(now),
                        Timestamp.from(now))
                .update(keys, "id");
        long id = keys.getKeyAs(Number.class).longValue();
        return new StoredSite(id, name, level, customRadius, sourceName, sourceText, now, now, 0);
    }

    public Optional<StoredSite> findById(long id) {
        return jdbc.sql("SELECT " + COLUMNS + " FROM sites WHERE id = ?").param(id).query(SiteRepository::row)
                .optional();
    }

    /** All sites, most recently changed first. */
    public List<StoredSite> findAll() {
        return jdbc.sql("SELECT " + COLUMNS + " FROM sites ORDER BY updated_at DESC, id DESC")
                .query(SiteRepository::row).list();
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

    private static StoredSite row(ResultSet rs, int rowNum) throws SQLException {
        double radius = rs.getDouble("custom_radius");
        Double customRadius = rs.wasNull() ? null : radius;
        return new StoredSite(rs.getLong("id"), rs.getString("name"),
                ProtectionLevel.valueOf(rs.getString("protection_level")), customRadius,
                rs.getString("source_name"), rs.getString("source_text"),
                rs.getTimestamp("created_at").toInstant(), rs.getTimestamp("updated_at").toInstant(),
                rs.getLong("version"));
    }
}
