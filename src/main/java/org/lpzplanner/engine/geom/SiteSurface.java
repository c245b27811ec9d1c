package org.lpzplanner.engine.geom;

import java.util.List;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.index.strtree.STRtree;
import org.lpzplanner.engine.model.Conductor;
import org.lpzplanner.engine.model.Rod;

/**
 * The site as the engine sees it: planar top faces, their straight edges, the walls under the
 * footprint edges, and the air-termination parts placed in 3D. Built by {@link SiteSurfaceBuilder}.
 *
 * <p>Top height lookups go through an STR-tree of the faces. Immutable and thread-safe.
 */
public final class SiteSurface {

    /** A rod with its resolved base (what it stands on) and tip. */
    public record PlacedRod(Rod rod, double base, Coordinate tip) {}

    /**
     * A conductor as placed: its path in 3D (a conductor that follows the surface runs over every
     * face it crosses and down or up every step and wall on its way; a wire keeps its straight
     * legs, split where the surface beneath changes), and per leg its clearance above the solid
     * directly beneath, at the leg's start and end (linear in between; a vertical leg rests against
     * a wall).
     */
    public record PlacedConductor(Conductor conductor, List<Coordinate> path, List<Clearance> clearances) {

        public PlacedConductor {
            path = List.copyOf(path);
            clearances = List.copyOf(clearances);
            if (clearances.size() != Math.max(0, path.size() - 1)) {
                throw new IllegalArgumentException("one clearance per leg");
            }
        }

        /** The conductor's name, or its id when it has none. */
        public String label() {
            String name = conductor.name();
            return name == null || name.isBlank() ? conductor.id() : name;
        }
    }

    /** Height of a conductor leg above the solid directly beneath it, at the leg's start and end (metres). */
    public record Clearance(double start, double end) {

        public double max() {
            return Math.max(start, end);
        }
    }

    /** A footprint corner (a vertex where two roof edges meet), at wall-top height. */
    public record Corner(String ownerId, String ownerName, Coordinate point) {}

    private final List<RoofFace> faces;
    private final List<PlanPolygon> facePolygons;
    private final List<RoofEdge> edges;
    private final List<Wall> walls;
    private final List<Corner> corners;
    private final List<PlacedRod> rods;
    private final List<PlacedConductor> conductors;
    private final STRtree faceIndex = new STRtree();

    SiteSurface(List<RoofFace> faces, List<RoofEdge> edges, List<Wall> walls, List<Corner> corners,
            List<PlacedRod> rods, List<PlacedConductor> conductors) {
        this.faces = List.copyOf(faces);
        this.facePolygons = faces.stream().map(f -> new PlanPolygon(f.polygon())).toList();
        this.edges = List.copyOf(edges);
        this.walls = List.copyOf(walls);
        this.corners = List.copyOf(corners);
        this.rods = List.copyOf(rods);
        this.conductors = List.copyOf(conductors);
        for (int i = 0; i < faces.size(); i++) {
            faceIndex.insert(faces.get(i).polygon().getEnvelopeInternal(), i);
        }
        faceIndex.build();
    }

    public List<RoofFace> faces() { return faces; }
    public List<RoofEdge> edges() { return edges; }
    public List<Wall> walls() { return walls; }
    public List<Corner> corners() { return corners; }
    public List<PlacedRod> rods() { return rods; }
    public List<PlacedConductor> conductors() { return conductors; }

    /** Plan polygon of face i in the fast representation. */
    public PlanPolygon facePolygon(int i) {
        return facePolygons.get(i);
    }

    /** Elevation of the solid's top at (x, y): the highest face over the point, 0 on open ground. */
    public double topHeight(double x, double y) {
        double top = 0;
        for (Object o : faceIndex.query(new Envelope(x, x, y, y))) {
            int i = (Integer) o;
            if (facePolygons.get(i).contains(x, y)) {
                top = Math.max(top, faces.get(i).plane().z(x, y));
            }
        }
        return top;
    }

    /**
     * A part placed this close to a parapet's line (metres) stands on the parapet: the precision of
     * stored coordinates (seven decimals of a degree are about 1 cm). Farther off, it stands on
     * whatever is under its own position.
     */
    public static final double PARAPET_SNAP = 0.01;

    /**
     * Elevation of what a rod or conductor placed at (x, y) stands on: the top of a parapet when
     * the point lies within {@link #PARAPET_SNAP} of its line, otherwise the top surface under it.
     */
    public double standHeight(double x, double y) {
        Coordinate on = onParapet(x, y);
        return on != null ? Math.max(topHeight(on.x, on.y), on.getZ()) : topHeight(x, y);
    }

    /**
     * The nearest point (with the parapet's top as z) on a parapet's line within
     * {@link #PARAPET_SNAP} of (x, y), or null when there is none. A part given there stands on the
     * parapet and is placed exactly on its line.
     */
    public Coordinate onParapet(double x, double y) {
        Coordinate best = null;
        double bestDistance = PARAPET_SNAP;
        for (RoofEdge e : edges) {
            if (e.kind() == EdgeKind.PARAPET) {
                Coordinate a = e.p0(), b = e.p1();
                double vx = b.x - a.x, vy = b.y - a.y, len2 = vx * vx + vy * vy;
                double t = len2 == 0 ? 0 : Math.max(0, Math.min(1, ((x - a.x) * vx + (y - a.y) * vy) / len2));
                double px = a.x + t * vx, py = a.y + t * vy;
                double d = Math.hypot(x - px, y - py);
                if (d <= bestDistance) {
                    bestDistance = d;
                    best = new Coordinate(px, py, a.getZ() + t * (b.getZ() - a.getZ()));
                }
            }
        }
        return best;
    }

    /**
     * Elevation of the solid's top exactly at (x, y): the highest face over the point or parapet
     * whose line passes through it, 0 on open ground.
     */
    public double solidTop(double x, double y) {
        double top = topHeight(x, y);
        for (RoofEdge e : edges) {
            if (e.kind() == EdgeKind.PARAPET && distanceToLine(x, y, e) <= SurfaceProfile.ON_LINE) {
                Coordinate a = e.p0(), b = e.p1();
                double vx = b.x - a.x, vy = b.y - a.y, len2 = vx * vx + vy * vy;
                double t = len2 == 0 ? 0 : Math.max(0, Math.min(1, ((x - a.x) * vx + (y - a.y) * vy) / len2));
                top = Math.max(top, a.getZ() + t * (b.getZ() - a.getZ()));
            }
        }
        return top;
    }

    /**
     * For drawings: the top surface at (x, y), or a parapet's top within {@code reach} of its line,
     * so that a parapet shows in a section sampled at finite steps.
     */
    public double drawnTop(double x, double y, double reach) {
        double top = topHeight(x, y);
        for (RoofEdge e : edges) {
            if (e.kind() == EdgeKind.PARAPET && distanceToLine(x, y, e) <= reach) {
                top = Math.max(top, Math.max(e.p0().getZ(), e.p1().getZ()));
            }
        }
        return top;
    }

    /** Plan distance from (x, y) to the edge's segment. */
    static double distanceToLine(double x, double y, RoofEdge e) {
        return Math.sqrt(PlanPolygon.segmentDistanceSq(x, y, e.p0().x, e.p0().y, e.p1().x, e.p1().y));
    }

    /** Indices of the faces whose bounding box meets the plan box. */
    List<Integer> facesNear(double minX, double minY, double maxX, double maxY) {
        List<Integer> out = new java.util.ArrayList<>();
        for (Object o : faceIndex.query(new Envelope(minX, maxX, minY, maxY))) {
            out.add((Integer) o);
        }
        out.sort(Integer::compare);
        return out;
    }

    /** The top of the solid under the plan segment a→b. */
    public SurfaceProfile profile(double ax, double ay, double bx, double by) {
        return SurfaceProfile.along(this, ax, ay, bx, by);
    }

    /** Highest elevation of any face, edge or part: the site's top. */
    public double maxElevation() {
        double top = 0;
        for (RoofEdge e : edges) {
            top = Math.max(top, Math.max(e.p0().getZ(), e.p1().getZ()));
        }
        for (PlacedRod r : rods) {
            top = Math.max(top, r.tip().getZ());
        }
        for (PlacedConductor c : conductors) {
            for (Coordinate p : c.path()) {
                top = Math.max(top, p.getZ());
            }
        }
        return top;
    }
}
