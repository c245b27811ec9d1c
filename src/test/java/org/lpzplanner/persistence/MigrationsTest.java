package org.lpzplanner.persistence;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.Statement;
import java.util.HashMap;
import java.util.Map;
import org.flywaydb.core.Flyway;
import org.flywaydb.core.api.MigrationInfo;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.lpzplanner.LpzPlannerApplication;
import org.lpzplanner.sites.SiteService;
import org.lpzplanner.system.PortableMigrationUpgrade;
import org.springframework.boot.builder.SpringApplicationBuilder;
import org.springframework.context.ConfigurableApplicationContext;

/**
 * The migrations run on H2 and on PostgreSQL, and a data folder made by a release whose first
 * migrations were worded for H2 only (kept verbatim under {@code db/released}) still starts.
 */
class MigrationsTest {

    private static final String CURRENT = "classpath:db/migration";
    private static final String RELEASED = "classpath:db/released";

    private static Flyway flyway(String url, String user, String password, String location) {
        return Flyway.configure().dataSource(url, user, password).locations(location).load();
    }

    private static Map<String, Integer> appliedChecksums(Flyway flyway) {
        Map<String, Integer> out = new HashMap<>();
        for (MigrationInfo info : flyway.info().applied()) {
            out.put(info.getVersion().getVersion(), info.getChecksum());
        }
        return out;
    }

    @Test
    void allMigrationsRunOnH2() {
        Flyway flyway = flyway("jdbc:h2:mem:migrations-" + System.nanoTime() + ";DB_CLOSE_DELAY=-1", "sa", "", CURRENT);
        flyway.migrate();
        assertThat(flyway.info().pending()).isEmpty();
        assertThat(flyway.info().applied()).hasSizeGreaterThanOrEqualTo(4);
    }

    @Test
    void allMigrationsRunOnPostgres() {
        assumeTrue(PostgresTestDatabase.configured() || "true".equalsIgnoreCase(System.getenv("CI")),
                "PostgreSQL tests skipped: set " + PostgresTestDatabase.URL_VARIABLE);
        assertThat(PostgresTestDatabase.configured()).as(PostgresTestDatabase.URL_VARIABLE + " under CI").isTrue();
        Flyway flyway = flyway(PostgresTestDatabase.freshSchemaUrl(), PostgresTestDatabase.user(),
                PostgresTestDatabase.password(), CURRENT);
        flyway.migrate();
        assertThat(flyway.info().pending()).isEmpty();
        assertThat(flyway.info().applied()).hasSizeGreaterThanOrEqualTo(4);
    }

    @Test
    void recordedChecksumsOfTheRewordedMigrationsAreFlywaysOwn() {
        Flyway released = flyway("jdbc:h2:mem:released-" + System.nanoTime() + ";DB_CLOSE_DELAY=-1", "sa", "", RELEASED);
        released.migrate();
        Flyway current = flyway("jdbc:h2:mem:current-" + System.nanoTime() + ";DB_CLOSE_DELAY=-1", "sa", "", CURRENT);
        current.migrate();
        Map<String, Integer> releasedSums = appliedChecksums(released);
        Map<String, Integer> currentSums = appliedChecksums(current);
        PortableMigrationUpgrade.REWORDED.forEach((version, sums) -> {
            assertThat(releasedSums.get(version)).as("released V" + version).isEqualTo(sums.released());
            assertThat(currentSums.get(version)).as("current V" + version).isEqualTo(sums.current());
        });
    }

    @Test
    void dataFolderOfAnEarlierReleaseStartsAndKeepsItsSites(@TempDir Path dataDir) throws Exception {
        String url = "jdbc:h2:file:" + dataDir.resolve("lpz-planner").toAbsolutePath();
        flyway(url, "sa", "", RELEASED).migrate();
        try (Connection c = DriverManager.getConnection(url, "sa", ""); Statement s = c.createStatement()) {
            s.execute("INSERT INTO sites (name, protection_level, source_name, source_text, created_at, updated_at)"
                    + " VALUES ('Old depot', 'II', 'depot.wkt', 'POLYGON ((0 0, 10 0, 10 10, 0 10, 0 0))',"
                    + " CURRENT_TIMESTAMP, CURRENT_TIMESTAMP)");
        }
        try (ConfigurableApplicationContext app = new SpringApplicationBuilder(LpzPlannerApplication.class)
                .run("--lpz.data-dir=" + dataDir.toAbsolutePath(), "--spring.datasource.url=" + url,
                        "--server.port=0", "--lpz.demo-data=false")) {
            SiteService sites = app.getBean(SiteService.class);
            assertThat(sites.list()).extracting(s -> s.name()).containsExactly("Old depot");
            // a new row gets a fresh id from the identity column made by the released wording
            long id = sites.duplicate(sites.list().get(0).id()).id();
            assertThat(id).isGreaterThan(1);
        }
        Flyway current = flyway(url, "sa", "", CURRENT);
        assertThat(current.info().pending()).isEmpty();
        assertThat(current.validateWithResult().validationSuccessful).isTrue();
    }

    @Test
    void aMigrationEditedOtherwiseIsStillRefused(@TempDir Path dataDir) throws Exception {
        String url = "jdbc:h2:file:" + dataDir.resolve("lpz-planner").toAbsolutePath();
        flyway(url, "sa", "", RELEASED).migrate();
        try (Connection c = DriverManager.getConnection(url, "sa", ""); Statement s = c.createStatement()) {
            s.execute("UPDATE \"flyway_schema_history\" SET \"checksum\" = 12345 WHERE \"version\" = '2'");
        }
        Flyway current = flyway(url, "sa", "", CURRENT);
        assertThatThrownBy(() -> new PortableMigrationUpgrade().migrate(current))
                .hasMessageContaining("checksum");
    }
}
