package org.lpzplanner.engine.risk;

import org.locationtech.jts.geom.Geometry;

/**
 * The collection area A_D of a site: its size in square metres and its outline on the ground (for
 * drawing). The outline is a polygonal approximation inscribed in the exact zone, so {@code area}
 * is at most {@code maxRelativeError} (a fraction, not a percentage) below the exact value and never
 * above it.
 */
public record CollectionArea(double area, Geometry zone, double maxRelativeError) {

    /**
     * An area never below the exact one: {@code area / (1 − maxRelativeError)}. The risk estimate uses
     * it, so that the approximation can only raise N_D, never lower it.
     */
    public double upperBound() {
        return area / (1 - maxRelativeError);
    }
}
