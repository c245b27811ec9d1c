package org.lpzplanner.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * {@code analyze} on a 10 m × 10 m hut, 5 m high, under a wire strung at 45 m between two 45 m
 * masts 100 m apart, at level I (R = 20 m, IEC 62305-3:2010 Table 2): the wire runs more than R
 * above what lies beneath it, where a sphere can pass under it (IEC 62305-3:2010 Annex A), so the
 * analysis warns, naming the wire, and gives no verdict of full protection.
 */
class ModelWarningOutputTest {

    private static final JsonMapper JSON = JsonMapper.builder().build();

    @TempDir
    static Path folder;

    static CliRun run;
    static JsonNode written;

    @BeforeAll
    static void analyseWireAboveHut() throws Exception {
        Path out = folder.resolve("wire-result.geojson");
        run = CliRun.of("analyze", "--site", "src/test/resources/sites/wire-above-hut.geojson", "--level", "I",
                "--out", out.toString());
        written = Files.exists(out) ? JSON.readTree(Files.readString(out)) : null;
    }

    @Test
    void summaryListsTheWarningNamingTheWireWithItsHeightAboveTheSurfaceAndTheRadius() {
        assertThat(run.exitCode()).as(run.err()).isZero();
        String flat = run.out().replaceAll("\\s+", " ");
        assertThat(run.out()).containsPattern("(?m)^Model warnings: 1 \\(no verdict of full protection while one stands\\)$");
        // the part by name and id, the radius it exceeds (R = 20 m at level I, IEC 62305-3:2010 Table 2)
        assertThat(run.out()).containsPattern("(?m)^  Span wire \\(wire\\): free span, up to [\\d.]+ m above the surface"
                + " beneath it, more than the sphere radius 20 m$");
        // and what to do, in the engine's own words
        assertThat(flat).contains("Protect what lies beneath by other air-termination, or lower the conductor.");
    }

    @Test
    void overallLineGivesNoVerdictOfProtectionWhileTheWarningStands() {
        assertThat(run.out()).doesNotContain("no exposed roof, edge, corner or facade band was found");
        assertThat(run.out()).containsPattern("(?m)^Overall: no verdict of full protection: 1 model warning stands"
                + " \\(see above\\)");
    }

    @Test
    void writtenResultCarriesTheWarningInItsOwnLayerAndInTheSummary() {
        assertThat(written).as("analyze --out wrote a file").isNotNull();
        int features = 0;
        for (JsonNode f : written.path("features")) {
            if (f.path("properties").path("layer").asString().equals("model-warning")) {
                features++;
                assertThat(f.path("properties").path("part").asString()).isEqualTo("wire");
            }
        }
        assertThat(features).isEqualTo(1);
        assertThat(written.path("analysis").path("summary").path("warnings").size()).isEqualTo(1);
        assertThat(written.path("analysis").path("summary").path("fullyProtected").asBoolean()).isFalse();
    }
}
