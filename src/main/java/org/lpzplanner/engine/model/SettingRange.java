package org.lpzplanner.engine.model;

import java.util.Locale;

/**
 * The ranges of the assessment settings a user may choose: the one place that states them, read by
 * the engine ({@link SphereSpec}, the analysis options), the web forms and API, and the command line,
 * so that every refusal states the same range. Both are in metres; neither bound is a value of a
 * standard: a radius above 1000 m or a grid finer than 5 cm would only cost time, and a grid coarser
 * than 10 m would miss whole roof parts.
 */
public enum SettingRange {

    /**
     * A custom sphere radius: 1 m to 1000 m. The levels' radii are 20 to 60 m; below a metre the
     * grid needed to resolve the sphere would hold a worker for minutes and means a unit mistake.
     */
    RADIUS(1, true, 1000),
    /** The grid resolution: 0.05 m to 10 m. */
    RESOLUTION(0.05, true, 10);

    private final double min;
    private final boolean minIncluded;
    private final double max;

    SettingRange(double min, boolean minIncluded, double max) {
        this.min = min;
        this.minIncluded = minIncluded;
        this.max = max;
    }

    /** The smallest value (excluded for the radius), metres. */
    public double min() {
        return min;
    }

    /** The largest value, metres (included). */
    public double max() {
        return max;
    }

    /** Whether {@code value} is in range; NaN and infinities never are. */
    public boolean contains(double value) {
        return (minIncluded ? value >= min : value > min) && value <= max;
    }

    /** The range in words, e.g. "above 0 and at most 1000 m" or "between 0.05 and 10 m". */
    public String rule() {
        return minIncluded ? "between " + number(min) + " and " + number(max) + " m"
                : "above " + number(min) + " and at most " + number(max) + " m";
    }

    private static String number(double v) {
        return v == Math.rint(v) ? String.valueOf((long) v) : String.format(Locale.ROOT, "%s", v);
    }
}
