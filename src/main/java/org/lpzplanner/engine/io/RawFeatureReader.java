package org.lpzplanner.engine.io;

import org.locationtech.jts.geom.GeometryFactory;
import tools.jackson.databind.JsonNode;

/**
 * Checks a GeoJSON feature's envelope (type, properties, name, id, kind) and reads its geometry,
 * leaving the kind-specific properties for later.
 */
final class RawFeatureReader {

    private final String source;
    private final GeometryFactory factory;
    private final boolean lonLat;

    RawFeatureReader(String source, GeometryFactory factory, boolean lonLat) {
        this.source = source;
        this.factory = factory;
        this.lonLat = lonLat;
    }

    /**
     * @param index 0-based position of the feature in the {@code features} array
     */
    RawFeature read(JsonNode feature, int index) {
        FeaturePlace unnamed = new FeaturePlace(source, index, null);
        if (!feature.isObject()) {
            throw unnamed.fail(null, "must be a GeoJSON Feature object, got " + Texts.shown(feature));
        }
        JsonNode properties = feature.path("properties");
        if (!properties.isObject() && !properties.isMissingNode() && !properties.isNull()) {
            throw unnamed.fail("properties", "must be an object, got " + Texts.shown(properties));
        }
        FeaturePlace place = new FeaturePlace(source, index, new PropertyReader(properties, unnamed).textOrNull("name"));
        JsonNode type = feature.path("type");
        if (!type.isString() || !"Feature".equals(type.stringValue())) {
            throw place.fail("type", "must be \"Feature\", got " + Texts.shown(type));
        }
        FeatureKind kind = kind(properties, place);
        String id = id(feature, properties, place);
        return new RawFeature(place, kind, id, new GeoJsonGeometryReader(factory, lonLat, place)
                .read(feature.path("geometry"), kind), properties);
    }

    private static FeatureKind kind(JsonNode properties, FeaturePlace place) {
        JsonNode node = properties.path("kind");
        if (node.isMissingNode() || node.isNull()) {
            throw place.fail("kind", "is required in \"properties\": one of " + FeatureKind.allKeys());
        }
        FeatureKind kind = node.isString() ? FeatureKind.byKey(node.stringValue()) : null;
        if (kind == null) {
            throw place.fail("kind", "must be one of " + FeatureKind.allKeys() + ", got " + Texts.shown(node));
        }
        return kind;
    }

    /** The id from the feature's {@code id} member or {@code properties.id}; they must agree if both are given. */
    private static String id(JsonNode feature, JsonNode properties, FeaturePlace place) {
        String member = idText(feature.path("id"), place);
        String property = idText(properties.path("id"), place);
        if (member != null && property != null && !member.equals(property)) {
            throw place.fail("id", "the feature's \"id\" " + Texts.quoted(member) + " and properties.id "
                    + Texts.quoted(property) + " differ; give one, or make them equal");
        }
        return member != null ? member : property;
    }

    private static String idText(JsonNode node, FeaturePlace place) {
        if (node.isMissingNode() || node.isNull()) {
            return null;
        }
        if (node.isString() && !node.stringValue().isBlank()) {
            return node.stringValue().trim();
        }
        if (node.isIntegralNumber()) {
            return node.asString();
        }
        throw place.fail("id", "must be non-empty text or a whole number, got " + Texts.shown(node));
    }
}
