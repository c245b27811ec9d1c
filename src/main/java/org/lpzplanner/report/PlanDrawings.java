package org.lpzplanner.report;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.locationtech.jts.geom.Coordinate;
import org.lpzplanner.analysis.ReviewItems;
import org.lpzplanner.engine.design.DownConductorLayout;
import org.lpzplanner.report.PlanDrawing.Label;
import org.lpzplanner.report.PlanDrawing.Layer;
import org.lpzplanner.report.PlanDrawing.Shape;
import tools.jackson.databind.JsonNode;

/**
 * Builds the {@link PlanDrawing} of a revision from its stored result: structures shaded by height
 * and named, rooftop objects, protected ground, exposed roof areas, facade bands, exposed edges and
 * corners numbered E1, E2, … (accepted ones drawn apart), the stretches of parts a model warning is
 * about (numbered as review items too), air-termination parts numbered A1, A2, …,
 * planned down-conductors numbered D1, D2, … and the site's stored keep-out areas numbered K1, K2, …
 * (as stored when printed, like the down-conductors edited by the designer).
 */
final class PlanDrawings {

    private PlanDrawings() {
    }

    static PlanDrawing of(ReportFacts facts) {
        List<JsonNode> features = facts.stored().features();
        Map<JsonNode, String> keys = ReviewItems.keys(features);
        Map<String, Integer> numbers = new HashMap<>();
        for (ReviewItems.Item item : facts.items()) {
            numbers.put(item.key(), item.number());
        }
        double maxHeight = features.stream().filter(f -> layer(f).equals("structure"))
                .mapToDouble(f -> f.path("properties").path("height").asDouble(0)).max().orElse(1);
        List<Shape> shapes = new ArrayList<>();
        List<Label> labels = new ArrayList<>();
        double[] box = {Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY,
            Double.NEGATIVE_INFINITY};
        for (JsonNode f : features) {
            JsonNode p = f.path("properties");
            List<List<double[]>> paths = paths(f.path("geometry"));
            String key = keys.get(f);
            boolean accepted = key != null && facts.source().accepted().containsKey(key);
            Layer layer = switch (layer(f)) {
                case "structure" -> Layer.STRUCTURE;
                case "rooftop-object" -> Layer.ROOFTOP_OBJECT;
                case "protected-ground" -> Layer.PROTECTED_GROUND;
                case "exposed-roof" -> Layer.EXPOSED_ROOF;
                case "facade-band" -> org.lpzplanner.analysis.ResultGeoJson.SIDE_FLASH_NEGLIGIBLE.equals(
                        p.path("sideFlash").asString("")) ? Layer.FACADE_NEGLIGIBLE
                        : accepted ? Layer.ACCEPTED_ITEM : Layer.FACADE_BAND;
                case "exposed-edge" -> accepted ? Layer.ACCEPTED_ITEM : Layer.EXPOSED_EDGE;
                case "exposed-corner" -> accepted ? Layer.ACCEPTED_ITEM : Layer.EXPOSED_CORNER;
                case "model-warning" -> Layer.MODEL_WARNING; // accepted or not, the warning stands
                case "rod" -> Layer.ROD;
                case "conductor" -> Layer.CONDUCTOR;
                default -> null;
            };
            if (layer == null || paths.isEmpty()) {
                continue;
            }
            double shade = layer == Layer.STRUCTURE ? Math.min(1, p.path("height").asDouble(0) / maxHeight) : 0;
            shapes.add(new Shape(layer, paths, shade));
            for (List<double[]> path : paths) {
                for (double[] xy : path) {
                    box[0] = Math.min(box[0], xy[0]);
                    box[1] = Math.min(box[1], xy[1]);
                    box[2] = Math.max(box[2], xy[0]);
                    box[3] = Math.max(box[3], xy[1]);
                }
            }
            if (key != null && numbers.containsKey(key)) {
                double[] a = paths.get(0).get(0);
                double[] b = paths.get(0).get(paths.get(0).size() > 1 ? 1 : 0);
                labels.add(new Label("E" + numbers.get(key), (a[0] + b[0]) / 2, (a[1] + b[1]) / 2, true));
            } else if (layer == Layer.ROD || layer == Layer.CONDUCTOR) {
                String number = facts.partNumbers().get(p.path("id").asString(""));
                if (number != null) {
                    labels.add(new Label(number, paths.get(0).get(0)[0], paths.get(0).get(0)[1], true));
                }
            } else if (layer == Layer.STRUCTURE) {
                double[] c = centre(paths.get(0));
                labels.add(new Label(p.path("name").asString("") + " (" + ReportFacts.oneDecimal(
                        p.path("height").asDouble(0)) + " m)", c[0], c[1], false));
            }
        }
        int number = 0;
        for (DownConductorLayout layout : facts.downConductors()) {
            for (Coordinate c : layout.positions()) {
                number++;
                shapes.add(new Shape(Layer.DOWN_CONDUCTOR, List.of(List.of(new double[] {c.x, c.y})), 0));
                labels.add(new Label("D" + number, c.x, c.y, true));
            }
        }
        List<StoredDesign.KeepOutArea> areas = facts.design().keepOutAreas();
        for (int i = 0; i < areas.size(); i++) {
            List<double[]> ring = areas.get(i).corners();
            shapes.add(new Shape(Layer.KEEP_OUT, List.of(ring), 0));
            double[] c = centre(ring);
            labels.add(new Label(KeepOutSchedule.number(i), c[0], c[1], true));
            for (double[] xy : ring) {
                box[0] = Math.min(box[0], xy[0]);
                box[1] = Math.min(box[1], xy[1]);
                box[2] = Math.max(box[2], xy[0]);
                box[3] = Math.max(box[3], xy[1]);
            }
        }
        if (box[0] > box[2]) {
            box = new double[] {0, 0, 1, 1};
        }
        shapes.sort(java.util.Comparator.comparing(Shape::layer));
        return new PlanDrawing(shapes, labels, box[0], box[1], box[2], box[3]);
    }

    private static String layer(JsonNode f) {
        return f.path("properties").path("layer").asString("");
    }

    /** Rings of a (Multi)Polygon, the line of a LineString, or the one position of a Point. */
    private static List<List<double[]>> paths(JsonNode g) {
        List<List<double[]>> out = new ArrayList<>();
        JsonNode c = g.path("coordinates");
        switch (g.path("type").asString("")) {
            case "Point" -> out.add(List.of(new double[] {c.path(0).asDouble(), c.path(1).asDouble()}));
            case "LineString" -> out.add(positions(c));
            case "MultiLineString" -> c.forEach(line -> out.add(positions(line)));
            case "Polygon" -> c.forEach(r -> out.add(positions(r)));
            case "MultiPolygon" -> c.forEach(poly -> poly.forEach(r -> out.add(positions(r))));
            default -> {
                // other geometry types are not stored
            }
        }
        out.removeIf(List::isEmpty);
        return out;
    }

    private static List<double[]> positions(JsonNode array) {
        List<double[]> out = new ArrayList<>();
        array.forEach(p -> out.add(new double[] {p.path(0).asDouble(), p.path(1).asDouble()}));
        return out;
    }

    private static double[] centre(List<double[]> ring) {
        double minX = Double.POSITIVE_INFINITY, minY = Double.POSITIVE_INFINITY;
        double maxX = Double.NEGATIVE_INFINITY, maxY = Double.NEGATIVE_INFINITY;
        for (double[] p : ring) {
            minX = Math.min(minX, p[0]);
            minY = Math.min(minY, p[1]);
            maxX = Math.max(maxX, p[0]);
            maxY = Math.max(maxY, p[1]);
        }
        return new double[] {(minX + maxX) / 2, (minY + maxY) / 2};
    }
}
