package org.lpzplanner.transfer;

import java.time.Instant;
import java.time.format.DateTimeParseException;
import org.lpzplanner.system.InvalidInputException;
import tools.jackson.databind.JsonNode;

/**
 * Reads the members of a site export, each check naming the member by its path (for example
 * {@code revisions[2].sphereRadius}) so that a bad file says exactly where it is wrong.
 */
final class ArchiveFields {

    private ArchiveFields() {}

    static JsonNode member(JsonNode parent, String path, String name) {
        JsonNode node = parent.get(name);
        if (node == null || node.isNull()) {
            throw bad(join(path, name), "is missing");
        }
        return node;
    }

    static String text(JsonNode parent, String path, String name, int maxLength) {
        JsonNode node = member(parent, path, name);
        if (!node.isString()) {
            throw bad(join(path, name), "must be a string");
        }
        String value = node.stringValue();
        if (value.length() > maxLength) {
            throw bad(join(path, name), "must be at most " + maxLength + " characters, got " + value.length());
        }
        return value;
    }

    static String nonBlankText(JsonNode parent, String path, String name, int maxLength) {
        String value = text(parent, path, name, maxLength);
        if (value.isBlank()) {
            throw bad(join(path, name), "must not be empty");
        }
        return value;
    }

    static double number(JsonNode parent, String path, String name) {
        JsonNode node = member(parent, path, name);
        if (!node.isNumber() || !Double.isFinite(node.doubleValue())) {
            throw bad(join(path, name), "must be a finite number");
        }
        return node.doubleValue();
    }

    static double nonNegative(JsonNode parent, String path, String name) {
        double value = number(parent, path, name);
        if (value < 0) {
            throw bad(join(path, name), "must not be negative, got " + value);
        }
        return value;
    }

    static Double optionalPositive(JsonNode parent, String path, String name) {
        JsonNode node = parent.get(name);
        if (node == null || node.isNull()) {
            return null;
        }
        double value = number(parent, path, name);
        if (value <= 0) {
            throw bad(join(path, name), "must be positive, got " + value);
        }
        return value;
    }

    static long whole(JsonNode parent, String path, String name, long min, long max) {
        JsonNode node = member(parent, path, name);
        if (!node.isIntegralNumber() || !node.canConvertToLong()) {
            throw bad(join(path, name), "must be a whole number");
        }
        long value = node.longValue();
        if (value < min || value > max) {
            throw bad(join(path, name), "must be from " + min + " to " + max + ", got " + value);
        }
        return value;
    }

    static boolean bool(JsonNode parent, String path, String name) {
        JsonNode node = member(parent, path, name);
        if (!node.isBoolean()) {
            throw bad(join(path, name), "must be true or false");
        }
        return node.booleanValue();
    }

    static Instant instant(JsonNode parent, String path, String name) {
        String value = text(parent, path, name, 64);
        try {
            return Instant.parse(value);
        } catch (DateTimeParseException e) {
            throw bad(join(path, name), "must be a UTC time such as 2026-05-01T09:30:00Z, got \"" + value + "\"");
        }
    }

    static JsonNode array(JsonNode parent, String path, String name) {
        JsonNode node = member(parent, path, name);
        if (!node.isArray()) {
            throw bad(join(path, name), "must be an array");
        }
        return node;
    }

    /** An array that exports written before the member existed leave out: absent or null reads as empty. */
    static JsonNode optionalArray(JsonNode parent, String path, String name) {
        JsonNode node = parent.get(name);
        if (node == null || node.isNull()) {
            return tools.jackson.databind.node.JsonNodeFactory.instance.arrayNode();
        }
        return array(parent, path, name);
    }

    static JsonNode object(JsonNode node, String path) {
        if (!node.isObject()) {
            throw bad(path, "must be an object");
        }
        return node;
    }

    static String join(String path, String name) {
        return path.isEmpty() ? name : path + "." + name;
    }

    static InvalidInputException bad(String field, String problem) {
        return new InvalidInputException(field, "site export: " + field + " " + problem + "; nothing was stored");
    }
}
