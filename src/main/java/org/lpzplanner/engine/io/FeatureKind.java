package org.lpzplanner.engine.io;

import java.util.Arrays;
import java.util.List;
import java.util.stream.Collectors;

/** The values of a feature's {@code properties.kind}, with what each accepts. */
enum FeatureKind {
    STRUCTURE("structure", "S", "a structure", List.of("Polygon", "MultiPolygon")),
    ROOFTOP_OBJECT("rooftop-object", "O", "a rooftop object", List.of("Polygon", "Point")),
    ROD("rod", "R", "a rod", List.of("Point")),
    CONDUCTOR("conductor", "C", "a conductor", List.of("LineString"));

    private final String key;
    private final String idPrefix;
    private final String described;
    private final List<String> geometryTypes;

    FeatureKind(String key, String idPrefix, String described, List<String> geometryTypes) {
        this.key = key;
        this.idPrefix = idPrefix;
        this.described = described;
        this.geometryTypes = geometryTypes;
    }

    /** The value written in files. */
    String key() { return key; }

    /** Prefix of generated ids, e.g. {@code S} for S1, S2, … */
    String idPrefix() { return idPrefix; }

    /** "a structure", "a rod", … for messages. */
    String described() { return described; }

    /** GeoJSON geometry types this kind accepts. */
    List<String> geometryTypes() { return geometryTypes; }

    /** The kind written as {@code key}, or null when there is none. */
    static FeatureKind byKey(String key) {
        return Arrays.stream(values()).filter(k -> k.key.equals(key)).findFirst().orElse(null);
    }

    /** All keys, for "must be one of …" messages. */
    static String allKeys() {
        return Arrays.stream(values()).map(FeatureKind::key).collect(Collectors.joining(", "));
    }
}
