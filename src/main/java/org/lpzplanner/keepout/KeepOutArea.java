package org.lpzplanner.keepout;

import java.time.Instant;
import java.util.List;

/**
 * A keep-out area stored for a site: a roof area where no air-termination may stand (a skylight, a
 * walkway, plant access, solar panels).
 *
 * @param corners the outline in local metres, [x, y] in order round the area, the ring not closed
 * @param area    plan area in square metres
 */
public record KeepOutArea(long id, long siteId, String name, List<double[]> corners, double area,
        Instant createdAt) {

    public KeepOutArea {
        corners = List.copyOf(corners);
    }
}
