package org.lpzplanner.keepout;

import org.lpzplanner.system.InvalidInputException;
import org.lpzplanner.system.JsonPaths;
import tools.jackson.core.JsonParser;
import tools.jackson.databind.DeserializationContext;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.ValueDeserializer;
import tools.jackson.databind.annotation.JsonDeserialize;

/**
 * A corner of an outline as the API sends it: {@code [x, y]}, two numbers of local metres. Anything
 * else is refused naming the corner ({@code corners[2]}); whether the corners make an outline is
 * {@link KeepOutOutline}'s to check.
 */
@JsonDeserialize(using = Corner.Reader.class)
public record Corner(double x, double y) {

    double[] xy() {
        return new double[] {x, y};
    }

    /** Reads {@code [x, y]}. */
    static final class Reader extends ValueDeserializer<Corner> {

        @Override
        public Corner deserialize(JsonParser p, DeserializationContext ctxt) {
            String field = JsonPaths.ofValue(p);
            JsonNode node = ctxt.readTree(p);
            if (!node.isArray() || node.size() != 2 || !node.get(0).isNumber() || !node.get(1).isNumber()) {
                String shown = node.toString();
                throw new InvalidInputException(field, field + " must be [x, y], two numbers of metres, got "
                        + (shown.length() > 60 ? shown.substring(0, 60) + "…" : shown));
            }
            return new Corner(node.get(0).doubleValue(), node.get(1).doubleValue());
        }
    }
}
