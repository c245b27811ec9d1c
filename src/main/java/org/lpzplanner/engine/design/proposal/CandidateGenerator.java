package org.lpzplanner.engine.design.proposal;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.geom.prep.PreparedGeometry;
import org.locationtech.jts.geom.prep.PreparedGeometryFactory;
import org.lpzplanner.engine.envelope.PointSupport;
import org.lpzplanner.engine.envelope.SegmentSupport;
import org.lpzplanner.engine.envelope.Support;
import org.lpzplanner.engine.geom.EdgeKind;
import org.lpzplanner.engine.geom.PlanPolygon;
import org.lpzplanner.engine.geom.RoofEdge;
import org.lpzplanner.engine.geom.RoofFace;
import org.lpzplanner.engine.geom.SiteSurface;
import org.lpzplanner.engine.geom.SurfaceKind;
import org.lpzplanner.engine.model.RooftopObject;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.Structure;

/**
 * The places a proposal may put parts, each with every allowed height: rods at the structures'
 * corners, along roof edges, parapets, ridges and hips, and on a grid over the open roof; masts on
 * the ground round each structure; one rod on each rooftop object (at an inner point of its top);
 * conductors along whole roof edges and ridges. Nothing inside a keep-out area, no roof rod within
 * 0.3 m of a rooftop object, and nothing where it would not stand on the roof it was meant for.
 *
 * <p>Spacing: along edges R/20 clamped to 0.5..2 m, on the open roof R/8 clamped to 2..6 m, masts
 * R/6 clamped to 3..8 m, 2 m out from the walls. Rods on parapets stand on the parapet's line; rods
 * on other edges are set {@value #INSET} m in from the outline so that they stand on the roof.
 */
final class CandidateGenerator {

    static final double INSET = 0.2;

    /** Objects at least this long on a side also get corner rods, metres. */
    static final double MIN_OBJECT_FOR_CORNERS = 2.0;
    private static final double MAST_OFFSET = 2.0;
    private static final double OBJECT_CLEARANCE = 0.3;

    private final GeometryFactory gf = new GeometryFactory();

    List<Candidate> generate(Site site, SiteSurface surface, ProposalOptions options) {
        double radius = options.sphere().radius();
        double edgeStep = clamp(radius / 20, 0.5, 2);
        double roofStep = clamp(radius / 8, 2, 6);
        double mastStep = clamp(radius / 6, 3, 8);
        PreparedGeometry keepOut = prepared(new ArrayList<>(options.keepOut()));
        List<Geometry> objectAreas = new ArrayList<>();
        for (RooftopObject o : site.rooftopObjects()) {
            objectAreas.add(o.footprint().buffer(OBJECT_CLEARANCE));
        }
        PreparedGeometry objects = prepared(objectAreas);
        Set<String> structureIds = new HashSet<>();
        List<Geometry> footprints = new ArrayList<>();
        for (Structure s : site.structures()) {
            structureIds.add(s.id());
            footprints.add(s.footprint());
        }
        List<Candidate> out = new ArrayList<>();
        Set<String> seen = new HashSet<>();
        // corners first, then edges, then ridges, then the open roof: the order breaks ties in the choice
        for (SiteSurface.Corner c : surface.corners()) {
            if (structureIds.contains(c.ownerId())) {
                Coordinate p = surface.onParapet(c.point().x, c.point().y) != null ? c.point()
                        : insetCorner(surface, c.point());
                if (p != null) {
                    addRods(out, seen, surface, options, keepOut, objects, p.x, p.y, c.point().getZ(),
                            ProposedPart.Place.CORNER, c.ownerId());
                }
            }
        }
        for (RoofEdge e : surface.edges()) {
            if (!structureIds.contains(e.ownerId()) || e.kind() == EdgeKind.OBJECT_EDGE) {
                continue;
            }
            boolean ridge = e.kind() == EdgeKind.RIDGE || e.kind() == EdgeKind.HIP;
            ProposedPart.Place place = ridge ? ProposedPart.Place.RIDGE : ProposedPart.Place.EDGE;
            double len = e.planLength();
            int steps = Math.max(1, (int) Math.ceil(len / edgeStep));
            double nx = -(e.p1().y - e.p0().y) / len, ny = (e.p1().x - e.p0().x) / len;
            for (int k = 1; k < steps; k++) {
                double t = (double) k / steps;
                double x = e.p0().x + t * (e.p1().x - e.p0().x), y = e.p0().y + t * (e.p1().y - e.p0().y);
                double z = e.p0().getZ() + t * (e.p1().getZ() - e.p0().getZ());
                // on a parapet a rod stands on its line; elsewhere a little in from the edge, on the roof
                Coordinate p = ridge ? new Coordinate(x + 0.01 * nx, y + 0.01 * ny)
                        : e.kind() == EdgeKind.PARAPET ? new Coordinate(x, y) : insetEdge(surface, x, y, nx, ny, z);
                if (p != null) {
                    addRods(out, seen, surface, options, keepOut, objects, p.x, p.y, z, place, e.ownerId());
                }
            }
            boolean wanted = ridge ? options.ridgeConductors() : options.edgeConductors();
            if (wanted && !crosses(keepOut, e)) {
                Coordinate a = new Coordinate(e.p0().x, e.p0().y, e.p0().getZ() + ProposalOptions.CONDUCTOR_RISE);
                Coordinate b = new Coordinate(e.p1().x, e.p1().y, e.p1().getZ() + ProposalOptions.CONDUCTOR_RISE);
                List<Support> supports = List.of(new SegmentSupport(a, b, radius));
                double cost = 0.5 + 0.5 * len / options.sphere().level().meshSize();
                out.add(new Candidate(ridge ? ProposedPart.Kind.RIDGE_CONDUCTOR : ProposedPart.Kind.EDGE_CONDUCTOR,
                        place, e.ownerId(), List.of(a, b), 0, supports, cost));
            }
        }
        for (int i = 0; i < surface.faces().size(); i++) {
            RoofFace f = surface.faces().get(i);
            if (f.kind() != SurfaceKind.ROOF || !structureIds.contains(f.ownerId())) {
                continue;
            }
            PlanPolygon plan = surface.facePolygon(i);
            double x0 = Math.floor(plan.minX() / roofStep) * roofStep + roofStep / 2;
            double y0 = Math.floor(plan.minY() / roofStep) * roofStep + roofStep / 2;
            for (double x = x0; x <= plan.maxX(); x += roofStep) {
                for (double y = y0; y <= plan.maxY(); y += roofStep) {
                    if (plan.contains(x, y) && plan.distanceToBoundary(x, y) >= 2 * INSET) {
                        addRods(out, seen, surface, options, keepOut, objects, x, y, f.plane().z(x, y),
                                ProposedPart.Place.ROOF, f.ownerId());
                    }
                }
            }
        }
        for (RooftopObject o : site.rooftopObjects()) {
            Coordinate c = o.footprint().getInteriorPoint().getCoordinate();
            Coordinate p = new Coordinate(c.x, c.y);
            if (c != null && !inside(keepOut, p) && Math.abs(surface.standHeight(c.x, c.y) - o.top()) < 0.01) {
                for (double h : options.rodHeights()) {
                    out.add(rod(ProposedPart.Kind.ROD, ProposedPart.Place.OBJECT, o.id(), c.x, c.y, o.top(), h,
                            radius, 1 + 0.02 * h));
                }
            }
            objectCornerRods(out, surface, options, keepOut, o);
        }
        if (!options.mastHeights().isEmpty() && !footprints.isEmpty()) {
            Geometry all = gf.buildGeometry(footprints).union();
            Geometry ring = all.buffer(MAST_OFFSET).getBoundary();
            Geometry blocked = all.buffer(MAST_OFFSET * 0.9);
            for (int g = 0; g < ring.getNumGeometries(); g++) {
                Geometry line = ring.getGeometryN(g);
                org.locationtech.jts.linearref.LengthIndexedLine along = new org.locationtech.jts.linearref.LengthIndexedLine(line);
                for (double s = 0; s < line.getLength(); s += mastStep) {
                    Coordinate p = along.extractPoint(s);
                    if (inside(keepOut, p) || blocked.contains(gf.createPoint(p))) {
                        continue;
                    }
                    for (double h : options.mastHeights()) {
                        out.add(rod(ProposedPart.Kind.MAST, ProposedPart.Place.GROUND, "", p.x, p.y, 0, h, radius,
                                1.5 + 0.01 * h));
                    }
                }
            }
        }
        return out;
    }

    /**
     * Rods on the corners of an object large enough for one rod in its middle to leave its corners
     * open (a plant room or housing; not a chimney or a flue): inset {@value #INSET} m along the
     * corner's bisector, on the object's top.
     */
    private void objectCornerRods(List<Candidate> out, SiteSurface surface, ProposalOptions options,
            PreparedGeometry keepOut, RooftopObject o) {
        var env = o.footprint().getEnvelopeInternal();
        Coordinate[] ring = o.footprint().getExteriorRing().getCoordinates();
        if (Math.max(env.getWidth(), env.getHeight()) < MIN_OBJECT_FOR_CORNERS || ring.length - 1 > 8) {
            return;
        }
        var inside = new org.locationtech.jts.algorithm.locate.IndexedPointInAreaLocator(o.footprint());
        for (int k = 0; k < ring.length - 1; k++) {
            Coordinate c = ring[k], prev = ring[k == 0 ? ring.length - 2 : k - 1], next = ring[k + 1];
            double ax = prev.x - c.x, ay = prev.y - c.y, bx = next.x - c.x, by = next.y - c.y;
            double la = Math.hypot(ax, ay), lb = Math.hypot(bx, by);
            double dx = ax / la + bx / lb, dy = ay / la + by / lb, ld = Math.hypot(dx, dy);
            if (ld < 1e-9) {
                continue;
            }
            Coordinate p = new Coordinate(c.x + INSET * dx / ld, c.y + INSET * dy / ld);
            if (inside.locate(p) != org.locationtech.jts.geom.Location.INTERIOR || inside(keepOut, p)
                    || Math.abs(surface.standHeight(p.x, p.y) - o.top()) > 0.01) {
                continue;
            }
            for (double h : options.rodHeights()) {
                out.add(rod(ProposedPart.Kind.ROD, ProposedPart.Place.OBJECT, o.id(), p.x, p.y, o.top(), h,
                        options.sphere().radius(), 1 + 0.02 * h));
            }
        }
    }

    private void addRods(List<Candidate> out, Set<String> seen, SiteSurface surface, ProposalOptions options,
            PreparedGeometry keepOut, PreparedGeometry objects, double x, double y, double expectedBase,
            ProposedPart.Place place, String owner) {
        String key = Math.round(x * 100) + ":" + Math.round(y * 100);
        if (!seen.add(key)) {
            return;
        }
        Coordinate p = new Coordinate(x, y);
        if (inside(keepOut, p) || inside(objects, p)) {
            return;
        }
        double base = surface.standHeight(x, y);
        if (base <= 0.01 || Math.abs(base - expectedBase) > 1.0 && place != ProposedPart.Place.ROOF) {
            return;
        }
        double extra = place == ProposedPart.Place.ROOF ? 0.05 : 0;
        for (double h : options.rodHeights()) {
            out.add(rod(ProposedPart.Kind.ROD, place, owner, x, y, base, h, options.sphere().radius(), 1 + extra + 0.02 * h));
        }
    }

    private static Candidate rod(ProposedPart.Kind kind, ProposedPart.Place place, String owner, double x, double y,
            double base, double h, double radius, double cost) {
        Coordinate foot = new Coordinate(x, y, base);
        Coordinate tip = new Coordinate(x, y, base + h);
        return new Candidate(kind, place, owner, List.of(foot, tip), h, List.of(new PointSupport(x, y, base + h, radius)), cost);
    }

    /** A point about {@value #INSET} m in from a footprint corner, on the roof or its parapet; null when none is found. */
    private static Coordinate insetCorner(SiteSurface surface, Coordinate corner) {
        Coordinate best = null;
        double bestBase = 0.01;
        double d = INSET / Math.sqrt(2);
        for (int k = 0; k < 8; k++) {
            double a = Math.PI / 4 * k + Math.PI / 8;
            double x = corner.x + d * 1.4 * Math.cos(a), y = corner.y + d * 1.4 * Math.sin(a);
            double base = surface.standHeight(x, y);
            // on the structure itself: a parapet's top also reaches a little past the wall, where a
            // rod would hang off the outside of the corner
            boolean onStructure = surface.topHeight(x, y) > 0.01;
            if (onStructure && base > bestBase + 1e-6 && Math.abs(base - corner.getZ()) <= 1.0) {
                bestBase = base;
                best = new Coordinate(x, y);
            }
        }
        return best;
    }

    /** The point {@value #INSET} m in from an edge point, on the side where the roof is. */
    private static Coordinate insetEdge(SiteSurface surface, double x, double y, double nx, double ny, double z) {
        double left = surface.standHeight(x + INSET * nx, y + INSET * ny);
        double right = surface.standHeight(x - INSET * nx, y - INSET * ny);
        boolean leftOn = surface.topHeight(x + INSET * nx, y + INSET * ny) > 0.01;
        boolean rightOn = surface.topHeight(x - INSET * nx, y - INSET * ny) > 0.01;
        // a parapet's top reaches past the wall too: take the side over the structure when only one is
        boolean useLeft = leftOn != rightOn ? leftOn : Math.abs(left - z) <= Math.abs(right - z);
        double base = useLeft ? left : right;
        if (base <= 0.01 || Math.abs(base - z) > 1.0) {
            return null;
        }
        return useLeft ? new Coordinate(x + INSET * nx, y + INSET * ny) : new Coordinate(x - INSET * nx, y - INSET * ny);
    }

    private boolean crosses(PreparedGeometry keepOut, RoofEdge e) {
        return keepOut != null && keepOut.intersects(gf.createLineString(new Coordinate[] {
                new Coordinate(e.p0().x, e.p0().y), new Coordinate(e.p1().x, e.p1().y)}));
    }

    private boolean inside(PreparedGeometry area, Coordinate p) {
        return area != null && area.intersects(gf.createPoint(p));
    }

    private PreparedGeometry prepared(List<Geometry> parts) {
        if (parts.isEmpty()) {
            return null;
        }
        List<Geometry> polys = new ArrayList<>();
        for (Geometry g : parts) {
            polys.add(g instanceof Polygon ? g : g.buffer(0));
        }
        return PreparedGeometryFactory.prepare(gf.buildGeometry(polys).buffer(0));
    }

    private static double clamp(double v, double lo, double hi) {
        return Math.max(lo, Math.min(hi, v));
    }
}
