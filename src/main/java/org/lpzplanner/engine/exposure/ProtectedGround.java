package org.lpzplanner.engine.exposure;

import org.locationtech.jts.geom.Geometry;

/**
 * Open ground (outside every footprint) below the envelope: LPZ 0B at ground level. Built from whole
 * grid cells that are proven protected, so it never overstates the protected area.
 */
public record ProtectedGround(Geometry area, double planArea) {}
