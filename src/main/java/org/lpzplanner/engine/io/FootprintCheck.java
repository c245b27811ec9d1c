package org.lpzplanner.engine.io;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.operation.valid.IsValidOp;
import org.locationtech.jts.operation.valid.TopologyValidationError;

/**
 * Requires footprints to be valid polygons with area, because the envelope construction relies on
 * clean rings. Problems are reported with their position in local metres and, for files in lon/lat,
 * also in lon/lat so they can be found in the source data.
 */
final class FootprintCheck {

    private final LocalProjection projection;

    /**
     * @param projection the projection the file was read through, or null for local-metre files
     */
    FootprintCheck(LocalProjection projection) {
        this.projection = projection;
    }

    /**
     * @param what what the polygon is, e.g. "the footprint", for the message
     * @throws SiteFormatException at field {@code geometry} when the polygon is invalid or has no area
     */
    void requireValid(Geometry polygon, Place place, String what) {
        TopologyValidationError error = new IsValidOp(polygon).getValidationError();
        if (error != null) {
            throw place.fail("geometry", what + " is not a valid polygon: " + explain(error, polygon)
                    + (error.getCoordinate() == null ? "" : " at " + where(error.getCoordinate())) + "; "
                    + advice(error));
        }
        if (!(polygon.getArea() > 0)) {
            throw place.fail("geometry", what + " encloses no area; give at least three corners that are not in"
                    + " a straight line");
        }
    }

    /**
     * Requires a structure's footprint to enclose at least {@link SiteLimits#MIN_FOOTPRINT_AREA}: a
     * smaller one is a unit mistake (most often longitudes and latitudes in a file declared to be in
     * local metres), not a building.
     *
     * @throws SiteFormatException at field {@code geometry}
     */
    void requireStructureSize(Geometry footprint, Place place) {
        double area = footprint.getArea();
        if (area >= SiteLimits.MIN_FOOTPRINT_AREA) {
            return;
        }
        String hint = projection == null && looksLikeLonLat(footprint)
                ? "; these positions look like longitudes and latitudes: if they are, remove \"coordinates\":"
                        + " \"local-metres\" from the file"
                : "; positions are metres, so check the units";
        throw place.fail("geometry", "the footprint encloses only "
                + (area < 0.01 ? "less than 0.01" : Texts.number(area, 2)) + " m²; a structure"
                + " needs at least " + Texts.number(SiteLimits.MIN_FOOTPRINT_AREA, 1) + " m²" + hint);
    }

    private static boolean looksLikeLonLat(Geometry footprint) {
        for (Coordinate c : footprint.getCoordinates()) {
            if (Math.abs(c.x) > 180 || Math.abs(c.y) > 90) {
                return false;
            }
        }
        return true;
    }

    /** A position for messages: local metres, plus lon/lat when the file was in lon/lat. */
    String where(Coordinate local) {
        String text = "x=" + Texts.metres(local.x) + ", y=" + Texts.metres(local.y) + " m";
        if (projection == null) {
            return text;
        }
        Coordinate lonLat = projection.toLonLat(local.x, local.y);
        return text + " (lon " + Texts.number(lonLat.x, 7) + ", lat " + Texts.number(lonLat.y, 7) + ")";
    }

    private static String explain(TopologyValidationError error, Geometry polygon) {
        return switch (error.getErrorType()) {
            case TopologyValidationError.SELF_INTERSECTION, TopologyValidationError.RING_SELF_INTERSECTION ->
                    polygon.getNumGeometries() > 1 ? "its parts overlap or its edges cross (self-intersection)"
                            : "its edges cross (self-intersection)";
            case TopologyValidationError.HOLE_OUTSIDE_SHELL -> "a hole (courtyard) lies outside the outer boundary";
            case TopologyValidationError.NESTED_HOLES -> "one hole lies inside another";
            case TopologyValidationError.DISCONNECTED_INTERIOR -> "its holes cut the interior into separate pieces";
            case TopologyValidationError.NESTED_SHELLS -> "one part of the MultiPolygon lies inside another";
            case TopologyValidationError.DUPLICATE_RINGS -> "two of its rings are identical";
            case TopologyValidationError.TOO_FEW_POINTS -> "a ring has too few distinct corners";
            default -> error.getMessage().toLowerCase(java.util.Locale.ROOT);
        };
    }

    private static String advice(TopologyValidationError error) {
        return switch (error.getErrorType()) {
            case TopologyValidationError.SELF_INTERSECTION, TopologyValidationError.RING_SELF_INTERSECTION ->
                    "trace the outline so that no two edges cross, or split it into separate structures";
            case TopologyValidationError.HOLE_OUTSIDE_SHELL, TopologyValidationError.NESTED_HOLES ->
                    "every hole must lie inside the outer boundary and outside the other holes";
            case TopologyValidationError.DISCONNECTED_INTERIOR, TopologyValidationError.NESTED_SHELLS ->
                    "describe the pieces as separate structures (overlapping structures form one solid)";
            default -> "check the corners around that position";
        };
    }
}
