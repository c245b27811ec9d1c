package org.lpzplanner.engine.geom;

import java.util.ArrayList;
import java.util.List;
import org.locationtech.jts.geom.Coordinate;
import org.lpzplanner.engine.model.Conductor;

/**
 * Places a conductor on a site's surface.
 *
 * <p>A conductor given as a height above the roof is fixed to the surface it crosses: each leg is
 * split wherever the surface beneath changes ({@link SurfaceProfile}), runs at that height over each
 * face, and goes straight up or down where the surface steps (down the wall of a higher roof, over a
 * parapet, down to the ground). A conductor given with elevations keeps its straight legs, split at
 * the same places so that each piece knows its clearance above the solid beneath it. A vertex within
 * {@link SiteSurface#PARAPET_SNAP} of a parapet's line is placed on that line.
 *
 * <p>Stateless and thread-safe.
 */
final class ConductorPlacement {

    /** Points closer than this (metres) are one. */
    private static final double SAME = 1e-9;

    private ConductorPlacement() {
    }

    /** A point of the placed path with the solid's top beneath it: left limit, value at the point, right limit. */
    private record Station(double x, double y, double z, double below, double at, double beyond) {
    }

    static SiteSurface.PlacedConductor place(SiteSurface surface, Conductor c) {
        List<Coordinate> given = new ArrayList<>();
        for (Coordinate p : c.path()) {
            Coordinate on = surface.onParapet(p.x, p.y);
            given.add(on == null ? new Coordinate(p.x, p.y, p.getZ()) : new Coordinate(on.x, on.y, p.getZ()));
        }
        List<Station> stations = new ArrayList<>();
        for (int i = 1; i < given.size(); i++) {
            Coordinate a = given.get(i - 1), b = given.get(i);
            SurfaceProfile profile = surface.profile(a.x, a.y, b.x, b.y);
            int n = profile.size();
            for (int k = 0; k < n; k++) {
                double t = profile.t(k);
                double x = a.x + t * (b.x - a.x), y = a.y + t * (b.y - a.y);
                double below = profile.before(k), at = profile.at(k), beyond = profile.after(k);
                if (c.followsSurface()) {
                    double h = c.heightAboveRoof();
                    if (k > 0) {
                        add(stations, new Station(x, y, below + h, below, at, beyond));
                    }
                    add(stations, new Station(x, y, at + h, below, at, beyond));
                    if (k < n - 1) {
                        add(stations, new Station(x, y, beyond + h, below, at, beyond));
                    }
                } else {
                    add(stations, new Station(x, y, a.getZ() + t * (b.getZ() - a.getZ()), below, at, beyond));
                }
            }
        }
        List<Coordinate> path = new ArrayList<>();
        List<SiteSurface.Clearance> clearances = new ArrayList<>();
        for (int i = 0; i < stations.size(); i++) {
            Station q = stations.get(i);
            path.add(new Coordinate(q.x, q.y, q.z));
            if (i > 0) {
                Station p = stations.get(i - 1);
                boolean vertical = Math.abs(p.x - q.x) <= SAME && Math.abs(p.y - q.y) <= SAME;
                clearances.add(vertical ? new SiteSurface.Clearance(p.z - q.at, q.z - q.at)
                        : new SiteSurface.Clearance(p.z - p.beyond, q.z - q.below));
            }
        }
        if (path.size() == 1) {
            // every vertex at one place: a point conductor, kept as a leg of length zero
            Station p = stations.get(0);
            path.add(new Coordinate(p.x, p.y, p.z));
            clearances.add(new SiteSurface.Clearance(p.z - p.at, p.z - p.at));
        }
        return new SiteSurface.PlacedConductor(c, path, clearances);
    }

    /**
     * Appends the station, merging it with the last one when they are the same point (a vertex
     * shared by two legs): the merged station keeps the left limit of the first and the right
     * limit of the second.
     */
    private static void add(List<Station> stations, Station s) {
        if (!stations.isEmpty()) {
            Station last = stations.get(stations.size() - 1);
            if (Math.abs(last.x - s.x) <= SAME && Math.abs(last.y - s.y) <= SAME && Math.abs(last.z - s.z) <= SAME) {
                stations.set(stations.size() - 1, new Station(last.x, last.y, last.z, last.below, last.at, s.beyond));
                return;
            }
        }
        stations.add(s);
    }
}
