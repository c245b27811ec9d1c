package org.lpzplanner.system;

import tools.jackson.core.JsonParser;
import tools.jackson.databind.DeserializationContext;
import tools.jackson.databind.ValueDeserializer;

/**
 * Reads a request member that may be sent as text or as a number ({@code "46"} or {@code 46}) as
 * its text, exactly as written; anything else is refused naming the member. For values that forms
 * send as typed text and the API takes either way (a radius, a risk input); the service that reads
 * the text checks it. Use as {@code @JsonDeserialize(using = TextOrNumber.class)} on a
 * {@code String} component; {@link NullClears} also tells a member sent as null from one left out.
 */
public class TextOrNumber extends ValueDeserializer<String> {

    @Override
    public String deserialize(JsonParser p, DeserializationContext ctxt) {
        return switch (p.currentToken()) {
            case VALUE_STRING, VALUE_NUMBER_INT, VALUE_NUMBER_FLOAT -> p.getString();
            default -> {
                String field = JsonPaths.ofValue(p);
                throw new InvalidInputException(field, field + " must be text or a number");
            }
        };
    }

    /** As {@link TextOrNumber}; a member sent as null reads as "" (clear it), one left out as null (keep it). */
    public static final class NullClears extends TextOrNumber {

        @Override
        public String getNullValue(DeserializationContext ctxt) {
            return "";
        }

        @Override
        public Object getAbsentValue(DeserializationContext ctxt) {
            return null;
        }
    }
}
