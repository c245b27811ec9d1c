package org.lpzplanner.engine.design.proposal;

import java.util.ArrayList;
import java.util.List;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.index.strtree.STRtree;
import org.locationtech.jts.operation.distance.DistanceOp;
import org.lpzplanner.engine.exposure.AnalysisResult;
import org.lpzplanner.engine.exposure.CornerExposure;
import org.lpzplanner.engine.exposure.EdgeExposure;
import org.lpzplanner.engine.exposure.FacadeBand;
import org.lpzplanner.engine.exposure.RoofExposure;
import org.lpzplanner.engine.exposure.SideFlashRule;
import org.lpzplanner.engine.geom.Areas;
import org.lpzplanner.engine.geom.SiteSurface;

/**
 * Points sampled on everything an analysis found exposed, less what the designer accepted: roof
 * areas (less the cells exposed only at an exposed edge, which that edge's points stand for) on a {@value #ROOF_SPACING} m grid (and one inner point of every piece, however small),
 * edges every {@value #LINE_SPACING} m with both ends, corners, and facade bands along the wall a
 * quarter and half-way up (their tops are roof edges, sampled as such).
 */
final class ExposedPoints {

    static final double ROOF_SPACING = 1.0;
    static final double LINE_SPACING = 0.5;

    /**
     * A sampled exposed point and what it lies on ("edge", "roof", "corner", "facade"). For points
     * on lines, (dx, dy) is the line's plan direction (unit); for roof points, (a, b) the slope of
     * the roof plane z = a·x + b·y + e; zero where it does not apply. {@code rise} is how much the
     * surface climbs per metre of plan within a grid cell round the point (|a| + |b| on a roof face,
     * the slope of a sloped edge, 0 elsewhere): the analysis decides a cell or edge piece by its
     * highest point, so a point may be reported exposed for a spot up to rise·h above it.
     */
    record Point(double x, double y, double z, String ownerId, String what, double dx, double dy, double a, double b,
            double rise) {

        /** The point raised to the highest the surface reaches in a cell of size h containing it. */
        Point raised(double h, double ox, double oy) {
            return new Point(x + ox, y + oy, z + rise * h, ownerId, what, dx, dy, a, b, rise);
        }
    }

    private final STRtree acceptedIndex = new STRtree();
    private final boolean anyAccepted;
    private final GeometryFactory gf = new GeometryFactory();

    ExposedPoints(List<Geometry> accepted) {
        for (Geometry g : accepted) {
            Envelope e = g.getEnvelopeInternal().copy();
            e.expandBy(ProposalOptions.ACCEPTED_REACH);
            acceptedIndex.insert(e, g);
        }
        anyAccepted = !accepted.isEmpty();
        acceptedIndex.build();
    }

    /** Sampled points of the result's exposed items that are not accepted. */
    List<Point> of(AnalysisResult result, SiteSurface surface) {
        List<Point> out = new ArrayList<>();
        java.util.Map<String, org.lpzplanner.engine.geom.Plane> planes = new java.util.HashMap<>();
        for (var f : surface.faces()) {
            planes.put(f.ownerId() + "|" + f.kind() + "|" + f.index(), f.plane());
        }
        for (RoofExposure r : result.roofs()) {
            if (!r.isExposed()) {
                continue;
            }
            var plane = planes.get(r.ownerId() + "|" + r.kind() + "|" + r.faceIndex());
            // cells exposed only because an exposed edge crosses them are that edge's exposure,
            // sampled with the edge: a part that protects the edge settles them, accepting it accepts them
            Geometry atEdges = r.exposedAtEdges();
            Geometry exposed = atEdges.isEmpty() ? r.exposed() : Areas.of(r.exposed(), gf).difference(atEdges);
            org.locationtech.jts.algorithm.locate.IndexedPointInAreaLocator inAtEdges = atEdges.isEmpty() ? null
                    : new org.locationtech.jts.algorithm.locate.IndexedPointInAreaLocator(atEdges);
            for (int k = 0; k < exposed.getNumGeometries(); k++) {
                Geometry piece = exposed.getGeometryN(k);
                if (piece.isEmpty()) {
                    continue;
                }
                Envelope e = piece.getEnvelopeInternal();
                org.locationtech.jts.algorithm.locate.IndexedPointInAreaLocator inside =
                        new org.locationtech.jts.algorithm.locate.IndexedPointInAreaLocator(piece);
                double x0 = Math.floor(e.getMinX() / ROOF_SPACING) * ROOF_SPACING + ROOF_SPACING / 2;
                double y0 = Math.floor(e.getMinY() / ROOF_SPACING) * ROOF_SPACING + ROOF_SPACING / 2;
                for (double x = x0; x <= e.getMaxX(); x += ROOF_SPACING) {
                    for (double y = y0; y <= e.getMaxY(); y += ROOF_SPACING) {
                        if (inside.locate(new Coordinate(x, y)) != org.locationtech.jts.geom.Location.EXTERIOR
                                && !strictlyIn(inAtEdges, x, y)) {
                            add(out, new Point(x, y, plane.z(x, y), r.ownerId(), "roof", 0, 0, plane.a(), plane.b(),
                                    Math.abs(plane.a()) + Math.abs(plane.b())));
                        }
                    }
                }
                Coordinate c = piece.getInteriorPoint().getCoordinate();
                if (c != null && !strictlyIn(inAtEdges, c.x, c.y)) {
                    add(out, new Point(c.x, c.y, plane.z(c.x, c.y), r.ownerId(), "roof", 0, 0, plane.a(), plane.b(),
                                    Math.abs(plane.a()) + Math.abs(plane.b())));
                }
            }
        }
        for (EdgeExposure e : result.edges()) {
            alongLine(out, e.line(), e.ownerId(), "edge", null);
        }
        for (CornerExposure c : result.corners()) {
            add(out, new Point(c.point().x, c.point().y, c.point().getZ(), c.ownerId(), "corner", 0, 0, 0, 0, 0));
        }
        // only what needs lateral air-termination (IEC 62305-3:2010 5.2.3); where flashes to the side
        // are negligible there is nothing to cover
        for (SideFlashRule.Part p : result.facadePartsNeedingLateral()) {
            FacadeBand b = p.band();
            alongLine(out, b.line(), b.ownerId(), "facade", p.bottom() + (p.top() - p.bottom()) / 4);
            alongLine(out, b.line(), b.ownerId(), "facade", (p.bottom() + p.top()) / 2);
        }
        return out;
    }

    private void alongLine(List<Point> out, LineString line, String owner, String what, Double fixedZ) {
        Coordinate[] cs = line.getCoordinates();
        for (int i = 1; i < cs.length; i++) {
            Coordinate a = cs[i - 1], b = cs[i];
            double len = a.distance(b);
            if (len < 1e-9) {
                continue;
            }
            double dx = (b.x - a.x) / len, dy = (b.y - a.y) / len;
            double rise = fixedZ != null ? 0 : Math.abs(z(b) - z(a)) / len;
            int steps = Math.max(1, (int) Math.ceil(len / LINE_SPACING));
            for (int k = (i == 1 ? 0 : 1); k <= steps; k++) {
                double t = (double) k / steps;
                double z = fixedZ != null ? fixedZ : z(a) + t * (z(b) - z(a));
                add(out, new Point(a.x + t * (b.x - a.x), a.y + t * (b.y - a.y), z, owner, what, dx, dy, 0, 0, rise));
            }
        }
    }

    private static boolean strictlyIn(org.locationtech.jts.algorithm.locate.IndexedPointInAreaLocator area, double x,
            double y) {
        return area != null && area.locate(new Coordinate(x, y)) == org.locationtech.jts.geom.Location.INTERIOR;
    }

    private static double z(Coordinate c) {
        return Double.isNaN(c.getZ()) ? 0 : c.getZ();
    }

    private void add(List<Point> out, Point p) {
        if (!isAccepted(p.x(), p.y())) {
            out.add(p);
        }
    }

    /** True when (x, y) lies within the accepted reach of an accepted item. */
    boolean isAccepted(double x, double y) {
        if (!anyAccepted) {
            return false;
        }
        Geometry p = gf.createPoint(new Coordinate(x, y));
        for (Object o : acceptedIndex.query(new Envelope(x, x, y, y))) {
            if (DistanceOp.isWithinDistance((Geometry) o, p, ProposalOptions.ACCEPTED_REACH)) {
                return true;
            }
        }
        return false;
    }
}
