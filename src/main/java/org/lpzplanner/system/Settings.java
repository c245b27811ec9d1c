package org.lpzplanner.system;

import org.lpzplanner.engine.model.ProtectionLevel;
import org.lpzplanner.engine.model.SettingRange;

/**
 * Checks the assessment values users type in (page forms and API), with the engine's ranges
 * ({@link SettingRange}), so that the message can name the value at fault.
 */
public final class Settings {

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
     * @throws InvalidInputException unless it is a number in {@link SettingRange#RADIUS}
     */
    public static Double radius(String text) {
        return inRange(SettingRange.RADIUS, "radius", text);
    }

    /**
     * A grid resolution in metres, or null (the engine chooses) when the text is blank.
     *
     * @throws InvalidInputException unless it is a number in {@link SettingRange#RESOLUTION}
     */
    public static Double resolution(String text) {
        return inRange(SettingRange.RESOLUTION, "resolution", text);
    }

    private static Double inRange(SettingRange range, String field, String text) {
        Double value = number(field, text);
        if (value != null && !range.contains(value)) {
            throw new InvalidInputException(field, field + " must be " + range.rule() + ", got " + text.strip());
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
