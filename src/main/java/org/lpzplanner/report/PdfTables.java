package org.lpzplanner.report;

import java.util.ArrayList;
import java.util.List;

/**
 * Lays out a {@link Schedule}: the title, a shaded heading row, then the rows with every cell wrapped
 * to its column. A row that does not fit goes to the next page under the title (marked
 * "continued") and the heading row again; a row taller than a whole page is cut to what fits, ending
 * with "…". The notes follow the table.
 */
final class PdfTables {

    private static final float PAD = 2.5f;

    private PdfTables() {
    }

    static void schedule(PdfPages p, Schedule s) {
        float[] widths = widths(s);
        List<List<String>> header = cells(p, s.columns(), widths);
        float headerHeight = height(header);
        List<List<List<String>>> rows = new ArrayList<>();
        for (List<String> row : s.rows()) {
            rows.add(cells(p, row, widths));
        }
        float firstRow = rows.isEmpty() ? 0 : height(rows.get(0));
        p.ensure(22 + headerHeight + Math.min(firstRow, 60));
        title(p, s.title(), false);
        header(p, header, widths, headerHeight);
        int maxLines = (int) ((p.pageSpace() - 22 - headerHeight - 2 * PAD) / PdfReportRenderer.TABLE_LEADING);
        for (List<List<String>> row : rows) {
            row = cut(row, maxLines);
            float h = height(row);
            if (p.y - h < p.bottom) {
                p.newPage();
                title(p, s.title(), true);
                header(p, header, widths, headerHeight);
            }
            row(p, row, widths, h, false);
        }
        p.y -= 4;
        for (String note : s.notes()) {
            PdfReportRenderer.paragraph(p, note, 7.8f, 10, PdfReportRenderer.MUTED);
        }
        p.y -= 8;
    }

    private static void title(PdfPages p, String title, boolean continued) {
        String text = continued ? title + " (continued)" : title;
        List<String> lines = PdfPages.wrap(p.fonts, text, 10.5f, PdfPages.CONTENT_WIDTH);
        for (String line : lines) {
            p.text(line, PdfPages.MARGIN, p.y - 10.5f, 10.5f, true, PdfReportRenderer.TEXT);
            p.y -= 14;
        }
        p.y -= 4;
    }

    private static void header(PdfPages p, List<List<String>> header, float[] widths, float h) {
        p.fillRect(PdfPages.MARGIN, p.y - h, PdfPages.CONTENT_WIDTH, h, PdfReportRenderer.HEADER_FILL);
        row(p, header, widths, h, true);
    }

    private static void row(PdfPages p, List<List<String>> cells, float[] widths, float h, boolean bold) {
        float x = PdfPages.MARGIN;
        for (int c = 0; c < cells.size(); c++) {
            float y = p.y - PAD - PdfReportRenderer.TABLE;
            for (String line : cells.get(c)) {
                p.text(line, x + PAD, y, PdfReportRenderer.TABLE, bold, PdfReportRenderer.TEXT);
                y -= PdfReportRenderer.TABLE_LEADING;
            }
            x += widths[c];
        }
        p.line(PdfPages.MARGIN, p.y - h, PdfPages.MARGIN + PdfPages.CONTENT_WIDTH, p.y - h, PdfReportRenderer.RULE,
                0.4f);
        p.y -= h;
    }

    private static float[] widths(Schedule s) {
        double total = s.widths().stream().mapToDouble(Double::doubleValue).sum();
        float[] out = new float[s.widths().size()];
        for (int i = 0; i < out.length; i++) {
            out[i] = (float) (PdfPages.CONTENT_WIDTH * s.widths().get(i) / total);
        }
        return out;
    }

    private static List<List<String>> cells(PdfPages p, List<String> texts, float[] widths) {
        List<List<String>> out = new ArrayList<>();
        for (int i = 0; i < texts.size(); i++) {
            out.add(PdfPages.wrap(p.fonts, texts.get(i), PdfReportRenderer.TABLE, widths[i] - 2 * PAD));
        }
        return out;
    }

    private static float height(List<List<String>> cells) {
        int lines = cells.stream().mapToInt(List::size).max().orElse(1);
        return lines * PdfReportRenderer.TABLE_LEADING + 2 * PAD;
    }

    private static List<List<String>> cut(List<List<String>> row, int maxLines) {
        List<List<String>> out = new ArrayList<>();
        for (List<String> cell : row) {
            if (cell.size() <= maxLines) {
                out.add(cell);
            } else {
                List<String> kept = new ArrayList<>(cell.subList(0, Math.max(1, maxLines)));
                kept.set(kept.size() - 1, kept.get(kept.size() - 1) + " …");
                out.add(kept);
            }
        }
        return out;
    }
}
