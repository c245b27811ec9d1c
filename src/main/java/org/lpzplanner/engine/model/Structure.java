package org.lpzplanner.engine.model;

import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.Polygonal;

/**
 * A building or other solid: a footprint (polygon or multipolygon, holes are courtyards), the
 * wall-top height above ground, and the roof form. Everything below the roof is treated as solid
 * down to the ground. Structures that overlap or touch form one solid.
 */
public record Structure(String id, String name, Geometry footprint, double height, RoofShape roof) {

    public Structure {
        if (!(footprint instanceof Polygonal)) {
            throw new IllegalArgumentException("footprint of " + id + " must be a Polygon or MultiPolygon");
        }
    }

    /** Highest point of the structure above ground. */
    public double topHeight() {
        if (roof instanceof RoofShape.Flat f) {
            return height + f.parapet();
        } else if (roof instanceof RoofShape.Gable g) {
            return g.ridgeHeight();
        } else if (roof instanceof RoofShape.Hip h) {
            return h.ridgeHeight();
        } else if (roof instanceof RoofShape.Shed s) {
            return s.highHeight();
        }
        return height;
    }
}
