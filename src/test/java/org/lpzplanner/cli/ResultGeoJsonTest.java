package org.lpzplanner.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/** The GeoJSON that {@code analyze --out} writes, for sites in local metres and in lon/lat. */
class ResultGeoJsonTest {

    private static final JsonMapper JSON = JsonMapper.builder().build();

    @TempDir
    Path folder;

    private Path out;
    private CliRun run;

    /** Runs analyze at level II with --out and any extra options; returns the GeoJSON written. */
    private JsonNode analyse(Path site, String... extra) throws Exception {
        out = folder.resolve("result.geojson");
        List<String> args = new ArrayList<>(List.of("analyze", "--site", site.toString(), "--level", "II",
                "--out", out.toString()));
        args.addAll(List.of(extra));
        run = CliRun.of(args.toArray(String[]::new));
        assertThat(run.exitCode()).as(run.err()).isZero();
        return JSON.readTree(Files.readString(out));
    }

    @Test
    void bareFlatRoofIsExposedAllOver() throws Exception {
        JsonNode result = analyse(TestFiles.bareBlock(folder));

        double exposed = 0;
        double roof = 0;
        for (JsonNode f : result.get("features")) {
            JsonNode p = f.get("properties");
            if (p.get("layer").asString().equals("exposed-roof")) {
                exposed += p.get("area").asDouble();
                roof += p.get("roofArea").asDouble();
            }
        }
        assertThat(roof).isCloseTo(200.0, within(0.01)); // 20 m × 10 m footprint
        // Flat roof with nothing on it: a sphere resting on the roof touches every roof point, so
        // the whole roof is exposed (rolling sphere geometry, closed form).
        assertThat(exposed).isCloseTo(roof, within(0.01 * roof));
    }

    @Test
    void customRadiusIsRecordedAsCustom() throws Exception {
        JsonNode analysis = analyse(TestFiles.bareBlock(folder), "--radius", "46").get("analysis");

        assertThat(analysis.get("sphereRadius").asDouble()).isEqualTo(46.0); // as given on the command line
        assertThat(analysis.get("customRadius").asBoolean()).isTrue();
        assertThat(analysis.get("level").asString()).isEqualTo("II");
        // level II would roll 30 m (IEC 62305-3 Table 2); the summary says which one was used
        assertThat(run.out()).contains("46 m (custom; level II uses 30 m)");
        assertThat(run.out()).contains("Results written to " + out);
    }

    @Test
    void lonLatSiteGivesLonLatPositionsWithinTheSite() throws Exception {
        Path site = TestFiles.SAMPLES.resolve("millbrook-hall.geojson");
        double[] bounds = lonLatBounds(JSON.readTree(Files.readString(site)));
        JsonNode result = analyse(site);

        assertThat(result.has("coordinates")).as("lon/lat needs no coordinates member (RFC 7946)").isFalse();
        // Protected ground reaches at most R = 30 m past the site's parts (a sphere resting on the
        // ground touches it within R of any support); 30 m is under 0.0005° of latitude and, at
        // 54° N, under 0.0005° of longitude. Everything else lies on the parts themselves.
        double groundSlack = 0.0005;
        double partSlack = 1e-6; // positions keep centimetres, under 1e-7°
        int[] positions = {0};
        for (JsonNode f : result.get("features")) {
            boolean ground = f.get("properties").get("layer").asString().equals("protected-ground");
            double slack = ground ? groundSlack : partSlack;
            forEachPosition(f.get("geometry").get("coordinates"), p -> {
                positions[0]++;
                assertThat(p.get(0).asDouble()).isBetween(bounds[0] - slack, bounds[2] + slack);
                assertThat(p.get(1).asDouble()).isBetween(bounds[1] - slack, bounds[3] + slack);
            });
        }
        assertThat(positions[0]).isPositive();
    }

    /** {min lon, min lat, max lon, max lat} over every position in a site file. */
    private static double[] lonLatBounds(JsonNode site) {
        double[] b = {Double.MAX_VALUE, Double.MAX_VALUE, -Double.MAX_VALUE, -Double.MAX_VALUE};
        for (JsonNode f : site.get("features")) {
            forEachPosition(f.get("geometry").get("coordinates"), p -> {
                b[0] = Math.min(b[0], p.get(0).asDouble());
                b[1] = Math.min(b[1], p.get(1).asDouble());
                b[2] = Math.max(b[2], p.get(0).asDouble());
                b[3] = Math.max(b[3], p.get(1).asDouble());
            });
        }
        return b;
    }

    /** Visits every position (an array of numbers) in nested GeoJSON coordinates. */
    private static void forEachPosition(JsonNode coordinates, Consumer<JsonNode> visit) {
        if (coordinates.size() > 0 && coordinates.get(0).isNumber()) {
            visit.accept(coordinates);
        } else {
            coordinates.forEach(c -> forEachPosition(c, visit));
        }
    }
}
