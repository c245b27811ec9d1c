package org.lpzplanner.engine.exposure;

import org.locationtech.jts.geom.Coordinate;

/** An exposed outside corner of a roof or rooftop object (z = elevation). */
public record CornerExposure(String ownerId, String ownerName, Coordinate point) {}
