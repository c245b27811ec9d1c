package org.lpzplanner.engine.io;

import org.locationtech.jts.geom.Geometry;
import tools.jackson.databind.JsonNode;

/**
 * One GeoJSON feature after its envelope has been checked but before its properties are turned
 * into model objects: the geometry is still in the file's own coordinates until projected.
 *
 * @param place      where the feature is in the file
 * @param kind       what it describes
 * @param explicitId the id written in the file, or null when one is to be generated
 * @param geometry   its geometry
 * @param properties its properties object (possibly empty)
 */
record RawFeature(FeaturePlace place, FeatureKind kind, String explicitId, Geometry geometry, JsonNode properties) {

    /** The same feature with its geometry replaced (after projection). */
    RawFeature withGeometry(Geometry newGeometry) {
        return new RawFeature(place, kind, explicitId, newGeometry, properties);
    }
}
