package org.lpzplanner.engine.exposure;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.locationtech.jts.geom.Coordinate;
import org.lpzplanner.engine.geom.SiteSurface;

/**
 * Finds where the engine's "solid down to the ground" model claims protection that may not exist:
 * a conductor more than R above the surface beneath it lets a real sphere pass under it, while the
 * model fills the space below.
 */
final class AssumptionCheck {

    private AssumptionCheck() {
    }

    static List<String> warnings(SiteSurface surface, double radius) {
        List<String> out = new ArrayList<>();
        for (SiteSurface.PlacedConductor c : surface.conductors()) {
            double worst = 0;
            List<Coordinate> p = c.path();
            for (int i = 1; i < p.size(); i++) {
                Coordinate a = p.get(i - 1), b = p.get(i);
                int n = Math.max(1, (int) Math.ceil(a.distance(b) / 0.5));
                for (int k = 0; k <= n; k++) {
                    Coordinate q = EdgeExposureOp.lerp(a, b, (double) k / n);
                    worst = Math.max(worst, q.getZ() - surface.topHeight(q.x, q.y));
                }
            }
            if (worst > radius) {
                String name = c.conductor().name() == null ? c.conductor().id() : c.conductor().name();
                out.add(String.format(Locale.ROOT,
                        "Conductor %s runs up to %.1f m above the surface beneath it, more than the sphere radius "
                                + "%.1f m: the analysis treats the space below it as solid, so protection shown "
                                + "under it is not established. Check that span by hand or add air-termination below it.",
                        name, worst, radius));
            }
        }
        return out;
    }
}
