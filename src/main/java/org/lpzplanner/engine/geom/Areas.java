package org.lpzplanner.engine.geom;

import java.util.ArrayList;
import java.util.List;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.MultiPolygon;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.geom.util.PolygonExtracter;

/** The areas of an overlay result, which may also hold the lines and points where areas touch. */
public final class Areas {

    private Areas() {
    }

    /** The polygons of {@code g}: g itself when it is polygonal, else a MultiPolygon of its polygons. */
    public static Geometry of(Geometry g, GeometryFactory gf) {
        if (g instanceof Polygon || g instanceof MultiPolygon) {
            return g;
        }
        List<Polygon> polygons = new ArrayList<>();
        PolygonExtracter.getPolygons(g, polygons);
        return gf.createMultiPolygon(polygons.toArray(Polygon[]::new));
    }
}
