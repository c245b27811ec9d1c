package org.lpzplanner.risk;

import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Timestamp;
import java.time.Instant;
import java.util.Optional;
import org.lpzplanner.engine.risk.FireProvisions;
import org.lpzplanner.engine.risk.FireRisk;
import org.lpzplanner.engine.risk.LocationFactor;
import org.lpzplanner.engine.risk.Occupancy;
import org.lpzplanner.engine.risk.SpecialHazard;
import org.lpzplanner.engine.risk.StructureUse;
import org.lpzplanner.engine.risk.SurfaceType;
import org.lpzplanner.engine.risk.TouchStepProtection;
import org.lpzplanner.sites.SiteDuplicated;
import org.springframework.context.event.EventListener;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.stereotype.Repository;

/** Reads and writes the {@code site_risk_inputs} table (one row per site). Stores checked settings only. */
@Repository
class RiskRepository {

    private final JdbcClient jdbc;

    RiskRepository(JdbcClient jdbc) {
        this.jdbc = jdbc;
    }

    Optional<RiskSettings> find(long siteId) {
        return jdbc.sql("SELECT * FROM site_risk_inputs WHERE site_id = ?").param(siteId)
                .query(RiskRepository::row).optional();
    }

    /** Replaces the site's inputs (update, or insert when there were none); portable SQL, no upsert. */
    void save(long siteId, RiskSettings s, Instant now) {
        Object[] values = {s.flashDensitySource().name(), s.flashDensity(), s.thunderstormDays(),
            s.location() == null ? null : s.location().name(), s.surface().name(), s.fireRisk().name(),
            s.fireProvisions().name(), s.specialHazard().name(), s.use().name(), s.touchStep().name(),
            s.occupancy().personsInZone(), s.occupancy().personsTotal(), s.occupancy().hoursPerYear(),
            s.lineCount(), s.lineLength(), Timestamp.from(now), siteId};
        int rows = jdbc.sql("UPDATE site_risk_inputs SET flash_density_source = ?, flash_density = ?,"
                        + " thunderstorm_days = ?, location_factor = ?, surface_type = ?, fire_risk = ?,"
                        + " fire_provisions = ?, special_hazard = ?, structure_use = ?, touch_step = ?,"
                        + " persons_in_zone = ?, persons_total = ?, hours_per_year = ?, line_count = ?,"
                        + " line_length = ?, updated_at = ? WHERE site_id = ?")
                .params(values).update();
        if (rows == 0) {
            jdbc.sql("INSERT INTO site_risk_inputs (flash_density_source, flash_density, thunderstorm_days,"
                            + " location_factor, surface_type, fire_risk, fire_provisions, special_hazard,"
                            + " structure_use, touch_step, persons_in_zone, persons_total, hours_per_year, line_count,"
                            + " line_length, updated_at, site_id) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)")
                    .params(values).update();
        }
    }

    private static RiskSettings row(ResultSet rs, int rowNum) throws SQLException {
        String location = rs.getString("location_factor");
        int lines = rs.getInt("line_count");
        Integer lineCount = rs.wasNull() ? null : lines;
        return new RiskSettings(FlashDensitySource.valueOf(rs.getString("flash_density_source")),
                nullableDouble(rs, "flash_density"), nullableDouble(rs, "thunderstorm_days"),
                location == null ? null : LocationFactor.valueOf(location),
                SurfaceType.valueOf(rs.getString("surface_type")), FireRisk.valueOf(rs.getString("fire_risk")),
                FireProvisions.valueOf(rs.getString("fire_provisions")),
                SpecialHazard.valueOf(rs.getString("special_hazard")),
                StructureUse.valueOf(rs.getString("structure_use")),
                TouchStepProtection.valueOf(rs.getString("touch_step")),
                new Occupancy(rs.getDouble("persons_in_zone"), rs.getDouble("persons_total"),
                        rs.getDouble("hours_per_year")),
                lineCount, nullableDouble(rs, "line_length"));
    }

    private static Double nullableDouble(ResultSet rs, String column) throws SQLException {
        double value = rs.getDouble(column);
        return rs.wasNull() ? null : value;
    }

    /** A copied site keeps the original's risk inputs. */
    @EventListener
    void copyFor(SiteDuplicated copy) {
        String columns = "flash_density_source, flash_density, thunderstorm_days, location_factor, surface_type, "
                + "fire_risk, fire_provisions, special_hazard, structure_use, touch_step, persons_in_zone, "
                + "persons_total, hours_per_year, line_count, line_length, updated_at";
        jdbc.sql("INSERT INTO site_risk_inputs (site_id, " + columns + ") SELECT ?, " + columns
                + " FROM site_risk_inputs WHERE site_id = ?").params(copy.to(), copy.from()).update();
    }
}
