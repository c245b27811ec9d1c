package org.lpzplanner.engine.geom;

import org.locationtech.jts.geom.Coordinate;

/** A straight 3D edge of the site's top surfaces (z = elevation above ground). */
public record RoofEdge(String ownerId, String ownerName, EdgeKind kind, Coordinate p0, Coordinate p1) {

    public double length3d() {
        return p0.distance3D(p1);
    }

    public double planLength() {
        return p0.distance(p1);
    }
}
