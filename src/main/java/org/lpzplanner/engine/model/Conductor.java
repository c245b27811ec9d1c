package org.lpzplanner.engine.model;

import java.util.List;
import org.locationtech.jts.geom.Coordinate;

/**
 * An air-termination conductor as a 3D polyline: roof-edge or ridge conductor, a mesh line, or a
 * catenary wire. Either every vertex carries its elevation above ground (z), or the conductor
 * follows the surface below at {@code heightAboveRoof} metres (evaluated at each vertex).
 */
public record Conductor(String id, String name, List<Coordinate> path, Double heightAboveRoof) {

    /** Most vertices of one conductor, in a file and through the app alike. */
    public static final int MAX_POINTS = 500;

    public Conductor {
        path = List.copyOf(path);
        if (path.size() < 2) {
            throw new IllegalArgumentException("conductor " + id + " needs at least two vertices");
        }
    }

    public boolean followsSurface() {
        return heightAboveRoof != null;
    }
}
