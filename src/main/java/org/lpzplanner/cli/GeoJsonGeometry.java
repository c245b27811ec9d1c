package org.lpzplanner.cli;

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
 * RFC 7946 geometry objects for engine geometry in local metres, written in the site's
 * coordinates. Outer rings are written counter-clockwise and holes clockwise, as RFC 7946 asks;
 * the local plane is conformal, so orientation taken in local metres holds in lon/lat too.
 */
final class GeoJsonGeometry {

    private final SiteFrame frame;
    private final JsonNodeFactory nodes;

    GeoJsonGeometry(SiteFrame frame, JsonNodeFactory nodes) {
        this.frame = frame;
        this.nodes = nodes;
    }

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
     * The polygons of a geometry (anything else in it is dropped): a Polygon when there is exactly
     * one, a MultiPolygon otherwise.
     */
    ObjectNode polygonal(Geometry geometry) {
        List<Polygon> polygons = polygons(geometry);
        if (polygons.size() == 1) {
            ObjectNode g = geometry("Polygon");
            g.set("coordinates", rings(polygons.get(0)));
            return g;
        }
        return multiPolygon(polygons);
    }

    /** The polygons of a geometry as one MultiPolygon (possibly with no polygon). */
    ObjectNode multiPolygon(Geometry geometry) {
        return multiPolygon(polygons(geometry));
    }

    private ObjectNode multiPolygon(List<Polygon> polygons) {
        ObjectNode g = geometry("MultiPolygon");
        ArrayNode coordinates = g.putArray("coordinates");
        for (Polygon p : polygons) {
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
        boolean reverse = Orientation.isCCW(c) != counterClockwise;
        ArrayNode out = nodes.arrayNode();
        for (int k = 0; k < c.length; k++) {
            out.add(position(c[reverse ? c.length - 1 - k : k], false));
        }
        return out;
    }

    private ArrayNode position(Coordinate local, boolean withZ) {
        ArrayNode out = nodes.arrayNode();
        for (double v : frame.written(local, withZ)) {
            out.add(v);
        }
        return out;
    }

    private ObjectNode geometry(String type) {
        ObjectNode g = nodes.objectNode();
        g.put("type", type);
        return g;
    }
}
