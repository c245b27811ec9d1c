package org.lpzplanner.engine.design;

import java.util.Set;
import org.locationtech.jts.geom.Coordinate;
import org.lpzplanner.engine.geom.SiteSurface;
import org.lpzplanner.engine.geom.Wall;

/**
 * Where a down-conductor leaves the air-termination: the top of the structure's wall at the
 * down-conductor's position.
 *
 * <p>The position is projected in plan onto the nearest wall of a structure (walls of rooftop
 * objects do not count). The top there is the wall top the site model gives: the parapet's top on
 * a flat roof with a parapet, the eaves on the long sides of a pitched roof, the roof's height at
 * that point of a gable end (the verge rises to the ridge). Where a roof conductor (a leg at most
 * {@value #ROOF_CONDUCTOR_RISE} m above what it stands on at both ends) passes within
 * {@value #CONDUCTOR_REACH} m in plan of that point and higher, the down-conductor starts at the
 * conductor *[ours]*. Stateless and thread-safe.
 */
public final class DownConductorTops {

    /** Highest a leg may run above the surface under both its ends and still count as a roof conductor, metres. */
    public static final double ROOF_CONDUCTOR_RISE = 1.5;

    /** How near in plan a roof conductor must pass to be where a down-conductor starts, metres. */
    public static final double CONDUCTOR_REACH = 0.5;

    private DownConductorTops() {
    }

    /**
     * The top of a down-conductor at a plan position: its point on the nearest structure wall,
     * z = the air-termination level there (metres above ground); null when the site has no
     * structure walls.
     */
    public static Coordinate top(SiteSurface surface, Set<String> structureIds, Coordinate position) {
        double best = Double.POSITIVE_INFINITY;
        for (Wall w : surface.walls()) {
            if (structureIds.contains(w.ownerId())) {
                best = Math.min(best, planDistance(w.p0(), w.p1(), position));
            }
        }
        if (best == Double.POSITIVE_INFINITY) {
            return null;
        }
        // at a corner two walls are equally near: the higher top there is where the conductor starts
        Coordinate top = null;
        for (Wall w : surface.walls()) {
            if (structureIds.contains(w.ownerId()) && planDistance(w.p0(), w.p1(), position) <= best + 1e-6) {
                double t = along(w.p0(), w.p1(), position);
                Coordinate p = new Coordinate(w.p0().x + t * (w.p1().x - w.p0().x), w.p0().y + t * (w.p1().y - w.p0().y),
                        w.topAt(t));
                if (top == null || p.getZ() > top.getZ()) {
                    top = p;
                }
            }
        }
        double z = top.getZ();
        for (SiteSurface.PlacedConductor c : surface.conductors()) {
            for (int i = 1; i < c.path().size(); i++) {
                Coordinate a = c.path().get(i - 1), b = c.path().get(i);
                if (!isRoofLeg(surface, a, b) || planDistance(a, b, top) > CONDUCTOR_REACH) {
                    continue;
                }
                double t = along(a, b, top);
                z = Math.max(z, a.getZ() + t * (b.getZ() - a.getZ()));
            }
        }
        return new Coordinate(top.x, top.y, z);
    }

    /** True when both ends of the leg are at most {@value #ROOF_CONDUCTOR_RISE} m above what they stand on. */
    public static boolean isRoofLeg(SiteSurface surface, Coordinate a, Coordinate b) {
        return a.getZ() - surface.standHeight(a.x, a.y) <= ROOF_CONDUCTOR_RISE
                && b.getZ() - surface.standHeight(b.x, b.y) <= ROOF_CONDUCTOR_RISE;
    }

    /** Fraction along a→b (plan) of the point nearest p, in [0, 1]. */
    static double along(Coordinate a, Coordinate b, Coordinate p) {
        double vx = b.x - a.x, vy = b.y - a.y, len2 = vx * vx + vy * vy;
        return len2 == 0 ? 0 : Math.max(0, Math.min(1, ((p.x - a.x) * vx + (p.y - a.y) * vy) / len2));
    }

    static double planDistance(Coordinate a, Coordinate b, Coordinate p) {
        double t = along(a, b, p);
        return Math.hypot(p.x - (a.x + t * (b.x - a.x)), p.y - (a.y + t * (b.y - a.y)));
    }
}
