package org.lpzplanner.common;

import java.time.Instant;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.Locale;

/**
 * How the product writes dates and quantities, one method per kind of quantity, the same on every
 * page, in the printed report, in the drawings and on the command line. Numbers use a dot as the
 * decimal separator whatever the locale; a value that rounds to zero never prints a minus sign.
 *
 * <p>Lengths, heights, areas and coordinates print to the centimetre (areas to the hundredth of a
 * square metre) with both decimals, so that they line up in columns and a value read from the page
 * is the value read from the report. The stored result holds them to the centimetre already
 * ({@code ResultGeoJson.round}), so nothing is lost.
 */
public final class Formats {

    private static final DateTimeFormatter WHEN = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm 'UTC'", Locale.ROOT)
            .withZone(ZoneOffset.UTC);

    private Formats() {
    }

    /** A moment to the minute, in UTC: "2026-12-05 21:45 UTC". */
    public static String dateTime(Instant at) {
        return WHEN.format(at);
    }

    /** A length along the ground, an edge, a wall or a part, in metres to the centimetre: "12.35", "0.50". */
    public static String length(double metres) {
        return fixed(metres, 2);
    }

    /** A height above ground or above the surface beneath a part, in metres to the centimetre: "12.00". */
    public static String height(double metres) {
        return fixed(metres, 2);
    }

    /**
     * A required separation distance s in metres, to the millimetre and rounded up, so that the
     * printed requirement is never less than the computed one: 0.4512 is "0.452".
     */
    public static String requiredSeparation(double metres) {
        return fixed(requiredSeparationValue(metres), 3);
    }

    /** The value {@link #requiredSeparation} writes, for answers that carry numbers. */
    public static double requiredSeparationValue(double metres) {
        return Math.ceil(metres * 1000 - 1e-9) / 1000;
    }

    /**
     * A distance that a separation requirement is checked against, in metres, to the millimetre and
     * rounded down, so that the printed distance is never more than the measured one: 0.4578 is
     * "0.457".
     */
    public static String availableSeparation(double metres) {
        return fixed(availableSeparationValue(metres), 3);
    }

    /** The value {@link #availableSeparation} writes, for answers that carry numbers. */
    public static double availableSeparationValue(double metres) {
        return Math.floor(metres * 1000 + 1e-9) / 1000;
    }

    /** A plan area in square metres, to the hundredth: "290.93". */
    public static String area(double squareMetres) {
        return fixed(squareMetres, 2);
    }

    /** A coordinate in local metres (x east, y north), to the centimetre: "-10.00". */
    public static String coordinate(double metres) {
        return fixed(metres, 2);
    }

    /**
     * The rolling sphere's radius in metres, to the decimetre without a trailing ".0": "30", "45.5"
     * (the levels' radii are whole metres; a custom radius is given to the decimetre).
     */
    public static String radius(double metres) {
        return trimmed(metres, 1);
    }

    /** A percentage to one decimal, without a trailing ".0": "9.1", "20" (the caller writes the "%"). */
    public static String percent(double percent) {
        return trimmed(percent, 1);
    }

    /**
     * A step of a scale bar or of an axis of a drawing, in metres: a round value without trailing
     * zeros, "20", "0.5", "2.5".
     */
    public static String scaleStep(double metres) {
        return trimmed(metres, 2);
    }

    /** A whole number when it rounds to one, else one decimal: "20", "12.5". */
    public static String oneDecimal(double value) {
        return trimmed(value, 1);
    }

    /** The value with exactly {@code places} decimals, "-0.00" written "0.00". */
    private static String fixed(double value, int places) {
        String text = String.format(Locale.ROOT, "%." + places + "f", value);
        return text.startsWith("-") && isZero(text) ? text.substring(1) : text;
    }

    /** The value rounded to {@code places} decimals, without trailing zeros or a trailing dot. */
    private static String trimmed(double value, int places) {
        String text = fixed(value, places);
        if (text.indexOf('.') < 0) {
            return text;
        }
        int end = text.length();
        while (text.charAt(end - 1) == '0') {
            end--;
        }
        if (text.charAt(end - 1) == '.') {
            end--;
        }
        return text.substring(0, end);
    }

    private static boolean isZero(String number) {
        for (char c : number.toCharArray()) {
            if (c >= '1' && c <= '9') {
                return false;
            }
        }
        return true;
    }
}
