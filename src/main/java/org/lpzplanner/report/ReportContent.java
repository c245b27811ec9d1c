package org.lpzplanner.report;

import java.util.List;

/**
 * A report ready to lay out: what the footer of every page says, the cautions every page repeats,
 * and the blocks in reading order.
 *
 * @param footerTitle site and revision, printed in every footer
 * @param cautions    the cautions, printed in every footer
 * @param blocks      the content, cover first
 */
public record ReportContent(String title, String footerTitle, List<String> cautions, List<ReportBlock> blocks) {

    public ReportContent {
        cautions = List.copyOf(cautions);
        blocks = List.copyOf(blocks);
    }
}
