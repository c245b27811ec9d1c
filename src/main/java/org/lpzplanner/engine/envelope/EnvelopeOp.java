package org.lpzplanner.engine.envelope;

import java.util.List;
import org.lpzplanner.engine.geom.SiteSurface;

/**
 * Computes the protection envelope of a site for one sphere radius: the grey-scale closing of the
 * solid by the ball (centre surface D from the supports, then erosion by the ball).
 *
 * <p>Formulation: D(c) = max(R, max<sub>k</sub> D<sub>k</sub>(c)) is the lowest free centre over
 * column c when everything is solid to the ground; E(p) = min over |c − p| ≤ R of
 * [D(c) − √(R² − |c − p|²)] (rolling sphere method, IEC 62305-3 Annex A).
 */
public final class EnvelopeOp {

    /**
     * Largest grid an analysis may use: about 12 arrays of 8-byte values per cell at peak, so
     * 12 million cells stay near 1 GiB.
     */
    public static final long MAX_CELLS = 12_000_000L;

    private EnvelopeOp() {
    }

    /** The grid: the site's extent plus R and two cells on every side, at spacing h. */
    public static Grid gridFor(SiteSurface surface, List<Support> supports, double radius, double h) {
        double minX = Double.POSITIVE_INFINITY, minY = Double.POSITIVE_INFINITY;
        double maxX = Double.NEGATIVE_INFINITY, maxY = Double.NEGATIVE_INFINITY;
        for (Support s : supports) {
            double[] r = s.reach();
            minX = Math.min(minX, r[0]);
            minY = Math.min(minY, r[1]);
            maxX = Math.max(maxX, r[2]);
            maxY = Math.max(maxY, r[3]);
        }
        if (supports.isEmpty()) {
            minX = minY = -radius;
            maxX = maxY = radius;
        }
        double x0 = Math.floor((minX - 2 * h) / h) * h, y0 = Math.floor((minY - 2 * h) / h) * h;
        int nx = (int) Math.ceil((maxX + 2 * h - x0) / h), ny = (int) Math.ceil((maxY + 2 * h - y0) / h);
        return new Grid(x0, y0, h, nx, ny);
    }

    /**
     * The envelope after a change of air-termination (or anything else) confined to the plan box
     * [minX, maxX] × [minY, maxY] (cover both the old and the new place of what moved). D changes
     * only within R of the box, so only that window of the centre surface is recomputed, and the
     * erosion only where the changed values can matter ({@link ErosionUpdate}); the result equals
     * {@link #compute} on the new surface. Falls back to a full computation when the
     * new site reaches beyond the previous grid.
     */
    public static EnvelopeField update(EnvelopeField previous, SiteSurface surface, double minX, double minY,
            double maxX, double maxY) {
        double radius = previous.radius();
        Grid grid = previous.grid();
        double h = grid.h();
        List<Support> supports = Supports.of(surface, radius);
        Grid needed = gridFor(surface, supports, radius, h);
        if (needed.x0() < grid.x0() || needed.y0() < grid.y0() || needed.x1() > grid.x1() || needed.y1() > grid.y1()) {
            return compute(surface, radius, h);
        }
        int reach = (int) Math.ceil(radius / h) + 1;
        int ci0 = grid.column(minX) - reach, ci1 = grid.column(maxX) + reach;
        int cj0 = grid.row(minY) - reach, cj1 = grid.row(maxY) + reach;
        CentreSurface centres = previous.centres().recompute(supports, ci0, cj0, ci1, cj1);
        // vertex values change only at the corners of recomputed cells
        double[] vertexLower = ErosionUpdate.erode(previous.centres().vertexLowers(), centres.vertexLowers(),
                previous.vertexLowers(), grid.nx() + 1, grid.ny() + 1, h, radius, ci0, cj0, ci1 + 1, cj1 + 1);
        SupportIndex index = new SupportIndex(supports, grid, Math.max(4 * h, radius / 4));
        return new EnvelopeField(centres, new EnvelopeRefiner(centres, index), vertexLower);
    }

    /**
     * Whether an analysis at spacing h fits, without computing anything: lets a caller refuse a
     * request before queueing it.
     *
     * @throws AnalysisTooLargeException when the grid at spacing h would exceed {@link #MAX_CELLS}
     */
    public static void checkSize(SiteSurface surface, double radius, double h) {
        checkCells(gridFor(surface, Supports.of(surface, radius), radius, h), h);
    }

    private static void checkCells(Grid grid, double h) {
        long cells = (long) grid.nx() * grid.ny();
        if (cells > MAX_CELLS) {
            double fits = Math.ceil(h * Math.sqrt((double) cells / MAX_CELLS) * 1.05 * 100) / 100;
            throw new AnalysisTooLargeException(cells, h, fits);
        }
    }

    /**
     * @throws AnalysisTooLargeException when the grid at spacing h would exceed {@link #MAX_CELLS};
     *         nothing is computed then
     */
    public static EnvelopeField compute(SiteSurface surface, double radius, double h) {
        List<Support> supports = Supports.of(surface, radius);
        Grid grid = gridFor(surface, supports, radius, h);
        checkCells(grid, h);
        CentreSurface centres = CentreSurface.compute(grid, supports, radius);
        double[] vertexLower = BallErosion.erode(centres.vertexLowers(), grid.nx() + 1, grid.ny() + 1, h, radius);
        SupportIndex index = new SupportIndex(supports, grid, Math.max(4 * h, radius / 4));
        return new EnvelopeField(centres, new EnvelopeRefiner(centres, index), vertexLower);
    }
}
