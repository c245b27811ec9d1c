package org.lpzplanner.browser;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assumptions.assumeThat;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * The pages' script modules that need no page (API client, plan frame, dragging and nudging,
 * undo history, tools, numbers, parapet snapping), tested by node's own test runner on the
 * files in {@code src/test/js}. Without node on the machine the test is skipped, except under CI
 * ({@code CI=true}), where a missing node is a failure: the CI script installs it.
 */
class ScriptModulesTest {

    private static final Path TESTS = Path.of("src", "test", "js");

    @Test
    void scriptModulesPassTheirUnitTests() throws Exception {
        String node = nodeCommand();
        if (node == null) {
            assertThat("true".equalsIgnoreCase(System.getenv("CI")))
                    .as("node must be installed under CI to run the script modules' tests").isFalse();
            assumeThat(node).as("node is not installed: the script modules' tests are skipped").isNotNull();
        }
        List<String> command = new ArrayList<>(List.of(node, "--test", "--test-reporter=tap"));
        try (Stream<Path> files = Files.list(TESTS)) {
            files.filter(f -> f.getFileName().toString().endsWith(".test.mjs")).sorted()
                    .forEach(f -> command.add(f.toString()));
        }
        assertThat(command).as("script module tests in " + TESTS).hasSizeGreaterThan(3);
        Process process = new ProcessBuilder(command).redirectErrorStream(true).start();
        byte[] output = process.getInputStream().readAllBytes();
        assertThat(process.waitFor(2, TimeUnit.MINUTES)).as("node's test run ends").isTrue();
        String text = new String(output, StandardCharsets.UTF_8);
        assertThat(process.exitValue()).as("node --test output:%n%s", text).isZero();
        assertThat(text).contains("# fail 0").doesNotContain("# pass 0");
    }

    /** node, or nodejs as older Debian releases name it; null when neither runs. */
    private static String nodeCommand() {
        for (String candidate : List.of("node", "nodejs")) {
            try {
                Process p = new ProcessBuilder(candidate, "--version").redirectErrorStream(true).start();
                p.getInputStream().readAllBytes();
                if (p.waitFor(20, TimeUnit.SECONDS) && p.exitValue() == 0) {
                    return candidate;
                }
            } catch (IOException e) {
                // not this one
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                return null;
            }
        }
        return null;
    }
}
