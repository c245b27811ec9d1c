package org.lpzplanner.engine.envelope;

import java.util.ArrayList;
import java.util.List;
import org.locationtech.jts.geom.Coordinate;
import org.lpzplanner.engine.geom.RoofEdge;
import org.lpzplanner.engine.geom.RoofFace;
import org.lpzplanner.engine.geom.SiteSurface;

/** Builds the supports of a whole site for one sphere radius. */
public final class Supports {

    private Supports() {
    }

    /**
     * Faces give their interiors, every edge (roof edges, parapets, ridges, hips, object edges) a
     * segment, rods their tips, conductors one segment per leg. Walls need nothing of their own:
     * their top edges bound the faces, and everything is solid to the ground.
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
        for (SiteSurface.PlacedConductor c : surface.conductors()) {
            List<Coordinate> p = c.path();
            for (int i = 1; i < p.size(); i++) {
                out.add(new SegmentSupport(p.get(i - 1), p.get(i), radius));
            }
        }
        return out;
    }
}
