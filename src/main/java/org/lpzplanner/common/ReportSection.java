package org.lpzplanner.common;

import java.util.List;

/**
 * A section of a report as plain data: a title, a table (column headings and rows of cell text,
 * every row as long as the headings) and notes printed under the table. Text only, already
 * worded and formatted, so any report writer can print it without knowing the feature behind it.
 */
public record ReportSection(String title, List<String> columns, List<List<String>> rows, List<String> notes) {

    public ReportSection {
        columns = List.copyOf(columns);
        rows = rows.stream().map(List::copyOf).toList();
        notes = List.copyOf(notes);
        for (List<String> row : rows) {
            if (row.size() != columns.size()) {
                throw new IllegalArgumentException("a row of \"" + title + "\" has " + row.size()
                        + " cells for " + columns.size() + " columns");
            }
        }
    }
}
