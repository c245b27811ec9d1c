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

    public static EnvelopeField compute(SiteSurface surface, double radius, double h) {
        List<Support> supports = Supports.of(surface, radius);
        Grid grid = gridFor(surface, supports, radius, h);
        CentreSurface centres = CentreSurface.compute(grid, supports, radius);
        double[] vertexLower = BallErosion.erode(centres.vertexLowers(), grid.nx() + 1, grid.ny() + 1, h, radius);
        SupportIndex index = new SupportIndex(supports, grid, Math.max(4 * h, radius / 4));
        return new EnvelopeField(centres, new EnvelopeRefiner(centres, index), vertexLower);
    }
}
