package org.lpzplanner.engine.risk;

/**
 * An object near a structure: horizontal distance in metres from the structure's wall to the
 * object's nearest point, and the object's height above the same ground in metres.
 */
public record Neighbour(double distance, double height) {

    public Neighbour {
        if (!(distance >= 0) || Double.isInfinite(distance)) {
            throw new IllegalArgumentException("neighbour distance must be a finite number of metres >= 0, got " + distance);
        }
        if (!(height >= 0) || Double.isInfinite(height)) {
            throw new IllegalArgumentException("neighbour height must be a finite number of metres >= 0, got " + height);
        }
    }
}
