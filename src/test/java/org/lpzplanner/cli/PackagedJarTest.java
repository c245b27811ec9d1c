package org.lpzplanner.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import java.util.jar.JarFile;
import org.junit.jupiter.api.Test;

/**
 * The packaged application runs a command-line command and exits without starting the web
 * application. Runs only when {@code target/lpz-planner.jar} has been built with the command line
 * in it ({@code mvn package}); skipped otherwise.
 */
class PackagedJarTest {

    private static final Path JAR = Path.of("target", "lpz-planner.jar");

    @Test
    void analyzeRunsWithoutStartingTheWebApplication() throws Exception {
        assumeTrue(Files.isRegularFile(JAR), "target/lpz-planner.jar not built");
        assumeTrue(containsCommandLine(), "target/lpz-planner.jar predates the command line; run mvn package");
        Path java = Path.of(System.getProperty("java.home"), "bin", "java");
        Process process = new ProcessBuilder(java.toString(), "-jar", JAR.toString(), "analyze",
                "--site", TestFiles.SAMPLES.resolve("harbour-warehouse.geojson").toString(), "--level", "II")
                .redirectErrorStream(true)
                .start();
        process.getOutputStream().close();
        // read before waiting, so a full pipe cannot stall the child
        String output = new String(process.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        boolean finished = process.waitFor(120, TimeUnit.SECONDS);
        if (!finished) {
            process.destroyForcibly();
        }

        assertThat(finished).as("finished within 2 minutes").isTrue();
        assertThat(process.exitValue()).as(output).isZero();
        assertThat(output).contains("Saltmere Quay warehouse", "Cautions:");
        // Spring's banner and its embedded server would show these
        assertThat(output).doesNotContain("Tomcat", "Spring Boot", ":: Spring", "Started LpzPlannerApplication");
    }

    private static boolean containsCommandLine() {
        try (JarFile jar = new JarFile(JAR.toFile())) {
            return jar.getEntry("BOOT-INF/classes/org/lpzplanner/cli/CommandLine.class") != null;
        } catch (IOException e) {
            return false; // a jar being written by a concurrent build is not a built jar
        }
    }
}
