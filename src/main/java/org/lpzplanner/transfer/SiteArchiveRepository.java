package org.lpzplanner.transfer;

import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Timestamp;
import java.util.List;
import java.util.Optional;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.jdbc.support.GeneratedKeyHolder;
import org.springframework.jdbc.support.KeyHolder;
import org.springframework.stereotype.Repository;

/** Reads a whole site out of the database and writes one back as a new site, row by row. */
@Repository
class SiteArchiveRepository {

    private final JdbcClient jdbc;

    SiteArchiveRepository(JdbcClient jdbc) {
        this.jdbc = jdbc;
    }

    Optional<SiteArchive> read(long siteId) {
        Optional<SiteArchive.Site> site = jdbc.sql("SELECT name, protection_level, custom_radius, source_name,"
                        + " source_text, created_at, updated_at, version FROM sites WHERE id = ?")
                .param(siteId).query(SiteArchiveRepository::siteRow).optional();
        if (site.isEmpty()) {
            return Optional.empty();
        }
        List<SiteArchive.EarlierFile> files = jdbc.sql("SELECT file_number, source_name, source_text, replaced_at"
                        + " FROM site_file_versions WHERE site_id = ? ORDER BY file_number")
                .param(siteId)
                .query((rs, n) -> new SiteArchive.EarlierFile(rs.getInt("file_number"), rs.getString("source_name"),
                        rs.getString("source_text"), rs.getTimestamp("replaced_at").toInstant()))
                .list();
        List<SiteArchive.Revision> revisions = jdbc.sql("SELECT id, revision, protection_level, sphere_radius,"
                        + " resolution, inputs_sha256, exposed_roof_area, exposed_edge_length, exposed_corners,"
                        + " facade_bands, protected_ground_area, fully_protected, result_geojson, engine_millis,"
                        + " created_at, site_name, source_name, source_text, tolerance FROM analysis_revisions"
                        + " WHERE site_id = ? ORDER BY revision")
                .param(siteId).query((rs, n) -> revisionRow(rs, accepted(rs.getLong("id")))).list();
        SiteArchive.RiskInputs risk = jdbc.sql("SELECT * FROM site_risk_inputs WHERE site_id = ?").param(siteId)
                .query((rs, n) -> new SiteArchive.RiskInputs(rs.getString("flash_density_source"),
                        nullable(rs, "flash_density"), nullable(rs, "thunderstorm_days"), rs.getString("location_factor"),
                        rs.getString("surface_type"), rs.getString("fire_risk"), rs.getString("fire_provisions"),
                        rs.getString("special_hazard"), rs.getString("structure_use"), rs.getString("touch_step"),
                        rs.getDouble("persons_in_zone"), rs.getDouble("persons_total"), rs.getDouble("hours_per_year"),
                        nullableInt(rs, "line_count"), nullable(rs, "line_length"),
                        rs.getTimestamp("updated_at").toInstant()))
                .optional().orElse(null);
        return Optional.of(new SiteArchive(site.get(), files, revisions, risk));
    }

    private List<SiteArchive.AcceptedItem> accepted(long revisionId) {
        return jdbc.sql("SELECT item_key, reason, created_at FROM accepted_items WHERE revision_id = ? ORDER BY id")
                .param(revisionId)
                .query((rs, n) -> new SiteArchive.AcceptedItem(rs.getString("item_key"), rs.getString("reason"),
                        rs.getTimestamp("created_at").toInstant()))
                .list();
    }

    /**
     * Stores the archive as a new site of the given team and returns its id; the caller holds the
     * transaction.
     */
    long insert(SiteArchive archive, long teamId) {
        SiteArchive.Site s = archive.site();
        KeyHolder siteKey = new GeneratedKeyHolder();
        jdbc.sql("INSERT INTO sites (name, protection_level, custom_radius, source_name, source_text, created_at,"
                        + " updated_at, version, team_id) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?)")
                .params(s.name(), s.level(), s.customRadius(), s.fileName(), s.fileText(),
                        Timestamp.from(s.createdAt()), Timestamp.from(s.updatedAt()), s.version(), teamId)
                .update(siteKey, "id");
        long siteId = siteKey.getKeyAs(Number.class).longValue();
        for (SiteArchive.EarlierFile f : archive.earlierFiles()) {
            jdbc.sql("INSERT INTO site_file_versions (site_id, file_number, source_name, source_text, replaced_at)"
                            + " VALUES (?, ?, ?, ?, ?)")
                    .params(siteId, f.number(), f.fileName(), f.text(), Timestamp.from(f.replacedAt())).update();
        }
        for (SiteArchive.Revision r : archive.revisions()) {
            KeyHolder revisionKey = new GeneratedKeyHolder();
            jdbc.sql("INSERT INTO analysis_revisions (site_id, revision, protection_level, sphere_radius, resolution,"
                            + " inputs_sha256, exposed_roof_area, exposed_edge_length, exposed_corners, facade_bands,"
                            + " protected_ground_area, fully_protected, result_geojson, created_at, engine_millis,"
                            + " site_name, source_name, source_text, tolerance)"
                            + " VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)")
                    .params(siteId, r.revision(), r.level(), r.sphereRadius(), r.resolution(), r.inputsSha256(),
                            r.exposedRoofArea(), r.exposedEdgeLength(), r.exposedCorners(), r.facadeBands(),
                            r.protectedGroundArea(), r.fullyProtected(), r.resultGeoJson(),
                            Timestamp.from(r.createdAt()), r.engineMillis(), r.siteName(), r.sourceName(),
                            r.sourceText(), r.tolerance())
                    .update(revisionKey, "id");
            long revisionId = revisionKey.getKeyAs(Number.class).longValue();
            for (SiteArchive.AcceptedItem a : r.accepted()) {
                jdbc.sql("INSERT INTO accepted_items (revision_id, item_key, reason, created_at) VALUES (?, ?, ?, ?)")
                        .params(revisionId, a.key(), a.reason(), Timestamp.from(a.createdAt())).update();
            }
        }
        SiteArchive.RiskInputs k = archive.riskInputs();
        if (k != null) {
            jdbc.sql("INSERT INTO site_risk_inputs (site_id, flash_density_source, flash_density, thunderstorm_days,"
                            + " location_factor, surface_type, fire_risk, fire_provisions, special_hazard, structure_use,"
                            + " touch_step, persons_in_zone, persons_total, hours_per_year, line_count, line_length,"
                            + " updated_at) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)")
                    .params(siteId, k.flashDensitySource(), k.flashDensity(), k.thunderstormDays(), k.locationFactor(),
                            k.surfaceType(), k.fireRisk(), k.fireProvisions(), k.specialHazard(), k.structureUse(),
                            k.touchStep(), k.personsInZone(), k.personsTotal(), k.hoursPerYear(), k.lineCount(),
                            k.lineLength(), Timestamp.from(k.updatedAt()))
                    .update();
        }
        return siteId;
    }

    private static Double nullable(ResultSet rs, String column) throws SQLException {
        double value = rs.getDouble(column);
        return rs.wasNull() ? null : value;
    }

    private static Integer nullableInt(ResultSet rs, String column) throws SQLException {
        int value = rs.getInt(column);
        return rs.wasNull() ? null : value;
    }

    private static SiteArchive.Site siteRow(ResultSet rs, int rowNum) throws SQLException {
        double radius = rs.getDouble("custom_radius");
        Double customRadius = rs.wasNull() ? null : radius;
        return new SiteArchive.Site(rs.getString("name"), rs.getString("protection_level"), customRadius,
                rs.getString("source_name"), rs.getString("source_text"), rs.getTimestamp("created_at").toInstant(),
                rs.getTimestamp("updated_at").toInstant(), rs.getLong("version"));
    }

    private static SiteArchive.Revision revisionRow(ResultSet rs, List<SiteArchive.AcceptedItem> accepted)
            throws SQLException {
        return new SiteArchive.Revision(rs.getInt("revision"), rs.getString("protection_level"),
                rs.getDouble("sphere_radius"), rs.getDouble("resolution"), rs.getString("inputs_sha256"),
                rs.getDouble("exposed_roof_area"), rs.getDouble("exposed_edge_length"), rs.getInt("exposed_corners"),
                rs.getInt("facade_bands"), rs.getDouble("protected_ground_area"), rs.getBoolean("fully_protected"),
                rs.getString("result_geojson"), rs.getLong("engine_millis"), rs.getTimestamp("created_at").toInstant(),
                accepted, rs.getString("site_name"), rs.getString("source_name"), rs.getString("source_text"),
                nullable(rs, "tolerance"));
    }
}
