package org.lpzplanner.analysis;

import java.util.ArrayList;
import java.util.List;
import org.locationtech.jts.algorithm.Orientation;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.LinearRing;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.geom.util.PolygonExtracter;
import tools.jackson.databind.node.ArrayNode;
import tools.jackson.databind.node.JsonNodeFactory;
import tools.jackson.databind.node.ObjectNode;

/**
 * RFC 7946 geometry objects for engine geometry in local metres, positions rounded to the
 * centimetre. Outer rings are written counter-clockwise and holes clockwise, as RFC 7946 asks; the
 * local plane is conformal, so the orientation holds when positions are later turned into lon/lat
 * (see {@link ResultGeoJson#published}). A third value is the elevation above ground in metres.
 */
final class GeoJsonGeometry {

    private final JsonNodeFactory nodes = JsonNodeFactory.instance;

    /** A Point; with z, the elevation above ground is the third value. */
    ObjectNode point(Coordinate c, boolean withZ) {
        ObjectNode g = geometry("Point");
        g.set("coordinates", position(c, withZ));
        return g;
    }

    /** A LineString through the given local positions. */
    ObjectNode lineString(List<Coordinate> path, boolean withZ) {
        ObjectNode g = geometry("LineString");
        ArrayNode coordinates = g.putArray("coordinates");
        for (Coordinate c : path) {
            coordinates.add(position(c, withZ));
        }
        return g;
    }

    /** A LineString of a JTS line. */
    ObjectNode lineString(LineString line, boolean withZ) {
        return lineString(List.of(line.getCoordinates()), withZ);
    }

    /**
     * Lines of a geometry (a LineString or MultiLineString; anything else in it is dropped) as one
     * MultiLineString; lines of fewer than two positions are left out (RFC 7946 3.1.5).
     */
    ObjectNode multiLineString(Geometry geometry, boolean withZ) {
        ObjectNode g = geometry("MultiLineString");
        ArrayNode coordinates = g.putArray("coordinates");
        for (int k = 0; k < geometry.getNumGeometries(); k++) {
            if (geometry.getGeometryN(k) instanceof LineString line && line.getNumPoints() >= 2) {
                ArrayNode positions = coordinates.addArray();
                for (Coordinate c : line.getCoordinates()) {
                    positions.add(position(c, withZ));
                }
            }
        }
        return g;
    }

    /** The polygons of a geometry (anything else in it is dropped) as one MultiPolygon. */
    ObjectNode multiPolygon(Geometry geometry) {
        ObjectNode g = geometry("MultiPolygon");
        ArrayNode coordinates = g.putArray("coordinates");
        for (Polygon p : polygons(geometry)) {
            coordinates.add(rings(p));
        }
        return g;
    }

    @SuppressWarnings("unchecked")
    private static List<Polygon> polygons(Geometry geometry) {
        List<Polygon> out = new ArrayList<>();
        for (Polygon p : (List<Polygon>) PolygonExtracter.getPolygons(geometry)) {
            if (!p.isEmpty()) {
                out.add(p);
            }
        }
        return out;
    }

    private ArrayNode rings(Polygon polygon) {
        ArrayNode rings = nodes.arrayNode();
        rings.add(ring(polygon.getExteriorRing(), true));
        for (int k = 0; k < polygon.getNumInteriorRing(); k++) {
            rings.add(ring(polygon.getInteriorRingN(k), false));
        }
        return rings;
    }

    private ArrayNode ring(LinearRing ring, boolean counterClockwise) {
        Coordinate[] c = ring.getCoordinates();
        boolean reverse = c.length >= 4 && Orientation.isCCW(c) != counterClockwise;
        ArrayNode out = nodes.arrayNode();
        for (int k = 0; k < c.length; k++) {
            out.add(position(c[reverse ? c.length - 1 - k : k], false));
        }
        return out;
    }

    private ArrayNode position(Coordinate local, boolean withZ) {
        ArrayNode out = nodes.arrayNode();
        out.add(ResultGeoJson.round(local.x));
        out.add(ResultGeoJson.round(local.y));
        if (withZ && !Double.isNaN(local.getZ())) {
            out.add(ResultGeoJson.round(local.getZ()));
        }
        return out;
    }

    private ObjectNode geometry(String type) {
        ObjectNode g = nodes.objectNode();
        g.put("type", type);
        return g;
    }
}
