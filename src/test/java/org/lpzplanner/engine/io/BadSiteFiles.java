package org.lpzplanner.engine.io;

import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Random;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.ArrayNode;
import tools.jackson.databind.node.JsonNodeFactory;
import tools.jackson.databind.node.ObjectNode;

/**
 * Generates site files that are wrong in one way each, from a valid five-feature site: broken JSON,
 * wrong or missing values, bad geometry, repeated features, wrong units, non-finite numbers. Each
 * case says which feature and field the error must name (-1 and null where the whole file is at fault).
 */
public final class BadSiteFiles {

    /** One bad file and what its error must name. */
    public record Case(String description, byte[] content, int feature, String field) {
        public String text() {
            return new String(content, StandardCharsets.UTF_8);
        }
    }

    private static final JsonMapper JSON = JsonMapper.builder().build();
    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;
    private static final List<String> BAD_NUMBERS = List.of("-1", "0", "-0.001", "\"ten\"", "null", "true", "[]",
            "{}", "1e999", "-1e999", "5000", "\"NaN\"", "\"Infinity\"", "1001");

    private BadSiteFiles() {}

    /** The valid site every case starts from (local metres; features 0 to 4). */
    static ObjectNode valid() {
        ObjectNode root = NODES.objectNode();
        root.put("type", "FeatureCollection");
        root.put("name", "Fuzz yard");
        root.put("coordinates", "local-metres");
        ArrayNode features = root.putArray("features");
        features.add(structure("Hall", 8, 0, 0, 30, 20));
        features.add(structure("Annex", 5, 40, 0, 55, 12));
        ObjectNode vent = feature("rooftop-object", "Vent", point(10, 10));
        ((ObjectNode) vent.get("properties")).put("top", 9.5).put("radius", 0.4);
        features.add(vent);
        ObjectNode mast = feature("rod", "Mast", point(60, 30));
        ((ObjectNode) mast.get("properties")).put("height", 4);
        features.add(mast);
        features.add(structure("Store", 4, 0, 30, 12, 40));
        return root;
    }

    static byte[] bytes(ObjectNode root) {
        return JSON.writeValueAsBytes(root);
    }

    public static Case generate(Random random) {
        ObjectNode root = valid();
        ArrayNode features = (ArrayNode) root.get("features");
        int[] structures = {0, 1, 4};
        int s = structures[random.nextInt(structures.length)];
        ObjectNode structure = (ObjectNode) features.get(s);
        ObjectNode props = (ObjectNode) structure.get("properties");
        ArrayNode ring = (ArrayNode) structure.get("geometry").get("coordinates").get(0);
        switch (random.nextInt(16)) {
            case 0 -> {
                byte[] full = bytes(root);
                int cut = 1 + random.nextInt(full.length - 2);
                return new Case("truncated at byte " + cut, java.util.Arrays.copyOf(full, cut), -1, null);
            }
            case 1 -> {
                byte[] full = bytes(root);
                full[random.nextInt(full.length)] = (byte) (0x80 + random.nextInt(0x40));
                return new Case("a byte that is not UTF-8", full, -1, null);
            }
            case 2 -> {
                String bad = BAD_NUMBERS.get(random.nextInt(BAD_NUMBERS.size()));
                props.set("height", JSON.readTree(bad));
                return new Case("height " + bad, bytes(root), s, "height");
            }
            case 3 -> {
                props.remove("height");
                return new Case("height missing", bytes(root), s, "height");
            }
            case 4 -> {
                // two adjacent corners swapped: the outline crosses itself (a bow-tie)
                int i = random.nextInt(3);
                var a = ring.get(i);
                ring.set(i, ring.get(i + 1));
                ring.set(i + 1, a);
                ring.set(4, ring.get(0));
                return new Case("bow-tie footprint", bytes(root), s, "geometry");
            }
            case 5 -> {
                ArrayNode corner = (ArrayNode) ring.get(random.nextInt(4));
                String bad = List.of("\"x\"", "null", "1e999", "\"NaN\"", "[]", "{}").get(random.nextInt(6));
                corner.set(random.nextInt(2), JSON.readTree(bad));
                return new Case("coordinate " + bad, bytes(root), s, "geometry");
            }
            case 6 -> {
                String type = List.of("LineString", "Point", "MultiPoint", "GeometryCollection", "Circle")
                        .get(random.nextInt(5));
                ((ObjectNode) structure.get("geometry")).put("type", type);
                return new Case("structure geometry " + type, bytes(root), s, "geometry");
            }
            case 7 -> {
                ring.remove(4);
                return new Case("ring not closed", bytes(root), s, "geometry");
            }
            case 8 -> {
                var first = ring.get(0);
                for (int i = 1; i < 5; i++) {
                    ring.set(i, first.deepCopy());
                }
                return new Case("all corners in one point", bytes(root), s, "geometry");
            }
            case 9 -> {
                // the copy goes last, so the later feature is the one at fault
                features.add(structure.deepCopy());
                return new Case("feature repeated", bytes(root), features.size() - 1, "geometry");
            }
            case 10 -> {
                root.remove("coordinates");
                return new Case("metres in a lon/lat file", bytes(root), -1, null);
            }
            case 11 -> {
                double lon = -170 + random.nextDouble() * 340;
                double lat = -80 + random.nextDouble() * 160;
                structure.set("geometry", rectangle(lon, lat, lon + 0.0002, lat + 0.0002));
                return new Case("lon/lat in a local-metre file", bytes(root), s, "geometry");
            }
            case 12 -> {
                double far = 20_001 + random.nextDouble() * 200_000;
                ObjectNode g = random.nextBoolean() ? rectangle(far, 0, far + 10, 10) : rectangle(0, far, 10, far + 10);
                structure.set("geometry", g);
                return new Case("site " + Math.round(far / 1000) + " km across", bytes(root), -1, null);
            }
            case 13 -> {
                props.put("kind", List.of("building", "", "Structure", "mast", "42").get(random.nextInt(5)));
                return new Case("unknown kind", bytes(root), s, "kind");
            }
            case 14 -> {
                props.put("roof", "gable");
                return new Case("gable without ridge", bytes(root), s, "ridgeHeight");
            }
            default -> {
                String body = List.of("[]", "{}", "null", "\"site\"", "{\"type\":\"Feature\"}",
                        "{\"type\":\"FeatureCollection\"}", "{\"type\":\"FeatureCollection\",\"features\":{}}",
                        "[".repeat(600), "", "   ").get(random.nextInt(10));
                return new Case("not a site: " + (body.length() > 20 ? body.substring(0, 20) + "..." : body),
                        body.getBytes(StandardCharsets.UTF_8), -1, null);
            }
        }
    }

    private static ObjectNode structure(String name, double height, double x0, double y0, double x1, double y1) {
        ObjectNode f = feature("structure", name, rectangle(x0, y0, x1, y1));
        ((ObjectNode) f.get("properties")).put("height", height);
        return f;
    }

    private static ObjectNode feature(String kind, String name, ObjectNode geometry) {
        ObjectNode f = NODES.objectNode();
        f.put("type", "Feature");
        f.putObject("properties").put("kind", kind).put("name", name);
        f.set("geometry", geometry);
        return f;
    }

    private static ObjectNode point(double x, double y) {
        ObjectNode g = NODES.objectNode();
        g.put("type", "Point");
        g.putArray("coordinates").add(x).add(y);
        return g;
    }

    private static ObjectNode rectangle(double x0, double y0, double x1, double y1) {
        ObjectNode g = NODES.objectNode();
        g.put("type", "Polygon");
        ArrayNode ring = g.putArray("coordinates").addArray();
        double[][] corners = {{x0, y0}, {x1, y0}, {x1, y1}, {x0, y1}, {x0, y0}};
        for (double[] c : corners) {
            ring.addArray().add(c[0]).add(c[1]);
        }
        return g;
    }
}
