package org.lpzplanner.analysis;

import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Timestamp;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;
import org.lpzplanner.engine.model.ProtectionLevel;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.jdbc.support.GeneratedKeyHolder;
import org.springframework.jdbc.support.KeyHolder;
import org.springframework.stereotype.Repository;

/** Reads and writes the {@code analysis_revisions} table. */
@Repository
public class AnalysisRepository {

    private static final String SUMMARY_COLUMNS = "id, site_id, revision, protection_level, sphere_radius, resolution,"
            + " inputs_sha256, exposed_roof_area, exposed_edge_length, exposed_corners, facade_bands,"
            + " protected_ground_area, fully_protected, created_at, engine_millis";

    private final JdbcClient jdbc;

    public AnalysisRepository(JdbcClient jdbc) {
        this.jdbc = jdbc;
    }

    /** The revision number the next analysis of the site gets. */
    public int nextRevision(long siteId) {
        Integer max = jdbc.sql("SELECT MAX(revision) FROM analysis_revisions WHERE site_id = ?").param(siteId)
                .query(Integer.class).optional().orElse(null);
        return max == null ? 1 : max + 1;
    }

    /**
     * Stores a revision (its id is ignored) with the inputs it read and returns it with the id given
     * by the database.
     */
    public AnalysisRevision insert(AnalysisRevision r, RevisionInputs inputs) {
        KeyHolder keys = new GeneratedKeyHolder();
        jdbc.sql("INSERT INTO analysis_revisions (site_id, revision, protection_level, sphere_radius, resolution,"
                        + " inputs_sha256, exposed_roof_area, exposed_edge_length, exposed_corners, facade_bands,"
                        + " protected_ground_area, fully_protected, result_geojson, created_at, engine_millis,"
                        + " site_name, source_name, source_text, tolerance)"
                        + " VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)")
                .params(r.siteId(), r.revision(), r.level().name(), r.sphereRadius(), r.resolution(), r.inputsSha256(),
                        r.exposedRoofArea(), r.exposedEdgeLength(), r.exposedCorners(), r.facadeBands(),
                        r.protectedGroundArea(), r.fullyProtected(), r.resultGeoJson(), Timestamp.from(r.createdAt()),
                        r.engineMillis(), inputs.siteName(), inputs.sourceName(), inputs.sourceText(),
                        inputs.tolerance())
                .update(keys, "id");
        long id = keys.getKeyAs(Number.class).longValue();
        return new AnalysisRevision(id, r.siteId(), r.revision(), r.level(), r.sphereRadius(), r.resolution(),
                r.inputsSha256(), r.exposedRoofArea(), r.exposedEdgeLength(), r.exposedCorners(), r.facadeBands(),
                r.protectedGroundArea(), r.fullyProtected(), r.resultGeoJson(), r.createdAt(), r.engineMillis());
    }

    /** The site's latest revision with its result GeoJSON, if it was analysed at all. */
    public Optional<AnalysisRevision> latest(long siteId) {
        return jdbc.sql("SELECT " + SUMMARY_COLUMNS + ", result_geojson FROM analysis_revisions WHERE site_id = ?"
                        + " ORDER BY revision DESC LIMIT 1")
                .param(siteId).query((rs, n) -> row(rs, rs.getString("result_geojson"))).optional();
    }

    /** One revision of a site by its number, with its result GeoJSON. */
    public Optional<AnalysisRevision> find(long siteId, int revision) {
        return jdbc.sql("SELECT " + SUMMARY_COLUMNS + ", result_geojson FROM analysis_revisions WHERE site_id = ?"
                        + " AND revision = ?")
                .params(siteId, revision).query((rs, n) -> row(rs, rs.getString("result_geojson"))).optional();
    }

    /**
     * The inputs stored with a revision; empty for revisions stored before inputs were kept (their
     * columns are NULL).
     */
    public Optional<RevisionInputs> inputs(long revisionId) {
        return jdbc.sql("SELECT site_name, source_name, source_text, tolerance FROM analysis_revisions WHERE id = ?"
                        + " AND source_text IS NOT NULL")
                .param(revisionId)
                .query((rs, n) -> new RevisionInputs(rs.getString("site_name"), rs.getString("source_name"),
                        rs.getString("source_text"), rs.getDouble("tolerance")))
                .optional();
    }

    /** The latest revision of every analysed site, without result GeoJSON, by site id. */
    public Map<Long, AnalysisRevision> latestSummaries() {
        Map<Long, AnalysisRevision> out = new LinkedHashMap<>();
        jdbc.sql("SELECT " + SUMMARY_COLUMNS + " FROM analysis_revisions a WHERE revision ="
                        + " (SELECT MAX(b.revision) FROM analysis_revisions b WHERE b.site_id = a.site_id)")
                .query((rs, n) -> row(rs, null)).list()
                .forEach(r -> out.put(r.siteId(), r));
        return out;
    }

    /** Number of revisions stored for a site. */
    public long count(long siteId) {
        return jdbc.sql("SELECT COUNT(*) FROM analysis_revisions WHERE site_id = ?").param(siteId)
                .query(Long.class).single();
    }

    private static AnalysisRevision row(ResultSet rs, String geoJson) throws SQLException {
        return new AnalysisRevision(rs.getLong("id"), rs.getLong("site_id"), rs.getInt("revision"),
                ProtectionLevel.valueOf(rs.getString("protection_level")), rs.getDouble("sphere_radius"),
                rs.getDouble("resolution"), rs.getString("inputs_sha256"), rs.getDouble("exposed_roof_area"),
                rs.getDouble("exposed_edge_length"), rs.getInt("exposed_corners"), rs.getInt("facade_bands"),
                rs.getDouble("protected_ground_area"), rs.getBoolean("fully_protected"), geoJson,
                rs.getTimestamp("created_at").toInstant(), rs.getLong("engine_millis"));
    }
}
