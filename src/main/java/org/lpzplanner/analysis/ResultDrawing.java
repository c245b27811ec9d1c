package org.lpzplanner.analysis;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.lpzplanner.drawing.Layer;
import org.lpzplanner.drawing.PlanDrawing;
import org.lpzplanner.drawing.PlanItem;
import tools.jackson.databind.JsonNode;

/**
 * The plan drawing of a stored {@link ResultGeoJson}: its structures, rooftop objects, protected
 * ground, exposed roof areas, facade bands with their side-flash class, exposed edges and corners,
 * model-warning stretches, rods and conductors, as items of a {@link PlanDrawing}; review items
 * carry their key, their number as the review list gives it ("E5") and the designer's reason when
 * accepted. The pages and the report start from the same builder and add what they own (keep-out
 * areas, down-conductors, numbers). Features of layers the drawing does not know are left out.
 */
public final class ResultDrawing {

    /** What a result plan always lists in its legend, drawn or not: what the analysis can find. */
    private static final Layer[] LISTED = {Layer.STRUCTURE, Layer.ROOFTOP_OBJECT, Layer.PROTECTED_GROUND,
        Layer.EXPOSED_ROOF, Layer.FACADE_BAND, Layer.EXPOSED_EDGE, Layer.ROD};

    private ResultDrawing() {
    }

    /**
     * A builder holding the result's items.
     *
     * @param features    the stored result's features, in stored order
     * @param accepted    the reason of each accepted review item, by key
     * @param partNumbers the number to write beside each part ("A1"), by part id; empty for none
     */
    public static PlanDrawing.Builder of(List<JsonNode> features, Map<String, String> accepted,
            Map<String, String> partNumbers) {
        Map<JsonNode, String> keys = ReviewItems.keys(features);
        PlanDrawing.Builder drawing = PlanDrawing.builder().list(LISTED);
        int number = 0;
        for (JsonNode f : features) {
            JsonNode p = f.path("properties");
            JsonNode g = f.path("geometry");
            String key = keys.get(f);
            PlanItem.Review review = key == null ? null : new PlanItem.Review(key, "E" + ++number, accepted.get(key));
            switch (p.path("layer").asString("")) {
                case "structure" -> drawing.add(new PlanItem.Structure(text(p, "name"), p.path("height").asDouble(0),
                        paths(g)));
                case "rooftop-object" -> drawing.add(new PlanItem.RooftopObject(text(p, "name"), paths(g)));
                case "protected-ground" -> drawing.add(new PlanItem.ProtectedGround(paths(g)));
                case "exposed-roof" -> drawing.add(new PlanItem.ExposedRoof(paths(g)));
                case "facade-band" -> drawing.add(new PlanItem.FacadeBand(first(g), ReviewItems.isNegligibleBand(f),
                        p.path("bottom").asDouble(0), p.path("top").asDouble(0), review));
                case "exposed-edge" -> drawing.add(new PlanItem.ExposedEdge(first(g), review));
                case "exposed-corner" -> {
                    List<double[]> at = first(g);
                    if (!at.isEmpty()) {
                        drawing.add(new PlanItem.ExposedCorner(at.get(0)[0], at.get(0)[1], review));
                    }
                }
                case "model-warning" -> drawing.add(new PlanItem.ModelWarningStretch(paths(g), text(p, "text"),
                        review));
                case "rod" -> {
                    List<double[]> at = first(g);
                    if (!at.isEmpty()) {
                        drawing.add(new PlanItem.Rod(text(p, "id"), text(p, "name"), at.get(0)[0], at.get(0)[1],
                                partNumbers.get(text(p, "id"))));
                    }
                }
                case "conductor" -> drawing.add(new PlanItem.Conductor(text(p, "id"), text(p, "name"), first(g),
                        partNumbers.get(text(p, "id"))));
                default -> {
                    // layers this drawing does not know are left out
                }
            }
        }
        return drawing;
    }

    /** Rings of a (Multi)Polygon, the lines of a (Multi)LineString, or the one position of a Point. */
    private static List<List<double[]>> paths(JsonNode g) {
        List<List<double[]>> out = new ArrayList<>();
        JsonNode c = g.path("coordinates");
        switch (g.path("type").asString("")) {
            case "Point" -> out.add(List.of(new double[] {c.path(0).asDouble(), c.path(1).asDouble()}));
            case "LineString" -> out.add(positions(c));
            case "MultiLineString", "Polygon" -> c.forEach(line -> out.add(positions(line)));
            case "MultiPolygon" -> c.forEach(polygon -> polygon.forEach(ring -> out.add(positions(ring))));
            default -> {
                // no other geometry is stored
            }
        }
        out.removeIf(List::isEmpty);
        return out;
    }

    /** The first path of a geometry, or none. */
    private static List<double[]> first(JsonNode g) {
        List<List<double[]>> paths = paths(g);
        return paths.isEmpty() ? List.of() : paths.get(0);
    }

    private static List<double[]> positions(JsonNode array) {
        List<double[]> out = new ArrayList<>();
        array.forEach(p -> out.add(new double[] {p.path(0).asDouble(), p.path(1).asDouble()}));
        return out;
    }

    private static String text(JsonNode properties, String field) {
        JsonNode value = properties.path(field);
        return value.isNull() || value.isMissingNode() ? "" : value.asString();
    }
}
