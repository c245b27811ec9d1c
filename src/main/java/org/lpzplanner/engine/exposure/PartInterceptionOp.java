package org.lpzplanner.engine.exposure;

import java.util.ArrayList;
import java.util.List;
import org.locationtech.jts.geom.Coordinate;
import org.lpzplanner.engine.envelope.Target;
import org.lpzplanner.engine.geom.SiteSurface;

/**
 * Which air-termination parts a sphere can touch. With the part itself in the solid, the envelope
 * at a point of the part equals the part's height there when a sphere touches it, and lies above
 * when other parts keep every sphere away; so a part intercepts iff some point of it is at or above
 * the envelope (within the margin).
 */
final class PartInterceptionOp {

    private PartInterceptionOp() {
    }

    static List<PartInterception> run(ExposureContext ctx) {
        List<PartInterception> out = new ArrayList<>();
        for (SiteSurface.PlacedRod r : ctx.surface.rods()) {
            Coordinate tip = r.tip();
            boolean touched = ctx.isExposed(Target.point(tip.x, tip.y), tip.getZ());
            out.add(new PartInterception(r.rod().id(), r.rod().name(), PartInterception.PartKind.ROD, touched));
        }
        for (SiteSurface.PlacedConductor c : ctx.surface.conductors()) {
            boolean touched = false;
            List<Coordinate> p = c.path();
            for (int i = 1; i < p.size() && !touched; i++) {
                Coordinate a = p.get(i - 1), b = p.get(i);
                int n = Math.max(1, (int) Math.ceil(a.distance(b) / ctx.grid.h()));
                for (int k = 0; k < n && !touched; k++) {
                    Coordinate s = EdgeExposureOp.lerp(a, b, (double) k / n), t = EdgeExposureOp.lerp(a, b, (double) (k + 1) / n);
                    touched = ctx.isExposed(Target.segment(s.x, s.y, t.x, t.y), Math.max(s.getZ(), t.getZ()));
                }
            }
            out.add(new PartInterception(c.conductor().id(), c.conductor().name(), PartInterception.PartKind.CONDUCTOR, touched));
        }
        return out;
    }
}
