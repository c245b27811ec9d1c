package org.lpzplanner.engine.geom;

import org.locationtech.jts.geom.Coordinate;

/**
 * A straight wall under a footprint edge, from {@code base} up to the top edge p0→p1 (z of each end
 * is the wall top there). {@code index} numbers the walls of one owner in footprint order.
 */
public record Wall(String ownerId, String ownerName, int index, Coordinate p0, Coordinate p1, double base) {

    public double length() {
        return p0.distance(p1);
    }

    /** Wall-top elevation at fraction t ∈ [0, 1] along the wall. */
    public double topAt(double t) {
        return p0.getZ() + t * (p1.getZ() - p0.getZ());
    }
}
