package org.lpzplanner.engine.exposure;

import java.util.ArrayList;
import java.util.List;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.operation.union.CascadedPolygonUnion;
import org.lpzplanner.engine.envelope.Grid;

/**
 * Turns a set of marked grid cells into polygons: runs along rows, runs stacked into rectangles,
 * rectangles unioned.
 */
final class CellRegions {

    private final Grid grid;
    private final GeometryFactory gf;

    CellRegions(Grid grid, GeometryFactory gf) {
        this.grid = grid;
        this.gf = gf;
    }

    /** The union of the marked cells within [i0, i1] × [j0, j1]; marks indexed j * nx + i. */
    Geometry union(boolean[] marked, int i0, int j0, int i1, int j1) {
        int nx = grid.nx();
        List<Polygon> rects = new ArrayList<>();
        // open rectangles keyed by run (start, end) from the previous row
        java.util.Map<Long, int[]> open = new java.util.HashMap<>();
        for (int j = j0; j <= j1 + 1; j++) {
            java.util.Map<Long, int[]> next = new java.util.HashMap<>();
            if (j <= j1) {
                int i = i0;
                while (i <= i1) {
                    if (!marked[j * nx + i]) {
                        i++;
                        continue;
                    }
                    int s = i;
                    while (i <= i1 && marked[j * nx + i]) {
                        i++;
                    }
                    long key = ((long) s << 32) | (i - 1);
                    int[] rect = open.remove(key);
                    next.put(key, rect != null ? rect : new int[] {s, j, i - 1});
                }
            }
            for (int[] r : open.values()) {
                rects.add(rectangle(r[0], r[1], r[2], j - 1));
            }
            open = next;
        }
        if (rects.isEmpty()) {
            return gf.createPolygon();
        }
        return CascadedPolygonUnion.union(rects);
    }

    private Polygon rectangle(int i0, int j0, int i1, int j1) {
        double x0 = grid.x0() + i0 * grid.h(), x1 = grid.x0() + (i1 + 1) * grid.h();
        double y0 = grid.y0() + j0 * grid.h(), y1 = grid.y0() + (j1 + 1) * grid.h();
        return gf.createPolygon(new org.locationtech.jts.geom.Coordinate[] {
            new org.locationtech.jts.geom.Coordinate(x0, y0), new org.locationtech.jts.geom.Coordinate(x1, y0),
            new org.locationtech.jts.geom.Coordinate(x1, y1), new org.locationtech.jts.geom.Coordinate(x0, y1),
            new org.locationtech.jts.geom.Coordinate(x0, y0)});
    }
}
