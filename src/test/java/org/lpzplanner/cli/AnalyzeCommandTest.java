package org.lpzplanner.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.lpzplanner.common.Cautions;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/** {@code analyze} on the harbour warehouse sample at level II: the printed summary and the GeoJSON written. */
class AnalyzeCommandTest {

    private static final JsonMapper JSON = JsonMapper.builder().build();

    // "  Warehouse   290.9 m2 of   3200.0 m2    9.1 %"
    private static final Pattern WAREHOUSE_ROW =
            Pattern.compile("(?m)^  Warehouse\\s+([\\d.]+) m2 of\\s+([\\d.]+) m2\\s+([\\d.]+) %$");

    @TempDir
    static Path folder;

    static CliRun run;
    static JsonNode written;

    @BeforeAll
    static void analyseWarehouse() throws Exception {
        Path out = folder.resolve("warehouse-result.geojson");
        run = CliRun.of("analyze", "--site", TestFiles.SAMPLES.resolve("harbour-warehouse.geojson").toString(),
                "--level", "II", "--out", out.toString());
        written = Files.exists(out) ? JSON.readTree(Files.readString(out)) : null;
    }

    @Test
    void succeedsWithNothingOnTheErrorStream() {
        assertThat(run.exitCode()).as(run.err()).isZero();
        assertThat(run.err()).isEmpty();
    }

    @Test
    void summaryNamesSiteLevelRadiusMethodAndResolution() {
        assertThat(run.out())
                .contains("Saltmere Quay warehouse (harbour-warehouse.geojson, local metres)") // sample file's name
                .contains("Protection level: II")
                .containsPattern("(?m)^Sphere radius: +30 m$") // level II: R = 30 m, IEC 62305-3 Table 2
                .contains("rolling sphere method")
                .contains("m grid; tolerance 0.001 m"); // the engine's default tolerance of exact values
    }

    @Test
    void summaryShowsTheWarehouseRoofExposedOnlyAwayFromItsParapet() {
        Matcher row = WAREHOUSE_ROW.matcher(run.out());
        assertThat(row.find()).as(run.out()).isTrue();
        double exposed = Double.parseDouble(row.group(1));
        double roof = Double.parseDouble(row.group(2));
        // 80 m × 40 m footprint in the sample file, less what its rooftop plant stands on
        double plant = org.lpzplanner.engine.io.SiteReader.read(java.nio.file.Path.of("sample-sites/harbour-warehouse.geojson"))
                .site().rooftopObjects().stream().mapToDouble(o -> o.footprint().getArea()).sum();
        assertThat(roof).isCloseTo(3200.0 - plant, org.assertj.core.data.Offset.offset(0.1));
        assertThat(exposed).isGreaterThan(0);
        // A 1 m parapet keeps a sphere of R = 30 m off the roof within √(2R·p − p²) = √59 = 7.68 m of
        // the edge (rolling sphere geometry, closed form), leaving at most (80 − 2·7.68)(40 − 2·7.68)
        // = 1592.7 m² to be touched.
        assertThat(exposed).isLessThanOrEqualTo(1592.7);
    }

    @Test
    void summaryEndsWithEveryCaution() {
        // The printer wraps long lines; compare with runs of white space made single.
        String flat = run.out().replaceAll("\\s+", " ");
        assertThat(flat).contains("Cautions:");
        for (String caution : Cautions.lines()) {
            assertThat(flat).contains(caution);
        }
    }

    @Test
    void writesAFeatureCollectionInLocalMetresWithTheAnalysisMember() {
        assertThat(written).as("GeoJSON written by --out").isNotNull();
        assertThat(written.get("type").asString()).isEqualTo("FeatureCollection"); // RFC 7946 §3.3
        assertThat(written.get("coordinates").asString()).isEqualTo("local-metres"); // the sample is in local metres
        JsonNode analysis = written.get("analysis");
        assertThat(analysis.get("level").asString()).isEqualTo("II");
        assertThat(analysis.get("sphereRadius").asDouble()).isEqualTo(30.0); // IEC 62305-3 Table 2, level II
        assertThat(analysis.get("method").asString()).isEqualTo("rolling sphere method");
        assertThat(analysis.get("standard").asString()).isEqualTo("IEC 62305-3:2010 rolling sphere method");
        List<String> cautions = new ArrayList<>();
        analysis.get("cautions").forEach(c -> cautions.add(c.asString()));
        assertThat(cautions).isEqualTo(Cautions.lines());
    }

    @Test
    void writtenWarehouseRoofExposureMatchesThePrintedOne() {
        Matcher row = WAREHOUSE_ROW.matcher(run.out());
        assertThat(row.find()).isTrue();
        double exposed = 0;
        int roofFeatures = 0;
        for (JsonNode f : written.get("features")) {
            JsonNode p = f.get("properties");
            if (p.get("layer").asString().equals("exposed-roof")) {
                roofFeatures++;
                if (p.get("owner").asString().equals("Warehouse")) {
                    exposed += p.get("area").asDouble();
                }
            }
        }
        assertThat(roofFeatures).isPositive();
        // the summary prints 0.1 m², the file 0.01 m²: both come from the same analysis
        assertThat(exposed).isCloseTo(Double.parseDouble(row.group(1)), within(0.06));
    }

    @Test
    void outerRingsRunCounterClockwiseAndHolesClockwise() {
        int rings = 0;
        for (JsonNode f : written.get("features")) {
            JsonNode g = f.get("geometry");
            if (g.get("type").asString().equals("MultiPolygon")) {
                for (JsonNode polygon : g.get("coordinates")) {
                    rings += checkRings(polygon);
                }
            } else if (g.get("type").asString().equals("Polygon")) {
                rings += checkRings(g.get("coordinates"));
            }
        }
        assertThat(rings).isPositive();
    }

    /** RFC 7946 §3.1.6: exterior rings counter-clockwise (positive shoelace area), holes clockwise. */
    private static int checkRings(JsonNode polygon) {
        for (int k = 0; k < polygon.size(); k++) {
            double twiceArea = 0;
            JsonNode ring = polygon.get(k);
            for (int i = 0; i + 1 < ring.size(); i++) {
                twiceArea += ring.get(i).get(0).asDouble() * ring.get(i + 1).get(1).asDouble()
                        - ring.get(i + 1).get(0).asDouble() * ring.get(i).get(1).asDouble();
            }
            if (k == 0) {
                assertThat(twiceArea).as("outer ring").isPositive();
            } else {
                assertThat(twiceArea).as("hole").isNegative();
            }
        }
        return polygon.size();
    }
}
