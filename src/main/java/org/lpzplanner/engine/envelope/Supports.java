package org.lpzplanner.engine.envelope;

import java.util.ArrayList;
import java.util.List;
import org.locationtech.jts.geom.Coordinate;
import org.lpzplanner.engine.geom.RoofEdge;
import org.lpzplanner.engine.geom.RoofFace;
import org.lpzplanner.engine.geom.SiteSurface;

/** Builds the supports of a whole site for one sphere radius. */
public final class Supports {

    /**
     * Radius of the thinnest air-termination conductor, metres: 50 mm² round, 8 mm across
     * (IEC 62305-3:2010 Table 6, from memory).
     */
    public static final double CONDUCTOR_RADIUS = 0.004;

    private Supports() {
    }

    /**
     * The greatest clearance above the solid directly beneath at which a conductor leg may be
     * treated as solid down to that surface: √(2·R·r<sub>c</sub>), r<sub>c</sub> = {@link #CONDUCTOR_RADIUS}
     * (0.40 m at R = 20 m, 0.69 m at R = 60 m).
     *
     * <p>Why: let w be a point of the leg at height h above the solid point directly beneath it.
     * Every centre c at plan distance d &lt; R from w has z<sub>c</sub> ≥ S + √(R² − d²) (the sphere
     * stays out of that solid point), and a sphere passing under w has z<sub>c</sub> ≤ S + h −
     * √(R² − d²). Then |c − w|² ≤ d² + (h − √(R² − d²))² ≤ R² + h², so that sphere comes within
     * √(R² + h²) − R ≤ h²/(2R) of the leg's axis, which is at most r<sub>c</sub>: it touches the real
     * conductor. Treating such a leg as solid down therefore excludes no sphere that a conductor of
     * at least that thickness lets through. Legs held higher get {@link SpanSupport}, exact for any
     * thickness.
     */
    public static double solidClearance(double radius) {
        return Math.sqrt(2 * radius * CONDUCTOR_RADIUS);
    }

    /**
     * Faces give their interiors, every edge (roof edges, parapets, ridges, hips, object edges) a
     * segment, rods their tips, conductor legs a segment: solid down where the leg is fixed within
     * {@link #solidClearance} of the solid beneath, otherwise a {@link SpanSupport} with free space
     * beneath. Walls need nothing of their own: their top edges bound the faces.
     */
    public static List<Support> of(SiteSurface surface, double radius) {
        List<Support> out = new ArrayList<>();
        for (int i = 0; i < surface.faces().size(); i++) {
            RoofFace f = surface.faces().get(i);
            out.add(new FaceSupport(surface.facePolygon(i), f.plane(), radius));
        }
        for (RoofEdge e : surface.edges()) {
            out.add(new SegmentSupport(e.p0(), e.p1(), radius));
        }
        for (SiteSurface.PlacedRod r : surface.rods()) {
            out.add(new PointSupport(r.tip().x, r.tip().y, r.tip().getZ(), radius));
        }
        double fixed = solidClearance(radius);
        for (SiteSurface.PlacedConductor c : surface.conductors()) {
            List<Coordinate> p = c.path();
            for (int i = 1; i < p.size(); i++) {
                out.add(c.clearances().get(i - 1).max() <= fixed ? new SegmentSupport(p.get(i - 1), p.get(i), radius)
                        : new SpanSupport(p.get(i - 1), p.get(i), radius));
            }
        }
        return out;
    }
}
