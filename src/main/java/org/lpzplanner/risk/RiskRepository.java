package org.lpzplanner.risk;

import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Timestamp;
import java.time.Instant;
import java.util.Collections;
import java.util.List;
import java.util.Optional;
import org.lpzplanner.engine.risk.FireProvisions;
import org.lpzplanner.engine.risk.FireRisk;
import org.lpzplanner.engine.risk.IncomingLine;
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

/**
 * Reads and writes the {@code site_risk_inputs} table (one row per site). Stores checked settings
 * only. A choice not made yet is stored as null; the location factor is stored as its class name,
 * as {@value RiskSettingsParser#SUGGESTED} when the user chose the app's suggestion, or null when
 * nothing is chosen (rows of earlier releases, where null meant the suggestion pre-filled in the
 * form, thus read as not chosen: migration V15). The lines are {@code line_count} (null until the
 * user says how many) and {@code line_details}, a JSON array of {@link StoredLine}; rows of earlier
 * releases hold only a count and one length ({@code line_length}), read as that many lines of that
 * length with every other factor at its most conservative value ({@link StoredLine#conservative}).
 * {@code life_critical_systems} is YES, NO or null (not answered).
 */
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
        Object[] values = {name(s.flashDensitySource()), s.flashDensity(), s.thunderstormDays(),
            s.useSuggestedLocation() ? RiskSettingsParser.SUGGESTED : name(s.location()), s.surface().name(),
            name(s.fireRisk()), s.fireProvisions().name(), name(s.specialHazard()), name(s.use()), s.touchStep().name(),
            s.occupancy().personsInZone(), s.occupancy().personsTotal(), s.occupancy().hoursPerYear(),
            s.lineCount(), null, s.lines() == null ? null : StoredLine.toJson(s.lines().stream().map(StoredLine::of)
                    .toList()), s.lifeCriticalSystems() == null ? null
                    : s.lifeCriticalSystems() ? RiskSettingsParser.YES : RiskSettingsParser.NO,
            Timestamp.from(now), siteId};
        int rows = jdbc.sql("UPDATE site_risk_inputs SET flash_density_source = ?, flash_density = ?,"
                        + " thunderstorm_days = ?, location_factor = ?, surface_type = ?, fire_risk = ?,"
                        + " fire_provisions = ?, special_hazard = ?, structure_use = ?, touch_step = ?,"
                        + " persons_in_zone = ?, persons_total = ?, hours_per_year = ?, line_count = ?,"
                        + " line_length = ?, line_details = ?, life_critical_systems = ?, updated_at = ?"
                        + " WHERE site_id = ?")
                .params(values).update();
        if (rows == 0) {
            jdbc.sql("INSERT INTO site_risk_inputs (flash_density_source, flash_density, thunderstorm_days,"
                            + " location_factor, surface_type, fire_risk, fire_provisions, special_hazard,"
                            + " structure_use, touch_step, persons_in_zone, persons_total, hours_per_year, line_count,"
                            + " line_length, line_details, life_critical_systems, updated_at, site_id)"
                            + " VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)")
                    .params(values).update();
        }
    }

    private static String name(Enum<?> choice) {
        return choice == null ? null : choice.name();
    }

    private static <E extends Enum<E>> E choice(ResultSet rs, String column, Class<E> type) throws SQLException {
        String value = rs.getString(column);
        return value == null ? null : Enum.valueOf(type, value);
    }

    private static RiskSettings row(ResultSet rs, int rowNum) throws SQLException {
        String location = rs.getString("location_factor");
        boolean suggested = RiskSettingsParser.SUGGESTED.equals(location);
        String lifeCritical = rs.getString("life_critical_systems");
        return new RiskSettings(choice(rs, "flash_density_source", FlashDensitySource.class),
                nullableDouble(rs, "flash_density"), nullableDouble(rs, "thunderstorm_days"),
                location == null || suggested ? null : LocationFactor.valueOf(location), suggested,
                SurfaceType.valueOf(rs.getString("surface_type")), choice(rs, "fire_risk", FireRisk.class),
                FireProvisions.valueOf(rs.getString("fire_provisions")),
                choice(rs, "special_hazard", SpecialHazard.class), choice(rs, "structure_use", StructureUse.class),
                TouchStepProtection.valueOf(rs.getString("touch_step")),
                new Occupancy(rs.getDouble("persons_in_zone"), rs.getDouble("persons_total"),
                        rs.getDouble("hours_per_year")),
                lifeCritical == null ? null : RiskSettingsParser.YES.equals(lifeCritical), lines(rs));
    }

    /** The stored lines; the count and one length of earlier rows as that many conservative lines. */
    private static List<IncomingLine> lines(ResultSet rs) throws SQLException {
        String details = rs.getString("line_details");
        if (details != null) {
            return StoredLine.fromJson(details).stream().map(StoredLine::toLine).toList();
        }
        int count = rs.getInt("line_count");
        if (rs.wasNull()) {
            return null;
        }
        Double length = nullableDouble(rs, "line_length");
        double l = length == null ? RiskSettings.DEFAULT_LINE_LENGTH : length;
        return Collections.nCopies(count, StoredLine.conservative(l));
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
                + "persons_total, hours_per_year, line_count, line_length, line_details, life_critical_systems, "
                + "updated_at";
        jdbc.sql("INSERT INTO site_risk_inputs (site_id, " + columns + ") SELECT ?, " + columns
                + " FROM site_risk_inputs WHERE site_id = ?").params(copy.to(), copy.from()).update();
    }
}
