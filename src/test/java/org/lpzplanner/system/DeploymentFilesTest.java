package org.lpzplanner.system;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Properties;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.Test;
import org.w3c.dom.Document;
import org.yaml.snakeyaml.Yaml;

/**
 * The container files, checked without a container engine: docker-compose.yml parses and wires the
 * app to PostgreSQL through the variables the postgres profile reads; the jar, port and Java version
 * in the Dockerfile match the build and the app; the health checks ask the endpoint the app publishes.
 */
class DeploymentFilesTest {

    @SuppressWarnings("unchecked")
    private static Map<String, Object> compose() throws Exception {
        try (InputStream in = Files.newInputStream(Path.of("docker-compose.yml"))) {
            return new Yaml().load(in);
        }
    }

    private static String dockerfile() throws Exception {
        return Files.readString(Path.of("Dockerfile"));
    }

    private static String pom(String tag) throws Exception {
        Document pom = DocumentBuilderFactory.newInstance().newDocumentBuilder().parse(Path.of("pom.xml").toFile());
        return pom.getElementsByTagName(tag).item(0).getTextContent().strip();
    }

    private static Properties properties(String resource) throws Exception {
        Properties p = new Properties();
        try (InputStream in = Files.newInputStream(Path.of("src/main/resources", resource))) {
            p.load(in);
        }
        return p;
    }

    @SuppressWarnings("unchecked")
    private static Map<String, Object> service(String name) throws Exception {
        return (Map<String, Object>) ((Map<String, Object>) compose().get("services")).get(name);
    }

    @Test
    void dockerfileCopiesTheJarTheBuildMakesAndRunsTheJavaVersionOfThePom() throws Exception {
        String jar = pom("finalName") + ".jar";
        assertThat(dockerfile()).contains("COPY --from=build /src/target/" + jar + " /app/" + jar)
                .contains("\"-jar\", \"/app/" + jar + "\"")
                .contains("eclipse-temurin-" + pom("java.version") + " AS build")
                .contains("FROM eclipse-temurin:" + pom("java.version") + "-jre");
    }

    @Test
    void publishedPortIsTheAppsPort() throws Exception {
        String appPort = properties("application.properties").getProperty("server.port", "8080");
        Map<String, Object> app = service("app");
        assertThat((List<String>) app.get("ports")).containsExactly(appPort + ":" + appPort);
        assertThat(dockerfile()).contains("EXPOSE " + appPort);
        assertThat(((Map<String, Object>) app.get("environment")).get("SERVER_PORT")).isEqualTo(appPort);
    }

    @Test
    @SuppressWarnings("unchecked")
    void appRunsThePostgresProfileWithTheVariablesItReads() throws Exception {
        Map<String, Object> env = (Map<String, Object>) service("app").get("environment");
        assertThat(env.get("SPRING_PROFILES_ACTIVE")).isEqualTo("postgres");
        Properties postgres = properties("application-postgres.properties");
        // every ${VARIABLE:default} the profile reads is set by the compose file
        Matcher variables = Pattern.compile("\\$\\{([A-Z_]+):").matcher(String.join("\n",
                postgres.getProperty("spring.datasource.url"), postgres.getProperty("spring.datasource.username"),
                postgres.getProperty("spring.datasource.password")));
        int found = 0;
        while (variables.find()) {
            assertThat(env).containsKey(variables.group(1));
            found++;
        }
        assertThat(found).isEqualTo(3);
        assertThat((String) env.get("LPZ_DB_URL")).startsWith("jdbc:postgresql://db:5432/");
        Map<String, Object> dbEnv = (Map<String, Object>) service("db").get("environment");
        assertThat((String) env.get("LPZ_DB_URL")).endsWith("/" + dbEnv.get("POSTGRES_DB"));
        assertThat(env.get("LPZ_DB_USER")).isEqualTo(dbEnv.get("POSTGRES_USER"));
        assertThat(env.get("LPZ_DB_PASSWORD")).isEqualTo(dbEnv.get("POSTGRES_PASSWORD"));
        assertThat((String) service("db").get("image")).isEqualTo("postgres:15");
        Map<String, Object> dependsOn = (Map<String, Object>) service("app").get("depends_on");
        assertThat((Map<String, Object>) dependsOn.get("db")).containsEntry("condition", "service_healthy");
    }

    @Test
    @SuppressWarnings("unchecked")
    void healthChecksAskThePublishedHealthEndpoint() throws Exception {
        Properties app = properties("application.properties");
        assertThat(app.getProperty("management.endpoints.web.exposure.include")).isEqualTo("health");
        List<String> test = (List<String>) ((Map<String, Object>) service("app").get("healthcheck")).get("test");
        assertThat(String.join(" ", test)).contains("/dev/tcp/127.0.0.1/8080", "GET /actuator/health",
                "\"status\":\"UP\"");
        assertThat(dockerfile()).contains("GET /actuator/health");
        List<String> dbTest = (List<String>) ((Map<String, Object>) service("db").get("healthcheck")).get("test");
        assertThat(String.join(" ", dbTest)).contains("pg_isready");
    }
}
