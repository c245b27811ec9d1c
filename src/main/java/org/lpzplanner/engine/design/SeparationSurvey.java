package org.lpzplanner.engine.design;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.stream.IntStream;
import org.locationtech.jts.geom.Coordinate;
import org.lpzplanner.engine.design.SeparationDistance.Material;
import org.lpzplanner.engine.geom.SiteSurface;
import org.lpzplanner.engine.geom.Wall;
import org.lpzplanner.engine.model.ProtectionLevel;
import org.lpzplanner.engine.model.RooftopObject;
import org.lpzplanner.engine.model.Site;

/**
 * Separation distance checks of a site [IEC 62305-3:2010 6.3]: every rooftop object (in air) and
 * every metal installation a designer marked, against every point of the protection system.
 *
 * <p><b>Every point.</b> s = k<sub>i</sub>·(k<sub>c</sub>/k<sub>m</sub>)·l must hold at every point
 * of the system, each with its own l. The system is the drawn rods (foot to tip), conductor legs
 * and the down-conductors (from the top down to the bonding level); l and k<sub>c</sub> at each
 * point come from {@link BondingRoutes}. A rooftop object is the solid from its base (the roof under
 * it) to its top over its footprint; a metal installation is its point. The check reports the
 * <em>worst</em> point, where distance − s is least, with its l and s: along a roof conductor that
 * is usually not the nearest point but the one farthest along the conductors from a down-conductor.
 *
 * <p><b>Tolerance.</b> {@link LeastMarginSearch} finds the least margin by halving the stretches of
 * the system where it could lie: the reported worst margin is at most {@value #TOLERANCE} m above
 * the true least, and a check passes only when the search shows the true least is not below zero.
 * A check whose worst margin lies within that tolerance above zero therefore fails (errs toward
 * "fails").
 *
 * <p><b>Lower bounds.</b> Where a part has no drawn route to a down-conductor (a straight link
 * across the roof is assumed, or none is reachable), its l and s are lower bounds: the check can
 * fail on such a point, never pass. A check passes only when it clears at every point and every
 * point's l rests on drawn parts (or a part standing on the ground); otherwise, when it clears,
 * it is "not confirmed" and names the lower-bound point that came nearest to failing
 * ({@link Check#unconfirmed()}). A down-conductor that no drawn part joins counts with
 * k<sub>c</sub> = 1 (the whole current) until the roof network that joins it is drawn: that can
 * only raise s. An object a part touches is connected to the air-termination: no clearance to
 * check, and no pass either (it must be fit to carry the current).
 *
 * <p>Stateless and thread-safe.
 */
public final class SeparationSurvey {

    /** How far the reported worst margin may lie above the true least, metres. */
    public static final double TOLERANCE = 0.001;

    /** Closer than this, metres, a part touches the object. */
    static final double TOUCHING = 1e-3;

    private SeparationSurvey() {
    }

    /** A metal installation the designer marked: a point (z above ground) and what lies between it and the LPS. */
    public record Installation(String name, Coordinate point, Material material) {
    }

    /** The outcome of a check. */
    public enum Status {
        /** At least s at every point, every l along drawn parts. */
        PASSES,
        /** Less than s at some point (or within the tolerance of it). */
        FAILS,
        /** At least s at every point, but some l is only a lower bound (no drawn route). */
        NOT_CONFIRMED,
        /** A part touches the object. */
        CONNECTED
    }

    /**
     * One point of the system checked against an installation.
     *
     * @param installation the installation's point nearest {@code lpsPoint}
     * @param lpsPoint     the point of the system
     * @param partId       the part it lies on (a down-conductor by its label)
     * @param route        how l was found there
     * @param result       s, the distance and l there
     */
    public record Point(Coordinate installation, Coordinate lpsPoint, String partId, BondingRoutes.Route route,
            SeparationDistance.Result result) {

        /** Distance − s, metres: negative where the point fails. */
        public double margin() {
            return result.actual() - result.required();
        }

        /** True when l there is only a lower bound (no drawn route to a down-conductor). */
        public boolean lowerBound() {
            return isLowerBound(route);
        }
    }

    /**
     * One check.
     *
     * @param kind        "rooftop object" or "metal installation"
     * @param worst       the point of the system with the least margin
     * @param unconfirmed of the points whose l is only a lower bound, the one with the least margin; null when
     *                    every route is drawn
     * @param clears      true when the search shows no point of the system closer than its s
     * @param connected   true when a part touches the object (no clearance)
     */
    public record Check(String kind, String name, Material material, Point worst, Point unconfirmed, boolean clears,
            boolean connected) {

        public Status status() {
            return connected ? Status.CONNECTED : !clears ? Status.FAILS
                    : unconfirmed != null ? Status.NOT_CONFIRMED : Status.PASSES;
        }

        public boolean passes() {
            return status() == Status.PASSES;
        }

        public Coordinate installation() {
            return worst.installation();
        }

        public Coordinate lpsPoint() {
            return worst.lpsPoint();
        }

        public String partId() {
            return worst.partId();
        }

        public BondingRoutes.Route route() {
            return worst.route();
        }

        public SeparationDistance.Result result() {
            return worst.result();
        }
    }

    /**
     * @param downConductors every down-conductor of the site
     * @param bondingLevel   height of the equipotential bonding above ground, metres (0 for ground level)
     * @return the checks, rooftop objects first; none when the site has no air-termination
     */
    public static List<Check> survey(Site site, SiteSurface surface, ProtectionLevel level,
            List<BondingRoutes.DownConductor> downConductors, List<Installation> installations, double bondingLevel) {
        Set<String> structures = new HashSet<>();
        site.structures().forEach(s -> structures.add(s.id()));
        BondingRoutes routes = new BondingRoutes(surface, structures, downConductors, bondingLevel);
        List<Check> out = new ArrayList<>();
        if (routes.pieces().isEmpty()) {
            return out;
        }
        SystemStretches system = new SystemStretches(routes);
        for (RooftopObject o : site.rooftopObjects()) {
            double base = o.top();
            for (Wall w : surface.walls()) {
                if (w.ownerId().equals(o.id())) {
                    base = Math.min(base, w.base());
                }
            }
            InstallationShape shape = InstallationShape.solid(o.footprint(), base, o.top());
            boolean touching = touches(o, routes.pieces()) || nearest(system, shape) < TOUCHING;
            out.add(check(system, level, "rooftop object", o.name() == null || o.name().isBlank() ? o.id() : o.name(),
                    Material.AIR, shape, touching));
        }
        for (Installation m : installations) {
            InstallationShape shape = InstallationShape.point(m.point());
            out.add(check(system, level, "metal installation", m.name(), m.material(), shape,
                    nearest(system, shape) < TOUCHING));
        }
        return out;
    }

    private static Check check(SystemStretches system, ProtectionLevel level, String kind, String name,
            Material material, InstallationShape shape, boolean connected) {
        int n = system.size();
        double[] slope = new double[n];
        boolean anyLowerBound = false;
        for (int i = 0; i < n; i++) {
            BondingRoutes.Route r = system.route(i, 0);
            double k = level.ki() * SeparationDistance.kc(r.downConductors()) / material.km();
            slope[i] = (1 + k) * system.length(i);
            anyLowerBound |= isLowerBound(r);
        }
        LeastMarginSearch.Margin margin = (i, t) -> point(system, level, material, shape, i, t).margin();
        LeastMarginSearch.Least least = LeastMarginSearch.minimise(slope, margin, TOLERANCE);
        Point worst = point(system, level, material, shape, least.stretch(), least.t());
        Point unconfirmed = null;
        if (anyLowerBound) {
            int[] ids = IntStream.range(0, n).filter(i -> isLowerBound(system.route(i, 0))).toArray();
            double[] sub = new double[ids.length];
            for (int j = 0; j < ids.length; j++) {
                sub[j] = slope[ids[j]];
            }
            LeastMarginSearch.Least u = LeastMarginSearch.minimise(sub, (j, t) -> margin.at(ids[j], t), TOLERANCE);
            unconfirmed = point(system, level, material, shape, ids[u.stretch()], u.t());
        }
        return new Check(kind, name, material, worst, unconfirmed, least.lowerBound() >= 0, connected);
    }

    private static boolean isLowerBound(BondingRoutes.Route r) {
        return r.basis() == BondingRoutes.Basis.ASSUMED_LINKS || r.basis() == BondingRoutes.Basis.NONE;
    }

    private static Point point(SystemStretches system, ProtectionLevel level, Material material,
            InstallationShape shape, int stretch, double t) {
        Coordinate p = system.at(stretch, t);
        Coordinate q = shape.nearestTo(p);
        BondingRoutes.Route route = system.route(stretch, t);
        double l = route.length();
        SeparationDistance.Result r = new SeparationDistance.Result(
                SeparationDistance.required(level, route.downConductors(), material, l), q.distance3D(p), l,
                route.basis() == BondingRoutes.Basis.NONE);
        return new Point(q, p, system.partId(stretch), route, r);
    }

    /** The least distance between the installation and the system, to a tenth of {@link #TOUCHING}. */
    private static double nearest(SystemStretches system, InstallationShape shape) {
        double[] slope = new double[system.size()];
        for (int i = 0; i < slope.length; i++) {
            slope[i] = system.length(i);
        }
        return LeastMarginSearch.minimise(slope, (i, t) -> shape.distanceTo(system.at(i, t)), TOUCHING / 10).value();
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
}
