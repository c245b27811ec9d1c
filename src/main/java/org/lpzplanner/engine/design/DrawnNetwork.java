package org.lpzplanner.engine.design;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.locationtech.jts.geom.Coordinate;

/**
 * The drawn air-termination as a graph for {@link BondingRoutes}: pieces (rods foot to tip,
 * conductor legs), their nodes (ends shared within a millimetre, and the points where another
 * node joins a piece within {@value BondingRoutes#JOIN_REACH} m in plan and
 * {@value BondingRoutes#JOIN_RISE} m in height), the stops along each piece (fraction, node) and the
 * edges between neighbouring stops and joined nodes, with their lengths in metres. Built once,
 * then read; not thread-safe while being built.
 */
final class DrawnNetwork {

    /** An edge to a node, metres long. */
    record Edge(int to, double length) {
    }

    final List<BondingRoutes.Piece> pieces = new ArrayList<>();
    final List<Coordinate> nodes = new ArrayList<>();
    final List<List<Edge>> edges = new ArrayList<>();
    /** Per piece: its stops as {fraction along it, node}, sorted once {@link #linkAlongPieces} has run. */
    final List<List<double[]>> stops = new ArrayList<>();
    /** Nodes at roof level (rod feet on a roof, ends of roof legs, down-conductor tops): where straight links may be assumed. */
    final List<Integer> roofNodes = new ArrayList<>();
    private final Map<String, Integer> nodeIndex = new HashMap<>();

    /** Adds a piece; its foot (or both ends) count as roof level when said so. */
    void addPiece(BondingRoutes.Piece piece, boolean footOnRoof, boolean bothOnRoof) {
        int a = node(piece.a());
        int b = node(piece.b());
        if (footOnRoof) {
            roofNodes.add(a);
        }
        if (bothOnRoof) {
            roofNodes.add(b);
        }
        pieces.add(piece);
        List<double[]> s = new ArrayList<>();
        s.add(new double[] {0, a});
        s.add(new double[] {1, b});
        stops.add(s);
    }

    /** The node at this point (shared by pieces meeting within a millimetre). */
    private int node(Coordinate p) {
        String key = String.format(Locale.ROOT, "%.3f|%.3f|%.3f", p.x, p.y, p.getZ());
        Integer n = nodeIndex.get(key);
        if (n == null) {
            n = newNode(p);
            nodeIndex.put(key, n);
        }
        return n;
    }

    /** A node of its own at p (a down-conductor's top, a joint). */
    int newNode(Coordinate p) {
        nodes.add(new Coordinate(p.x, p.y, p.getZ()));
        edges.add(new ArrayList<>());
        return nodes.size() - 1;
    }

    private void link(int u, int v, double length) {
        if (u == v) {
            return;
        }
        edges.get(u).add(new Edge(v, length));
        edges.get(v).add(new Edge(u, length));
    }

    /** Joins each node to the pieces passing near it, splitting them there. */
    void join(List<Integer> joining) {
        for (int n : joining) {
            Coordinate p = nodes.get(n);
            for (int i = 0; i < pieces.size(); i++) {
                BondingRoutes.Piece piece = pieces.get(i);
                List<double[]> s = stops.get(i);
                if ((int) s.get(0)[1] == n || (int) s.get(1)[1] == n) {
                    continue;
                }
                double t = parameter(piece.a(), piece.b(), p);
                Coordinate q = new Coordinate(piece.a().x + t * (piece.b().x - piece.a().x),
                        piece.a().y + t * (piece.b().y - piece.a().y), piece.a().getZ() + t * (piece.b().getZ() - piece.a().getZ()));
                if (Math.hypot(q.x - p.x, q.y - p.y) > BondingRoutes.JOIN_REACH
                        || Math.abs(q.getZ() - p.getZ()) > BondingRoutes.JOIN_RISE) {
                    continue;
                }
                int at;
                if (q.distance3D(piece.a()) < 1e-3) {
                    at = (int) s.get(0)[1];
                } else if (q.distance3D(piece.b()) < 1e-3) {
                    at = (int) s.get(1)[1];
                } else {
                    at = newNode(q);
                    s.add(new double[] {t, at});
                }
                link(n, at, p.distance3D(q));
            }
        }
    }

    /** Links the stops of every piece in order along it; call once, after every node has joined. */
    void linkAlongPieces() {
        for (int i = 0; i < pieces.size(); i++) {
            List<double[]> s = stops.get(i);
            s.sort((u, v) -> Double.compare(u[0], v[0]));
            double length = pieces.get(i).a().distance3D(pieces.get(i).b());
            for (int k = 1; k < s.size(); k++) {
                link((int) s.get(k - 1)[1], (int) s.get(k)[1], length * (s.get(k)[0] - s.get(k - 1)[0]));
            }
        }
    }

    /** The id of the first piece a node is a stop of, or null. */
    String partAt(int node) {
        for (int i = 0; i < pieces.size(); i++) {
            for (double[] s : stops.get(i)) {
                if ((int) s[1] == node) {
                    return pieces.get(i).partId();
                }
            }
        }
        return null;
    }

    /** Connected groups of the network by node (a root node per group; union-find over the edges). */
    int[] groups() {
        int count = nodes.size();
        int[] parent = new int[count];
        for (int i = 0; i < count; i++) {
            parent[i] = i;
        }
        for (int u = 0; u < count; u++) {
            for (Edge e : edges.get(u)) {
                int a = find(parent, u), b = find(parent, e.to());
                if (a != b) {
                    parent[a] = b;
                }
            }
        }
        int[] out = new int[count];
        for (int i = 0; i < count; i++) {
            out[i] = find(parent, i);
        }
        return out;
    }

    private static int find(int[] parent, int i) {
        while (parent[i] != i) {
            parent[i] = parent[parent[i]];
            i = parent[i];
        }
        return i;
    }

    /** Fraction along a→b (3D) of the point nearest p, in [0, 1]. */
    static double parameter(Coordinate a, Coordinate b, Coordinate p) {
        double vx = b.x - a.x, vy = b.y - a.y, vz = b.getZ() - a.getZ();
        double len2 = vx * vx + vy * vy + vz * vz;
        if (len2 == 0) {
            return 0;
        }
        double t = ((p.x - a.x) * vx + (p.y - a.y) * vy + (p.getZ() - a.getZ()) * vz) / len2;
        return Math.max(0, Math.min(1, t));
    }
}
