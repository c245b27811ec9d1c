package org.lpzplanner.engine.design;

import java.util.ArrayList;
import java.util.List;
import org.locationtech.jts.algorithm.Distance;
import org.locationtech.jts.algorithm.RayCrossingCounter;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.Location;
import org.locationtech.jts.geom.Polygon;

/**
 * What a separation distance is measured to: a metal installation's point, or a rooftop object as
 * the solid over its footprint from its base to its top. The distance is exact (no sampling of the
 * outline) and, like any distance to a fixed set, changes by at most the distance the other point
 * moves. Immutable and thread-safe.
 */
final class InstallationShape {

    private final Coordinate point;
    /** Per polygon of the footprint: its shell, then its holes. */
    private final List<List<Coordinate[]>> polygons = new ArrayList<>();
    private final double base;
    private final double top;

    private InstallationShape(Coordinate point, Geometry footprint, double base, double top) {
        this.point = point;
        this.base = base;
        this.top = top;
        if (footprint != null) {
            for (int k = 0; k < footprint.getNumGeometries(); k++) {
                Polygon p = (Polygon) footprint.getGeometryN(k);
                List<Coordinate[]> rings = new ArrayList<>();
                rings.add(p.getExteriorRing().getCoordinates());
                for (int h = 0; h < p.getNumInteriorRing(); h++) {
                    rings.add(p.getInteriorRingN(h).getCoordinates());
                }
                polygons.add(rings);
            }
        }
    }

    /** A point (z above ground). */
    static InstallationShape point(Coordinate point) {
        return new InstallationShape(point, null, point.getZ(), point.getZ());
    }

    /** The solid over a footprint (polygon or multipolygon) from {@code base} to {@code top} metres above ground. */
    static InstallationShape solid(Geometry footprint, double base, double top) {
        return new InstallationShape(null, footprint, base, Math.max(base, top));
    }

    /** The point of the shape nearest p (3D). */
    Coordinate nearestTo(Coordinate p) {
        if (point != null) {
            return point;
        }
        double z = Math.max(base, Math.min(top, p.getZ()));
        if (inside(p)) {
            return new Coordinate(p.x, p.y, z);
        }
        Coordinate best = null;
        double least = Double.POSITIVE_INFINITY;
        for (List<Coordinate[]> rings : polygons) {
            for (Coordinate[] ring : rings) {
                for (int i = 1; i < ring.length; i++) {
                    double d = Distance.pointToSegment(p, ring[i - 1], ring[i]);
                    if (d < least) {
                        least = d;
                        best = onSegment(p, ring[i - 1], ring[i]);
                    }
                }
            }
        }
        return new Coordinate(best.x, best.y, z);
    }

    double distanceTo(Coordinate p) {
        return nearestTo(p).distance3D(p);
    }

    /** True when p lies in the footprint in plan (boundary included). */
    private boolean inside(Coordinate p) {
        for (List<Coordinate[]> rings : polygons) {
            if (RayCrossingCounter.locatePointInRing(p, rings.get(0)) != Location.EXTERIOR) {
                boolean inHole = false;
                for (Coordinate[] hole : rings.subList(1, rings.size())) {
                    inHole |= RayCrossingCounter.locatePointInRing(p, hole) == Location.INTERIOR;
                }
                if (!inHole) {
                    return true;
                }
            }
        }
        return false;
    }

    private static Coordinate onSegment(Coordinate p, Coordinate a, Coordinate b) {
        double vx = b.x - a.x, vy = b.y - a.y, len2 = vx * vx + vy * vy;
        double t = len2 == 0 ? 0 : Math.max(0, Math.min(1, ((p.x - a.x) * vx + (p.y - a.y) * vy) / len2));
        return new Coordinate(a.x + t * vx, a.y + t * vy);
    }
}
