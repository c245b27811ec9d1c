package org.lpzplanner.report;

import java.util.List;

/**
 * A table of the report: a title, column headings and rows of text, with optional notes below. Any
 * schedule a feature wants to print (parts, exposed items, quantities, risk) is one of these; the
 * renderer wraps cells and splits the rows over pages, repeating the headings.
 *
 * @param widths relative column widths, one per column
 * @param notes  short paragraphs printed under the table (sources, assumptions)
 */
public record Schedule(String title, List<String> columns, List<Double> widths, List<List<String>> rows,
        List<String> notes) implements ReportBlock {

    public Schedule {
        columns = List.copyOf(columns);
        widths = List.copyOf(widths);
        rows = rows.stream().map(List::copyOf).toList();
        notes = List.copyOf(notes);
        if (widths.size() != columns.size()) {
            throw new IllegalArgumentException("schedule \"" + title + "\" has " + columns.size() + " columns but "
                    + widths.size() + " widths");
        }
        for (List<String> row : rows) {
            if (row.size() != columns.size()) {
                throw new IllegalArgumentException("schedule \"" + title + "\" has a row of " + row.size()
                        + " cells for " + columns.size() + " columns");
            }
        }
    }

    /** A schedule with equal column widths and no notes. */
    public static Schedule of(String title, List<String> columns, List<List<String>> rows) {
        return new Schedule(title, columns, columns.stream().map(c -> 1.0).toList(), rows, List.of());
    }
}
