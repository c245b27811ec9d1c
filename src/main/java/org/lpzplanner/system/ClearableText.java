package org.lpzplanner.system;

import tools.jackson.core.JsonParser;
import tools.jackson.core.JsonToken;
import tools.jackson.databind.DeserializationContext;
import tools.jackson.databind.ValueDeserializer;

/**
 * Reads a request member that is text or null: a member sent as null reads as "" (clear the value),
 * one left out as null (keep the stored value); anything else is refused naming the member. Use as
 * {@code @JsonDeserialize(using = ClearableText.class)} on a {@code String} component.
 */
public final class ClearableText extends ValueDeserializer<String> {

    @Override
    public String deserialize(JsonParser p, DeserializationContext ctxt) {
        if (p.currentToken() == JsonToken.VALUE_STRING) {
            return p.getString();
        }
        String field = JsonPaths.ofValue(p);
        throw new InvalidInputException(field, field + " must be text (or null to clear it)");
    }

    @Override
    public String getNullValue(DeserializationContext ctxt) {
        return "";
    }

    @Override
    public Object getAbsentValue(DeserializationContext ctxt) {
        return null;
    }
}
