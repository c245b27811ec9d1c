package org.lpzplanner.engine.exposure;

import org.locationtech.jts.geom.LineString;

/**
 * A stretch of wall a sphere reaches from the side: along {@code line} (plan), from {@code bottom}
 * (the lowest envelope height met just outside the wall) up to the wall top {@code top}.
 */
public record FacadeBand(String ownerId, String ownerName, int wallIndex, LineString line, double length,
        double bottom, double top) {

    public double bandHeight() {
        return top - bottom;
    }
}
