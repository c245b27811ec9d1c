package org.lpzplanner.engine.exposure;

import java.util.List;
import org.lpzplanner.engine.envelope.EnvelopeOp;
import org.lpzplanner.engine.envelope.Grid;
import org.lpzplanner.engine.envelope.Support;
import org.lpzplanner.engine.envelope.Supports;
import org.lpzplanner.engine.geom.SiteSurface;

/**
 * Picks the grid spacing when the user gives none: the finest of 0.25, 0.5, 1, 2, 4 m whose grid
 * stays within a cell budget (0.25 m only for small sites). The spacing affects speed and how
 * often decisions need exact refinement, never the safety of the result.
 */
public final class ResolutionChoice {

    static final double[] STEPS = {0.25, 0.5, 1, 2, 4};
    static final long FINE_BUDGET = 400_000;
    static final long BUDGET = 8_000_000;

    private ResolutionChoice() {
    }

    public static double choose(SiteSurface surface, double radius) {
        List<Support> supports = Supports.of(surface, radius);
        for (double h : STEPS) {
            Grid g = EnvelopeOp.gridFor(surface, supports, radius, h);
            if ((long) g.nx() * g.ny() <= (h < 0.5 ? FINE_BUDGET : BUDGET)) {
                return h;
            }
        }
        return STEPS[STEPS.length - 1];
    }
}
