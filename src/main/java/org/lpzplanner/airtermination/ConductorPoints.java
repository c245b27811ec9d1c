package org.lpzplanner.airtermination;

import java.util.ArrayList;
import java.util.List;
import org.lpzplanner.system.InvalidInputException;
import tools.jackson.core.JsonParser;
import tools.jackson.databind.DeserializationContext;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.ValueDeserializer;

/**
 * Reads a conductor's {@code points}: a list of positions in local metres, each [x, y] or
 * [x, y, elevation above ground], finite numbers. Anything else is refused naming {@code points} and
 * the point by its place in the list (1 for the first); whether the points make a path is
 * {@link ConductorEdits}' to check.
 */
final class ConductorPoints extends ValueDeserializer<List<double[]>> {

    static final String FIELD = "points";

    @Override
    public List<double[]> deserialize(JsonParser p, DeserializationContext ctxt) {
        JsonNode node = ctxt.readTree(p);
        if (!node.isArray()) {
            throw new InvalidInputException(FIELD, "points must be a list of [x, y] or [x, y, elevation]"
                    + " positions in local metres, got " + shown(node));
        }
        List<double[]> out = new ArrayList<>();
        for (JsonNode point : node) {
            int place = out.size() + 1;
            if (!point.isArray() || point.size() < 2 || point.size() > 3) {
                throw new InvalidInputException(FIELD, "point " + place + " must be [x, y] or [x, y, elevation], got "
                        + shown(point));
            }
            double[] values = new double[point.size()];
            for (int k = 0; k < point.size(); k++) {
                JsonNode value = point.get(k);
                if (!value.isNumber() || !Double.isFinite(value.asDouble())) {
                    throw new InvalidInputException(FIELD, "point " + place + " must hold numbers of metres, got "
                            + shown(point));
                }
                values[k] = value.asDouble();
            }
            out.add(values);
        }
        return out;
    }

    private static String shown(JsonNode node) {
        String text = node.toString();
        return text.length() > 60 ? text.substring(0, 60) + "…" : text;
    }
}
