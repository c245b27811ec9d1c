package org.lpzplanner.engine.io;

import java.util.ArrayList;
import java.util.List;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LinearRing;
import org.locationtech.jts.geom.Polygon;
import tools.jackson.databind.JsonNode;

/**
 * Turns a feature's GeoJSON {@code geometry} into a JTS geometry in the file's own coordinates
 * (lon/lat degrees or local metres), checking the GeoJSON structure: types allowed for the kind,
 * position arrays, ring sizes and closure, and the lon/lat ranges.
 *
 * <p>Only line strings keep a third value (the elevation of conductor vertices); footprints and
 * points are plan positions, so their third values are dropped. Missing elevations are NaN.
 */
final class GeoJsonGeometryReader {

    private static final String FIELD = "geometry";
    private static final int MIN_RING_POSITIONS = 4;

    private final GeometryFactory factory;
    private final boolean lonLat;
    private final Place place;

    /**
     * @param lonLat whether positions are WGS84 longitude/latitude (else local metres)
     */
    GeoJsonGeometryReader(GeometryFactory factory, boolean lonLat, Place place) {
        this.factory = factory;
        this.lonLat = lonLat;
        this.place = place;
    }

    /** Reads the geometry, which must be of a type the kind accepts. */
    Geometry read(JsonNode geometry, FeatureKind kind) {
        String accepted = String.join(" or ", kind.geometryTypes());
        if (geometry == null || geometry.isMissingNode() || geometry.isNull()) {
            throw place.fail(FIELD, "is required: " + kind.described() + " needs a " + accepted + " geometry");
        }
        if (!geometry.isObject() || !geometry.path("type").isString()) {
            throw place.fail(FIELD, "must be a GeoJSON geometry object with a \"type\", got " + Texts.shown(geometry));
        }
        String type = geometry.get("type").stringValue();
        if (!kind.geometryTypes().contains(type)) {
            throw place.fail(FIELD, kind.described() + " needs a " + accepted + " geometry, got " + type);
        }
        JsonNode coordinates = geometry.path("coordinates");
        if (!coordinates.isArray()) {
            throw place.fail(FIELD, "a " + type + " needs a \"coordinates\" array, got " + Texts.shown(coordinates));
        }
        return switch (type) {
            case "Point" -> factory.createPoint(position(coordinates, "the point", false));
            case "LineString" -> lineString(coordinates);
            case "Polygon" -> polygon(coordinates, "");
            case "MultiPolygon" -> multiPolygon(coordinates);
            default -> throw new IllegalStateException("geometry type not handled: " + type);
        };
    }

    private Geometry lineString(JsonNode positions) {
        if (positions.size() < 2) {
            throw place.fail(FIELD, "a LineString needs at least 2 positions, got " + positions.size());
        }
        Coordinate[] coordinates = new Coordinate[positions.size()];
        for (int i = 0; i < coordinates.length; i++) {
            coordinates[i] = position(positions.get(i), "position " + i, true);
        }
        return factory.createLineString(coordinates);
    }

    private Geometry multiPolygon(JsonNode polygons) {
        if (polygons.isEmpty()) {
            throw place.fail(FIELD, "the MultiPolygon has no polygons");
        }
        Polygon[] parts = new Polygon[polygons.size()];
        for (int i = 0; i < parts.length; i++) {
            JsonNode rings = polygons.get(i);
            if (!rings.isArray()) {
                throw place.fail(FIELD, "polygon " + i + " of the MultiPolygon must be an array of rings, got "
                        + Texts.shown(rings));
            }
            parts[i] = polygon(rings, "polygon " + i + ", ");
        }
        return factory.createMultiPolygon(parts);
    }

    private Polygon polygon(JsonNode rings, String prefix) {
        if (rings.isEmpty()) {
            throw place.fail(FIELD, prefix + "the polygon has no rings; it needs at least an outer boundary");
        }
        LinearRing shell = ring(rings.get(0), prefix + "ring 0 (outer boundary)");
        List<LinearRing> holes = new ArrayList<>();
        for (int i = 1; i < rings.size(); i++) {
            holes.add(ring(rings.get(i), prefix + "ring " + i + " (hole)"));
        }
        return factory.createPolygon(shell, holes.toArray(new LinearRing[0]));
    }

    private LinearRing ring(JsonNode positions, String which) {
        if (!positions.isArray()) {
            throw place.fail(FIELD, which + " must be an array of positions, got " + Texts.shown(positions));
        }
        if (positions.size() < MIN_RING_POSITIONS) {
            throw place.fail(FIELD, which + " has " + positions.size() + " positions; a ring needs at least "
                    + MIN_RING_POSITIONS + " (three corners, then the first corner repeated to close it)");
        }
        Coordinate[] coordinates = new Coordinate[positions.size()];
        for (int i = 0; i < coordinates.length; i++) {
            coordinates[i] = position(positions.get(i), "position " + i + " of " + which, false);
        }
        Coordinate first = coordinates[0];
        Coordinate last = coordinates[coordinates.length - 1];
        if (!first.equals2D(last)) {
            throw place.fail(FIELD, which + " is not closed: its last position " + Texts.compact(positions.get(
                    coordinates.length - 1)) + " must repeat its first " + Texts.compact(positions.get(0)));
        }
        return factory.createLinearRing(coordinates);
    }

    private Coordinate position(JsonNode node, String which, boolean keepElevation) {
        if (!node.isArray() || node.size() < 2 || !node.get(0).isNumber() || !node.get(1).isNumber()
                || (keepElevation && node.size() > 2 && !node.get(2).isNumber())) {
            throw place.fail(FIELD, which + " must be an array of 2 or 3 numbers ([x, y] or [x, y, z]), got "
                    + Texts.compact(node));
        }
        double x = node.get(0).doubleValue();
        double y = node.get(1).doubleValue();
        double z = keepElevation && node.size() > 2 ? node.get(2).doubleValue() : Double.NaN;
        if (!Double.isFinite(x) || !Double.isFinite(y) || (node.size() > 2 && keepElevation && !Double.isFinite(z))) {
            throw place.fail(FIELD, which + " must hold finite numbers, got " + Texts.compact(node));
        }
        if (lonLat && !(x >= -180 && x <= 180 && y >= -90 && y <= 90)) {
            throw place.fail(FIELD, which + " " + Texts.compact(node)
                    + " is not a longitude/latitude (longitude must lie in [-180, 180], latitude in [-90, 90]);"
                    + " these look like metres; if the file is in local metres, add"
                    + " \"coordinates\": \"local-metres\" at the top level of the file");
        }
        return new Coordinate(x, y, z);
    }
}
