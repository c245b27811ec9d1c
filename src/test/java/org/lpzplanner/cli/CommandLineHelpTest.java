package org.lpzplanner.cli;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

/** Help, the bare command and which first words the command line takes over from the web application. */
class CommandLineHelpTest {

    @Test
    void helpPrintsUsageAndSucceeds() {
        CliRun run = CliRun.of("--help");

        assertThat(run.exitCode()).isEqualTo(CommandLine.OK);
        assertThat(run.out()).contains("Usage:", "analyze", "envelope", "--site", "--level", "--points", "--out");
        assertThat(run.err()).isEmpty();
    }

    @Test
    void helpAfterACommandPrintsUsageToo() {
        CliRun run = CliRun.of("analyze", "--site", "x.geojson", "--help");

        assertThat(run.exitCode()).isEqualTo(CommandLine.OK);
        assertThat(run.out()).startsWith("Usage:");
    }

    @Test
    void noArgumentsPrintUsageAsAnError() {
        CliRun run = CliRun.of();

        assertThat(run.exitCode()).isEqualTo(CommandLine.INVALID);
        assertThat(run.out()).isEmpty();
        assertThat(run.err()).startsWith("Usage:");
    }

    @Test
    void commandsAndHelpAreHandledHereEverythingElseByTheWebApplication() {
        assertThat(CommandLine.handles("analyze")).isTrue();
        assertThat(CommandLine.handles("envelope")).isTrue();
        assertThat(CommandLine.handles("--help")).isTrue();
        assertThat(CommandLine.handles("--server.port=8081")).isFalse();
        assertThat(CommandLine.handles("analyse")).isFalse();
        assertThat(CommandLine.handles(null)).isFalse();
    }
}
