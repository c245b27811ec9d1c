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
 * beneath there (rolling sphere method, IEC 62305-3:2010 Annex A). The engine models that free space
 * exactly ({@link org.lpzplanner.engine.envelope.SpanSupport}); the warning tells the designer, who
 * may have meant the wire to protect what lies beneath. One warning per part, naming it and giving
 * the stretches in plan, exact from the clearances of the placed legs.
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
                SiteSurface.Clearance k = c.clearances().get(i - 1);
                if (a.distance(b) == 0 || k.max() <= radius) {
                    // a leg down a wall rests against it; a low leg keeps spheres off what lies beneath
                    close(run, stretches);
                    continue;
                }
                worst = Math.max(worst, k.max());
                // the clearance is linear along a leg: the part above R runs from t0 to t1
                double t0 = k.start() > radius ? 0 : (radius - k.start()) / (k.end() - k.start());
                double t1 = k.end() > radius ? 1 : (radius - k.start()) / (k.end() - k.start());
                Coordinate from = EdgeExposureOp.lerp(a, b, t0), to = EdgeExposureOp.lerp(a, b, t1);
                if (t0 > 0) {
                    close(run, stretches);
                }
                if (run.isEmpty() || !run.get(run.size() - 1).equals2D(from)) {
                    run.add(new Coordinate(from.x, from.y));
                }
                run.add(new Coordinate(to.x, to.y));
                if (t1 < 1) {
                    close(run, stretches);
                }
            }
            close(run, stretches);
            if (!stretches.isEmpty()) {
                String name = c.label();
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
