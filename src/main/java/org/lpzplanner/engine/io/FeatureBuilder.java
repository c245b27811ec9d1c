package org.lpzplanner.engine.io;

import java.util.ArrayList;
import java.util.List;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Point;
import org.locationtech.jts.geom.Polygon;
import org.lpzplanner.engine.model.Conductor;
import org.lpzplanner.engine.model.Rod;
import org.lpzplanner.engine.model.RooftopObject;
import org.lpzplanner.engine.model.Structure;

/**
 * Turns features whose geometry is already in local metres into model objects, checking the
 * kind-specific properties. A feature without a name is named by its id.
 */
final class FeatureBuilder {

    private final GeometryFactory factory;
    private final FootprintCheck footprints;

    FeatureBuilder(GeometryFactory factory, FootprintCheck footprints) {
        this.factory = factory;
        this.footprints = footprints;
    }

    Structure structure(RawFeature feature, String id) {
        PropertyReader properties = properties(feature);
        footprints.requireValid(feature.geometry(), feature.place(), "the footprint");
        footprints.requireStructureSize(feature.geometry(), feature.place());
        double height = properties.positive("height", "the wall-top height above ground in metres");
        return new Structure(id, name(feature, id), feature.geometry(), height,
                new RoofReader(properties, feature.place()).read(height, feature.geometry()));
    }

    RooftopObject rooftopObject(RawFeature feature, String id) {
        PropertyReader properties = properties(feature);
        Polygon footprint;
        if (feature.geometry() instanceof Point centre) {
            double radius = properties.positive("radius", "a Point rooftop object is a circle and needs its radius in"
                    + " metres");
            footprint = InscribedPolygon.of(factory, centre.getCoordinate(), radius, SiteLimits.CIRCLE_VERTICES);
        } else {
            if (properties.has("radius")) {
                throw feature.place().fail("radius", "applies to Point geometries only (circles); this object has a"
                        + " Polygon footprint, so remove \"radius\"");
            }
            footprint = (Polygon) feature.geometry();
            footprints.requireValid(footprint, feature.place(), "the footprint");
        }
        double top = properties.positive("top", "the elevation of the object's top above ground in metres");
        return new RooftopObject(id, name(feature, id), footprint, top);
    }

    Rod rod(RawFeature feature, String id) {
        Coordinate at = feature.geometry().getCoordinate();
        double height = properties(feature).positive("height", "the rod's height in metres above what it stands on");
        return new Rod(id, name(feature, id), at.x, at.y, height);
    }

    /**
     * With {@code heightAboveRoof} the vertices' elevations are ignored and set to NaN; without it
     * every vertex must carry an elevation above ground.
     */
    Conductor conductor(RawFeature feature, String id) {
        Double heightAboveRoof = properties(feature).nonNegativeOrNull("heightAboveRoof");
        List<Coordinate> path = new ArrayList<>();
        Coordinate[] vertices = feature.geometry().getCoordinates();
        if (vertices.length > SiteLimits.MAX_CONDUCTOR_POINTS) {
            throw feature.place().fail("geometry", "has " + vertices.length + " positions; a conductor may have at most "
                    + SiteLimits.MAX_CONDUCTOR_POINTS + " (split a longer one into several conductors)");
        }
        for (int i = 0; i < vertices.length; i++) {
            Coordinate v = vertices[i];
            if (heightAboveRoof == null) {
                requireElevation(feature, v, i);
            }
            path.add(new Coordinate(v.x, v.y, heightAboveRoof == null ? v.getZ() : Double.NaN));
        }
        return new Conductor(id, name(feature, id), path, heightAboveRoof);
    }

    private static void requireElevation(RawFeature feature, Coordinate vertex, int index) {
        double z = vertex.getZ();
        if (Double.isNaN(z)) {
            throw feature.place().fail("heightAboveRoof", "is required because position " + index + " has no"
                    + " elevation; either give \"heightAboveRoof\" (metres above the surface below) or a third"
                    + " value on every position (elevation above ground in metres)");
        }
        if (z < 0 || z > SiteLimits.MAX_HEIGHT) {
            throw feature.place().fail("geometry", "position " + index + " has elevation " + Texts.metres(z)
                    + "; elevations must be metres above ground, from 0 to " + Texts.metres(SiteLimits.MAX_HEIGHT));
        }
    }

    private static PropertyReader properties(RawFeature feature) {
        return new PropertyReader(feature.properties(), feature.place());
    }

    private static String name(RawFeature feature, String id) {
        String name = feature.place().name();
        return name == null || name.isBlank() ? id : name;
    }
}
