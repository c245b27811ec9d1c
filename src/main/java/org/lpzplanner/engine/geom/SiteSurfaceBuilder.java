package org.lpzplanner.engine.geom;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Polygon;
import org.lpzplanner.engine.model.Conductor;
import org.lpzplanner.engine.model.RoofShape;
import org.lpzplanner.engine.model.Rod;
import org.lpzplanner.engine.model.RooftopObject;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.Structure;

/**
 * Turns a {@link Site} into planar faces, edges, walls and placed parts.
 *
 * <p>Roof forms: flat (optional parapet), gable (two planes meeting at a ridge through the
 * footprint centroid along the ridge bearing; each side slopes to the wall top at its farthest
 * footprint vertex), hip (equal-slope planes from every eave of a convex footprint; the ridge
 * height fixes the slope), shed (one plane from wall-top height to the high side).
 */
public final class SiteSurfaceBuilder {

    private static final double EPS = 1e-7;

    private final GeometryFactory gf = new GeometryFactory();
    private final List<RoofFace> faces = new ArrayList<>();
    private final List<RoofEdge> edges = new ArrayList<>();
    private final List<Wall> walls = new ArrayList<>();
    private final List<SiteSurface.Corner> corners = new ArrayList<>();
    private final Set<String> internalEdgeKeys = new HashSet<>();

    private SiteSurfaceBuilder() {
    }

    public static SiteSurface build(Site site) {
        return new SiteSurfaceBuilder().buildSurface(site);
    }

    private SiteSurface buildSurface(Site site) {
        for (Structure s : site.structures()) {
            addStructure(s);
        }
        List<RoofFace> structureFaces = List.copyOf(faces);
        SiteSurface structuresOnly = new SiteSurface(structureFaces, List.of(), List.of(), List.of(), List.of(), List.of());
        for (RooftopObject o : site.rooftopObjects()) {
            addRooftopObject(o, structuresOnly);
        }
        SiteSurface withoutParts = new SiteSurface(faces, edges, walls, corners, List.of(), List.of());
        List<SiteSurface.PlacedRod> rods = new ArrayList<>();
        for (Rod r : site.rods()) {
            Coordinate foot = footOf(withoutParts, r.x(), r.y());
            rods.add(new SiteSurface.PlacedRod(r, foot.getZ(), new Coordinate(foot.x, foot.y, foot.getZ() + r.height())));
        }
        List<SiteSurface.PlacedConductor> conductors = new ArrayList<>();
        for (Conductor c : site.conductors()) {
            conductors.add(ConductorPlacement.place(withoutParts, c));
        }
        return new SiteSurface(faces, edges, walls, corners, rods, conductors);
    }

    /**
     * Where a part given at (x, y) stands: on a parapet's line (and its top) when within
     * {@link SiteSurface#PARAPET_SNAP} of it, otherwise at (x, y) on the top surface beneath.
     */
    static Coordinate footOf(SiteSurface surface, double x, double y) {
        Coordinate on = surface.onParapet(x, y);
        if (on != null) {
            return new Coordinate(on.x, on.y, surface.standHeight(on.x, on.y));
        }
        return new Coordinate(x, y, surface.topHeight(x, y));
    }

    private void addStructure(Structure s) {
        String name = s.name() == null || s.name().isBlank() ? s.id() : s.name();
        int faceIndex = faces.size();
        int wallIndex = 0;
        for (int k = 0; k < s.footprint().getNumGeometries(); k++) {
            Polygon part = normalized((Polygon) s.footprint().getGeometryN(k));
            List<PlaneRegion> regions = roofRegions(part, s.height(), s.roof());
            int first = faces.size();
            for (PlaneRegion r : regions) {
                faces.add(new RoofFace(s.id(), name, SurfaceKind.ROOF, faces.size() - faceIndex, r.polygon, r.plane));
            }
            double parapet = s.roof() instanceof RoofShape.Flat f ? f.parapet() : 0;
            wallIndex = addFaceEdges(s.id(), name, part, faces.subList(first, faces.size()), parapet, 0, wallIndex, true);
        }
    }

    private void addRooftopObject(RooftopObject o, SiteSurface below) {
        String name = o.name() == null || o.name().isBlank() ? o.id() : o.name();
        Polygon part = normalized(o.footprint());
        int first = faces.size();
        faces.add(new RoofFace(o.id(), name, SurfaceKind.ROOFTOP_OBJECT, 0, part, Plane.horizontal(o.top())));
        Coordinate c = part.getInteriorPoint().getCoordinate();
        double base = Math.min(below.topHeight(c.x, c.y), o.top());
        addFaceEdges(o.id(), name, part, faces.subList(first, faces.size()), 0, base, 0, false);
    }

    /**
     * Emits the edges of the given faces of one footprint part: edges on the footprint boundary are
     * roof edges (or parapets) and carry a wall; edges inside the part are ridges or hips.
     */
    private int addFaceEdges(String ownerId, String ownerName, Polygon part, List<RoofFace> partFaces, double parapet,
            double wallBase, int wallIndex, boolean structure) {
        PlanPolygon boundary = new PlanPolygon(part);
        for (RoofFace f : partFaces) {
            Polygon poly = f.polygon();
            for (int r = 0; r <= poly.getNumInteriorRing(); r++) {
                Coordinate[] cs = (r == 0 ? poly.getExteriorRing() : poly.getInteriorRingN(r - 1)).getCoordinates();
                for (int i = 1; i < cs.length; i++) {
                    Coordinate a = cs[i - 1], b = cs[i];
                    if (a.distance(b) < EPS) {
                        continue;
                    }
                    Coordinate a3 = new Coordinate(a.x, a.y, f.plane().z(a.x, a.y));
                    Coordinate b3 = new Coordinate(b.x, b.y, f.plane().z(b.x, b.y));
                    double mx = (a.x + b.x) / 2, my = (a.y + b.y) / 2;
                    if (boundary.distanceToBoundary(mx, my) < 1e-6) {
                        Coordinate ta = new Coordinate(a.x, a.y, a3.getZ() + parapet);
                        Coordinate tb = new Coordinate(b.x, b.y, b3.getZ() + parapet);
                        EdgeKind kind = !structure ? EdgeKind.OBJECT_EDGE : parapet > 0 ? EdgeKind.PARAPET : EdgeKind.ROOF_EDGE;
                        edges.add(new RoofEdge(ownerId, ownerName, kind, ta, tb));
                        walls.add(new Wall(ownerId, ownerName, wallIndex++, ta, tb, wallBase));
                        corners.add(new SiteSurface.Corner(ownerId, ownerName, ta));
                    } else if (internalEdgeKeys.add(key(ownerId, a, b))) {
                        EdgeKind kind = Math.abs(a3.getZ() - b3.getZ()) < 1e-6 ? EdgeKind.RIDGE : EdgeKind.HIP;
                        edges.add(new RoofEdge(ownerId, ownerName, kind, a3, b3));
                    }
                }
            }
        }
        return wallIndex;
    }

    private static String key(String owner, Coordinate a, Coordinate b) {
        boolean swap = a.x > b.x || (a.x == b.x && a.y > b.y);
        Coordinate p = swap ? b : a, q = swap ? a : b;
        return String.format("%s|%.6f|%.6f|%.6f|%.6f", owner, p.x, p.y, q.x, q.y);
    }

    private record PlaneRegion(Polygon polygon, Plane plane) {}

    private List<PlaneRegion> roofRegions(Polygon part, double height, RoofShape roof) {
        if (roof instanceof RoofShape.Gable g) {
            return gable(part, height, g);
        } else if (roof instanceof RoofShape.Hip h) {
            return hip(part, height, h);
        } else if (roof instanceof RoofShape.Shed s) {
            return shed(part, height, s);
        }
        return List.of(new PlaneRegion(part, Plane.horizontal(height)));
    }

    private List<PlaneRegion> gable(Polygon part, double height, RoofShape.Gable g) {
        double beta = Math.toRadians(g.ridgeBearing());
        double nx = Math.cos(beta), ny = -Math.sin(beta);
        Coordinate o = part.getCentroid().getCoordinate();
        double maxPos = 0, maxNeg = 0;
        for (Coordinate c : part.getExteriorRing().getCoordinates()) {
            double p = nx * (c.x - o.x) + ny * (c.y - o.y);
            maxPos = Math.max(maxPos, p);
            maxNeg = Math.max(maxNeg, -p);
        }
        double rise = g.ridgeHeight() - height;
        List<PlaneRegion> out = new ArrayList<>();
        double span = 4 * (part.getEnvelopeInternal().getWidth() + part.getEnvelopeInternal().getHeight()) + 10;
        for (int side : new int[] {1, -1}) {
            double reach = side > 0 ? maxPos : maxNeg;
            if (reach < EPS) {
                continue;
            }
            double k = rise / reach;
            // z = ridge − k·side·n·(q − o)
            Plane plane = new Plane(-k * side * nx, -k * side * ny, g.ridgeHeight() + k * side * (nx * o.x + ny * o.y));
            Polygon half = halfPlaneBox(o, side * nx, side * ny, span);
            addPolygons(out, part.intersection(half), plane);
        }
        return out;
    }

    private List<PlaneRegion> shed(Polygon part, double height, RoofShape.Shed s) {
        double beta = Math.toRadians(s.highSideBearing());
        double ux = Math.sin(beta), uy = Math.cos(beta);
        double lo = Double.POSITIVE_INFINITY, hi = Double.NEGATIVE_INFINITY;
        for (Coordinate c : part.getExteriorRing().getCoordinates()) {
            double p = ux * c.x + uy * c.y;
            lo = Math.min(lo, p);
            hi = Math.max(hi, p);
        }
        double k = (s.highHeight() - height) / Math.max(hi - lo, EPS);
        return List.of(new PlaneRegion(part, new Plane(k * ux, k * uy, height - k * lo)));
    }

    private List<PlaneRegion> hip(Polygon part, double height, RoofShape.Hip h) {
        Coordinate[] ring = part.getExteriorRing().getCoordinates();
        int n = ring.length - 1;
        double[] nx = new double[n], ny = new double[n], c = new double[n];
        for (int i = 0; i < n; i++) {
            Coordinate a = ring[i], b = ring[i + 1];
            double len = a.distance(b);
            // exterior ring is counter-clockwise after normalisation: inward normal is to the left
            nx[i] = -(b.y - a.y) / len;
            ny[i] = (b.x - a.x) / len;
            c[i] = nx[i] * a.x + ny[i] * a.y;
        }
        List<List<double[]>> regions = new ArrayList<>();
        double dMax = 0;
        for (int i = 0; i < n; i++) {
            List<double[]> poly = new ArrayList<>();
            for (int v = 0; v < n; v++) {
                poly.add(new double[] {ring[v].x, ring[v].y});
            }
            for (int j = 0; j < n && poly.size() >= 3; j++) {
                if (j != i) {
                    // keep d_i ≤ d_j: (n_i − n_j)·q ≤ c_i − c_j
                    poly = clip(poly, nx[i] - nx[j], ny[i] - ny[j], c[i] - c[j]);
                }
            }
            regions.add(poly);
            for (double[] q : poly) {
                dMax = Math.max(dMax, nx[i] * q[0] + ny[i] * q[1] - c[i]);
            }
        }
        double k = (h.ridgeHeight() - height) / Math.max(dMax, EPS);
        List<PlaneRegion> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            List<double[]> poly = regions.get(i);
            if (poly.size() < 3) {
                continue;
            }
            Coordinate[] cs = new Coordinate[poly.size() + 1];
            for (int v = 0; v < poly.size(); v++) {
                cs[v] = new Coordinate(poly.get(v)[0], poly.get(v)[1]);
            }
            cs[poly.size()] = cs[0].copy();
            Polygon p = gf.createPolygon(cs);
            if (p.getArea() < 1e-6) {
                continue;
            }
            out.add(new PlaneRegion(normalized(p), new Plane(k * nx[i], k * ny[i], height - k * c[i])));
        }
        return out;
    }

    /** Sutherland–Hodgman clip of a convex polygon to the half-plane ax + by ≤ c. */
    private static List<double[]> clip(List<double[]> poly, double a, double b, double c) {
        List<double[]> out = new ArrayList<>();
        for (int i = 0; i < poly.size(); i++) {
            double[] p = poly.get(i), q = poly.get((i + 1) % poly.size());
            double fp = a * p[0] + b * p[1] - c, fq = a * q[0] + b * q[1] - c;
            if (fp <= 1e-12) {
                out.add(p);
            }
            if ((fp < -1e-12 && fq > 1e-12) || (fp > 1e-12 && fq < -1e-12)) {
                double t = fp / (fp - fq);
                out.add(new double[] {p[0] + t * (q[0] - p[0]), p[1] + t * (q[1] - p[1])});
            }
        }
        return out;
    }

    private Polygon halfPlaneBox(Coordinate o, double nx, double ny, double span) {
        // the side n·(q − o) ≥ 0, as a large rectangle
        double tx = -ny, ty = nx;
        Coordinate[] cs = {
            new Coordinate(o.x + tx * span, o.y + ty * span),
            new Coordinate(o.x + tx * span + nx * span, o.y + ty * span + ny * span),
            new Coordinate(o.x - tx * span + nx * span, o.y - ty * span + ny * span),
            new Coordinate(o.x - tx * span, o.y - ty * span),
            new Coordinate(o.x + tx * span, o.y + ty * span)
        };
        return gf.createPolygon(cs);
    }

    private void addPolygons(List<PlaneRegion> out, Geometry g, Plane plane) {
        for (int i = 0; i < g.getNumGeometries(); i++) {
            if (g.getGeometryN(i) instanceof Polygon p && p.getArea() > 1e-6) {
                out.add(new PlaneRegion(normalized(p), plane));
            }
        }
    }

    /** Exterior ring counter-clockwise, holes clockwise. */
    private Polygon normalized(Polygon p) {
        Polygon q = (Polygon) p.copy();
        q.normalize(); // JTS normal form: shell clockwise
        return (Polygon) q.reverse();
    }
}
