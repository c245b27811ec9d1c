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

    /** A conductor with every vertex resolved to an elevation above ground. */
    public record PlacedConductor(Conductor conductor, List<Coordinate> path) {}

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

    /** How far from a parapet's line a rod or conductor still stands on the parapet, metres. */
    public static final double PARAPET_REACH = 0.3;

    /**
     * Elevation of what a rod or conductor placed at (x, y) stands on: the top surface, or the top
     * of a parapet when the point lies within {@link #PARAPET_REACH} of it.
     */
    public double standHeight(double x, double y) {
        double top = topHeight(x, y);
        for (RoofEdge e : edges) {
            if (e.kind() == EdgeKind.PARAPET) {
                Coordinate a = e.p0(), b = e.p1();
                double vx = b.x - a.x, vy = b.y - a.y, len2 = vx * vx + vy * vy;
                double t = len2 == 0 ? 0 : Math.max(0, Math.min(1, ((x - a.x) * vx + (y - a.y) * vy) / len2));
                if (Math.hypot(x - (a.x + t * vx), y - (a.y + t * vy)) <= PARAPET_REACH) {
                    top = Math.max(top, a.getZ() + t * (b.getZ() - a.getZ()));
                }
            }
        }
        return top;
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
