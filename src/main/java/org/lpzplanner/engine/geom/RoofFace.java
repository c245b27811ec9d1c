package org.lpzplanner.engine.geom;

import org.locationtech.jts.geom.Polygon;

/** One planar top surface of a structure or rooftop object: its plan polygon and its plane. */
public record RoofFace(String ownerId, String ownerName, SurfaceKind kind, int index, Polygon polygon, Plane plane) {

    /** Label used in summaries, e.g. "North hall roof 2". */
    public String label() {
        return ownerName + (kind == SurfaceKind.ROOF ? " roof " : " top ") + (index + 1);
    }
}
