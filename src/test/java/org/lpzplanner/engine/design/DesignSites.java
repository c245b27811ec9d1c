package org.lpzplanner.engine.design;

import java.util.ArrayList;
import java.util.List;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Polygon;
import org.lpzplanner.engine.model.Conductor;
import org.lpzplanner.engine.model.RoofShape;
import org.lpzplanner.engine.model.Rod;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.Structure;

/** Small sites for the design-check tests. */
final class DesignSites {

    private static final GeometryFactory GF = new GeometryFactory();

    private DesignSites() {
    }

    /** Polygon through the given (x, y) pairs, closed automatically. */
    static Polygon polygon(double... xy) {
        Coordinate[] cs = new Coordinate[xy.length / 2 + 1];
        for (int i = 0; i < xy.length / 2; i++) {
            cs[i] = new Coordinate(xy[2 * i], xy[2 * i + 1]);
        }
        cs[cs.length - 1] = cs[0].copy();
        return GF.createPolygon(cs);
    }

    static Polygon rectangle(double x0, double y0, double x1, double y1) {
        return polygon(x0, y0, x1, y0, x1, y1, x0, y1);
    }

    static Structure flatBuilding(Polygon footprint, double height) {
        return new Structure("b", "Hall", footprint, height, new RoofShape.Flat(0));
    }

    static Site site(Structure structure, List<Rod> rods, List<Conductor> conductors) {
        return new Site("test", List.of(structure), List.of(), rods, conductors);
    }

    /** A conductor laid {@code rise} metres above the roof through the given (x, y) pairs. */
    static Conductor onRoof(String id, double rise, double... xy) {
        List<Coordinate> path = new ArrayList<>();
        for (int i = 0; i < xy.length / 2; i++) {
            path.add(new Coordinate(xy[2 * i], xy[2 * i + 1]));
        }
        return new Conductor(id, id, path, rise);
    }
}
