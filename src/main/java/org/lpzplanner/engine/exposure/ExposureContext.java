package org.lpzplanner.engine.exposure;

import java.util.concurrent.atomic.AtomicLong;
import org.locationtech.jts.geom.GeometryFactory;
import org.lpzplanner.engine.envelope.EnvelopeField;
import org.lpzplanner.engine.envelope.Grid;
import org.lpzplanner.engine.envelope.Target;
import org.lpzplanner.engine.geom.SiteSurface;

/**
 * What the exposure operations share: the site surface, the envelope, and the decision rule.
 *
 * <p>Decision rule: a solid point at height z is exposed iff z + {@link #MARGIN} ≥ E. Every
 * decision is first tried on the grid's bounds and only refined exactly where those cannot settle
 * it, and a value that stays uncertain counts as exposed.
 */
final class ExposureContext {

    /** Safety margin of every exposure decision, metres: a point this close under the envelope counts as exposed. */
    static final double MARGIN = 0.001;

    final SiteSurface surface;
    final EnvelopeField field;
    final Grid grid;
    final double tolerance;
    final GeometryFactory gf = new GeometryFactory();
    private final AtomicLong refined = new AtomicLong();

    ExposureContext(SiteSurface surface, EnvelopeField field, double tolerance) {
        this.surface = surface;
        this.field = field;
        this.grid = field.grid();
        this.tolerance = tolerance;
    }

    long refinedQueries() {
        return refined.get();
    }

    /** Least lower bound of E over the grid cells overlapping the box (a valid bound for anything inside it). */
    double lowerOver(double minX, double minY, double maxX, double maxY) {
        if (minX < grid.x0() || minY < grid.y0() || maxX > grid.x1() || maxY > grid.y1()) {
            return 0;
        }
        int i0 = grid.column(minX), i1 = grid.column(maxX), j0 = grid.row(minY), j1 = grid.row(maxY);
        double m = Double.POSITIVE_INFINITY;
        for (int j = j0; j <= j1; j++) {
            for (int i = i0; i <= i1; i++) {
                m = Math.min(m, field.cellLower(i, j));
            }
        }
        return m;
    }

    /** True when some point of the target at height ≤ {@code top} is reached by the sphere. */
    boolean isExposed(Target target, double top) {
        double[] b = target.bounds();
        double threshold = top + MARGIN;
        if (threshold < lowerOver(b[0], b[1], b[2], b[3])) {
            return false;
        }
        refined.incrementAndGet();
        return field.refiner().lowest(target, tolerance, threshold).lower() <= threshold;
    }
}
