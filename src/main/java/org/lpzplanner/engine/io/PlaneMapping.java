package org.lpzplanner.engine.io;

import java.util.List;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.CoordinateFilter;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;

/** Moves features read in lon/lat onto the site's local plane. Elevations are left as they are. */
final class PlaneMapping {

    private PlaneMapping() {}

    /**
     * The projection centred on the lon/lat bounding box of the structures (of all the features
     * when there are none). Parts are left out on purpose: adding, moving or removing a rod,
     * mast or conductor must not move the local origin, or every position held in local metres
     * (the plan in the browser, undo steps, stored results) would shift with it.
     */
    static LocalProjection centredOn(List<RawFeature> features) {
        Envelope bounds = new Envelope();
        features.stream().filter(f -> f.kind() == FeatureKind.STRUCTURE)
                .forEach(f -> bounds.expandToInclude(f.geometry().getEnvelopeInternal()));
        if (bounds.isNull()) {
            features.forEach(f -> bounds.expandToInclude(f.geometry().getEnvelopeInternal()));
        }
        return LocalProjection.centredOn(bounds);
    }

    /** The feature with its geometry in local metres. */
    static RawFeature toLocal(RawFeature feature, LocalProjection projection) {
        Geometry local = feature.geometry().copy();
        local.apply((CoordinateFilter) c -> {
            Coordinate projected;
            try {
                projected = projection.toLocal(c.x, c.y);
            } catch (IllegalArgumentException e) {
                throw feature.place().fail("geometry", "position [" + c.x + ", " + c.y + "] cannot be placed on the"
                        + " site's local plane; it is very far from the rest of the site, so check for a stray"
                        + " coordinate");
            }
            c.x = projected.x;
            c.y = projected.y;
        });
        local.geometryChanged();
        return feature.withGeometry(local);
    }
}
