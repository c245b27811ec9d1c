package org.lpzplanner.persistence;

import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.UUID;
import org.springframework.test.context.DynamicPropertyRegistry;

/**
 * The PostgreSQL server tests may use: {@value #URL_VARIABLE} (a JDBC URL such as
 * {@code jdbc:postgresql://localhost:5432/lpz_test}), {@code LPZ_TEST_POSTGRES_USER} and
 * {@code LPZ_TEST_POSTGRES_PASSWORD}. Every caller gets a fresh schema of its own, so test classes
 * never see each other's rows and the migrations run from the start each time.
 */
public final class PostgresTestDatabase {

    public static final String URL_VARIABLE = "LPZ_TEST_POSTGRES_URL";

    private PostgresTestDatabase() {}

    public static boolean configured() {
        String url = System.getenv(URL_VARIABLE);
        return url != null && !url.isBlank();
    }

    public static String user() {
        String user = System.getenv("LPZ_TEST_POSTGRES_USER");
        return user == null ? "lpz" : user;
    }

    public static String password() {
        String password = System.getenv("LPZ_TEST_POSTGRES_PASSWORD");
        return password == null ? "" : password;
    }

    /** Creates an empty schema and returns a JDBC URL whose connections work in it. */
    public static String freshSchemaUrl() {
        String url = System.getenv(URL_VARIABLE);
        String schema = "t_" + UUID.randomUUID().toString().replace("-", "");
        try (Connection c = DriverManager.getConnection(url, user(), password());
                Statement s = c.createStatement()) {
            s.execute("CREATE SCHEMA " + schema);
        } catch (SQLException e) {
            throw new IllegalStateException("cannot create a schema on the PostgreSQL test server " + url
                    + ": " + e.getMessage(), e);
        }
        return url + (url.contains("?") ? "&" : "?") + "currentSchema=" + schema;
    }

    /** Points the Spring context's data source at a fresh schema on the test server. */
    public static void register(DynamicPropertyRegistry registry) {
        String url = freshSchemaUrl();
        registry.add("spring.datasource.url", () -> url);
        registry.add("spring.datasource.username", PostgresTestDatabase::user);
        registry.add("spring.datasource.password", PostgresTestDatabase::password);
        registry.add("spring.datasource.driver-class-name", () -> "org.postgresql.Driver");
        // test contexts stay cached for the whole run: keep each one's pool small so that many of
        // them fit in the server's connection slots
        registry.add("spring.datasource.hikari.maximum-pool-size", () -> "4");
        registry.add("spring.datasource.hikari.minimum-idle", () -> "1");
    }
}
