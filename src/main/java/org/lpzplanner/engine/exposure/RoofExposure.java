package org.lpzplanner.engine.exposure;

import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.Polygon;
import org.lpzplanner.engine.geom.SurfaceKind;

/**
 * One roof face (or rooftop-object top) and the part of it a sphere reaches. Areas are plan areas
 * in m²; {@code minClearance} is the least height of the envelope above the protected part (NaN
 * when nothing of it is protected). {@code exposedAtEdges} is the part of {@code exposed} (boundary
 * cells) that counts as exposed only because an exposed edge of the same structure runs through
 * it: everything of those cells lying wholly in the face is protected. It stays in {@code exposed}
 * (drawn and counted as exposed); it needs no cover of its own beyond what protects that edge.
 */
public record RoofExposure(String ownerId, String ownerName, SurfaceKind kind, int faceIndex, Polygon face,
        double slopeFactor, Geometry exposed, double planArea, double exposedPlanArea, double minClearance,
        Geometry exposedAtEdges) {

    public boolean isExposed() {
        return exposedPlanArea > 0;
    }

    /** Share of the face's area that is exposed, 0..1. */
    public double exposedShare() {
        return planArea > 0 ? exposedPlanArea / planArea : 0;
    }
}
