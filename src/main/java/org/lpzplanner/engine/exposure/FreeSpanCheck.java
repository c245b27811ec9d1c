package org.lpzplanner.engine.exposure;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.lpzplanner.engine.geom.SiteSurface;

/**
 * Finds the stretches of conductors and wires that run more than R above the surface beneath them:
 * a sphere of radius R resting on that surface passes under them, so they protect nothing directly
 * beneath there (rolling sphere method, IEC 62305-3:2010 Annex A). One warning per part, naming it
 * and giving the stretches in plan.
 */
final class FreeSpanCheck {

    private static final GeometryFactory GF = new GeometryFactory();

    private FreeSpanCheck() {
    }

    static List<ModelWarning> warnings(SiteSurface surface, double radius) {
        List<ModelWarning> out = new ArrayList<>();
        for (SiteSurface.PlacedConductor c : surface.conductors()) {
            double worst = 0;
            List<LineString> stretches = new ArrayList<>();
            List<Coordinate> run = new ArrayList<>();
            List<Coordinate> p = c.path();
            for (int i = 1; i < p.size(); i++) {
                Coordinate a = p.get(i - 1), b = p.get(i);
                int n = Math.max(1, (int) Math.ceil(a.distance(b) / 0.5));
                for (int k = 0; k <= n; k++) {
                    Coordinate q = EdgeExposureOp.lerp(a, b, (double) k / n);
                    double above = q.getZ() - surface.topHeight(q.x, q.y);
                    if (above > radius) {
                        worst = Math.max(worst, above);
                        run.add(new Coordinate(q.x, q.y));
                    } else {
                        close(run, stretches);
                    }
                }
            }
            close(run, stretches);
            if (!stretches.isEmpty()) {
                String name = c.conductor().name() == null || c.conductor().name().isBlank() ? c.conductor().id()
                        : c.conductor().name();
                out.add(new ModelWarning(ModelWarning.Kind.FREE_SPAN, c.conductor().id(), name,
                        GF.createMultiLineString(stretches.toArray(new LineString[0])), worst, radius,
                        String.format(Locale.ROOT, "Conductor %s runs up to %.1f m above the surface beneath it, more"
                                + " than the sphere radius %.1f m: a sphere can pass under it there, so it protects"
                                + " nothing directly beneath that stretch. Protect what lies beneath by other"
                                + " air-termination, or lower the conductor.", name, worst, radius)));
            }
        }
        return out;
    }

    private static void close(List<Coordinate> run, List<LineString> stretches) {
        if (run.size() >= 2) {
            stretches.add(GF.createLineString(run.toArray(new Coordinate[0])));
        }
        run.clear();
    }
}
