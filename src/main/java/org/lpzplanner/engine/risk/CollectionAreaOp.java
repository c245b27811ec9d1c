package org.lpzplanner.engine.risk;

import java.util.ArrayList;
import java.util.List;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.operation.buffer.BufferOp;
import org.locationtech.jts.operation.buffer.BufferParameters;
import org.locationtech.jts.operation.union.UnaryUnionOp;
import org.locationtech.jts.triangulate.polygon.PolygonTriangulator;
import org.lpzplanner.engine.geom.Plane;
import org.lpzplanner.engine.geom.RoofFace;
import org.lpzplanner.engine.geom.SiteSurfaceBuilder;
import org.lpzplanner.engine.model.RoofShape;
import org.lpzplanner.engine.model.RooftopObject;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.Structure;

/**
 * Collection area A_D of the real site geometry: the ground area within horizontal distance 3·h of
 * each point of each structure, h being that point's height [IEC 62305-2:2010 Annex A]. For an
 * isolated rectangular structure this reduces to {@link #rectangleFormula}.
 *
 * <p><b>Heights per point.</b> A flat roof is one part at {@link Structure#topHeight()} (wall top plus
 * parapet: the parapet runs round the outline, so its zone contains the lower roof's). A pitched
 * roof (gable, hip, shed) is taken face by face from the engine's roof planes: on a planar face the
 * height, and so the radius 3·h, is an affine function of position, and the union of the discs of
 * all its points is the convex hull of the discs at its corners (a point of a triangle is a convex
 * combination of the corners and its radius the same combination of theirs). Each face is cut into
 * triangles and each triangle's zone is the hull of its three corner discs. Walls lie below their
 * roof edge and add nothing. A stepped building is several structures, each with its own height.
 * {@link #of(Site)} also counts every rooftop object as a part at its top height (a chimney or plant
 * box raises the zone locally, as Annex A does for a prominent part of a structure).
 *
 * <p><b>Approximation.</b> Each zone is a JTS buffer with {@value #QUADRANT_SEGMENTS} segments per
 * quadrant, and the zones are merged with {@link UnaryUnionOp}. Round joins are chords whose vertices
 * lie on the exact circle (inscribed), so the result is never larger than the exact zone. A chord
 * spanning angle α cuts off a circular segment that is the fraction 1 − sin α / α of its sector; for
 * buffers of straight-edged parts the sectors of the arcs that remain on the outline are disjoint
 * parts of the zone, so the relative area error is at most 1 − sin α_max / α_max. JTS divides a
 * corner of turning angle θ into round(θ / q) equal steps, q = π / (2·{@value #QUADRANT_SEGMENTS}), so
 * every step is below 1.5·q: α_max &lt; 1.5·π/96 and the bound is {@link #MAX_RELATIVE_ERROR} ≈
 * 4.0·10⁻⁴ (0.04 %). For right-angled corners every step is exactly q, and the bound is 1 − sin q / q
 * ≈ 1.8·10⁻⁴. Hulls of discs have tangent lines that touch between chord vertices, where that
 * argument does not hold; a site with a pitched roof is therefore also built once with every radius
 * enlarged by 1 / cos(1.5·q / 2), so that every chord lies outside the exact circle, and its bound is
 * 1 − inner / outer, since inner ≤ exact ≤ outer.
 *
 * <p>Stateless and thread-safe. Cost: one buffer per flat part and one hull per roof triangle, one
 * union (two for a site with a pitched roof), O(n log n) in the number of vertices.
 */
public final class CollectionAreaOp {

    /** Segments per quarter circle of each buffer. */
    public static final int QUADRANT_SEGMENTS = 48;

    /** The distance from a part, as a multiple of its height [IEC 62305-2:2010 Annex A]. */
    public static final double HEIGHT_FACTOR = 3.0;

    private static final double LARGEST_STEP = 1.5 * Math.PI / (2 * QUADRANT_SEGMENTS);

    /** Radius factor that puts every chord of a round join outside the exact circle. */
    private static final double OUTER_FACTOR = 1 / Math.cos(LARGEST_STEP / 2);

    private static final GeometryFactory GEOMETRY = new GeometryFactory();

    /** Upper bound of (exact − computed) / exact for any site; derivation in the class comment. */
    public static final double MAX_RELATIVE_ERROR = 1 - Math.sin(LARGEST_STEP) / LARGEST_STEP;

    private CollectionAreaOp() {
    }

    /**
     * Collection area of every structure and rooftop object of the site. An empty site has area 0.
     *
     * @throws IllegalArgumentException when a height is negative or not finite
     */
    public static CollectionArea of(Site site) {
        return build(site.structures(), site.rooftopObjects());
    }

    /** Collection area of the given structures alone (no rooftop objects). */
    public static CollectionArea ofStructures(List<Structure> structures) {
        return build(structures, List.of());
    }

    /**
     * A_D = L·W + 2·(3H)·(L + W) + π·(3H)², exact for an isolated rectangular structure of length L,
     * width W and height H in metres [IEC 62305-2:2010 Annex A].
     */
    public static double rectangleFormula(double length, double width, double height) {
        double r = HEIGHT_FACTOR * height;
        return length * width + 2 * r * (length + width) + Math.PI * r * r;
    }

    private static CollectionArea build(List<Structure> structures, List<RooftopObject> objects) {
        boolean pitched = structures.stream().anyMatch(s -> !(s.roof() instanceof RoofShape.Flat));
        Geometry inner = union(zones(structures, objects, 1));
        double bound = MAX_RELATIVE_ERROR;
        if (pitched && inner.getArea() > 0) {
            double outer = union(zones(structures, objects, OUTER_FACTOR)).getArea();
            bound = Math.max(bound, 1 - inner.getArea() / outer);
        }
        return new CollectionArea(inner.getArea(), inner, bound);
    }

    /** Every part's zone, each radius multiplied by {@code enlarge} (1 for the inscribed zone). */
    private static List<Geometry> zones(List<Structure> structures, List<RooftopObject> objects, double enlarge) {
        List<Geometry> zones = new ArrayList<>();
        for (Structure s : structures) {
            checkHeight(s.topHeight(), s.id());
            if (s.roof() instanceof RoofShape.Flat) {
                zones.add(buffer(s.footprint(), HEIGHT_FACTOR * s.topHeight() * enlarge));
            } else {
                Site alone = new Site(s.id(), List.of(s), List.of(), List.of(), List.of());
                for (RoofFace face : SiteSurfaceBuilder.build(alone).faces()) {
                    zones.add(faceZone(face, enlarge));
                }
            }
        }
        for (RooftopObject o : objects) {
            checkHeight(o.top(), o.id());
            zones.add(buffer(o.footprint(), HEIGHT_FACTOR * o.top() * enlarge));
        }
        return zones;
    }

    /** The union of the discs of radius 3·z(p) of every point p of a planar roof face. */
    private static Geometry faceZone(RoofFace face, double enlarge) {
        Plane plane = face.plane();
        if (plane.isHorizontal()) {
            return buffer(face.polygon(), HEIGHT_FACTOR * plane.z(0, 0) * enlarge);
        }
        Geometry triangles = PolygonTriangulator.triangulate(face.polygon());
        List<Geometry> hulls = new ArrayList<>();
        for (int i = 0; i < triangles.getNumGeometries(); i++) {
            Coordinate[] corners = triangles.getGeometryN(i).getCoordinates();
            Geometry[] discs = new Geometry[3];
            for (int k = 0; k < 3; k++) {
                Coordinate c = corners[k];
                double z = Math.max(0, plane.z(c.x, c.y));
                discs[k] = buffer(GEOMETRY.createPoint(new Coordinate(c.x, c.y)), HEIGHT_FACTOR * z * enlarge);
            }
            hulls.add(GEOMETRY.createGeometryCollection(discs).convexHull());
        }
        return UnaryUnionOp.union(hulls);
    }

    private static void checkHeight(double height, String id) {
        if (!(height >= 0) || Double.isInfinite(height)) {
            throw new IllegalArgumentException("height of " + id + " must be a finite number of metres >= 0, got " + height);
        }
    }

    private static Geometry buffer(Geometry g, double distance) {
        return BufferOp.bufferOp(g, distance, new BufferParameters(QUADRANT_SEGMENTS));
    }

    private static Geometry union(List<Geometry> zones) {
        return zones.isEmpty() ? GEOMETRY.createPolygon() : UnaryUnionOp.union(zones);
    }
}
