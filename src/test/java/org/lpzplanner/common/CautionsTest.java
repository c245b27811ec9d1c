package org.lpzplanner.common;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.junit.jupiter.api.Test;

/** The cautions shown with every assessment. */
class CautionsTest {

    @Test
    void fiveShortSingleLineCautionsInAFixedOrder() {
        List<String> lines = Cautions.lines();

        // scope, review, precedence, what is not covered, safety: one line each
        assertThat(lines).hasSize(5);
        for (String line : lines) {
            assertThat(line).isNotBlank().doesNotContain("\n").doesNotContain("\r").hasSizeLessThan(200);
        }
    }

    @Test
    void eachCautionCoversItsSubject() {
        List<String> lines = Cautions.lines();

        // the subjects every caution must carry, in display order
        assertThat(lines.get(0)).contains("rolling sphere method", "protection level");
        assertThat(lines.get(1)).contains("qualified", "licensed", "review", "approve");
        assertThat(lines.get(2)).contains("codes", "national standard", "authority having jurisdiction");
        assertThat(lines.get(3)).contains("earthing", "surge protection", "internal systems", "existing installation");
        assertThat(lines.get(4)).contains("dangerous", "trained");
    }

    @Test
    void theListCannotBeChangedByCallers() {
        // shared by the command line, web pages and reports: one caller must not alter it for all
        assertThat(Cautions.lines()).isUnmodifiable();
    }
}
