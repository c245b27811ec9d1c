package org.lpzplanner.system;

import java.util.ArrayDeque;
import java.util.Deque;
import java.util.List;
import tools.jackson.core.JacksonException;
import tools.jackson.core.JsonParser;
import tools.jackson.core.JsonToken;
import tools.jackson.core.TokenStreamContext;

/**
 * Where in a JSON body something is, written as the API names fields: {@code lines[0].length},
 * {@code corners[2]}, {@code name}; the empty string for the body as a whole.
 */
public final class JsonPaths {

    private JsonPaths() {
    }

    /** The path of the value the parser is at (a scalar, or the start of an array or object). */
    public static String ofValue(JsonParser parser) {
        TokenStreamContext context = parser.streamReadContext();
        JsonToken token = parser.currentToken();
        if (context != null && (token == JsonToken.START_ARRAY || token == JsonToken.START_OBJECT)) {
            context = context.getParent();
        }
        return of(context);
    }

    /** The path of the member or element a reading context is at. */
    static String of(TokenStreamContext context) {
        Deque<String> segments = new ArrayDeque<>();
        for (TokenStreamContext c = context; c != null && !c.inRoot(); c = c.getParent()) {
            if (c.inArray() && c.getCurrentIndex() >= 0) {
                segments.addFirst("[" + c.getCurrentIndex() + "]");
            } else if (c.inObject() && c.currentName() != null) {
                segments.addFirst("." + c.currentName());
            }
        }
        return join(segments);
    }

    /** The path a mapping failure records (its references from the body down). */
    static String of(List<JacksonException.Reference> path) {
        Deque<String> segments = new ArrayDeque<>();
        for (JacksonException.Reference r : path) {
            if (r.getPropertyName() != null) {
                segments.addLast("." + r.getPropertyName());
            } else if (r.getIndex() >= 0) {
                segments.addLast("[" + r.getIndex() + "]");
            }
        }
        return join(segments);
    }

    /** The first member of a path: {@code lines} of {@code lines[0].length}. */
    static String outermost(String path) {
        int end = 0;
        while (end < path.length() && path.charAt(end) != '.' && path.charAt(end) != '[') {
            end++;
        }
        return end == 0 ? path : path.substring(0, end);
    }

    private static String join(Deque<String> segments) {
        String joined = String.join("", segments);
        return joined.startsWith(".") ? joined.substring(1) : joined;
    }
}
