package org.lpzplanner.engine.exposure;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.locationtech.jts.algorithm.Orientation;
import org.locationtech.jts.algorithm.PointLocation;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LinearRing;
import org.locationtech.jts.geom.Polygon;
import org.lpzplanner.engine.envelope.Grid;

/**
 * Turns a set of marked grid cells into polygons by tracing their outline, without any polygon
 * overlay (which costs far more on large, ragged cell sets).
 *
 * <p>Every side between a marked and an unmarked cell is a directed edge with the marked cell on
 * its left; edges are chained into rings, turning left where two cells meet only at a corner, so
 * such cells stay apart. A ring that comes back to a point it passed is split there into simple
 * rings. Counter-clockwise rings are shells, clockwise ones holes, each hole going to the smallest
 * shell around it. Only corners are kept as vertices. The result is a valid (multi)polygon covering
 * exactly the marked cells.
 */
final class CellRegions {

    private static final int EAST = 1, NORTH = 2, WEST = 4, SOUTH = 8;
    private static final int[] DI = {1, 0, -1, 0};
    private static final int[] DJ = {0, 1, 0, -1};

    private final Grid grid;
    private final GeometryFactory gf;

    CellRegions(Grid grid, GeometryFactory gf) {
        this.grid = grid;
        this.gf = gf;
    }

    /** The union of the marked cells within [i0, i1] × [j0, j1]; marks indexed j * nx + i. */
    Geometry union(boolean[] marked, int i0, int j0, int i1, int j1) {
        int nx = grid.nx();
        int w = i1 - i0 + 2; // vertices per row of the window
        int rows = j1 - j0 + 2;
        byte[] out = new byte[w * rows];
        for (int j = j0; j <= j1; j++) {
            for (int i = i0; i <= i1; i++) {
                if (!marked[j * nx + i]) {
                    continue;
                }
                int vi = i - i0, vj = j - j0;
                if (j == j0 || !marked[(j - 1) * nx + i]) {
                    out[vj * w + vi] |= EAST;
                }
                if (i == i1 || !marked[j * nx + i + 1]) {
                    out[vj * w + vi + 1] |= NORTH;
                }
                if (j == j1 || !marked[(j + 1) * nx + i]) {
                    out[(vj + 1) * w + vi + 1] |= WEST;
                }
                if (i == i0 || !marked[j * nx + i - 1]) {
                    out[(vj + 1) * w + vi] |= SOUTH;
                }
            }
        }
        List<Coordinate[]> shells = new ArrayList<>();
        List<Coordinate[]> holes = new ArrayList<>();
        for (int v = 0; v < out.length; v++) {
            while (out[v] != 0) {
                for (Coordinate[] ring : split(trace(out, w, v, i0, j0))) {
                    (Orientation.isCCW(ring) ? shells : holes).add(ring);
                }
            }
        }
        if (shells.isEmpty()) {
            return gf.createPolygon();
        }
        return assemble(shells, holes);
    }

    /** One closed walk from vertex v, with the corners it turns at (first = last). */
    private List<Coordinate> trace(byte[] out, int w, int v0, int i0, int j0) {
        int startDir = Integer.numberOfTrailingZeros(out[v0]);
        List<Coordinate> corners = new ArrayList<>();
        corners.add(vertex(v0, w, i0, j0));
        int v = v0, dir = startDir;
        while (true) {
            out[v] &= (byte) ~(1 << dir);
            v += DJ[dir] * w + DI[dir];
            if (v == v0 && out[v] == 0) {
                break;
            }
            int next = -1;
            for (int turn : new int[] {1, 0, 3}) { // left, straight on, right
                int d = (dir + turn) % 4;
                if ((out[v] & (1 << d)) != 0) {
                    next = d;
                    break;
                }
            }
            if (next < 0) {
                throw new IllegalStateException("cell outline does not close");
            }
            if (next != dir) {
                corners.add(vertex(v, w, i0, j0));
            }
            dir = next;
        }
        corners.add(corners.get(0));
        return corners;
    }

    private Coordinate vertex(int v, int w, int i0, int j0) {
        int i = i0 + v % w, j = j0 + v / w;
        return new Coordinate(grid.x0() + i * grid.h(), grid.y0() + j * grid.h());
    }

    /** Splits a closed walk at every point it passes twice into simple closed rings. */
    private static List<Coordinate[]> split(List<Coordinate> walk) {
        List<Coordinate[]> rings = new ArrayList<>();
        List<Coordinate> stack = new ArrayList<>();
        Map<Coordinate, Integer> at = new HashMap<>();
        for (int k = 0; k < walk.size(); k++) {
            Coordinate c = walk.get(k);
            Integer seen = at.get(c);
            if (seen != null) {
                List<Coordinate> loop = new ArrayList<>(stack.subList(seen, stack.size()));
                loop.add(c);
                if (loop.size() >= 4) {
                    rings.add(loop.toArray(Coordinate[]::new));
                }
                for (int m = stack.size() - 1; m > seen; m--) {
                    at.remove(stack.remove(m));
                }
            } else {
                at.put(c, stack.size());
                stack.add(c);
            }
        }
        return rings;
    }

    private Geometry assemble(List<Coordinate[]> shells, List<Coordinate[]> holes) {
        List<List<LinearRing>> holesOf = new ArrayList<>();
        double[] areas = new double[shells.size()];
        Envelope[] boxes = new Envelope[shells.size()];
        for (int s = 0; s < shells.size(); s++) {
            holesOf.add(new ArrayList<>());
            areas[s] = Math.abs(org.locationtech.jts.algorithm.Area.ofRingSigned(shells.get(s)));
            boxes[s] = new Envelope();
            for (Coordinate c : shells.get(s)) {
                boxes[s].expandToInclude(c);
            }
        }
        double q = grid.h() / 4;
        for (Coordinate[] hole : holes) {
            // a point of a marked cell beside the hole's first side (marked cells lie to the left)
            Coordinate a = hole[0], b = hole[1];
            double dx = Math.signum(b.x - a.x), dy = Math.signum(b.y - a.y);
            Coordinate probe = new Coordinate(a.x + dx * q - dy * q, a.y + dy * q + dx * q);
            int best = -1;
            for (int s = 0; s < shells.size(); s++) {
                if (boxes[s].contains(probe) && (best < 0 || areas[s] < areas[best])
                        && PointLocation.isInRing(probe, shells.get(s))) {
                    best = s;
                }
            }
            if (best < 0) {
                throw new IllegalStateException("a hole of the cell outline lies in no shell");
            }
            holesOf.get(best).add(gf.createLinearRing(hole));
        }
        Polygon[] polygons = new Polygon[shells.size()];
        for (int s = 0; s < shells.size(); s++) {
            polygons[s] = gf.createPolygon(gf.createLinearRing(shells.get(s)), holesOf.get(s).toArray(LinearRing[]::new));
        }
        return polygons.length == 1 ? polygons[0] : gf.createMultiPolygon(polygons);
    }
}
