package org.lpzplanner.design;

import java.util.ArrayList;
import java.util.List;
import org.lpzplanner.system.InvalidInputException;
import org.lpzplanner.system.JsonPaths;
import tools.jackson.core.JsonParser;
import tools.jackson.databind.DeserializationContext;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.ValueDeserializer;

/**
 * A list member of a design request as sent: its values, or why they cannot be used. The readers
 * below never refuse while the body is read, so that a body broken further on (cut off, a member
 * twice) is answered as such; the request refuses an unusable member when it is used, naming it.
 *
 * @param field   the member, as the API names fields
 * @param problem what is wrong, for users; null when the value can be used
 */
public record Sent<T>(T value, String field, String problem) {

    /**
     * @throws InvalidInputException naming the member when its value cannot be used
     */
    T checked() {
        if (problem != null) {
            throw new InvalidInputException(field, problem);
        }
        return value;
    }

    private static String shown(JsonNode node) {
        String text = node.toString();
        return text.length() > 60 ? text.substring(0, 60) + "…" : text;
    }

    /** Heights in metres: a list of at most {@link #MAX} numbers. */
    public static final class Heights extends ValueDeserializer<Sent<List<Double>>> {

        static final int MAX = 20;

        @Override
        public Sent<List<Double>> deserialize(JsonParser p, DeserializationContext ctxt) {
            String field = JsonPaths.ofValue(p);
            JsonNode node = ctxt.readTree(p);
            if (!node.isArray()) {
                return new Sent<>(null, field, field + " must be a list of numbers of metres, e.g. [0.5, 1, 2]");
            }
            List<Double> out = new ArrayList<>();
            for (JsonNode n : node) {
                if (!n.isNumber()) {
                    return new Sent<>(null, field, field + " must hold numbers only, got " + shown(n));
                }
                out.add(n.asDouble());
            }
            if (out.size() > MAX) {
                return new Sent<>(null, field, field + " may hold at most " + MAX + " heights");
            }
            return new Sent<>(out, field, null);
        }
    }

    /** Positions on the plan: a list of [x, y] in local metres. */
    public static final class Points extends ValueDeserializer<Sent<List<double[]>>> {

        @Override
        public Sent<List<double[]>> deserialize(JsonParser p, DeserializationContext ctxt) {
            String field = JsonPaths.ofValue(p);
            return points(field, ctxt.readTree(p));
        }
    }

    /** Areas on the plan: a list of outlines, each a list of [x, y] in local metres. */
    public static final class Areas extends ValueDeserializer<Sent<List<List<double[]>>>> {

        @Override
        public Sent<List<List<double[]>>> deserialize(JsonParser p, DeserializationContext ctxt) {
            String field = JsonPaths.ofValue(p);
            JsonNode node = ctxt.readTree(p);
            if (!node.isArray()) {
                return new Sent<>(null, field, field + " must be a list of polygons, each a list of [x, y]");
            }
            List<List<double[]>> out = new ArrayList<>();
            for (JsonNode ring : node) {
                Sent<List<double[]>> points = points(field, ring);
                if (points.problem() != null) {
                    return new Sent<>(null, field, points.problem());
                }
                out.add(points.value());
            }
            return new Sent<>(out, field, null);
        }
    }

    private static Sent<List<double[]>> points(String field, JsonNode ring) {
        if (!ring.isArray()) {
            return new Sent<>(null, field, field + " must be a list of [x, y] in local metres");
        }
        List<double[]> points = new ArrayList<>();
        for (JsonNode p : ring) {
            if (!p.isArray() || p.size() != 2 || !p.get(0).isNumber() || !p.get(1).isNumber()) {
                return new Sent<>(null, field, "every point of " + field + " must be [x, y] in metres, got "
                        + shown(p));
            }
            points.add(new double[] {p.get(0).asDouble(), p.get(1).asDouble()});
        }
        return new Sent<>(points, field, null);
    }
}
