package org.lpzplanner.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code envelope}: envelope heights at given points, checked against the closed form around a
 * single free-standing rod and on a bare flat roof.
 *
 * <p>The printed height is the engine's value (never above the true envelope E, at most
 * {@link EnvelopeCommand#TOLERANCE} below it) cut down to 3 decimals, which lowers it by less
 * than 0.001 m more, so every printed value must lie in [E − TOLERANCE − 0.001 − 1e-6, E + 1e-6],
 * the 1e-6 m covering floating-point rounding. Points range from the rod's own column outward.
 */
class EnvelopeCommandTest {

    /** Level II sphere radius, IEC 62305-3 Table 2. */
    private static final double R = 30;

    /** Height of the rod in the test site. */
    private static final double H = 10;

    /** How far below E a printed value may be: the query tolerance plus the cut to 3 decimals. */
    private static final double PRINTED_BELOW = EnvelopeCommand.TOLERANCE + 0.001;

    private static final double ROUNDING = 1e-6;

    @TempDir
    Path folder;

    private static void assertPrinted(double printed, double exact, String what) {
        assertThat(printed).as(what + ": never above the exact envelope %.6f", exact).isLessThanOrEqualTo(exact + ROUNDING);
        assertThat(printed).as(what + ": at most %.3f m below the exact envelope %.6f", PRINTED_BELOW, exact)
                .isGreaterThanOrEqualTo(exact - PRINTED_BELOW - ROUNDING);
    }

    /**
     * Envelope beside a rod of height h ≤ R on open ground at plan distance x:
     * E(x) = R − √(R² − (d_c − x)²) for x &lt; d_c, d_c = √(h(2R − h)) (22.36 m here), else 0.
     * Rolling sphere geometry around a single rod, closed form.
     */
    private static double closedForm(double x) {
        double dc = Math.sqrt(H * (2 * R - H));
        return x < dc ? R - Math.sqrt(R * R - (dc - x) * (dc - x)) : 0;
    }

    /** Runs the command on the rod site at level II for points (x, 0); returns the printed heights. */
    private double[] envelopeAlongX(double... xs) {
        StringBuilder csv = new StringBuilder("x,y\n");
        for (double x : xs) {
            csv.append(String.format(Locale.ROOT, "%s,0%n", x));
        }
        Path points = TestFiles.write(folder, "points.csv", csv.toString());
        CliRun run = CliRun.of("envelope", "--site", TestFiles.rodSite(folder, H).toString(), "--level", "II",
                "--points", points.toString());
        assertThat(run.exitCode()).as(run.err()).isZero();
        List<String> lines = run.outLines();
        assertThat(lines).hasSize(xs.length + 1);
        assertThat(lines.get(0)).isEqualTo("x,y,envelope_m");
        double[] heights = new double[xs.length];
        for (int i = 0; i < xs.length; i++) {
            String[] cells = lines.get(i + 1).split(",");
            heights[i] = Double.parseDouble(cells[2]);
        }
        return heights;
    }

    @Test
    void rodEnvelopeFollowsTheClosedForm() {
        double[] xs = {0.01, 0.1, 0.5, 2, 5, 10, 20, 22.3, 30};
        double[] got = envelopeAlongX(xs);
        for (int i = 0; i < xs.length; i++) {
            // E(x) = R − √(R² − (d_c − x)²) below d_c, 0 beyond: rolling sphere geometry, closed form above
            assertPrinted(got[i], closedForm(xs[i]), "x = " + xs[i]);
        }
    }

    @Test
    void rodEnvelopeAtTheRodIsTheRodHeight() {
        // E(0) = R − √(R² − d_c²) = R − (R − h) = h: closed form above, at x = 0
        assertPrinted(envelopeAlongX(0)[0], H, "at the rod");
    }

    @Test
    void pointsAreEchoedAsWrittenWithHeightsToThreeDecimals() {
        Path points = TestFiles.write(folder, "points.csv", "x,y\n5.00,+0\n\n 30 , -0.0 \n");
        CliRun run = CliRun.of("envelope", "--site", TestFiles.rodSite(folder, H).toString(), "--level", "II",
                "--points", points.toString());

        assertThat(run.exitCode()).as(run.err()).isZero();
        // blank line skipped; values trimmed but otherwise as written; 30 m is beyond d_c = 22.36 m,
        // where the closed form gives 0
        assertThat(run.outLines()).hasSize(3);
        assertThat(run.outLines().get(1)).matches("5\\.00,\\+0,\\d+\\.\\d{3}");
        assertThat(run.outLines().get(2)).isEqualTo("30,-0.0,0.000");
    }

    @Test
    void heightsAreCutDownNeverRoundedUp() {
        // RoundingMode.FLOOR at 3 decimals: the printed value never exceeds the engine's
        assertThat(EnvelopeCommand.floor3(5.5339)).isEqualTo("5.533");
        assertThat(EnvelopeCommand.floor3(1.9999999)).isEqualTo("1.999");
        assertThat(EnvelopeCommand.floor3(0)).isEqualTo("0.000");
        assertThat(EnvelopeCommand.floor3(12.5)).isEqualTo("12.500");
    }

    @Test
    void lonLatPointsAreReadAsLongitudeLatitude() {
        // A bare flat roof 10 m high, about 21 m × 22 m, near 4.5° E 51.2° N.
        Path site = TestFiles.write(folder, "lonlat-block.geojson", """
                {"type": "FeatureCollection", "name": "Block on the map", "features": [
                  {"type": "Feature", "properties": {"kind": "structure", "name": "Block", "height": 10},
                   "geometry": {"type": "Polygon", "coordinates": [[[4.5000, 51.2000], [4.5003, 51.2000],
                     [4.5003, 51.2002], [4.5000, 51.2002], [4.5000, 51.2000]]]}}
                ]}
                """);
        Path points = TestFiles.write(folder, "points.csv", "x,y\n4.50015,51.2001\n4.5200,51.2001\n");
        CliRun run = CliRun.of("envelope", "--site", site.toString(), "--level", "II", "--points", points.toString());

        assertThat(run.exitCode()).as(run.err()).isZero();
        String[] centre = run.outLines().get(1).split(",");
        String[] away = run.outLines().get(2).split(",");
        assertThat(centre[0] + "," + centre[1]).isEqualTo("4.50015,51.2001");
        // Roof centre: a sphere resting on a bare flat roof touches every roof point, so the
        // envelope there is the roof height, 10 m (rolling sphere geometry, closed form).
        assertPrinted(Double.parseDouble(centre[2]), 10.0, "roof centre");
        // 0.02° of longitude east (about 1.4 km) is far beyond the 10 m block's protected radius
        // √(10·(60 − 10)) = 22.4 m: bare ground, envelope 0 (closed form).
        assertThat(Double.parseDouble(away[2])).isEqualTo(0.0);
    }
}
