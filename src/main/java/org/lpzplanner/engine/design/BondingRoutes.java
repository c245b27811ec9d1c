package org.lpzplanner.engine.design;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.PriorityQueue;
import java.util.Set;
import org.locationtech.jts.geom.Coordinate;
import org.lpzplanner.engine.geom.SiteSurface;

/**
 * The length l of the separation distance formula [IEC 62305-3:2010 6.3]: from a point of the
 * air-termination along the air-termination and down a down-conductor to the equipotential bonding
 * level, by the shortest such route.
 *
 * <p><b>The network.</b> Rods (foot to tip) and conductor legs are the drawn pieces. Pieces whose
 * ends are shared, or a node of one lying within {@value #JOIN_REACH} m in plan and
 * {@value #JOIN_RISE} m in height of another piece (a rod standing at an edge conductor, a conductor
 * ending on another), are joined there *[ours: such parts are bonded where they meet]*. A
 * down-conductor starts at its {@link DownConductorTops top} and joins the pieces that pass there;
 * from the top it runs straight down to the bonding level (its length is the top's height above
 * that level). A rod or conductor standing on the ground (a mast) is its own path to the ground.
 *
 * <p><b>Where no conductor is drawn.</b> Parts that the drawn pieces do not connect to a
 * down-conductor are assumed to be connected by a straight conductor across the roof between
 * their nearest roof-level points (rod feet, roof conductor vertices, down-conductor tops) of
 * different connected groups. That is the shortest possible connection, so where a route uses it
 * the l it gives is a lower bound; {@link Route#assumedStraight()} says how much of l it is. An
 * unconnected part is not used as a bridge straight back into the group the route came from (that
 * would bypass the group's drawn conductors by two assumptions). A group that the drawn pieces do
 * connect to a down-conductor is routed along them only: its drawn network is the design.
 *
 * <p><b>k<sub>c</sub>.</b> The current shares between the down-conductors that a part's conductor
 * network joins at roof level [IEC 62305-3:2010 Annex C]: k<sub>c</sub> follows the number of
 * down-conductors (and parts standing on the ground) of the drawn connected group a point lies in,
 * not the number the building has. A rod or conductor joined to one down-conductor has
 * k<sub>c</sub> = 1 whatever else stands on the building. For a group joined to none (its l a lower
 * bound), the count is the largest the assumed connection could reach: every down-conductor of the
 * building whose down-conductor its routes end at, so that s stays a lower bound too. The count is
 * the same at every point of a group.
 *
 * <p>Immutable after construction and thread-safe. Cost: a Dijkstra search over the nodes from all
 * down-conductors at once, O(n²) in the roof-level nodes for the assumed links.
 */
public final class BondingRoutes {

    /** Plan reach within which a node joins another piece, metres. */
    public static final double JOIN_REACH = 0.5;

    /** Height difference within which a node joins another piece, metres. */
    public static final double JOIN_RISE = 0.5;

    /** A node this high above ground or lower stands on the ground, metres. */
    static final double GROUNDED = 0.05;

    /** How the route of l was found. */
    public enum Basis {
        /** Along drawn rods and conductors to a down-conductor, then down it. */
        DRAWN,
        /** Part of the route runs straight across the roof where no conductor is drawn (assumed). */
        ASSUMED_LINKS,
        /** Down a part that stands on the ground (a mast). */
        GROUNDED_PART,
        /** No down-conductor can be reached: l is the point's height above the bonding level, a lower bound. */
        NONE
    }

    /**
     * The route of l from one point.
     *
     * @param length              l, metres
     * @param assumedStraight     of it, metres straight across the roof where no conductor is drawn
     * @param downConductor       of it, metres down the down-conductor (top to bonding level)
     * @param via                 the label of the down-conductor the route takes, or the id of the part
     *                            standing on the ground; null for none
     * @param downConductorTop    the top of that down-conductor, or the foot of the mast; null for none
     * @param downConductors      the number of down-conductors the current shares between, for k<sub>c</sub>
     *                            (see the class comment; 1 for none)
     * @param sharedBy            their labels (parts standing on the ground by their ids), in the order given
     */
    public record Route(double length, double assumedStraight, double downConductor, Basis basis, String via,
            Coordinate downConductorTop, int downConductors, List<String> sharedBy) {

        public Route {
            sharedBy = List.copyOf(sharedBy);
        }

        /** Metres along the air-termination (drawn pieces and their joints). */
        public double alongAirTermination() {
            return length - assumedStraight - downConductor;
        }

        /** One line saying how l was found. */
        public String describe() {
            if (basis == Basis.DRAWN && assumedStraight == 0 && Math.abs(length - downConductor) < 1e-9) {
                return String.format(Locale.ROOT, "on down-conductor %s at (%.1f, %.1f), %.2f m down it", via,
                        downConductorTop.x, downConductorTop.y, downConductor);
            }
            return switch (basis) {
                case DRAWN -> String.format(Locale.ROOT, "%.2f m along drawn air-termination to down-conductor %s at"
                        + " (%.1f, %.1f), %.2f m down it", alongAirTermination(), via, downConductorTop.x,
                        downConductorTop.y, downConductor);
                case ASSUMED_LINKS -> String.format(Locale.ROOT, "%.2f m along drawn air-termination and %.2f m straight"
                        + " across the roof where no conductor is drawn (assumed) to down-conductor %s at (%.1f, %.1f),"
                        + " %.2f m down it", alongAirTermination(), assumedStraight, via, downConductorTop.x,
                        downConductorTop.y, downConductor);
                case GROUNDED_PART -> String.format(Locale.ROOT, "%.2f m down a part standing on the ground at"
                        + " (%.1f, %.1f)", length, downConductorTop.x, downConductorTop.y);
                case NONE -> "no down-conductor reached: l is the height above the bonding level (a lower bound, not"
                        + " confirmed)";
            };
        }
    }

    /** A straight drawn piece of the air-termination: a rod from foot to tip, or a conductor leg. */
    public record Piece(String partId, Coordinate a, Coordinate b) {
    }

    /** A down-conductor as part of the system: its label, its top and the height it runs down to. */
    public record DownRun(String label, Coordinate top, double bottom) {
    }

    /**
     * A down-conductor: its label (as page and report number it, e.g. "D3"), the building whose outline
     * it stands on and its plan position.
     */
    public record DownConductor(String label, String building, Coordinate position) {
    }

    /** Where a route ends: a down-conductor's top (cost: its length down) or the foot of a part on the ground. */
    private record Sink(double cost, String label, String building, Coordinate top, boolean grounded) {
    }

    private final double bondingLevel;
    private final DrawnNetwork net = new DrawnNetwork();
    private final Map<Integer, Sink> sinks = new HashMap<>();
    /** The node of each down-conductor's top, in the order the down-conductors were given (those with a top). */
    private final List<Integer> tops = new ArrayList<>();
    private double[] dist;
    private double[] assumed;
    private int[] sinkOf;
    /** The group a node's route was in before its last straight link (-1: none), so that no unconnected part bridges back. */
    private int[] cameFrom;
    private int[] group;
    /** Per group root: the labels of the sinks the drawn group joins (empty: none, its routes are assumed). */
    private final Map<Integer, List<String>> joined = new HashMap<>();
    /** Per group root of a group joined to none: the labels its k<sub>c</sub> counts (see class comment). */
    private final Map<Integer, List<String>> assumedSharing = new HashMap<>();
    private final Map<String, List<String>> labelsByBuilding = new HashMap<>();

    /**
     * @param structureIds   the ids of the site's structures (whose walls carry down-conductors)
     * @param downConductors every down-conductor of the site
     * @param bondingLevel   height of the equipotential bonding above ground, metres (0: at ground level)
     */
    public BondingRoutes(SiteSurface surface, Set<String> structureIds, List<DownConductor> downConductors,
            double bondingLevel) {
        if (!(bondingLevel >= 0) || Double.isInfinite(bondingLevel)) {
            throw new IllegalArgumentException("the bonding level must be 0 m or more above ground, got " + bondingLevel);
        }
        this.bondingLevel = bondingLevel;
        for (DownConductor d : downConductors) {
            labelsByBuilding.computeIfAbsent(d.building(), b -> new ArrayList<>()).add(d.label());
        }
        for (SiteSurface.PlacedRod r : surface.rods()) {
            Coordinate foot = new Coordinate(r.tip().x, r.tip().y, r.base());
            net.addPiece(new Piece(r.rod().id(), foot, r.tip()), r.base() > GROUNDED, false);
        }
        for (SiteSurface.PlacedConductor c : surface.conductors()) {
            for (int i = 1; i < c.path().size(); i++) {
                Coordinate a = c.path().get(i - 1), b = c.path().get(i);
                boolean roof = DownConductorTops.isRoofLeg(surface, a, b);
                net.addPiece(new Piece(c.conductor().id(), a, b), roof, roof);
            }
        }
        int drawnNodes = net.nodes.size();
        for (DownConductor d : downConductors) {
            Coordinate top = DownConductorTops.top(surface, structureIds, d.position());
            if (top == null) {
                continue;
            }
            int n = net.newNode(top);
            net.roofNodes.add(n);
            tops.add(n);
            sinks.put(n, new Sink(Math.max(0, top.getZ() - bondingLevel), d.label(), d.building(), top, false));
        }
        for (int n = 0; n < drawnNodes; n++) {
            Coordinate p = net.nodes.get(n);
            if (p.getZ() <= GROUNDED && !sinks.containsKey(n)) {
                sinks.put(n, new Sink(0, net.partAt(n), null, p, true));
            }
        }
        List<Integer> joining = new ArrayList<>();
        for (int n = 0; n < drawnNodes; n++) {
            joining.add(n);
        }
        joining.addAll(tops);
        net.join(joining);
        net.linkAlongPieces();
        search();
    }

    /** The drawn pieces of the air-termination (rods and conductor legs), in the order {@link #at} numbers them. */
    public List<Piece> pieces() {
        return List.copyOf(net.pieces);
    }

    /** The down-conductors, each from its top straight down to the bonding level, in the order {@link #down} numbers them. */
    public List<DownRun> downRuns() {
        List<DownRun> out = new ArrayList<>();
        for (int n : tops) {
            Sink sink = sinks.get(n);
            out.add(new DownRun(sink.label(), sink.top(), Math.min(bondingLevel, sink.top().getZ())));
        }
        return out;
    }

    /**
     * The route of l from a point of a down-conductor at height z: straight down it to the bonding
     * level (l = z − bonding level, at least 0); k<sub>c</sub> counts the down-conductors its top's
     * drawn group joins (itself alone when no drawn part reaches its top).
     */
    public Route down(int run, double z) {
        int n = tops.get(run);
        Sink sink = sinks.get(n);
        double l = Math.max(0, Math.min(z, sink.top().getZ()) - bondingLevel);
        List<String> sharing = sharing(n);
        return new Route(l, 0, l, Basis.DRAWN, sink.label(), sink.top(), Math.max(1, sharing.size()), sharing);
    }

    /**
     * The route of l from a point on a piece.
     *
     * @param piece index into {@link #pieces()}
     * @param point a point on that piece (it is projected onto it)
     */
    public Route from(int piece, Coordinate point) {
        Piece p = net.pieces.get(piece);
        return at(piece, DrawnNetwork.parameter(p.a(), p.b(), point));
    }

    /**
     * The route of l from the point at fraction t ∈ [0, 1] along a piece (a to b, 3D). Along a piece l
     * changes by at most the distance moved: a route from one point can run along the piece to the
     * other and on along its route.
     */
    public Route at(int piece, double t) {
        Piece p = net.pieces.get(piece);
        double length = p.a().distance3D(p.b());
        List<double[]> s = net.stops.get(piece);
        int below = 0;
        for (int k = 0; k < s.size(); k++) {
            if (s.get(k)[0] <= t) {
                below = k;
            }
        }
        int above = Math.min(below + 1, s.size() - 1);
        double best = Double.POSITIVE_INFINITY;
        int via = -1;
        double offset = 0;
        for (int k : new int[] {below, above}) {
            int n = (int) s.get(k)[1];
            double d = Math.abs(t - s.get(k)[0]) * length;
            if (d + dist[n] < best) {
                best = d + dist[n];
                via = n;
                offset = d;
            }
        }
        if (via < 0 || best == Double.POSITIVE_INFINITY) {
            Coordinate q = new Coordinate(p.a().x + t * (p.b().x - p.a().x), p.a().y + t * (p.b().y - p.a().y),
                    p.a().getZ() + t * (p.b().getZ() - p.a().getZ()));
            return new Route(Math.max(0, q.getZ() - bondingLevel), 0, 0, Basis.NONE, null, null, 1, List.of());
        }
        Sink sink = sinks.get(sinkOf[via]);
        List<String> sharing = sharing(via);
        Basis basis = sink.grounded() && assumed[via] <= 1e-9 ? Basis.GROUNDED_PART
                : assumed[via] > 1e-9 ? Basis.ASSUMED_LINKS : Basis.DRAWN;
        double down = sink.grounded() ? 0 : sink.cost();
        return new Route(offset + dist[via], assumed[via], down, basis, sink.label(), sink.top(),
                Math.max(1, sharing.size()), sharing);
    }

    /**
     * The down-conductors k<sub>c</sub> counts at a node: those its drawn group joins, or for a group
     * joined to none, every down-conductor of the buildings its routes end at (see class comment).
     */
    private List<String> sharing(int node) {
        List<String> own = joined.getOrDefault(group[node], List.of());
        return own.isEmpty() ? assumedSharing.getOrDefault(group[node], List.of()) : own;
    }



    /** Dijkstra from every sink at once; assumed straight links join roof-level nodes of different groups. */
    private void search() {
        int count = net.nodes.size();
        group = net.groups();
        for (int n = 0; n < count; n++) {
            joined.computeIfAbsent(group[n], g -> new ArrayList<>());
        }
        // down-conductors in the order given (their tops are numbered after the drawn nodes), then parts on the ground
        sinks.entrySet().stream().sorted(Comparator.comparing((Map.Entry<Integer, Sink> e) -> e.getValue().grounded())
                .thenComparing(Map.Entry::getKey))
                .forEach(e -> joined.get(group[e.getKey()]).add(e.getValue().label()));
        dist = new double[count];
        assumed = new double[count];
        sinkOf = new int[count];
        cameFrom = new int[count];
        Arrays.fill(dist, Double.POSITIVE_INFINITY);
        Arrays.fill(sinkOf, -1);
        Arrays.fill(cameFrom, -1);
        boolean[] isRoof = new boolean[count];
        net.roofNodes.forEach(n -> isRoof[n] = true);
        int[] roof = net.roofNodes.stream().distinct().mapToInt(Integer::intValue).toArray();
        PriorityQueue<double[]> queue = new PriorityQueue<>((u, v) -> Double.compare(u[0], v[0]));
        sinks.forEach((n, s) -> {
            dist[n] = s.cost();
            sinkOf[n] = n;
            queue.add(new double[] {s.cost(), n});
        });
        boolean[] done = new boolean[count];
        while (!queue.isEmpty()) {
            double[] top = queue.poll();
            int u = (int) top[1];
            if (done[u]) {
                continue;
            }
            done[u] = true;
            for (DrawnNetwork.Edge e : net.edges.get(u)) {
                relax(queue, u, e.to(), e.length(), false);
            }
            if (isRoof[u]) {
                Coordinate p = net.nodes.get(u);
                for (int v : roof) {
                    // a group joined to a down-conductor keeps its drawn routes: links only lead into groups joined to none
                    if (group[v] != group[u] && group[v] != cameFrom[u] && !done[v] && joined.get(group[v]).isEmpty()) {
                        relax(queue, u, v, p.distance3D(net.nodes.get(v)), true);
                    }
                }
            }
        }
        for (int n = 0; n < count; n++) {
            if (joined.get(group[n]).isEmpty() && sinkOf[n] >= 0) {
                List<String> reach = reachable(sinks.get(sinkOf[n]), sinkOf[n]);
                assumedSharing.merge(group[n], reach, (a, b) -> a.size() >= b.size() ? a : b);
            }
        }
    }

    /** What an assumed connection to this sink could share the current with: its building's down-conductors, or its own group's. */
    private List<String> reachable(Sink sink, int node) {
        List<String> building = sink.building() == null ? List.of() : labelsByBuilding.getOrDefault(sink.building(), List.of());
        List<String> own = joined.get(group[node]);
        return building.size() >= own.size() ? building : own;
    }

    private void relax(PriorityQueue<double[]> queue, int u, int v, double length, boolean straight) {
        double d = dist[u] + length;
        if (d < dist[v] - 1e-12) {
            dist[v] = d;
            assumed[v] = assumed[u] + (straight ? length : 0);
            sinkOf[v] = sinkOf[u];
            cameFrom[v] = straight ? group[u] : cameFrom[u];
            queue.add(new double[] {d, v});
        }
    }


}
