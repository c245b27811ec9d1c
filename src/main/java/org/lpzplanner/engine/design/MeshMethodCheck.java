package org.lpzplanner.engine.design;

import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import org.locationtech.jts.algorithm.MinimumDiameter;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.geom.PrecisionModel;
import org.locationtech.jts.operation.distance.DistanceOp;
import org.locationtech.jts.operation.overlayng.UnaryUnionNG;
import org.locationtech.jts.operation.polygonize.Polygonizer;
import org.lpzplanner.engine.geom.Plane;
import org.lpzplanner.engine.geom.RoofFace;
import org.lpzplanner.engine.geom.SiteSurface;
import org.lpzplanner.engine.geom.SiteSurfaceBuilder;
import org.lpzplanner.engine.geom.SurfaceKind;
import org.lpzplanner.engine.model.ProtectionLevel;
import org.lpzplanner.engine.model.Site;

/**
 * Mesh method [IEC 62305-3:2010 5.2.2, Table 2]: do the roof conductors on each flat or low-slope
 * roof face form a mesh no wider than the level's mesh size (5, 10, 15, 20 m for I to IV)?
 *
 * <p><b>Which faces.</b> Faces with a slope of at most 1:10 ({@value #MAX_SLOPE}, common practice
 * for "flat" roofs); steeper faces are reported as not applicable (there ridge and eave conductors
 * and the rolling sphere decide).
 *
 * <p><b>Which conductors.</b> Conductor segments that come within {@value #EDGE_REACH} m of the
 * face in plan and lie between {@value #BELOW_ROOF} m below and {@value #MAX_RISE} m above the roof
 * plane at both ends (on the roof, on holders, or on a parapet top; our rule). Higher conductors are
 * catenary wires, which the mesh method does not cover.
 *
 * <p><b>Cells.</b> In plan, the conductors are clipped to the face grown by the edge reach; every
 * conductor vertex within {@value #EDGE_REACH} m of the face outline is moved onto it (onto an
 * outline corner when one is that close), so a conductor laid just inside the edge or on a parapet
 * counts as running along the edge. The parts of the outline with a conductor within the reach are
 * added, the whole is noded with snap rounding to 1 mm and polygonized (JTS), and each cell is
 * clipped to the face. A roof edge therefore bounds a cell only where a conductor runs along it; any
 * part of the face no conductor loop encloses is reported as open and fails the face.
 *
 * <p><b>Cell size.</b> A cell passes when the longer side of its minimum-width rectangle is at most
 * the mesh size (+{@value #LENGTH_TOLERANCE} m for rounding). The cell then fits in a square of the
 * mesh size, so a pass is always right; an odd-shaped cell (a long triangle) may fail although some
 * rotated square would hold it, i.e. the rule errs on the safe side.
 *
 * <p><b>Edges.</b> Every part of the face's outline (roof edges, parapets and, on pitched roofs,
 * ridges) must have a conductor within {@value #EDGE_REACH} m (common practice for "conductors on
 * the roof edge lines"). Outline gaps shorter than the tolerance are ignored.
 *
 * <p><b>Limits.</b> Rooftop objects are not checked and do not interrupt cells; conductor heights
 * other than the band above are ignored; the check says nothing about side flashes to facades.
 * Stateless and thread-safe.
 */
public final class MeshMethodCheck {

    /** Steepest face slope (rise over run) still treated as flat, common practice. */
    public static final double MAX_SLOPE = 0.1;
    /** How far from a roof edge a conductor still counts as running along it, metres (common practice). */
    public static final double EDGE_REACH = 0.5;
    /** Highest a conductor may run above the roof plane and still count as a roof conductor, metres (our rule). */
    public static final double MAX_RISE = 1.5;
    /** How far below the roof plane a conductor may lie (rounding, recessed fixing), metres. */
    public static final double BELOW_ROOF = 0.05;
    /** Length tolerance for cell sizes, gaps and slivers, metres. */
    public static final double LENGTH_TOLERANCE = 0.01;

    private static final GeometryFactory GF = new GeometryFactory();
    private static final PrecisionModel MILLIMETRE = new PrecisionModel(1000);

    private MeshMethodCheck() {
    }

    /** Every roof face of the site checked against the level's mesh size. */
    public static List<MeshFaceResult> check(Site site, ProtectionLevel level) {
        return check(SiteSurfaceBuilder.build(site), level.meshSize());
    }

    /** Every roof face of a built surface checked against the given mesh size, metres. */
    public static List<MeshFaceResult> check(SiteSurface surface, double meshSize) {
        List<MeshFaceResult> out = new ArrayList<>();
        for (int i = 0; i < surface.faces().size(); i++) {
            if (surface.faces().get(i).kind() == SurfaceKind.ROOF) {
                out.add(checkFace(surface, i, meshSize));
            }
        }
        return out;
    }

    /** The check of face {@code faceIndex} of the surface. */
    public static MeshFaceResult checkFace(SiteSurface surface, int faceIndex, double meshSize) {
        RoofFace face = surface.faces().get(faceIndex);
        Plane plane = face.plane();
        Polygon roof = face.polygon();
        double slope = Math.hypot(plane.a(), plane.b());
        if (slope > MAX_SLOPE + 1e-12) {
            return new MeshFaceResult(face.ownerId(), face.label(), faceIndex, MeshFaceResult.Status.NOT_APPLICABLE, 0,
                    List.of(), List.of(), GF.createPolygon(), GF.createLineString(),
                    String.format(java.util.Locale.ROOT, "slope %.2f is steeper than 1:10; the mesh method is checked on flat roofs only", slope));
        }
        Geometry reachArea = roof.buffer(EDGE_REACH);
        Geometry outline = roof.getBoundary();
        List<Geometry> raw = roofConductors(surface, plane, reachArea);
        Geometry conductorZone = raw.isEmpty() ? GF.createPolygon() : GF.buildGeometry(raw).buffer(EDGE_REACH);

        List<Geometry> network = new ArrayList<>();
        for (Geometry g : raw) {
            for (int k = 0; k < g.getNumGeometries(); k++) {
                if (g.getGeometryN(k) instanceof LineString line) {
                    network.add(snapToOutline(line, roof, outline));
                }
            }
        }
        network.add(outline.intersection(conductorZone));
        Geometry edgesWithoutConductor = dropShortPieces(outline.difference(conductorZone));

        List<Polygon> cells = cells(network, roof);
        List<Polygon> tooLarge = new ArrayList<>();
        double largest = 0;
        for (Polygon cell : cells) {
            double size = largerSide(cell);
            largest = Math.max(largest, size);
            if (size > meshSize + LENGTH_TOLERANCE) {
                tooLarge.add(cell);
            }
        }
        Geometry open = cells.isEmpty() ? roof : roof.difference(UnaryUnionNG.union(GF.buildGeometry(cells), MILLIMETRE));
        open = dropThinParts(open);

        List<String> reasons = new ArrayList<>();
        if (!tooLarge.isEmpty()) {
            reasons.add(String.format(java.util.Locale.ROOT, "%d mesh cell(s) wider than %.1f m (largest %.2f m)",
                    tooLarge.size(), meshSize, largest));
        }
        if (!open.isEmpty()) {
            reasons.add(String.format(java.util.Locale.ROOT, "%.1f m² of roof not enclosed by conductors", open.getArea()));
        }
        if (!edgesWithoutConductor.isEmpty()) {
            reasons.add(String.format(java.util.Locale.ROOT, "%.1f m of roof edge without a conductor within %.1f m",
                    edgesWithoutConductor.getLength(), EDGE_REACH));
        }
        MeshFaceResult.Status status = reasons.isEmpty() ? MeshFaceResult.Status.PASS : MeshFaceResult.Status.FAIL;
        return new MeshFaceResult(face.ownerId(), face.label(), faceIndex, status, largest, cells, tooLarge, open,
                edgesWithoutConductor, String.join("; ", reasons));
    }

    /** Plan lines of the conductor segments that lie on or just above this face, clipped to its reach. */
    private static List<Geometry> roofConductors(SiteSurface surface, Plane plane, Geometry reachArea) {
        List<Geometry> out = new ArrayList<>();
        for (SiteSurface.PlacedConductor c : surface.conductors()) {
            List<Coordinate> path = c.path();
            for (int i = 1; i < path.size(); i++) {
                Coordinate a = path.get(i - 1), b = path.get(i);
                if (a.distance(b) < 1e-9 || !onRoof(a, plane) || !onRoof(b, plane)) {
                    continue;
                }
                Geometry clipped = GF.createLineString(new Coordinate[] {new Coordinate(a.x, a.y), new Coordinate(b.x, b.y)})
                        .intersection(reachArea);
                if (!clipped.isEmpty() && clipped.getLength() > 0) {
                    out.add(clipped);
                }
            }
        }
        return out;
    }

    private static boolean onRoof(Coordinate p, Plane plane) {
        double rise = p.getZ() - plane.z(p.x, p.y);
        return rise >= -BELOW_ROOF && rise <= MAX_RISE;
    }

    /** The line with every vertex near the roof outline moved onto it: onto a corner when one is in reach. */
    private static LineString snapToOutline(LineString line, Polygon roof, Geometry outline) {
        Coordinate[] corners = outline.getCoordinates();
        Coordinate[] cs = line.getCoordinates();
        Coordinate[] moved = new Coordinate[cs.length];
        for (int i = 0; i < cs.length; i++) {
            Coordinate p = cs[i];
            Coordinate best = null;
            double bestDistance = EDGE_REACH + 1e-9;
            for (Coordinate corner : corners) {
                double d = corner.distance(p);
                if (d <= bestDistance) {
                    best = corner;
                    bestDistance = d;
                }
            }
            if (best == null && outline.isWithinDistance(GF.createPoint(p), EDGE_REACH + 1e-9)) {
                best = DistanceOp.nearestPoints(outline, GF.createPoint(p))[0];
            }
            moved[i] = best == null ? new Coordinate(p.x, p.y) : new Coordinate(best.x, best.y);
        }
        return GF.createLineString(moved);
    }

    /** The faces of the noded network, clipped to the roof, slivers dropped. */
    private static List<Polygon> cells(List<Geometry> network, Polygon roof) {
        Geometry noded = UnaryUnionNG.union(GF.buildGeometry(network), MILLIMETRE);
        Polygonizer polygonizer = new Polygonizer();
        polygonizer.add(noded);
        @SuppressWarnings("unchecked")
        Collection<Polygon> faces = polygonizer.getPolygons();
        List<Polygon> out = new ArrayList<>();
        for (Polygon f : faces) {
            Geometry clipped = f.intersection(roof);
            for (int k = 0; k < clipped.getNumGeometries(); k++) {
                if (clipped.getGeometryN(k) instanceof Polygon p && new MinimumDiameter(p).getLength() > LENGTH_TOLERANCE) {
                    out.add(p);
                }
            }
        }
        return out;
    }

    /** Longer side of the minimum-width rectangle of the cell. */
    static double largerSide(Geometry cell) {
        Geometry rect = new MinimumDiameter(cell).getMinimumRectangle();
        if (!(rect instanceof Polygon p)) {
            return rect.getLength();
        }
        Coordinate[] cs = p.getExteriorRing().getCoordinates();
        return Math.max(cs[0].distance(cs[1]), cs[1].distance(cs[2]));
    }

    private static Geometry dropThinParts(Geometry g) {
        List<Geometry> keep = new ArrayList<>();
        for (int k = 0; k < g.getNumGeometries(); k++) {
            Geometry part = g.getGeometryN(k);
            if (part instanceof Polygon && new MinimumDiameter(part).getLength() > LENGTH_TOLERANCE) {
                keep.add(part);
            }
        }
        return keep.isEmpty() ? GF.createPolygon() : GF.buildGeometry(keep);
    }

    private static Geometry dropShortPieces(Geometry g) {
        List<Geometry> keep = new ArrayList<>();
        for (int k = 0; k < g.getNumGeometries(); k++) {
            Geometry part = g.getGeometryN(k);
            if (part.getLength() > LENGTH_TOLERANCE) {
                keep.add(part);
            }
        }
        return keep.isEmpty() ? GF.createLineString() : GF.buildGeometry(keep);
    }
}
