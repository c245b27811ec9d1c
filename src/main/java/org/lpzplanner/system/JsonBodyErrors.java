package org.lpzplanner.system;

import java.util.Collection;
import java.util.Map;
import java.util.stream.Collectors;
import org.springframework.http.converter.HttpMessageNotReadableException;
import tools.jackson.core.JacksonException;
import tools.jackson.core.JsonParser;
import tools.jackson.core.JsonToken;
import tools.jackson.core.ObjectReadContext;
import tools.jackson.core.StreamReadConstraints;
import tools.jackson.core.TokenStreamLocation;
import tools.jackson.core.exc.InputCoercionException;
import tools.jackson.core.exc.StreamConstraintsException;
import tools.jackson.core.exc.StreamReadException;
import tools.jackson.core.exc.UnexpectedEndOfInputException;
import tools.jackson.core.json.JsonFactory;
import tools.jackson.databind.DatabindException;
import tools.jackson.databind.exc.InvalidFormatException;
import tools.jackson.databind.exc.MismatchedInputException;
import tools.jackson.databind.exc.UnrecognizedPropertyException;

/**
 * Says what is wrong with a request body the API could not read as the JSON object an endpoint
 * takes, in words fit for users, and where: the member at fault as the API names fields
 * ({@link JsonPaths}), the line and column for JSON that does not parse. Nothing of the reader's own
 * wording (class names, settings) reaches the answer.
 */
final class JsonBodyErrors {

    /** The problem's kind, the member at fault (null when unknown) and the text for users. */
    record Described(ApiProblem kind, String field, String detail) {
    }

    private static final StreamReadConstraints LIMITS = StreamReadConstraints.defaults();
    /** Reads a refused body again without the reader's limits, only to find where it broke one. */
    private static final JsonFactory UNLIMITED = JsonFactory.builder().streamReadConstraints(
            StreamReadConstraints.builder().maxNestingDepth(Integer.MAX_VALUE).maxNumberLength(Integer.MAX_VALUE)
                    .maxNameLength(Integer.MAX_VALUE).build()).build();

    private JsonBodyErrors() {
    }

    /**
     * @param body the bytes of the body as read ({@link JsonBodyLimit}), or null
     */
    static Described describe(HttpMessageNotReadableException e, byte[] body) {
        InvalidInputException invalid = cause(e, InvalidInputException.class);
        JacksonException jackson = cause(e, JacksonException.class);
        if (invalid != null) {
            String path = jackson == null ? "" : JsonPaths.of(jackson.getPath());
            return new Described(ApiProblem.INVALID_INPUT, path.isEmpty() ? invalid.field() : path,
                    invalid.getMessage());
        }
        if (jackson == null || isEmpty(jackson)) {
            if (jackson != null || (e.getMessage() != null && e.getMessage().startsWith("Required request body"))) {
                return new Described(ApiProblem.UNREADABLE_BODY, "body",
                        "the request body is empty (or null); send a JSON object");
            }
            return new Described(ApiProblem.UNREADABLE_BODY, "body", "the request body could not be read to its end");
        }
        if (jackson instanceof StreamConstraintsException limit) {
            return overLimit(limit, body);
        }
        if (jackson instanceof InputCoercionException c) {
            String field = field(c);
            return new Described(ApiProblem.INVALID_INPUT, field, named(field) + " must be a whole number from "
                    + minimum(c.getTargetType()) + " to " + maximum(c.getTargetType()));
        }
        if (jackson instanceof UnrecognizedPropertyException u) {
            return unknownMember(u);
        }
        if (jackson instanceof MismatchedInputException m) {
            return mismatch(m);
        }
        if (jackson instanceof StreamReadException r) {
            return notJson(r);
        }
        String field = field(jackson);
        return new Described(ApiProblem.INVALID_INPUT, field.isEmpty() ? "body" : field,
                (field.isEmpty() ? "the request body" : field) + " cannot be read as this endpoint takes it");
    }

    private static boolean isEmpty(JacksonException e) {
        return e instanceof MismatchedInputException && e.getOriginalMessage() != null
                && e.getOriginalMessage().startsWith("No content to map");
    }

    private static Described unknownMember(UnrecognizedPropertyException u) {
        String path = JsonPaths.of(u.getPath());
        String parent = path.endsWith(u.getPropertyName()) ? path.substring(0, path.length()
                - u.getPropertyName().length()).replaceAll("\\.$", "") : "";
        Collection<Object> known = u.getKnownPropertyIds();
        return new Described(ApiProblem.INVALID_INPUT, path, "unknown field \"" + u.getPropertyName() + "\""
                + (parent.isEmpty() ? "" : " of " + parent) + (known == null || known.isEmpty() ? ""
                        : "; the fields are " + known.stream().map(String::valueOf).collect(Collectors.joining(", "))));
    }

    private static Described mismatch(MismatchedInputException m) {
        String path = JsonPaths.of(m.getPath());
        String got = m instanceof InvalidFormatException f ? shown(f.getValue()) : shown(token(m));
        String expected = expected(m.getTargetType());
        if (path.isEmpty()) {
            return new Described(ApiProblem.INVALID_INPUT, "body", "the request body must be " + expected
                    + (got == null ? "" : ", got " + got));
        }
        return new Described(ApiProblem.INVALID_INPUT, path, path + " must be " + expected
                + (got == null ? "" : ", got " + got));
    }

    private static Described notJson(StreamReadException r) {
        String message = r.getOriginalMessage() == null ? "" : r.getOriginalMessage();
        JsonParser parser = r.processor();
        String field = parser == null ? "" : JsonPaths.of(parser.streamReadContext());
        if (message.startsWith("Duplicate Object property") && parser != null) {
            String name = parser.streamReadContext().currentName();
            String parent = field.endsWith(name) ? field.substring(0, field.length() - name.length())
                    .replaceAll("\\.$", "") : "";
            return new Described(ApiProblem.UNREADABLE_BODY, field, "the JSON body holds the member \"" + name
                    + "\"" + (parent.isEmpty() ? "" : " of " + parent) + " twice" + where(r)
                    + "; send each member once");
        }
        if (message.startsWith("Non-standard token '")) {
            String token = message.substring("Non-standard token '".length(), message.indexOf('\'',
                    "Non-standard token '".length()));
            return new Described(ApiProblem.UNREADABLE_BODY, field.isEmpty() ? null : field,
                    (field.isEmpty() ? "the JSON body holds " : named(field) + " is ") + token
                            + ", which JSON (RFC 8259) does not allow" + where(r) + "; send a finite number");
        }
        if (message.contains("UTF-8") || message.contains("UTF8")) {
            return new Described(ApiProblem.UNREADABLE_BODY, field.isEmpty() ? null : field,
                    "the request body is not valid UTF-8 text" + where(r) + "; send JSON as UTF-8");
        }
        if (r instanceof UnexpectedEndOfInputException) {
            return new Described(ApiProblem.UNREADABLE_BODY, field.isEmpty() ? null : field,
                    "the JSON body ends before it is complete" + where(r) + "; send the whole body");
        }
        String reason = plain(message);
        return new Described(ApiProblem.UNREADABLE_BODY, field.isEmpty() ? null : field,
                "the request body is not valid JSON" + where(r) + (reason.isEmpty() ? "" : ": " + reason));
    }

    private static Described overLimit(StreamConstraintsException e, byte[] body) {
        String message = e.getOriginalMessage() == null ? "" : e.getOriginalMessage();
        if (message.contains("NestingDepth")) {
            String path = locate(body, true);
            String field = path == null || path.isEmpty() ? null : JsonPaths.outermost(path);
            return new Described(ApiProblem.UNREADABLE_BODY, field, "the JSON body nests arrays and objects more"
                    + " than " + LIMITS.getMaxNestingDepth() + " deep" + (field == null ? "" : " in " + field)
                    + "; send a flatter body");
        }
        if (message.contains("NumberLength")) {
            String path = locate(body, false);
            String field = path == null || path.isEmpty() ? null : path;
            return new Described(ApiProblem.UNREADABLE_BODY, field, (field == null ? "a number of the JSON body"
                    : named(field)) + " has more digits than the " + LIMITS.getMaxNumberLength()
                    + " the API reads; send a shorter number");
        }
        return new Described(ApiProblem.UNREADABLE_BODY, null, "the JSON body has a string or member name longer"
                + " than the API reads; send shorter text");
    }

    /**
     * The path of the first place where the body nests deeper than the limit, or holds a number
     * longer than the limit; null when the body cannot be searched.
     */
    private static String locate(byte[] body, boolean nesting) {
        if (body == null) {
            return null;
        }
        try (JsonParser p = UNLIMITED.createParser(ObjectReadContext.empty(), body)) {
            for (JsonToken t = p.nextToken(); t != null; t = p.nextToken()) {
                if (nesting && (t == JsonToken.START_ARRAY || t == JsonToken.START_OBJECT)
                        && p.streamReadContext().getNestingDepth() > LIMITS.getMaxNestingDepth()) {
                    return JsonPaths.ofValue(p);
                }
                if (!nesting && t.isNumeric() && p.getStringLength() > LIMITS.getMaxNumberLength()) {
                    return JsonPaths.ofValue(p);
                }
            }
        } catch (JacksonException e) {
            return null;
        }
        return null;
    }

    /** The member as the detail names it, or "a value" for the body as a whole. */
    private static String named(String field) {
        return field == null || field.isEmpty() ? "a value" : field;
    }

    private static String field(JacksonException e) {
        String path = JsonPaths.of(e.getPath());
        if (path.isEmpty() && e.processor() instanceof JsonParser p) {
            path = JsonPaths.of(p.streamReadContext());
        }
        return path;
    }

    private static String where(JacksonException e) {
        TokenStreamLocation at = e.getLocation();
        if (at == null || at.getLineNr() < 1) {
            return "";
        }
        return " at line " + at.getLineNr() + (at.getColumnNr() > 0 ? ", column " + at.getColumnNr() : "");
    }

    private static final Map<Class<?>, String> KINDS = Map.ofEntries(
            Map.entry(String.class, "text (a JSON string)"), Map.entry(Double.class, "a number"),
            Map.entry(double.class, "a number"), Map.entry(Float.class, "a number"), Map.entry(float.class, "a number"),
            Map.entry(java.math.BigDecimal.class, "a number"), Map.entry(Long.class, "a whole number"),
            Map.entry(long.class, "a whole number"), Map.entry(Integer.class, "a whole number"),
            Map.entry(int.class, "a whole number"), Map.entry(java.math.BigInteger.class, "a whole number"),
            Map.entry(Boolean.class, "true or false"), Map.entry(boolean.class, "true or false"));

    private static String expected(Class<?> type) {
        if (type == null) {
            return "another kind of value";
        }
        String kind = KINDS.get(type);
        if (kind != null) {
            return kind;
        }
        if (type.isEnum()) {
            return "one of " + java.util.Arrays.stream(type.getEnumConstants()).map(String::valueOf)
                    .collect(Collectors.joining(", "));
        }
        if (type.isArray() || Collection.class.isAssignableFrom(type)) {
            return "an array";
        }
        return "a JSON object";
    }

    private static JsonToken token(MismatchedInputException m) {
        if (m.getCurrentToken() != null) {
            return m.getCurrentToken();
        }
        return m.processor() instanceof JsonParser p ? p.currentToken() : null;
    }

    private static String shown(JsonToken token) {
        if (token == null) {
            return null;
        }
        return switch (token) {
            case START_ARRAY -> "an array";
            case START_OBJECT -> "an object";
            case VALUE_STRING -> "text";
            case VALUE_NUMBER_INT, VALUE_NUMBER_FLOAT -> "a number";
            case VALUE_TRUE -> "true";
            case VALUE_FALSE -> "false";
            case VALUE_NULL -> "null";
            default -> null;
        };
    }

    private static String shown(Object value) {
        if (value instanceof CharSequence text) {
            String s = text.toString();
            return "the text \"" + (s.length() > 40 ? s.substring(0, 40) + "…" : s) + "\"";
        }
        if (value instanceof Number || value instanceof Boolean) {
            String s = String.valueOf(value);
            return value instanceof Number ? "the number " + (s.length() > 40 ? s.substring(0, 40) + "…" : s) : s;
        }
        return null;
    }

    private static String minimum(Class<?> type) {
        return type == int.class || type == Integer.class ? String.valueOf(Integer.MIN_VALUE)
                : String.valueOf(Long.MIN_VALUE);
    }

    private static String maximum(Class<?> type) {
        return type == int.class || type == Integer.class ? String.valueOf(Integer.MAX_VALUE)
                : String.valueOf(Long.MAX_VALUE);
    }

    /** The reader's first line without its own settings and type names. */
    private static String plain(String message) {
        String line = message.lines().findFirst().orElse("");
        for (String cut : new String[] {": enable", "; enable", " (for ", ": was expecting (JSON"}) {
            int at = line.indexOf(cut);
            if (at > 0) {
                line = line.substring(0, at);
            }
        }
        line = line.replace("`", "");
        String lower = line.toLowerCase(java.util.Locale.ROOT);
        return lower.contains("java") || lower.contains("jackson") ? "" : line;
    }

    private static <T extends Throwable> T cause(Throwable e, Class<T> type) {
        for (Throwable t = e; t != null; t = t.getCause() == t ? null : t.getCause()) {
            if (type.isInstance(t)) {
                return type.cast(t);
            }
        }
        return null;
    }
}
