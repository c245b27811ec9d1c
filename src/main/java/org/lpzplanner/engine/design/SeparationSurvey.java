package org.lpzplanner.engine.design;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.locationtech.jts.densify.Densifier;
import org.locationtech.jts.geom.Coordinate;
import org.lpzplanner.engine.design.SeparationDistance.Material;
import org.lpzplanner.engine.geom.SiteSurface;
import org.lpzplanner.engine.geom.Wall;
import org.lpzplanner.engine.model.ProtectionLevel;
import org.lpzplanner.engine.model.RooftopObject;
import org.lpzplanner.engine.model.Site;

/**
 * Separation distance checks of a site [IEC 62305-3:2010 6.3]: every rooftop object (in air) and
 * every metal installation a designer marked, against the nearest point of the air-termination.
 *
 * <p>The nearest point is found in 3D on rods (foot to tip) and conductor legs; a rooftop object
 * is its outline (sampled every {@value #OUTLINE_STEP} m) from its base to its top, so a rod beside
 * its wall is measured level with it. l runs from that point along the air-termination and down
 * the down-conductor to the bonding level ({@link BondingRoutes}); k<sub>c</sub> follows the number
 * of down-conductors of the structure that route takes. A check passes when the actual distance is
 * at least s and l was found along drawn parts (or down a mast); where the route assumes a straight
 * link across the roof, or reaches no down-conductor, l is a lower bound and the check can fail but
 * not pass ("not confirmed" when the distance clears that lower bound). An object that a part touches is connected to the
 * air-termination: no clearance to check, and no pass either (it must be fit to carry the current).
 * Stateless and thread-safe.
 */
public final class SeparationSurvey {

    /** Spacing of the sample points along a rooftop object's outline, metres. */
    public static final double OUTLINE_STEP = 0.25;

    /** Closer than this, metres, a part touches the object. */
    static final double TOUCHING = 1e-3;

    private SeparationSurvey() {
    }

    /** A metal installation the designer marked: a point (z above ground) and what lies between it and the LPS. */
    public record Installation(String name, Coordinate point, Material material) {
    }

    /**
     * One check.
     *
     * @param kind         "rooftop object" or "metal installation"
     * @param installation the object's or installation's point nearest the air-termination
     * @param lpsPoint     the nearest point of the air-termination
     * @param partId       the part that point lies on
     * @param route        how l was found
     * @param result       s, the actual distance and l
     * @param connected    true when a part touches the object (no clearance)
     */
    public record Check(String kind, String name, Material material, Coordinate installation, Coordinate lpsPoint,
            String partId, BondingRoutes.Route route, SeparationDistance.Result result, boolean connected) {

        public boolean passes() {
            // an assumed straight link across the roof is the shortest a route can be: with it, l and
            // s are lower bounds, enough to fail a check but never to pass one
            return !connected && (route.basis() == BondingRoutes.Basis.DRAWN
                    || route.basis() == BondingRoutes.Basis.GROUNDED_PART) && result.passes();
        }
    }

    /**
     * @param downConductors every down-conductor of the site with its structure and that structure's count
     * @param bondingLevel   height of the equipotential bonding above ground, metres (0 for ground level)
     * @return the checks, rooftop objects first; none when the site has no air-termination
     */
    public static List<Check> survey(Site site, SiteSurface surface, ProtectionLevel level,
            List<BondingRoutes.DownConductor> downConductors, List<Installation> installations, double bondingLevel) {
        Set<String> structures = new HashSet<>();
        site.structures().forEach(s -> structures.add(s.id()));
        BondingRoutes routes = new BondingRoutes(surface, structures, downConductors, bondingLevel);
        List<BondingRoutes.Piece> pieces = routes.pieces();
        List<Check> out = new ArrayList<>();
        if (pieces.isEmpty()) {
            return out;
        }
        for (RooftopObject o : site.rooftopObjects()) {
            double base = o.top();
            for (Wall w : surface.walls()) {
                if (w.ownerId().equals(o.id())) {
                    base = Math.min(base, w.base());
                }
            }
            Nearest best = null;
            for (Coordinate c : Densifier.densify(o.footprint().getExteriorRing(), OUTLINE_STEP).getCoordinates()) {
                Coordinate bottom = new Coordinate(c.x, c.y, base), top = new Coordinate(c.x, c.y, o.top());
                for (int i = 0; i < pieces.size(); i++) {
                    Coordinate[] pq = closest(bottom, top, pieces.get(i).a(), pieces.get(i).b());
                    double d = pq[0].distance3D(pq[1]);
                    if (best == null || d < best.distance) {
                        best = new Nearest(pq[0], pq[1], i, d);
                    }
                }
            }
            boolean touching = best.distance < TOUCHING || touches(o, pieces);
            out.add(check(routes, level, "rooftop object", o.name() == null || o.name().isBlank() ? o.id() : o.name(),
                    Material.AIR, best, touching));
        }
        for (Installation m : installations) {
            Nearest best = null;
            for (int i = 0; i < pieces.size(); i++) {
                Coordinate[] pq = closest(m.point(), m.point(), pieces.get(i).a(), pieces.get(i).b());
                double d = pq[0].distance3D(pq[1]);
                if (best == null || d < best.distance) {
                    best = new Nearest(m.point(), pq[1], i, d);
                }
            }
            out.add(check(routes, level, "metal installation", m.name(), m.material(), best, best.distance < TOUCHING));
        }
        return out;
    }

    private record Nearest(Coordinate installation, Coordinate lps, int piece, double distance) {
    }

    private static Check check(BondingRoutes routes, ProtectionLevel level, String kind, String name, Material material,
            Nearest n, boolean connected) {
        BondingRoutes.Route route = routes.from(n.piece(), n.lps());
        Double length = route.basis() == BondingRoutes.Basis.NONE ? null : route.length();
        SeparationDistance.Result r = SeparationDistance.check(level, route.downConductors(), material, n.installation(),
                n.lps(), length);
        return new Check(kind, name, material, n.installation(), n.lps(), routes.pieces().get(n.piece()).partId(), route,
                r, connected);
    }

    /** True when a piece stands on the object: its lower end inside the footprint at the object's top. */
    private static boolean touches(RooftopObject o, List<BondingRoutes.Piece> pieces) {
        var gf = o.footprint().getFactory();
        for (BondingRoutes.Piece p : pieces) {
            for (Coordinate c : new Coordinate[] {p.a(), p.b()}) {
                if (Math.abs(c.getZ() - o.top()) < 0.05 && o.footprint().covers(gf.createPoint(new Coordinate(c.x, c.y)))) {
                    return true;
                }
            }
        }
        return false;
    }

    /**
     * Closest points of segments p1→q1 and p2→q2 in 3D (Ericson, Real-Time Collision Detection,
     * 5.1.9): [point on the first, point on the second].
     */
    static Coordinate[] closest(Coordinate p1, Coordinate q1, Coordinate p2, Coordinate q2) {
        double[] d1 = sub(q1, p1), d2 = sub(q2, p2), r = sub(p1, p2);
        double a = dot(d1, d1), e = dot(d2, d2), f = dot(d2, r);
        double s, t;
        if (a <= 1e-12 && e <= 1e-12) {
            s = 0;
            t = 0;
        } else if (a <= 1e-12) {
            s = 0;
            t = clamp(f / e);
        } else {
            double c = dot(d1, r);
            if (e <= 1e-12) {
                t = 0;
                s = clamp(-c / a);
            } else {
                double b = dot(d1, d2), denom = a * e - b * b;
                if (denom <= 1e-9 * a * e) {
                    return parallel(p1, q1, p2, q2);
                }
                s = clamp((b * f - c * e) / denom);
                t = (b * s + f) / e;
                if (t < 0) {
                    t = 0;
                    s = clamp(-c / a);
                } else if (t > 1) {
                    t = 1;
                    s = clamp((b - c) / a);
                }
            }
        }
        return new Coordinate[] {at(p1, d1, s), at(p2, d2, t)};
    }

    /**
     * Parallel segments are equally near along their overlap: of the ends of the overlap, the one
     * highest on the second segment (the air-termination), whose route down is the longest.
     */
    private static Coordinate[] parallel(Coordinate p1, Coordinate q1, Coordinate p2, Coordinate q2) {
        List<Coordinate[]> pairs = new ArrayList<>();
        for (Coordinate c : new Coordinate[] {p1, q1}) {
            pairs.add(new Coordinate[] {c, at(p2, sub(q2, p2), parameter(p2, q2, c))});
        }
        for (Coordinate c : new Coordinate[] {p2, q2}) {
            pairs.add(new Coordinate[] {at(p1, sub(q1, p1), parameter(p1, q1, c)), c});
        }
        double least = Double.POSITIVE_INFINITY;
        for (Coordinate[] pq : pairs) {
            least = Math.min(least, pq[0].distance3D(pq[1]));
        }
        Coordinate[] best = null;
        for (Coordinate[] pq : pairs) {
            if (pq[0].distance3D(pq[1]) <= least + 1e-6 && (best == null || pq[1].getZ() > best[1].getZ())) {
                best = pq;
            }
        }
        return best;
    }

    private static double parameter(Coordinate a, Coordinate b, Coordinate p) {
        double[] d = sub(b, a), r = sub(p, a);
        double len2 = dot(d, d);
        return len2 == 0 ? 0 : clamp(dot(r, d) / len2);
    }

    private static double clamp(double v) {
        return Math.max(0, Math.min(1, v));
    }

    private static double[] sub(Coordinate a, Coordinate b) {
        return new double[] {a.x - b.x, a.y - b.y, a.getZ() - b.getZ()};
    }

    private static double dot(double[] u, double[] v) {
        return u[0] * v[0] + u[1] * v[1] + u[2] * v[2];
    }

    private static Coordinate at(Coordinate p, double[] d, double s) {
        return new Coordinate(p.x + s * d[0], p.y + s * d[1], p.getZ() + s * d[2]);
    }
}
