package org.lpzplanner.report;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.lpzplanner.engine.io.Json;
import org.lpzplanner.analysis.ReviewItems;
import tools.jackson.databind.JsonNode;

/**
 * The stored result of a revision (see {@link org.lpzplanner.analysis.ResultGeoJson}) read once for
 * the report: its features, review items, exposed roof areas, exposed points, intercepting parts and
 * model warnings.
 * The report prints the stored result, not a new analysis, so that a revision always prints as it
 * was found.
 *
 * @param features       every feature, in stored order
 * @param items          review items numbered as the review list numbers them
 * @param roofAreas      exposed roof plan area by owner name, in stored order
 * @param corners        exposed corners with their owner and elevation
 * @param highPoints     a point of every review item (with its highest elevation) and of every
 *                       exposed roof area (mean of its outer ring, elevation 0), with their owner:
 *                       candidates for the automatic section cuts
 * @param intercepting   ids of the air-termination parts a sphere touches
 * @param warnings       the model warnings, numbered as the review list numbers them
 */
public record StoredResult(List<JsonNode> features, List<ReviewItems.Item> items, Map<String, Double> roofAreas,
        List<Marked> corners, List<Marked> highPoints, Set<String> intercepting, List<Warning> warnings) {

    /**
     * A model warning of the stored result: its review item (number, key, part name, height above
     * the surface beneath, text) with the part's id, and the limit it exceeds (the sphere radius for
     * a free span), metres.
     */
    public record Warning(ReviewItems.Item item, String partId, double limit) {
    }


    /**
     * A point in local metres with the name of the structure or object it belongs to, its height and
     * the plan direction (unit vector) a section through it runs: across an edge, diagonally through
     * a corner, east-west through a roof area.
     */
    public record Marked(String owner, double x, double y, double z, double dirX, double dirY) {
    }

    private static final double DIAGONAL = Math.sqrt(0.5);

    public static StoredResult read(String resultGeoJson) {
        List<JsonNode> features = new ArrayList<>();
        Json.MAPPER.readTree(resultGeoJson).path("features").forEach(features::add);
        Map<String, Double> roofAreas = new LinkedHashMap<>();
        List<Marked> corners = new ArrayList<>();
        List<Marked> high = new ArrayList<>();
        Set<String> intercepting = new HashSet<>();
        for (JsonNode f : features) {
            JsonNode p = f.path("properties");
            String owner = p.path("owner").asString("");
            JsonNode c = f.path("geometry").path("coordinates");
            switch (p.path("layer").asString("")) {
                case "exposed-roof" -> {
                    roofAreas.merge(owner, p.path("area").asDouble(0), Double::sum);
                    JsonNode first = c.path(0).path(0).path(0);
                    high.add(interiorPoint(owner, c.path(0).path(0)));
                }
                case "exposed-corner" -> {
                    Marked m = new Marked(owner, c.path(0).asDouble(), c.path(1).asDouble(), p.path("top").asDouble(0),
                            DIAGONAL, DIAGONAL);
                    corners.add(m);
                    high.add(m);
                }
                case "exposed-edge", "facade-band" -> high.add(midpoint(owner, c, p.path("top").asDouble(0)));
                case "rod", "conductor" -> {
                    if (p.path("intercepts").asBoolean(false)) {
                        intercepting.add(p.path("id").asString(""));
                    }
                }
                default -> {
                    // drawn only
                }
            }
        }
        List<ReviewItems.Item> items = ReviewItems.of(resultGeoJson);
        Map<JsonNode, String> keys = ReviewItems.keys(features);
        List<Warning> warnings = new ArrayList<>();
        for (JsonNode f : features) {
            String key = keys.get(f);
            JsonNode p = f.path("properties");
            if (key == null || !p.path("layer").asString("").equals("model-warning")) {
                continue;
            }
            items.stream().filter(i -> i.key().equals(key)).findFirst().ifPresent(i -> warnings.add(
                    new Warning(i, p.path("part").asString(""), p.path("radius").asDouble(Double.NaN))));
        }
        return new StoredResult(List.copyOf(features), items, roofAreas, List.copyOf(corners),
                List.copyOf(high), Set.copyOf(intercepting), List.copyOf(warnings));
    }

    /** The middle of a line's first segment, with the cut running across that segment. */
    private static Marked midpoint(String owner, JsonNode line, double top) {
        JsonNode a = line.path(0), b = line.path(Math.min(1, line.size() - 1));
        double ax = a.path(0).asDouble(), ay = a.path(1).asDouble(), bx = b.path(0).asDouble(), by = b.path(1).asDouble();
        double len = Math.hypot(bx - ax, by - ay);
        double dx = len > 0 ? -(by - ay) / len : 1, dy = len > 0 ? (bx - ax) / len : 0;
        return new Marked(owner, (ax + bx) / 2, (ay + by) / 2, top, dx, dy);
    }

    /** The mean of an outer ring's vertices, a cut running east-west through it. */
    private static Marked interiorPoint(String owner, JsonNode ring) {
        double x = 0, y = 0;
        int n = Math.max(1, ring.size() - 1);
        for (int i = 0; i < n && i < ring.size(); i++) {
            x += ring.path(i).path(0).asDouble();
            y += ring.path(i).path(1).asDouble();
        }
        return new Marked(owner, x / n, y / n, 0, 1, 0);
    }
}
