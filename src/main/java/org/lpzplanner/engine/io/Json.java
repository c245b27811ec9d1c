package org.lpzplanner.engine.io;

import tools.jackson.core.StreamReadFeature;
import tools.jackson.databind.DeserializationFeature;
import tools.jackson.databind.cfg.CoercionAction;
import tools.jackson.databind.cfg.CoercionInputShape;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.type.LogicalType;

/**
 * How the product reads and writes JSON (RFC 8259), in one place: the settings every mapper of the
 * product gets, and the one mapper for code that runs without an application context.
 *
 * <p>The settings: an object holding a member twice is refused (as site files refuse it); a value is
 * read only as the type it is written in: no number where text is expected or the reverse, no
 * fraction where a whole number is expected, no text for a number or a yes-or-no; a member the type
 * has not is refused, unless the type says it ignores such members
 * ({@code @JsonIgnoreProperties(ignoreUnknown = true)}, for request bodies that clients of earlier
 * releases may send with more members than are read). Jackson's own limits
 * stay as they are: nesting at most 500 deep, numbers of at most 1,000 characters, strings of at most
 * 100 million characters; NaN and Infinity are not JSON and are refused.
 *
 * <p>{@link #MAPPER} is for the engine, the command line and the static helpers the app shares with
 * them (result documents, site-file rewriting, stored values); every Spring component instead takes
 * the application's {@code JsonMapper} bean, built with {@link #configure} as well. A mapper is
 * thread-safe once built.
 */
public final class Json {

    /** The mapper for code without an application context. */
    public static final JsonMapper MAPPER = configure(JsonMapper.builder()).build();

    private Json() {
    }

    /** Applies the product's settings to a mapper being built; returns the same builder. */
    public static JsonMapper.Builder configure(JsonMapper.Builder builder) {
        return builder
                .enable(StreamReadFeature.STRICT_DUPLICATE_DETECTION)
                .enable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES)
                .disable(DeserializationFeature.ACCEPT_FLOAT_AS_INT)
                .withCoercionConfig(LogicalType.Textual, c -> c
                        .setCoercion(CoercionInputShape.Integer, CoercionAction.Fail)
                        .setCoercion(CoercionInputShape.Float, CoercionAction.Fail)
                        .setCoercion(CoercionInputShape.Boolean, CoercionAction.Fail))
                .withCoercionConfig(LogicalType.Integer, c -> c
                        .setCoercion(CoercionInputShape.String, CoercionAction.Fail)
                        .setCoercion(CoercionInputShape.EmptyString, CoercionAction.Fail)
                        .setCoercion(CoercionInputShape.Float, CoercionAction.Fail))
                .withCoercionConfig(LogicalType.Float, c -> c
                        .setCoercion(CoercionInputShape.String, CoercionAction.Fail)
                        .setCoercion(CoercionInputShape.EmptyString, CoercionAction.Fail))
                .withCoercionConfig(LogicalType.Boolean, c -> c
                        .setCoercion(CoercionInputShape.String, CoercionAction.Fail)
                        .setCoercion(CoercionInputShape.EmptyString, CoercionAction.Fail)
                        .setCoercion(CoercionInputShape.Integer, CoercionAction.Fail));
    }
}
