package org.lpzplanner.engine.design.quantities;

import java.util.List;

/**
 * A table for print and download: a title, column headings and rows of cells (already worded and
 * formatted). Reports print it as it is; {@link #toCsv()} writes it as CSV.
 */
public record QuantityTable(String title, List<String> columns, List<List<String>> rows) {

    public QuantityTable {
        columns = List.copyOf(columns);
        rows = rows.stream().map(List::copyOf).toList();
        for (List<String> row : rows) {
            if (row.size() != columns.size()) {
                throw new IllegalArgumentException("every row needs " + columns.size() + " cells, got " + row);
            }
        }
    }

    /**
     * The columns and rows as CSV (RFC 4180: comma separated, CRLF line ends, fields with a comma,
     * quote or line break in double quotes, quotes doubled). The title is not part of it.
     */
    public String toCsv() {
        StringBuilder out = new StringBuilder();
        line(out, columns);
        for (List<String> row : rows) {
            line(out, row);
        }
        return out.toString();
    }

    private static void line(StringBuilder out, List<String> cells) {
        for (int i = 0; i < cells.size(); i++) {
            if (i > 0) {
                out.append(',');
            }
            String c = cells.get(i) == null ? "" : cells.get(i);
            if (c.contains(",") || c.contains("\"") || c.contains("\n") || c.contains("\r")) {
                out.append('"').append(c.replace("\"", "\"\"")).append('"');
            } else {
                out.append(c);
            }
        }
        out.append("\r\n");
    }
}
