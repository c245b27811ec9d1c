package org.lpzplanner.transfer;

import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Timestamp;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.lpzplanner.risk.StoredLine;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.jdbc.support.GeneratedKeyHolder;
import org.springframework.jdbc.support.KeyHolder;
import org.springframework.stereotype.Repository;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/** Reads a whole site out of the database and writes one back as a new site, row by row. */
@Repository
class SiteArchiveRepository {

    private final JdbcClient jdbc;
    private final JsonMapper json;

    SiteArchiveRepository(JdbcClient jdbc, JsonMapper json) {
        this.jdbc = jdbc;
        this.json = json;
    }

    /** The site if the team owns it. */
    Optional<SiteArchive> read(long siteId, long teamId) {
        Optional<SiteArchive.Site> site = jdbc.sql("SELECT name, protection_level, custom_radius, source_name,"
                        + " source_text, created_at, updated_at, version, address, designer_name FROM sites"
                        + " WHERE id = ? AND team_id = ?")
                .params(siteId, teamId).query(SiteArchiveRepository::siteRow).optional();
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
                .param(siteId).query((rs, n) -> revisionRow(rs, accepted(rs.getLong("id")), reviews(rs.getLong("id"))))
                .list();
        SiteArchive.RiskInputs risk = jdbc.sql("SELECT * FROM site_risk_inputs WHERE site_id = ?").param(siteId)
                .query((rs, n) -> new SiteArchive.RiskInputs(rs.getString("flash_density_source"),
                        nullable(rs, "flash_density"), nullable(rs, "thunderstorm_days"), rs.getString("location_factor"),
                        rs.getString("surface_type"), rs.getString("fire_risk"), rs.getString("fire_provisions"),
                        rs.getString("special_hazard"), rs.getString("structure_use"), rs.getString("touch_step"),
                        rs.getDouble("persons_in_zone"), rs.getDouble("persons_total"), rs.getDouble("hours_per_year"),
                        nullableInt(rs, "line_count"), nullable(rs, "line_length"),
                        rs.getTimestamp("updated_at").toInstant(), rs.getString("life_critical_systems"),
                        rs.getString("line_details") == null ? null
                                : StoredLine.fromJson(rs.getString("line_details"))))
                .optional().orElse(null);
        List<SiteArchive.DownConductorEdit> downs = jdbc.sql("SELECT structure_id, positions, updated_at"
                        + " FROM down_conductor_positions WHERE site_id = ? ORDER BY structure_id")
                .param(siteId).query((rs, n) -> new SiteArchive.DownConductorEdit(rs.getString("structure_id"),
                        positions(rs.getString("positions")), rs.getTimestamp("updated_at").toInstant()))
                .list();
        List<SiteArchive.MetalInstallation> metals = jdbc.sql("SELECT name, x, y, z, material, created_at"
                        + " FROM metal_installations WHERE site_id = ? ORDER BY id")
                .param(siteId).query((rs, n) -> new SiteArchive.MetalInstallation(rs.getString("name"),
                        rs.getDouble("x"), rs.getDouble("y"), rs.getDouble("z"), rs.getString("material"),
                        rs.getTimestamp("created_at").toInstant()))
                .list();
        List<SiteArchive.SavedCut> cuts = jdbc.sql("SELECT name, x1, y1, x2, y2, created_at FROM site_cuts"
                        + " WHERE site_id = ? ORDER BY created_at, id")
                .param(siteId).query((rs, n) -> new SiteArchive.SavedCut(rs.getString("name"), rs.getDouble("x1"),
                        rs.getDouble("y1"), rs.getDouble("x2"), rs.getDouble("y2"),
                        rs.getTimestamp("created_at").toInstant()))
                .list();
        List<SiteArchive.KeepOutArea> keepOut = jdbc.sql("SELECT name, corners, created_at FROM site_keep_out_areas"
                        + " WHERE site_id = ? ORDER BY created_at, id")
                .param(siteId).query((rs, n) -> new SiteArchive.KeepOutArea(rs.getString("name"),
                        positions(rs.getString("corners")), rs.getTimestamp("created_at").toInstant()))
                .list();
        List<SiteArchive.Comment> comments = jdbc.sql("SELECT author, body, created_at FROM site_comments"
                        + " WHERE site_id = ? ORDER BY created_at, id")
                .param(siteId).query((rs, n) -> new SiteArchive.Comment(rs.getString("author"), rs.getString("body"),
                        rs.getTimestamp("created_at").toInstant()))
                .list();
        List<SiteArchive.AuditEntry> trail = jdbc.sql("SELECT actor, action, detail, created_at FROM audit_events"
                        + " WHERE site_id = ? ORDER BY created_at, id")
                .param(siteId).query((rs, n) -> new SiteArchive.AuditEntry(rs.getString("actor"),
                        rs.getString("action"), rs.getString("detail"), rs.getTimestamp("created_at").toInstant()))
                .list();
        return Optional.of(new SiteArchive(site.get(), files, revisions, risk, downs, metals, cuts, keepOut, comments,
                trail));
    }

    private List<SiteArchive.Review> reviews(long revisionId) {
        return jdbc.sql("SELECT reviewer, reviewed_at FROM revision_reviews WHERE revision_id = ? ORDER BY reviewed_at, id")
                .param(revisionId)
                .query((rs, n) -> new SiteArchive.Review(rs.getString("reviewer"), rs.getTimestamp("reviewed_at").toInstant()))
                .list();
    }

    private List<List<Double>> positions(String stored) {
        List<List<Double>> out = new ArrayList<>();
        for (JsonNode p : json.readTree(stored)) {
            out.add(List.of(p.get(0).asDouble(), p.get(1).asDouble()));
        }
        return out;
    }

    private List<SiteArchive.AcceptedItem> accepted(long revisionId) {
        return jdbc.sql("SELECT item_key, reason, created_at FROM accepted_items WHERE revision_id = ? ORDER BY id")
                .param(revisionId)
                .query((rs, n) -> new SiteArchive.AcceptedItem(rs.getString("item_key"), rs.getString("reason"),
                        rs.getTimestamp("created_at").toInstant()))
                .list();
    }

    /**
     * Stores the archive as a new site of the team and returns its id; the caller holds the
     * transaction. The archive's audit trail is not written (see {@link SiteArchive}).
     */
    long insert(SiteArchive archive, long teamId) {
        SiteArchive.Site s = archive.site();
        KeyHolder siteKey = new GeneratedKeyHolder();
        jdbc.sql("INSERT INTO sites (name, protection_level, custom_radius, source_name, source_text, created_at,"
                        + " updated_at, version, team_id, address, designer_name)"
                        + " VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)")
                .params(s.name(), s.level(), s.customRadius(), s.fileName(), s.fileText(),
                        Timestamp.from(s.createdAt()), Timestamp.from(s.updatedAt()), s.version(), teamId,
                        s.address(), s.designer())
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
            for (SiteArchive.Review v : r.reviews()) {
                jdbc.sql("INSERT INTO revision_reviews (revision_id, reviewer, reviewed_at) VALUES (?, ?, ?)")
                        .params(revisionId, v.reviewer(), Timestamp.from(v.reviewedAt())).update();
            }
        }
        for (SiteArchive.DownConductorEdit d : archive.downConductors()) {
            jdbc.sql("INSERT INTO down_conductor_positions (site_id, structure_id, positions, updated_at)"
                            + " VALUES (?, ?, ?, ?)")
                    .params(siteId, d.structureId(), json.writeValueAsString(d.positions()),
                            Timestamp.from(d.updatedAt()))
                    .update();
        }
        for (SiteArchive.MetalInstallation m : archive.metalInstallations()) {
            jdbc.sql("INSERT INTO metal_installations (site_id, name, x, y, z, material, created_at)"
                            + " VALUES (?, ?, ?, ?, ?, ?, ?)")
                    .params(siteId, m.name(), m.x(), m.y(), m.z(), m.material(), Timestamp.from(m.createdAt()))
                    .update();
        }
        for (SiteArchive.SavedCut c : archive.savedCuts()) {
            jdbc.sql("INSERT INTO site_cuts (site_id, name, x1, y1, x2, y2, created_at) VALUES (?, ?, ?, ?, ?, ?, ?)")
                    .params(siteId, c.name(), c.x1(), c.y1(), c.x2(), c.y2(), Timestamp.from(c.createdAt()))
                    .update();
        }
        for (SiteArchive.KeepOutArea k : archive.keepOutAreas()) {
            jdbc.sql("INSERT INTO site_keep_out_areas (site_id, name, corners, created_at) VALUES (?, ?, ?, ?)")
                    .params(siteId, k.name(), json.writeValueAsString(k.corners()), Timestamp.from(k.createdAt()))
                    .update();
        }
        for (SiteArchive.Comment c : archive.comments()) {
            jdbc.sql("INSERT INTO site_comments (site_id, author, body, created_at) VALUES (?, ?, ?, ?)")
                    .params(siteId, c.author(), c.body(), Timestamp.from(c.createdAt())).update();
        }
        SiteArchive.RiskInputs k = archive.riskInputs();
        if (k != null) {
            jdbc.sql("INSERT INTO site_risk_inputs (site_id, flash_density_source, flash_density, thunderstorm_days,"
                            + " location_factor, surface_type, fire_risk, fire_provisions, special_hazard, structure_use,"
                            + " touch_step, persons_in_zone, persons_total, hours_per_year, line_count, line_length,"
                            + " updated_at, life_critical_systems, line_details)"
                            + " VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)")
                    .params(siteId, k.flashDensitySource(), k.flashDensity(), k.thunderstormDays(), k.locationFactor(),
                            k.surfaceType(), k.fireRisk(), k.fireProvisions(), k.specialHazard(), k.structureUse(),
                            k.touchStep(), k.personsInZone(), k.personsTotal(), k.hoursPerYear(), k.lineCount(),
                            k.lineLength(), Timestamp.from(k.updatedAt()), k.lifeCriticalSystems(),
                            k.lines() == null ? null : StoredLine.toJson(k.lines()))
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
                rs.getTimestamp("updated_at").toInstant(), rs.getLong("version"), rs.getString("address"),
                rs.getString("designer_name"));
    }

    private static SiteArchive.Revision revisionRow(ResultSet rs, List<SiteArchive.AcceptedItem> accepted,
            List<SiteArchive.Review> reviews) throws SQLException {
        return new SiteArchive.Revision(rs.getInt("revision"), rs.getString("protection_level"),
                rs.getDouble("sphere_radius"), rs.getDouble("resolution"), rs.getString("inputs_sha256"),
                rs.getDouble("exposed_roof_area"), rs.getDouble("exposed_edge_length"), rs.getInt("exposed_corners"),
                rs.getInt("facade_bands"), rs.getDouble("protected_ground_area"), rs.getBoolean("fully_protected"),
                rs.getString("result_geojson"), rs.getLong("engine_millis"), rs.getTimestamp("created_at").toInstant(),
                accepted, rs.getString("site_name"), rs.getString("source_name"), rs.getString("source_text"),
                nullable(rs, "tolerance"), reviews);
    }
}
