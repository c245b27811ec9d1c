package org.lpzplanner.engine.io;

/**
 * A line of a text site file.
 *
 * @param source file name
 * @param line   1-based line number
 */
record LinePlace(String source, int line) implements Place {

    @Override
    public String label() {
        return "line " + line;
    }

    @Override
    public SiteFormatException fail(String field, String problem) {
        return SiteFormatException.atLine(source, line, null, field, problem, null);
    }
}
