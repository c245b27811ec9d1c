package org.lpzplanner.engine.io;

/**
 * A site file that cannot be turned into a site. The message is shown to users verbatim, so it
 * always says where the problem is (file, then feature or line, then field) and what is wrong, for
 * example:
 *
 * <pre>site.geojson: feature 3 ("North hall"), field "height": must be a number &gt; 0, got "abc"</pre>
 *
 * <p>Feature indexes are 0-based positions in the {@code features} array; line numbers are 1-based.
 * The parts are also available separately for callers that want to highlight the spot.
 */
public class SiteFormatException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    private final String source;
    private final Integer featureIndex;
    private final String featureName;
    private final Integer line;
    private final Integer column;
    private final String field;
    private final String problem;

    private SiteFormatException(String source, Integer featureIndex, String featureName, Integer line, Integer column,
            String field, String problem, Throwable cause) {
        super(render(source, featureIndex, featureName, line, column, field, problem), cause);
        this.source = source;
        this.featureIndex = featureIndex;
        this.featureName = featureName;
        this.line = line;
        this.column = column;
        this.field = field;
        this.problem = problem;
    }

    /** A problem with the file as a whole, e.g. "the site has no structure". */
    public SiteFormatException(String source, String problem) {
        this(source, null, null, null, null, null, problem, null);
    }

    /** A problem with the file as a whole that was caused by a lower-level failure. */
    public SiteFormatException(String source, String problem, Throwable cause) {
        this(source, null, null, null, null, null, problem, cause);
    }

    /**
     * A problem with one top-level member of the file (not inside a feature).
     *
     * @param field the member's name
     */
    public static SiteFormatException atMember(String source, String field, String problem) {
        return new SiteFormatException(source, null, null, null, null, field, problem, null);
    }

    /**
     * A problem with one feature.
     *
     * @param featureIndex 0-based position in the {@code features} array
     * @param featureName  the feature's {@code name}, or null when it has none
     * @param field        the offending member ({@code "height"}, {@code "geometry"}, …), or null
     */
    public static SiteFormatException atFeature(String source, int featureIndex, String featureName, String field,
            String problem) {
        return new SiteFormatException(source, featureIndex, featureName, null, null, field, problem, null);
    }

    /**
     * A problem at a line of a text file.
     *
     * @param line   1-based line number
     * @param column 1-based column, or null when unknown
     * @param field  the offending part, or null
     */
    public static SiteFormatException atLine(String source, int line, Integer column, String field, String problem,
            Throwable cause) {
        return new SiteFormatException(source, null, null, line, column, field, problem, cause);
    }

    /** The file name the problem was found in. */
    public String source() { return source; }

    /** 0-based index of the feature in the {@code features} array, or null when not about one feature. */
    public Integer featureIndex() { return featureIndex; }

    /** The feature's name, or null. */
    public String featureName() { return featureName; }

    /** 1-based line number, or null when not about one line. */
    public Integer line() { return line; }

    /** 1-based column, or null when unknown. */
    public Integer column() { return column; }

    /** The offending field or member, or null when the problem is not about one field. */
    public String field() { return field; }

    /** The problem alone, without the location prefix. */
    public String problem() { return problem; }

    private static String render(String source, Integer featureIndex, String featureName, Integer line, Integer column,
            String field, String problem) {
        StringBuilder where = new StringBuilder();
        if (featureIndex != null) {
            where.append("feature ").append(featureIndex);
            if (featureName != null && !featureName.isBlank()) {
                where.append(" (\"").append(featureName).append("\")");
            }
        }
        if (line != null) {
            where.append("line ").append(line);
            if (column != null) {
                where.append(", column ").append(column);
            }
        }
        if (field != null) {
            if (where.length() > 0) {
                where.append(", ");
            }
            where.append("field \"").append(field).append('"');
        }
        StringBuilder message = new StringBuilder(source == null ? "input" : source).append(": ");
        if (where.length() > 0) {
            message.append(where).append(": ");
        }
        return message.append(problem).toString();
    }
}
