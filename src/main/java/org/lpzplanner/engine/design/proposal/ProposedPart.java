package org.lpzplanner.engine.design.proposal;

import org.lpzplanner.engine.model.Conductor;
import org.lpzplanner.engine.model.Rod;

/**
 * One part of a proposal: a rod (on a roof), a mast (a rod standing on the ground) or a conductor,
 * with where it sits. Exactly one of {@code rod} and {@code conductor} is set.
 *
 * @param ownerId the structure it is fixed to; empty for masts
 */
public record ProposedPart(Kind kind, Place place, String ownerId, Rod rod, Conductor conductor) {

    /** What the part is. */
    public enum Kind { ROD, MAST, EDGE_CONDUCTOR, RIDGE_CONDUCTOR }

    /** Where it is fixed (OBJECT: on a rooftop object); the proposal prefers corners, edges and ridges over the open roof. */
    public enum Place { CORNER, EDGE, RIDGE, ROOF, OBJECT, GROUND }

    public boolean isRod() {
        return rod != null;
    }

    /** Plan length of a conductor, 0 for rods and masts. */
    public double conductorLength() {
        if (conductor == null) {
            return 0;
        }
        double sum = 0;
        for (int i = 1; i < conductor.path().size(); i++) {
            sum += conductor.path().get(i - 1).distance3D(conductor.path().get(i));
        }
        return sum;
    }
}
