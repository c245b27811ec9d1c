package org.lpzplanner.engine.io;

import tools.jackson.databind.JsonNode;

/**
 * Reads typed values from a feature's {@code properties}, turning every bad value into a
 * {@link SiteFormatException} that names the field, the rule and the value found.
 */
final class PropertyReader {

    private final JsonNode properties;
    private final Place place;

    /**
     * @param properties the feature's properties object; null or missing is read as empty
     */
    PropertyReader(JsonNode properties, Place place) {
        this.properties = properties;
        this.place = place;
    }

    /** Whether the field is present at all (even as null). */
    boolean has(String field) {
        return properties != null && properties.isObject() && properties.has(field);
    }

    /**
     * A required length in metres, {@code 0.01 ≤ value ≤ 1000}.
     *
     * @param meaning what the field is, for the message when it is missing
     */
    double positive(String field, String meaning) {
        if (!has(field)) {
            throw place.fail(field, "is required: " + meaning + ", a number > 0");
        }
        return checked(field, properties.get(field), false);
    }

    /** An optional length in metres, 0 or {@code 0.01 ≤ value ≤ 1000}; null when absent. */
    Double nonNegativeOrNull(String field) {
        return has(field) ? checked(field, properties.get(field), true) : null;
    }

    /** An optional positive length in metres, {@code 0.01 ≤ value ≤ 1000}; null when absent. */
    Double positiveOrNull(String field) {
        return has(field) ? checked(field, properties.get(field), false) : null;
    }

    /**
     * A required compass bearing in degrees clockwise from north; any finite number, returned
     * normalised to {@code [0, 360)}.
     */
    double bearing(String field, String meaning) {
        if (!has(field)) {
            throw place.fail(field, "is required: " + meaning
                    + ", a compass bearing in degrees clockwise from north (0 = north, 90 = east)");
        }
        double value = finiteNumber(field, properties.get(field), "a compass bearing in degrees");
        double normalised = value % 360;
        return normalised < 0 ? normalised + 360 : normalised;
    }

    /** An optional text value; null when absent or JSON null. */
    String textOrNull(String field) {
        if (!has(field) || properties.get(field).isNull()) {
            return null;
        }
        JsonNode node = properties.get(field);
        if (!node.isString()) {
            throw place.fail(field, "must be text, got " + Texts.shown(node));
        }
        return node.stringValue();
    }

    private double checked(String field, JsonNode node, boolean zeroAllowed) {
        String rule = zeroAllowed ? "a number ≥ 0" : "a number > 0";
        double value = finiteNumber(field, node, rule);
        if (zeroAllowed ? value < 0 : value <= 0) {
            throw place.fail(field, "must be " + rule + ", got " + Texts.shown(node));
        }
        if (value > 0 && value < SiteLimits.MIN_LENGTH) {
            throw place.fail(field, "must be " + (zeroAllowed ? "0 or " : "") + "at least "
                    + Texts.metres(SiteLimits.MIN_LENGTH) + " m, got " + Texts.shown(node)
                    + "; values are metres, so check the units");
        }
        if (value > SiteLimits.MAX_HEIGHT) {
            throw place.fail(field, "must be at most " + Texts.metres(SiteLimits.MAX_HEIGHT) + " m, got "
                    + Texts.shown(node) + "; values are metres, so check the units");
        }
        return value;
    }

    private double finiteNumber(String field, JsonNode node, String rule) {
        if (!node.isNumber()) {
            throw place.fail(field, "must be " + rule + ", got " + Texts.shown(node));
        }
        double value = node.doubleValue();
        if (!Double.isFinite(value)) {
            throw place.fail(field, "must be " + rule + ", got " + Texts.shown(node) + " (not a finite number)");
        }
        return value;
    }
}
