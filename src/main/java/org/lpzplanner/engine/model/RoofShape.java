package org.lpzplanner.engine.model;

/**
 * The form of a structure's roof above its wall top. Bearings are compass degrees, clockwise from
 * north (+y of the local plane).
 */
public sealed interface RoofShape {

    /** Flat roof at wall-top height, with an optional parapet rising above it. */
    record Flat(double parapet) implements RoofShape {}

    /** Two planes meeting at a ridge of the given height; the ridge runs along the bearing through the footprint's centroid. */
    record Gable(double ridgeHeight, double ridgeBearing) implements RoofShape {}

    /** Equal-slope planes rising from every eave to a ridge of the given height; needs a convex footprint. */
    record Hip(double ridgeHeight) implements RoofShape {}

    /** One plane rising from wall-top height to the high side, which lies towards the given bearing. */
    record Shed(double highHeight, double highSideBearing) implements RoofShape {}
}
