package org.lpzplanner.design;

import java.time.Instant;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.lpzplanner.sites.SiteDuplicated;
import org.springframework.context.event.EventListener;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.stereotype.Repository;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/** Edited down-conductor positions and marked metal installations of sites (plain JDBC). */
@Repository
public class DesignRepository {

    private final JdbcClient jdbc;
    private final JsonMapper json;

    public DesignRepository(JdbcClient jdbc, JsonMapper json) {
        this.jdbc = jdbc;
        this.json = json;
    }

    /** A metal installation; material is "AIR" or "CONCRETE_OR_BRICK" (the insulation between it and the LPS). */
    public record Installation(long id, String name, double x, double y, double z, String material) {
    }

    /** Edited positions per structure id. */
    public Map<String, List<double[]>> downConductors(long siteId) {
        Map<String, List<double[]>> out = new LinkedHashMap<>();
        jdbc.sql("SELECT structure_id, positions FROM down_conductor_positions WHERE site_id = ? ORDER BY structure_id")
                .param(siteId).query((rs, n) -> {
                    List<double[]> positions = new ArrayList<>();
                    for (JsonNode p : json.readTree(rs.getString(2))) {
                        positions.add(new double[] {p.get(0).asDouble(), p.get(1).asDouble()});
                    }
                    out.put(rs.getString(1), positions);
                    return null;
                }).list();
        return out;
    }

    public void saveDownConductors(long siteId, String structureId, List<double[]> positions, Instant at) {
        String positionsJson = json.writeValueAsString(positions);
        OffsetDateTime when = at.atOffset(ZoneOffset.UTC);
        int changed = jdbc.sql("UPDATE down_conductor_positions SET positions = ?, updated_at = ? WHERE site_id = ? AND structure_id = ?")
                .params(positionsJson, when, siteId, structureId).update();
        if (changed == 0) {
            jdbc.sql("INSERT INTO down_conductor_positions (site_id, structure_id, positions, updated_at) VALUES (?, ?, ?, ?)")
                    .params(siteId, structureId, positionsJson, when).update();
        }
    }

    public boolean resetDownConductors(long siteId, String structureId) {
        return jdbc.sql("DELETE FROM down_conductor_positions WHERE site_id = ? AND structure_id = ?")
                .params(siteId, structureId).update() > 0;
    }

    public List<Installation> installations(long siteId) {
        return jdbc.sql("SELECT id, name, x, y, z, material FROM metal_installations WHERE site_id = ? ORDER BY id")
                .param(siteId).query((rs, n) -> new Installation(rs.getLong(1), rs.getString(2), rs.getDouble(3),
                        rs.getDouble(4), rs.getDouble(5), rs.getString(6))).list();
    }

    public long addInstallation(long siteId, String name, double x, double y, double z, String material, Instant at) {
        var keys = new org.springframework.jdbc.support.GeneratedKeyHolder();
        jdbc.sql("INSERT INTO metal_installations (site_id, name, x, y, z, material, created_at) VALUES (?, ?, ?, ?, ?, ?, ?)")
                .params(siteId, name, x, y, z, material, at.atOffset(ZoneOffset.UTC)).update(keys, "id");
        return keys.getKey().longValue();
    }

    public boolean removeInstallation(long siteId, long id) {
        return jdbc.sql("DELETE FROM metal_installations WHERE site_id = ? AND id = ?").params(siteId, id).update() > 0;
    }

    /** A copied site keeps the original's edited down-conductor positions and metal installations. */
    @EventListener
    void copyFor(SiteDuplicated copy) {
        jdbc.sql("INSERT INTO down_conductor_positions (site_id, structure_id, positions, updated_at)"
                + " SELECT ?, structure_id, positions, updated_at FROM down_conductor_positions WHERE site_id = ?")
                .params(copy.to(), copy.from()).update();
        jdbc.sql("INSERT INTO metal_installations (site_id, name, x, y, z, material, created_at)"
                + " SELECT ?, name, x, y, z, material, created_at FROM metal_installations WHERE site_id = ?"
                + " ORDER BY id").params(copy.to(), copy.from()).update();
    }
}
