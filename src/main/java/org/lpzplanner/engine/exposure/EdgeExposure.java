package org.lpzplanner.engine.exposure;

import org.locationtech.jts.geom.LineString;
import org.lpzplanner.engine.geom.EdgeKind;

/** An exposed stretch of a roof edge, parapet, ridge, hip or object edge (3D line, length in m). */
public record EdgeExposure(String ownerId, String ownerName, EdgeKind kind, LineString line, double length) {}
