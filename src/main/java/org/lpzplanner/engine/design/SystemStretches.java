package org.lpzplanner.engine.design;

import java.util.ArrayList;
import java.util.List;
import org.locationtech.jts.geom.Coordinate;

/**
 * The protection system as straight stretches along which l is known at every point: the drawn
 * pieces of {@link BondingRoutes} (rods foot to tip, conductor legs) and the down-conductors (top
 * straight down to the bonding level). Stretch i runs from {@link #at}(i, 0) to {@link #at}(i, 1);
 * on every stretch l and the distance to any fixed point change by at most the distance moved,
 * and k<sub>c</sub> is the same at every point (it belongs to the drawn group the stretch lies in).
 * Immutable; thread-safe as its {@link BondingRoutes}.
 */
final class SystemStretches {

    private final BondingRoutes routes;
    private final List<BondingRoutes.Piece> pieces;
    private final List<BondingRoutes.DownRun> runs;
    private final List<Coordinate[]> ends = new ArrayList<>();

    SystemStretches(BondingRoutes routes) {
        this.routes = routes;
        this.pieces = routes.pieces();
        this.runs = routes.downRuns();
        for (BondingRoutes.Piece p : pieces) {
            ends.add(new Coordinate[] {p.a(), p.b()});
        }
        for (BondingRoutes.DownRun d : runs) {
            ends.add(new Coordinate[] {d.top(), new Coordinate(d.top().x, d.top().y, d.bottom())});
        }
    }

    int size() {
        return ends.size();
    }

    /** 3D length of stretch i, metres. */
    double length(int i) {
        return ends.get(i)[0].distance3D(ends.get(i)[1]);
    }

    /** The point at fraction t ∈ [0, 1] along stretch i. */
    Coordinate at(int i, double t) {
        Coordinate a = ends.get(i)[0], b = ends.get(i)[1];
        return new Coordinate(a.x + t * (b.x - a.x), a.y + t * (b.y - a.y), a.getZ() + t * (b.getZ() - a.getZ()));
    }

    /** The route of l from the point at fraction t along stretch i. */
    BondingRoutes.Route route(int i, double t) {
        if (i < pieces.size()) {
            return routes.at(i, t);
        }
        return routes.down(i - pieces.size(), at(i, t).getZ());
    }

    /** The part stretch i belongs to: a rod's or conductor's id, or a down-conductor's label. */
    String partId(int i) {
        return i < pieces.size() ? pieces.get(i).partId() : runs.get(i - pieces.size()).label();
    }
}
