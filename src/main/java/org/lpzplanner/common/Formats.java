package org.lpzplanner.common;

import java.time.Instant;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.Locale;

/** How pages write dates and plain quantities, the same on every page. */
public final class Formats {

    private static final DateTimeFormatter WHEN = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm 'UTC'", Locale.ROOT)
            .withZone(ZoneOffset.UTC);

    private Formats() {
    }

    /** A moment to the minute, in UTC: "2026-12-05 21:45 UTC". */
    public static String dateTime(Instant at) {
        return WHEN.format(at);
    }

    /** A whole number when it rounds to one, else one decimal: "20", "12.5". */
    public static String oneDecimal(double value) {
        double rounded = Math.round(value * 10) / 10.0;
        return rounded == Math.rint(rounded) ? String.valueOf((long) rounded)
                : String.format(Locale.ROOT, "%.1f", rounded);
    }
}
