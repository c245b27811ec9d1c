package org.lpzplanner.risk;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import org.flywaydb.core.Flyway;
import org.junit.jupiter.api.Test;
import org.lpzplanner.engine.risk.FireProvisions;
import org.lpzplanner.engine.risk.FireRisk;
import org.lpzplanner.engine.risk.LocationFactor;
import org.lpzplanner.engine.risk.SpecialHazard;
import org.lpzplanner.engine.risk.StructureUse;
import org.lpzplanner.engine.risk.SurfaceType;
import org.lpzplanner.engine.risk.TouchStepProtection;
import org.lpzplanner.persistence.PostgresTestDatabase;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.jdbc.datasource.DriverManagerDataSource;

/**
 * Risk inputs stored by an earlier release still load after the migrations. The inputs that now
 * have no default (fire risk, special hazard, type of structure, the location factor, the ground
 * flash density) were pre-filled then: a value equal to that former default may never have been
 * chosen, so it is cleared and must be chosen again; a value that differs was chosen and is kept.
 * Lines were a count and one length: they load as that many lines at the most conservative values.
 */
class RiskInputsMigrationTest {

    /** The last migration before the inputs without a safe default. */
    private static final String BEFORE = "14";

    @Test
    void storedInputsLoadOnH2WithFormerDefaultsCleared() {
        check("jdbc:h2:mem:risk-migration-" + System.nanoTime() + ";DB_CLOSE_DELAY=-1", "sa", "");
    }

    @Test
    void storedInputsLoadOnPostgresWithFormerDefaultsCleared() {
        assumeTrue(PostgresTestDatabase.configured() || "true".equalsIgnoreCase(System.getenv("CI")),
                "PostgreSQL tests skipped: set " + PostgresTestDatabase.URL_VARIABLE);
        check(PostgresTestDatabase.freshSchemaUrl(), PostgresTestDatabase.user(), PostgresTestDatabase.password());
    }

    private static void check(String url, String user, String password) {
        Flyway.configure().dataSource(url, user, password).locations("classpath:db/migration").target(BEFORE).load()
                .migrate();
        JdbcClient jdbc = JdbcClient.create(new DriverManagerDataSource(url, user, password));
        long team = jdbc.sql("SELECT MIN(id) FROM teams").query(Long.class).single();
        long untouched = site(jdbc, team, "Left at the defaults");
        long chosen = site(jdbc, team, "Chosen");
        String insert = "INSERT INTO site_risk_inputs (site_id, flash_density_source, flash_density, thunderstorm_days,"
                + " location_factor, surface_type, fire_risk, fire_provisions, special_hazard, structure_use, touch_step,"
                + " persons_in_zone, persons_total, hours_per_year, line_count, line_length, updated_at)"
                + " VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, CURRENT_TIMESTAMP)";
        // saved as the earlier page form came up: every pre-filled value kept
        jdbc.sql(insert).params(untouched, "THUNDERSTORM_DAYS", null, 25.0, null, "AGRICULTURAL_OR_CONCRETE",
                "ORDINARY", "NONE", "NONE", "OTHER", "NONE", 1.0, 1.0, 8760.0, null, null).update();
        jdbc.sql(insert).params(chosen, "MEASURED", 3.5, null, "ISOLATED", "MARBLE_OR_CERAMIC", "HIGH", "MANUAL",
                "LOW_PANIC", "HOSPITAL_HOTEL_SCHOOL_CIVIC", "WARNING_NOTICES", 10.0, 40.0, 2000.0, 2, 600.0).update();

        Flyway.configure().dataSource(url, user, password).locations("classpath:db/migration").load().migrate();
        RiskRepository repository = new RiskRepository(jdbc);

        RiskSettings cleared = repository.find(untouched).orElseThrow();
        assertThat(cleared.fireRisk()).isNull();
        assertThat(cleared.specialHazard()).isNull();
        assertThat(cleared.use()).isNull();
        assertThat(cleared.thunderstormDays()).isNull();
        assertThat(cleared.location()).isNull();
        assertThat(cleared.useSuggestedLocation()).isFalse();
        assertThat(cleared.missing()).containsExactly("thunderstormDays", "location", "fireRisk", "specialHazard",
                "structureUse", "lifeCriticalSystems", "lineCount");
        assertThat(cleared.lines()).isNull();
        // the former defaults that were already the most conservative stay
        assertThat(cleared.surface()).isEqualTo(SurfaceType.AGRICULTURAL_OR_CONCRETE);
        assertThat(cleared.fireProvisions()).isEqualTo(FireProvisions.NONE);
        assertThat(cleared.touchStep()).isEqualTo(TouchStepProtection.NONE);
        assertThat(cleared.occupancy().fraction()).isEqualTo(1.0);

        RiskSettings kept = repository.find(chosen).orElseThrow();
        assertThat(kept.flashDensity()).isEqualTo(3.5);
        assertThat(kept.location()).isEqualTo(LocationFactor.ISOLATED);
        assertThat(kept.surface()).isEqualTo(SurfaceType.MARBLE_OR_CERAMIC);
        assertThat(kept.fireRisk()).isEqualTo(FireRisk.HIGH);
        assertThat(kept.fireProvisions()).isEqualTo(FireProvisions.MANUAL);
        assertThat(kept.specialHazard()).isEqualTo(SpecialHazard.LOW_PANIC);
        assertThat(kept.use()).isEqualTo(StructureUse.HOSPITAL_HOTEL_SCHOOL_CIVIC);
        assertThat(kept.touchStep()).isEqualTo(TouchStepProtection.WARNING_NOTICES);
        assertThat(kept.occupancy().personsTotal()).isEqualTo(40.0);
        assertThat(kept.missing()).containsExactly("lifeCriticalSystems");
        // two lines of 600 m stored as a count and one length: two lines at the most conservative
        // values, the ones the form starts a line with
        assertThat(kept.lines()).hasSize(2).allSatisfy(l -> {
            assertThat(l.length()).isEqualTo(600.0);
            assertThat(l).isEqualTo(StoredLine.conservative(600));
        });
    }

    private static long site(JdbcClient jdbc, long team, String name) {
        jdbc.sql("INSERT INTO sites (name, protection_level, source_name, source_text, created_at, updated_at, team_id)"
                + " VALUES (?, 'III', 'block.wkt', 'POLYGON ((0 0, 10 0, 10 10, 0 10, 0 0))', CURRENT_TIMESTAMP,"
                + " CURRENT_TIMESTAMP, ?)").params(name, team).update();
        return jdbc.sql("SELECT MAX(id) FROM sites").query(Long.class).single();
    }
}
