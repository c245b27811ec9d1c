package org.lpzplanner.system;

import java.util.Locale;
import org.lpzplanner.engine.model.ProtectionLevel;

/**
 * Checks the assessment values users type in, with the same bounds as the engine, so that the
 * message can name the value at fault.
 */
public final class Settings {

    /** Largest custom sphere radius, metres. */
    public static final double MAX_RADIUS = 1000;
    /** Finest and coarsest grid resolution, metres. */
    public static final double MIN_RESOLUTION = 0.05;
    public static final double MAX_RESOLUTION = 10;

    private Settings() {
    }

    /**
     * The protection level named by {@code text} ("I".."IV" or "1".."4"), or {@code fallback} when
     * the text is blank.
     *
     * @throws InvalidInputException for any other text
     */
    public static ProtectionLevel level(String text, ProtectionLevel fallback) {
        if (text == null || text.isBlank()) {
            return fallback;
        }
        ProtectionLevel level = ProtectionLevel.parse(text);
        if (level == null) {
            throw new InvalidInputException("level", "level must be I, II, III or IV, got \"" + text.strip() + "\"");
        }
        return level;
    }

    /**
     * A custom sphere radius in metres, or null when the text is blank.
     *
     * @throws InvalidInputException unless it is a number above 0 and at most {@value #MAX_RADIUS}
     */
    public static Double radius(String text) {
        Double value = number("radius", text);
        if (value != null && !(value > 0 && value <= MAX_RADIUS)) {
            throw new InvalidInputException("radius", "radius must be above 0 and at most " + (int) MAX_RADIUS
                    + " m, got " + text.strip());
        }
        return value;
    }

    /**
     * A grid resolution in metres, or null (the engine chooses) when the text is blank.
     *
     * @throws InvalidInputException unless it is between {@value #MIN_RESOLUTION} and
     *                               {@value #MAX_RESOLUTION} m
     */
    public static Double resolution(String text) {
        Double value = number("resolution", text);
        if (value != null && !(value >= MIN_RESOLUTION && value <= MAX_RESOLUTION)) {
            throw new InvalidInputException("resolution", String.format(Locale.ROOT,
                    "resolution must be between %s and %s m, got %s", MIN_RESOLUTION, (int) MAX_RESOLUTION,
                    text.strip()));
        }
        return value;
    }

    private static Double number(String field, String text) {
        if (text == null || text.isBlank()) {
            return null;
        }
        try {
            double value = Double.parseDouble(text.strip());
            if (Double.isNaN(value) || Double.isInfinite(value)) {
                throw new NumberFormatException();
            }
            return value;
        } catch (NumberFormatException e) {
            throw new InvalidInputException(field, field + " must be a number of metres, got \"" + text.strip() + "\"");
        }
    }
}
