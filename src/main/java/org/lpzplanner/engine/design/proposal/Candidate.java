package org.lpzplanner.engine.design.proposal;

import java.util.List;
import org.locationtech.jts.geom.Coordinate;
import org.lpzplanner.engine.envelope.Support;

/**
 * A part the proposal may choose: a rod or mast at a plan position, or a conductor along an edge.
 *
 * @param path     for rods and masts the foot and the tip; for conductors the 3D path
 * @param height   rod or mast height above its foot, metres (0 for conductors)
 * @param supports how the part holds spheres off (the engine's supports for the sphere radius)
 * @param cost     what the part weighs in the choice: one per part, a little more for taller rods,
 *                 rods in the open roof (edges, corners and ridges are preferred) and masts; conductors by length
 */
record Candidate(ProposedPart.Kind kind, ProposedPart.Place place, String ownerId, List<Coordinate> path,
        double height, List<Support> supports, double cost) {

    /** Plan bounding box of the part: [minX, minY, maxX, maxY]. */
    double[] bounds() {
        double[] b = {Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY};
        for (Coordinate c : path) {
            b[0] = Math.min(b[0], c.x);
            b[1] = Math.min(b[1], c.y);
            b[2] = Math.max(b[2], c.x);
            b[3] = Math.max(b[3], c.y);
        }
        return b;
    }

    /** True when the part holds off the sphere centred at (x, y, z) with the given margin. */
    boolean blocks(double x, double y, double z, double margin) {
        for (Support s : supports) {
            if (s.centreHeight(x, y) > z + margin) {
                return true;
            }
        }
        return false;
    }
}
