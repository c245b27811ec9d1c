package org.lpzplanner.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Every way of asking for something the command line cannot do ends with exit code 2 and one line
 * on the error stream, starting with {@code error: } and naming the problem, and never a stack
 * trace.
 */
class CommandLineErrorsTest {

    @TempDir
    Path folder;

    private String site;
    private String points;

    @BeforeEach
    void files() {
        site = TestFiles.rodSite(folder, 10).toString();
        points = TestFiles.write(folder, "points.csv", "x,y\n1,2\n").toString();
    }

    /** Checks the shape every error shares, then that the message holds each fragment. */
    private static void assertInvalid(CliRun run, String... fragments) {
        assertThat(run.exitCode()).as(run.err()).isEqualTo(CommandLine.INVALID);
        assertThat(run.out()).isEmpty();
        assertThat(run.errLines()).hasSize(1);
        String line = run.errLines().get(0);
        assertThat(line).startsWith("error: ").doesNotContain("Exception").doesNotContain("\tat ");
        assertThat(line).contains(fragments);
    }

    @Test
    void unknownCommand() {
        assertInvalid(CliRun.of("analyse", "--site", site), "unknown command", "\"analyse\"");
    }

    @Test
    void unknownOption() {
        assertInvalid(CliRun.of("analyze", "--site", site, "--level", "II", "--colour", "red"),
                "unknown option --colour");
    }

    @Test
    void optionOfTheOtherCommand() {
        assertInvalid(CliRun.of("envelope", "--site", site, "--level", "II", "--points", points, "--out", "x.geojson"),
                "unknown option --out for envelope");
    }

    @Test
    void optionWithoutValue() {
        assertInvalid(CliRun.of("analyze", "--level", "II", "--site"), "option --site needs a value");
        assertInvalid(CliRun.of("analyze", "--site", "--level", "II"), "option --site needs a value");
    }

    @Test
    void repeatedOption() {
        assertInvalid(CliRun.of("analyze", "--site", site, "--level", "II", "--level", "I"),
                "--level is given more than once");
    }

    @Test
    void strayArgument() {
        assertInvalid(CliRun.of("analyze", "--site", site, "--level", "II", "fast"), "unexpected argument \"fast\"");
    }

    @Test
    void missingRequiredOption() {
        assertInvalid(CliRun.of("analyze", "--level", "II"), "needs --site");
        assertInvalid(CliRun.of("analyze", "--site", site), "needs --level");
        assertInvalid(CliRun.of("envelope", "--site", site, "--level", "II"), "needs --points");
    }

    @Test
    void badLevel() {
        assertInvalid(CliRun.of("analyze", "--site", site, "--level", "V"), "--level", "\"V\"");
    }

    @Test
    void radiusBelowOneMetre() {
        assertInvalid(CliRun.of("analyze", "--site", site, "--level", "II", "--radius", "0"), "--radius", "between 1 and 1000 m");
        assertInvalid(CliRun.of("analyze", "--site", site, "--level", "II", "--radius", "0.0001"), "--radius", "0.0001");
        assertInvalid(CliRun.of("analyze", "--site", site, "--level", "II", "--radius", "-5"), "--radius", "-5");
    }

    @Test
    void radiusNotANumber() {
        assertInvalid(CliRun.of("analyze", "--site", site, "--level", "II", "--radius", "NaN"), "--radius", "\"NaN\"");
        assertInvalid(CliRun.of("analyze", "--site", site, "--level", "II", "--radius=thirty"), "--radius", "\"thirty\"");
    }

    @Test
    void resolutionOutsideItsRange() {
        // the engine accepts 0.05 m to 10 m
        assertInvalid(CliRun.of("analyze", "--site", site, "--level", "II", "--resolution", "0.01"), "--resolution");
        assertInvalid(CliRun.of("analyze", "--site", site, "--level", "II", "--resolution", "11"), "--resolution");
    }

    @Test
    void missingSiteFile() {
        assertInvalid(CliRun.of("analyze", "--site", folder.resolve("nowhere.geojson").toString(), "--level", "II"),
                "not found", "nowhere.geojson");
    }

    @Test
    void missingPointsFile() {
        assertInvalid(CliRun.of("envelope", "--site", site, "--level", "II", "--points",
                folder.resolve("nowhere.csv").toString()), "not found", "nowhere.csv");
    }

    @Test
    void outputFolderMissing() {
        assertInvalid(CliRun.of("analyze", "--site", site, "--level", "II", "--out",
                folder.resolve("no-such-folder").resolve("r.geojson").toString()), "--out", "does not exist");
    }

    @Test
    void siteFormatErrorNamesFeatureAndField() {
        String bad = TestFiles.write(folder, "bad-site.geojson", """
                {"type": "FeatureCollection", "coordinates": "local-metres", "features": [
                  {"type": "Feature", "properties": {"kind": "structure", "name": "Store", "height": "tall"},
                   "geometry": {"type": "Polygon", "coordinates": [[[0, 0], [9, 0], [9, 9], [0, 9], [0, 0]]]}}
                ]}
                """).toString();
        assertInvalid(CliRun.of("analyze", "--site", bad, "--level", "II"),
                "bad-site.geojson", "feature 0 (\"Store\")", "field \"height\"");
    }

    @Test
    void pointsWithoutHeader() {
        String csv = TestFiles.write(folder, "no-header.csv", "1,2\n3,4\n").toString();
        assertInvalid(CliRun.of("envelope", "--site", site, "--level", "II", "--points", csv),
                "no-header.csv", "line 1", "header x,y");
    }

    @Test
    void pointsLineThatIsNotANumberIsNamedByItsLineNumber() {
        String csv = TestFiles.write(folder, "bad-row.csv", "x,y\n1,2\n\nthree,4\n").toString();
        assertInvalid(CliRun.of("envelope", "--site", site, "--level", "II", "--points", csv),
                "bad-row.csv, line 4", "\"three\"");
    }

    @Test
    void pointsLineWithThreeValuesIsNamedByItsLineNumber() {
        String csv = TestFiles.write(folder, "three.csv", "x,y\n1,2,3\n").toString();
        assertInvalid(CliRun.of("envelope", "--site", site, "--level", "II", "--points", csv),
                "three.csv, line 2", "two values");
    }

    @Test
    void pointsInMetresForALonLatSiteAreRejected() {
        String lonLatSite = TestFiles.SAMPLES.resolve("millbrook-hall.geojson").toString();
        String csv = TestFiles.write(folder, "metres.csv", "x,y\n-2.41,54.18\n120,300\n").toString();
        assertInvalid(CliRun.of("envelope", "--site", lonLatSite, "--level", "II", "--points", csv),
                "metres.csv, line 3", "longitude");
    }

    @Test
    void analysisTooLargeForTheResolutionIsRefusedWithASuggestion() {
        // two sheds 6 km apart: at 0.5 m the grid would hold about 150 million cells
        String farApart = TestFiles.write(folder, "far-apart.geojson",
                "{\"type\":\"FeatureCollection\",\"coordinates\":\"local-metres\",\"features\":["
                + "{\"type\":\"Feature\",\"properties\":{\"kind\":\"structure\",\"height\":5},"
                + "\"geometry\":{\"type\":\"Polygon\",\"coordinates\":[[[0,0],[10,0],[10,10],[0,10],[0,0]]]}},"
                + "{\"type\":\"Feature\",\"properties\":{\"kind\":\"structure\",\"height\":5},"
                + "\"geometry\":{\"type\":\"Polygon\",\"coordinates\":[[[6000,6000],[6010,6000],[6010,6010],[6000,6010],[6000,6000]]]}}]}")
                .toString();
        assertInvalid(CliRun.of("analyze", "--site", farApart, "--level", "II", "--resolution", "0.5"),
                "cells", "choose a resolution of");
    }
}
