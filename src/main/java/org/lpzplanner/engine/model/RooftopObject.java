package org.lpzplanner.engine.model;

import org.locationtech.jts.geom.Polygon;

/**
 * Plant box, chimney, antenna housing or similar standing on a roof: a footprint (circles arrive as
 * inscribed polygons) and the elevation of its top above ground. Solid down to what it stands on.
 */
public record RooftopObject(String id, String name, Polygon footprint, double top) {}
