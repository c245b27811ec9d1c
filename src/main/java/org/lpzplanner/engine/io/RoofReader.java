package org.lpzplanner.engine.io;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.Polygon;
import org.lpzplanner.engine.model.RoofShape;

/**
 * Reads a structure's roof from its {@code roof} property and the fields that belong to that roof
 * form. A field that belongs to another roof form is an error rather than ignored, because it
 * usually means the {@code roof} value was forgotten.
 */
final class RoofReader {

    static final String ROOF = "roof";
    static final String PARAPET = "parapet";
    static final String RIDGE_HEIGHT = "ridgeHeight";
    static final String RIDGE_BEARING = "ridgeBearing";
    static final String HIGH_SIDE_BEARING = "highSideBearing";

    /** Roof-form fields and the roof forms they belong to. */
    private static final Map<String, Set<String>> APPLIES_TO = new LinkedHashMap<>();

    static {
        APPLIES_TO.put(PARAPET, Set.of("flat"));
        APPLIES_TO.put(RIDGE_HEIGHT, Set.of("gable", "hip", "shed"));
        APPLIES_TO.put(RIDGE_BEARING, Set.of("gable"));
        APPLIES_TO.put(HIGH_SIDE_BEARING, Set.of("shed"));
    }

    private static final List<String> FORMS = List.of("flat", "gable", "hip", "shed");

    /** Tolerated relative area difference between a footprint and its convex hull for a hip roof. */
    private static final double CONVEXITY_TOLERANCE = 1e-9;

    private final PropertyReader properties;
    private final Place place;

    RoofReader(PropertyReader properties, Place place) {
        this.properties = properties;
        this.place = place;
    }

    /**
     * @param height    the structure's wall-top height, already checked
     * @param footprint the structure's footprint in local metres, already checked valid
     */
    RoofShape read(double height, Geometry footprint) {
        String form = properties.textOrNull(ROOF);
        if (form == null) {
            form = "flat";
        }
        if (!FORMS.contains(form)) {
            throw place.fail(ROOF, "must be one of " + String.join(", ", FORMS) + ", got " + Texts.quoted(form));
        }
        rejectFieldsOfOtherForms(form);
        return switch (form) {
            case "gable" -> new RoofShape.Gable(ridgeHeight(height, "the height of the ridge above ground"),
                    properties.bearing(RIDGE_BEARING, "the direction the ridge runs"));
            case "hip" -> {
                requireConvex(footprint);
                yield new RoofShape.Hip(ridgeHeight(height, "the height of the ridge above ground"));
            }
            case "shed" -> new RoofShape.Shed(ridgeHeight(height, "the height of the high side above ground"),
                    properties.bearing(HIGH_SIDE_BEARING, "the direction pointing towards the high side"));
            default -> {
                Double parapet = properties.nonNegativeOrNull(PARAPET);
                yield new RoofShape.Flat(parapet == null ? 0 : parapet);
            }
        };
    }

    private void rejectFieldsOfOtherForms(String form) {
        for (Map.Entry<String, Set<String>> entry : APPLIES_TO.entrySet()) {
            if (properties.has(entry.getKey()) && !entry.getValue().contains(form)) {
                throw place.fail(entry.getKey(), "does not apply to a " + form + " roof (it belongs to "
                        + String.join("/", FORMS.stream().filter(entry.getValue()::contains).toList())
                        + " roofs); remove it or set \"roof\" to the intended form");
            }
        }
    }

    private double ridgeHeight(double height, String meaning) {
        double ridge = properties.positive(RIDGE_HEIGHT, meaning);
        if (ridge <= height) {
            throw place.fail(RIDGE_HEIGHT, "must be greater than \"height\" (" + Texts.metres(height) + " m), got "
                    + Texts.metres(ridge) + " m; both are metres above ground, so the roof must rise above the walls");
        }
        return ridge;
    }

    private void requireConvex(Geometry footprint) {
        String problem = null;
        if (footprint.getNumGeometries() > 1) {
            problem = "this one has " + footprint.getNumGeometries() + " separate parts";
        } else if (((Polygon) footprint.getGeometryN(0)).getNumInteriorRing() > 0) {
            problem = "this one has a hole (courtyard)";
        } else {
            double area = footprint.getArea();
            if (footprint.convexHull().getArea() - area > CONVEXITY_TOLERANCE * area) {
                problem = "this one is not convex";
            }
        }
        if (problem != null) {
            throw place.fail(ROOF, "a hip roof needs a convex footprint without holes, and " + problem
                    + "; split the building into convex parts, one structure each"
                    + " (overlapping structures form one solid)");
        }
    }
}
