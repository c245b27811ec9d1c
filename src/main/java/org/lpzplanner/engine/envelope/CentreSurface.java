package org.lpzplanner.engine.envelope;

import java.util.Arrays;
import java.util.List;
import java.util.stream.IntStream;

/**
 * The lowest free sphere-centre height over every cell of a grid (D, or L where conductors have
 * free space beneath them: see {@link CentreHeights}): exact at each node (cell centre), and a lower
 * bound over each whole cell. Both include the ground floor D ≥ R.
 *
 * <p>Cost O(Σ supports · cells in reach); rows are split across cores.
 */
public final class CentreSurface {

    private final Grid grid;
    private final double radius;
    private final double[] nodeHeight;
    private final double[] cellLower;
    /** Per vertex of the lattice, the least lower bound of the cells around it (see {@link #vertexLowers}). */
    private final double[] vertexLower;

    private CentreSurface(Grid grid, double radius, double[] nodeHeight, double[] cellLower, double[] vertexLower) {
        this.grid = grid;
        this.radius = radius;
        this.nodeHeight = nodeHeight;
        this.cellLower = cellLower;
        this.vertexLower = vertexLower;
    }

    public static CentreSurface compute(Grid grid, List<Support> supports, double radius) {
        int nx = grid.nx(), ny = grid.ny();
        double[] node = new double[nx * ny];
        double[] low = new double[nx * ny];
        Arrays.fill(node, radius);
        Arrays.fill(low, radius);
        rasterize(grid, supports, radius, node, low, 0, 0, nx - 1, ny - 1);
        double[] vertices = new double[(nx + 1) * (ny + 1)];
        fillVertexLowers(grid, radius, low, vertices, 0, 0, nx, ny);
        return new CentreSurface(grid, radius, node, low, vertices);
    }

    /**
     * The same surface after a change to the supports that only affects cells in [i0, i1] × [j0, j1]:
     * those cells are computed afresh from all supports, the rest are kept. Equal to
     * {@link #compute} with the new supports when the window holds every cell within R of what
     * changed.
     */
    public CentreSurface recompute(List<Support> supports, int i0, int j0, int i1, int j1) {
        int nx = grid.nx();
        double[] node = nodeHeight.clone();
        double[] low = cellLower.clone();
        for (int j = Math.max(0, j0); j <= Math.min(grid.ny() - 1, j1); j++) {
            for (int i = Math.max(0, i0); i <= Math.min(nx - 1, i1); i++) {
                node[j * nx + i] = radius;
                low[j * nx + i] = radius;
            }
        }
        rasterize(grid, supports, radius, node, low, Math.max(0, i0), Math.max(0, j0),
                Math.min(nx - 1, i1), Math.min(grid.ny() - 1, j1));
        double[] vertices = vertexLower.clone();
        // only the corners of recomputed cells can change
        fillVertexLowers(grid, radius, low, vertices, Math.max(0, i0), Math.max(0, j0), Math.min(nx, i1 + 1),
                Math.min(grid.ny(), j1 + 1));
        return new CentreSurface(grid, radius, node, low, vertices);
    }

    /** Raises node and cell values in the window to every support's exact value and lower bound. */
    private static void rasterize(Grid grid, List<Support> supports, double radius, double[] node, double[] low,
            int wi0, int wj0, int wi1, int wj1) {
        int nx = grid.nx();
        double half = grid.h() / 2;
        int rows = wj1 - wj0 + 1;
        int bands = Math.max(1, Math.min(rows, 4 * Runtime.getRuntime().availableProcessors()));
        List<Support> spans = supports.stream().filter(Support::hasSpaceBelow).toList();
        IntStream.range(0, bands).parallel().forEach(b -> {
            int jFrom = wj0 + (int) ((long) rows * b / bands), jTo = wj0 + (int) ((long) rows * (b + 1) / bands);
            for (Support s : supports) {
                if (s.hasSpaceBelow()) {
                    continue;
                }
                double[] r = s.reach();
                int i0 = Math.max(wi0, (int) Math.floor((r[0] - grid.x0()) / grid.h()) - 1);
                int i1 = Math.min(wi1, (int) Math.floor((r[2] - grid.x0()) / grid.h()) + 1);
                int j0 = Math.max(jFrom, (int) Math.floor((r[1] - grid.y0()) / grid.h()) - 1);
                int j1 = Math.min(jTo - 1, (int) Math.floor((r[3] - grid.y0()) / grid.h()) + 1);
                for (int j = j0; j <= j1; j++) {
                    double y = grid.nodeY(j);
                    int row = j * nx;
                    for (int i = i0; i <= i1; i++) {
                        double x = grid.nodeX(i);
                        double d = s.centreHeight(x, y);
                        if (d > node[row + i]) {
                            node[row + i] = d;
                        }
                        double l = s.lowerBound(x, y, half);
                        if (l > low[row + i]) {
                            low[row + i] = l;
                        }
                    }
                }
            }
            if (!spans.isEmpty()) {
                raiseOverSpans(grid, spans, node, low, wi0, wi1, jFrom, jTo - 1);
            }
        });
    }

    /**
     * Second pass over the cells the spans reach, once the solid value of each cell is known: the
     * node moves above every span's excluded interval it lies in, the cell bound rises where no gap
     * under it is possible ({@link CentreHeights}).
     */
    private static void raiseOverSpans(Grid grid, List<Support> spans, double[] node, double[] low, int wi0, int wi1,
            int wj0, int wj1) {
        int nx = grid.nx();
        double half = grid.h() / 2;
        double[] box = {Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY,
            Double.NEGATIVE_INFINITY};
        for (Support s : spans) {
            double[] r = s.reach();
            box[0] = Math.min(box[0], r[0]);
            box[1] = Math.min(box[1], r[1]);
            box[2] = Math.max(box[2], r[2]);
            box[3] = Math.max(box[3], r[3]);
        }
        int i0 = Math.max(wi0, (int) Math.floor((box[0] - grid.x0()) / grid.h()) - 1);
        int i1 = Math.min(wi1, (int) Math.floor((box[2] - grid.x0()) / grid.h()) + 1);
        int j0 = Math.max(wj0, (int) Math.floor((box[1] - grid.y0()) / grid.h()) - 1);
        int j1 = Math.min(wj1, (int) Math.floor((box[3] - grid.y0()) / grid.h()) + 1);
        for (int j = j0; j <= j1; j++) {
            double y = grid.nodeY(j);
            int row = j * nx;
            for (int i = i0; i <= i1; i++) {
                double x = grid.nodeX(i);
                node[row + i] = CentreHeights.aboveSpans(spans, x, y, node[row + i]);
                low[row + i] = CentreHeights.raiseOverSpans(spans, x, y, half, low[row + i]);
            }
        }
    }

    public Grid grid() { return grid; }

    public double radius() { return radius; }

    /** D at the node of cell (i, j). */
    public double nodeHeight(int i, int j) { return nodeHeight[j * grid.nx() + i]; }

    /** A value ≤ D everywhere in cell (i, j). */
    public double cellLower(int i, int j) { return cellLower[j * grid.nx() + i]; }

    double[] nodeHeights() { return nodeHeight; }

    double[] cellLowers() { return cellLower; }

    /**
     * Per vertex, the least lower bound of the (up to four) cells around it; outside cells are open
     * ground. Shared, not a copy: do not modify.
     */
    double[] vertexLowers() {
        return vertexLower;
    }

    /** Fills the vertex values of vertices [vi0, vi1] × [vj0, vj1]. */
    private static void fillVertexLowers(Grid grid, double radius, double[] cellLower, double[] v, int vi0, int vj0,
            int vi1, int vj1) {
        int nx = grid.nx(), ny = grid.ny();
        for (int j = vj0; j <= vj1; j++) {
            for (int i = vi0; i <= vi1; i++) {
                double m = Double.POSITIVE_INFINITY;
                for (int dj = -1; dj <= 0; dj++) {
                    for (int di = -1; di <= 0; di++) {
                        int ci = i + di, cj = j + dj;
                        double c = ci < 0 || cj < 0 || ci >= nx || cj >= ny ? radius : cellLower[cj * nx + ci];
                        m = Math.min(m, c);
                    }
                }
                v[j * (nx + 1) + i] = m;
            }
        }
    }
}
