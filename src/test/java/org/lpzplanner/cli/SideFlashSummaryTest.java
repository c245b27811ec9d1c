package org.lpzplanner.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The printed summary counts and prints facade bands apart by IEC 62305-3:2010 5.2.3 and Annex A:
 * flashes to the side are negligible on structures lower than 60 m; on taller ones the upper 20 %
 * of the height and everything above 120 m need lateral air-termination. Towers of 10 m × 10 m at
 * level I (R = 20 m, Table 2), touched by the sphere from R up to their top (closed form 4 of the
 * sphere geometry).
 */
class SideFlashSummaryTest {

    @TempDir
    Path folder;

    /** A WKT tower; WKT structures are named "Structure 1", "Structure 2", … in file order. */
    private String summary(double height) {
        Path site = TestFiles.write(folder, "tower.wkt", "POLYGON ((0 0, 10 0, 10 10, 0 10, 0 0)) " + height + "\n");
        CliRun run = CliRun.of("analyze", "--site", site.toString(), "--level", "I");
        assertThat(run.exitCode()).as(run.err()).isZero();
        return run.out();
    }

    @Test
    void aHundredMetreTowerPrintsItsUpperFifthAsNeedingAndTheRestAsNegligible() {
        String out = summary(100);
        assertThat(out).containsPattern("(?m)^Facade bands needing lateral air-termination \\(IEC 62305-3:2010 5\\.2\\.3:"
                + " the upper 20 % of a structure taller than 60 m, and everything above 120 m\\): 4$");
        // 5.2.3, "upper 20 %": of 100 m, from 80 m
        assertThat(out).containsPattern("(?m)^  Structure 1, wall 1: 10\\.00 m long, from 80\\.00 m to 100\\.00 m above ground"
                + " \\(building 100\\.00 m\\)$");
        assertThat(out).containsPattern("(?m)^Facade bands where flashes to the side are negligible \\(IEC 62305-3:2010"
                + " 5\\.2\\.3 and Annex A: a structure lower than 60 m, or below the upper 20 % of a taller one\\): 4$");
        // from R = 20 m (at most 0.05 m below it, the engine's band tolerance) up to 80 m
        assertThat(out).containsPattern("(?m)^  Structure 1, wall 1: 10\\.00 m long, from (19\\.9[5-9]|20\\.00) m to 80\\.00 m"
                + " above ground \\(building 100\\.00 m\\)$");
    }

    @Test
    void aFiftyMetreTowerHasNoBandNeedingLateralAirTermination() {
        String out = summary(50);
        assertThat(out).containsPattern("(?m)^Facade bands needing lateral air-termination \\(.*\\): none$");
        assertThat(out).containsPattern("(?m)^Facade bands where flashes to the side are negligible \\(.*\\): 4$");
    }
}
