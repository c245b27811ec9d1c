package org.lpzplanner.engine.exposure;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Set;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.operation.union.UnaryUnionOp;
import org.lpzplanner.engine.envelope.Target;
import org.lpzplanner.engine.geom.Areas;
import org.lpzplanner.engine.geom.PlanPolygon;
import org.lpzplanner.engine.geom.Plane;
import org.lpzplanner.engine.geom.RoofFace;

/**
 * Exposed part of every roof face.
 *
 * <p>A grid cell lying wholly in a face is exposed when the envelope's least value over the cell is
 * at or below the face's highest point in the cell (plus the margin). A cell on the face's
 * boundary is split into squares lying wholly in the face (down to an eighth of the cell) and
 * decided the same way; the sliver along the boundary that no such square covers is judged with
 * the edge it borders, so the cell is also exposed when an exposed edge of the same owner passes
 * through it (such a cell whose squares are all protected is exposed only at that edge, and says
 * so). Keeping boundary lines out of the squares matters: on a wall of a structure taller
 * than R the envelope drops to the facade's exposure, which says nothing about the roof beside it.
 * The exposed part is the union of exposed cells clipped to the face's visible part (the face less
 * what higher solids of other owners cover).
 */
final class RoofExposureOp {

    /** Boundary cells are split down to cell size / 2^this. */
    private static final int BOUNDARY_SPLITS = 3;

    private RoofExposureOp() {
    }

    /**
     * Cell states of a face. {@code EXPOSED_AT_EDGE}: an exposed edge of the same owner crosses the
     * cell and the cell counts as exposed, while every square of it lying wholly in the face is
     * below the envelope, so the exposure is the edge's own (a designer who accepts the edge
     * accepts it; a part that protects the edge settles it).
     */
    static final byte OUTSIDE = 0, HIDDEN = 1, PROTECTED = 2, EXPOSED = 3, EXPOSED_AT_EDGE = 4;

    /**
     * Every decision taken for one face: the state of each cell of its bounding cell range
     * [i0, i1] × [j0, j1] (row by row), the clearance of each protected whole cell (NaN for the
     * others), and the face's visible part.
     */
    record FaceCells(int i0, int j0, int i1, int j1, byte[] state, double[] clearance, Geometry visible,
            boolean partlyCovered) {

        int index(int i, int j) {
            return (j - j0) * (i1 - i0 + 1) + (i - i0);
        }
    }

    /** A face's decisions and what they add up to. */
    record FaceResult(FaceCells cells, RoofExposure exposure) {
    }

    /**
     * Decides one face. With {@code previous} (the same face's decisions and exposure in the analysis
     * before an edit), only the cells the change window touches where the changed columns may bring
     * the envelope down to the cell's threshold ({@link ChangeBound}), and the cells whose
     * exposed-edge marks changed, are decided again; the rest are taken over, and so is the
     * exposure when no decision changed.
     */
    static FaceResult face(ExposureContext ctx, int k, Set<Integer> edgeCells, FaceResult previousResult,
            Set<Integer> previousEdgeCells, ChangeWindow window, ChangeBound changeBound) {
        FaceCells previous = previousResult == null ? null : previousResult.cells();
        RoofFace face = ctx.surface.faces().get(k);
        PlanPolygon poly = ctx.surface.facePolygon(k);
        Plane plane = face.plane();
        var g = ctx.grid;
        double half = g.h() / 2;
        int i0 = g.column(poly.minX()), i1 = g.column(poly.maxX()), j0 = g.row(poly.minY()), j1 = g.row(poly.maxY());
        Geometry visible;
        boolean partlyCovered;
        if (previous != null) {
            visible = previous.visible();
            partlyCovered = previous.partlyCovered();
        } else {
            List<Polygon> covers = coveringFaces(ctx, k);
            partlyCovered = !covers.isEmpty();
            visible = partlyCovered ? face.polygon().difference(UnaryUnionOp.union(covers)) : face.polygon();
        }
        int w = i1 - i0 + 1;
        byte[] state = new byte[w * (j1 - j0 + 1)];
        double[] clearance = new double[state.length];
        Arrays.fill(clearance, Double.NaN);
        FaceCells cells = new FaceCells(i0, j0, i1, j1, state, clearance, visible, partlyCovered);
        for (int j = j0; j <= j1; j++) {
            for (int i = i0; i <= i1; i++) {
                int c = cells.index(i, j);
                double x = g.nodeX(i), y = g.nodeY(j);
                int gridIndex = j * g.nx() + i;
                if (previous != null && edgeCells.contains(gridIndex) == previousEdgeCells.contains(gridIndex)
                        && (!window.touchesCell(x, y, half) || (changeBound != null && changeBound.cannotReach(
                                x - half, y - half, x + half, y + half, roofMax(plane, x, y, half) + ExposureContext.MARGIN)))) {
                    // the edit cannot bring the envelope down to this cell's decision threshold
                    state[c] = previous.state()[c];
                    double before = previous.clearance()[c];
                    // a protected whole cell keeps its clearance from the grid bound, which may have moved
                    clearance[c] = Double.isNaN(before) ? before : ctx.field.cellLower(i, j) - roofMax(plane, x, y, half);
                    continue;
                }
                decideCell(ctx, poly, plane, edgeCells, cells, i, j);
            }
        }
        if (previous != null && Arrays.equals(state, previous.state()) && Arrays.equals(clearance, previous.clearance())) {
            return previousResult; // the exposure is a function of the decisions alone
        }
        return new FaceResult(cells, exposure(ctx, k, cells));
    }

    private static void decideCell(ExposureContext ctx, PlanPolygon poly, Plane plane, Set<Integer> edgeCells, FaceCells cells, int i, int j) {
        var g = ctx.grid;
        double half = g.h() / 2;
        double x = g.nodeX(i), y = g.nodeY(j);
        int c = cells.index(i, j);
        boolean centreInside = poly.contains(x, y);
        if (!centreInside && poly.distanceToBoundary(x, y) > half * Math.sqrt(2)) {
            return;
        }
        if (cells.partlyCovered() && centreInside && ctx.surface.topHeight(x, y) > plane.z(x, y) + 1e-6) {
            cells.state()[c] = HIDDEN; // inside a higher solid
            return;
        }
        boolean whole = poly.containsSquare(x, y, half);
        boolean isExposed;
        boolean onlyAtEdge = false;
        if (whole) {
            isExposed = squareExposed(ctx, plane, x, y, half, i, j);
        } else if (roofMax(plane, x, y, half) + ExposureContext.MARGIN < ctx.field.cellLower(i, j)) {
            isExposed = false; // the whole cell, boundary line included, is below the envelope
        } else {
            boolean inside = boundaryExposed(ctx, poly, plane, x, y, half);
            onlyAtEdge = !inside && edgeCells.contains(j * g.nx() + i);
            isExposed = inside || onlyAtEdge;
        }
        cells.state()[c] = onlyAtEdge ? EXPOSED_AT_EDGE : isExposed ? EXPOSED : PROTECTED;
        if (!isExposed && whole) {
            cells.clearance()[c] = ctx.field.cellLower(i, j) - roofMax(plane, x, y, half);
        }
    }

    /** The face's exposed part, areas and least clearance from its cell decisions. */
    private static RoofExposure exposure(ExposureContext ctx, int k, FaceCells cells) {
        RoofFace face = ctx.surface.faces().get(k);
        var g = ctx.grid;
        boolean[] exposed = new boolean[g.nx() * g.ny()];
        boolean[] atEdge = null;
        int candidates = 0, exposedCount = 0, hidden = 0;
        double minClearance = Double.NaN;
        for (int j = cells.j0(); j <= cells.j1(); j++) {
            for (int i = cells.i0(); i <= cells.i1(); i++) {
                int c = cells.index(i, j);
                byte s = cells.state()[c];
                if (s == HIDDEN) {
                    hidden++;
                } else if (s == EXPOSED || s == EXPOSED_AT_EDGE) {
                    candidates++;
                    exposedCount++;
                    exposed[j * g.nx() + i] = true;
                    if (s == EXPOSED_AT_EDGE) {
                        if (atEdge == null) {
                            atEdge = new boolean[exposed.length];
                        }
                        atEdge[j * g.nx() + i] = true;
                    }
                } else if (s == PROTECTED) {
                    candidates++;
                    double clearance = cells.clearance()[c];
                    if (!Double.isNaN(clearance)) {
                        minClearance = Double.isNaN(minClearance) ? clearance : Math.min(minClearance, clearance);
                    }
                }
            }
        }
        Geometry visible = cells.visible();
        Geometry exposedArea;
        if (exposedCount == 0) {
            exposedArea = ctx.gf.createPolygon();
        } else if (exposedCount == candidates && hidden == 0) {
            exposedArea = visible;
        } else {
            exposedArea = new CellRegions(g, ctx.gf).union(exposed, cells.i0(), cells.j0(), cells.i1(), cells.j1())
                    .intersection(visible);
        }
        if (!Double.isNaN(minClearance)) {
            minClearance = Math.max(0, minClearance);
        }
        Geometry alongEdges = atEdge == null ? ctx.gf.createPolygon()
                : Areas.of(new CellRegions(g, ctx.gf).union(atEdge, cells.i0(), cells.j0(), cells.i1(), cells.j1())
                        .intersection(exposedArea), ctx.gf);
        return new RoofExposure(face.ownerId(), face.ownerName(), face.kind(), face.index(), face.polygon(),
                face.plane().slopeFactor(), exposedArea, visible.getArea(), exposedArea.getArea(), minClearance,
                alongEdges);
    }

    private static double roofMax(Plane plane, double x, double y, double half) {
        return plane.z(x, y) + (Math.abs(plane.a()) + Math.abs(plane.b())) * half;
    }

    /** Decision for a whole grid cell inside the face: grid bounds first, then the resting sphere, then exact. */
    private static boolean squareExposed(ExposureContext ctx, Plane plane, double x, double y, double half, int i, int j) {
        double top = roofMax(plane, x, y, half);
        if (top + ExposureContext.MARGIN < ctx.field.cellLower(i, j)) {
            return false;
        }
        if (plane.z(x, y) + ExposureContext.MARGIN >= restingUpper(ctx, plane, x, y)) {
            return true;
        }
        return ctx.isExposed(Target.square(x, y, half), top);
    }

    /** True when some square lying wholly in the face within this boundary cell is exposed. */
    private static boolean boundaryExposed(ExposureContext ctx, PlanPolygon poly, Plane plane, double x, double y,
            double half) {
        List<Target.Square> inside = new ArrayList<>();
        insideSquares(poly, x, y, half, 0, inside);
        if (inside.isEmpty()) {
            return false;
        }
        double top = Double.NEGATIVE_INFINITY;
        for (Target.Square sq : inside) {
            if (plane.z(sq.x(), sq.y()) + ExposureContext.MARGIN >= restingUpper(ctx, plane, sq.x(), sq.y())) {
                return true;
            }
            top = Math.max(top, roofMax(plane, sq.x(), sq.y(), sq.half()));
        }
        return ctx.isExposed(Target.union(inside), top);
    }

    /** Quadtree cover of the cell's part inside the face by squares lying wholly in it. */
    private static void insideSquares(PlanPolygon poly, double x, double y, double half, int depth,
            List<Target.Square> out) {
        if (poly.containsSquare(x, y, half)) {
            out.add(new Target.Square(x, y, half));
            return;
        }
        if (depth == BOUNDARY_SPLITS || (!poly.contains(x, y) && poly.distanceToBoundary(x, y) > half * Math.sqrt(2))) {
            return;
        }
        double q = half / 2;
        for (int dj = -1; dj <= 1; dj += 2) {
            for (int di = -1; di <= 1; di += 2) {
                insideSquares(poly, x + di * q, y + dj * q, q, depth + 1, out);
            }
        }
    }

    /**
     * E at (x, y) from above, using the sphere that rests on the face's plane with its contact at
     * that point: its centre sits R·(a, b)/s up-slope, and E ≤ D(c) − R/s, which equals the roof
     * height wherever nothing else holds that sphere up.
     */
    private static double restingUpper(ExposureContext ctx, Plane plane, double x, double y) {
        double s = plane.slopeFactor(), r = ctx.field.radius();
        double cx = x - r * plane.a() / s, cy = y - r * plane.b() / s;
        return ctx.field.refiner().centreHeight(cx, cy) - r / s;
    }

    /** Faces of other owners that overlap this face and stand higher there. */
    private static List<Polygon> coveringFaces(ExposureContext ctx, int k) {
        RoofFace face = ctx.surface.faces().get(k);
        PlanPolygon poly = ctx.surface.facePolygon(k);
        List<Polygon> out = new ArrayList<>();
        for (int m = 0; m < ctx.surface.faces().size(); m++) {
            RoofFace other = ctx.surface.faces().get(m);
            PlanPolygon op = ctx.surface.facePolygon(m);
            if (m == k || other.ownerId().equals(face.ownerId()) || op.minX() > poly.maxX() || op.maxX() < poly.minX()
                    || op.minY() > poly.maxY() || op.maxY() < poly.minY()) {
                continue;
            }
            Geometry overlap = face.polygon().intersection(other.polygon());
            if (overlap.getArea() > 1e-6) {
                var c = overlap.getInteriorPoint().getCoordinate();
                if (other.plane().z(c.x, c.y) > face.plane().z(c.x, c.y) + 1e-6) {
                    out.add(other.polygon());
                }
            }
        }
        return out;
    }
}
