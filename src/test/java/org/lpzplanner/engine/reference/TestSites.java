package org.lpzplanner.engine.reference;

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

/** Small sites for the closed-form tests. */
public final class TestSites {

    private static final GeometryFactory GF = new GeometryFactory();

    private TestSites() {
    }

    /** Axis-aligned rectangle [x0, x1] × [y0, y1]. */
    public static Polygon rectangle(double x0, double y0, double x1, double y1) {
        return GF.createPolygon(new Coordinate[] {
            new Coordinate(x0, y0), new Coordinate(x1, y0), new Coordinate(x1, y1), new Coordinate(x0, y1), new Coordinate(x0, y0)
        });
    }

    /** Rods on open ground, given as (x, y, height) triples. */
    public static Site rods(double[]... xyh) {
        List<Rod> rods = new ArrayList<>();
        for (int i = 0; i < xyh.length; i++) {
            rods.add(new Rod("rod" + i, "Rod " + i, xyh[i][0], xyh[i][1], xyh[i][2]));
        }
        return new Site("rods", List.of(), List.of(), rods, List.of());
    }

    /** One flat-roofed building on the rectangle, roof at height h, no parapet. */
    public static Site building(Polygon footprint, double h) {
        return new Site("building", List.of(new Structure("b", "Building", footprint, h, new RoofShape.Flat(0))),
                List.of(), List.of(), List.of());
    }

    /** Straight horizontal conductors at height h, each from (x, y0) to (x, y1), one per x. */
    public static Site conductorsAlongY(double h, double y0, double y1, double... xs) {
        List<Conductor> cs = new ArrayList<>();
        for (int i = 0; i < xs.length; i++) {
            cs.add(new Conductor("c" + i, "Conductor " + i,
                    List.of(new Coordinate(xs[i], y0, h), new Coordinate(xs[i], y1, h)), null));
        }
        return new Site("conductors", List.of(), List.of(), List.of(), cs);
    }
}
