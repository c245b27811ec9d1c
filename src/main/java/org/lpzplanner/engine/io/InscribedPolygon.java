package org.lpzplanner.engine.io;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Polygon;

/**
 * Circles as regular polygons inscribed in them: every vertex lies on the circle, so the polygon
 * never claims space the real object does not occupy, and its area is n/2·r²·sin(2π/n).
 */
final class InscribedPolygon {

    private InscribedPolygon() {}

    /**
     * @param vertices number of corners, at least 3; the first lies due east of the centre and the
     *                 ring runs counter-clockwise
     */
    static Polygon of(GeometryFactory factory, Coordinate centre, double radius, int vertices) {
        if (vertices < 3 || !(radius > 0)) {
            throw new IllegalArgumentException("need at least 3 vertices and a positive radius");
        }
        Coordinate[] ring = new Coordinate[vertices + 1];
        for (int i = 0; i < vertices; i++) {
            double angle = 2 * Math.PI * i / vertices;
            ring[i] = new Coordinate(centre.x + radius * Math.cos(angle), centre.y + radius * Math.sin(angle));
        }
        ring[vertices] = ring[0].copy();
        return factory.createPolygon(ring);
    }
}
