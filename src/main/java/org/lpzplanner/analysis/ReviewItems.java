package org.lpzplanner.analysis;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HexFormat;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.lpzplanner.engine.io.Json;
import tools.jackson.databind.JsonNode;

/**
 * The items of a stored {@link ResultGeoJson} a designer reviews one by one: every exposed edge
 * (roof edge, parapet, ridge, hip, rooftop object edge), exposed corner and facade band (or part of
 * one) that needs lateral air-termination, and every model warning, in the order the result lists
 * them. Exposed roof areas are not items of this list, nor are facade bands where flashes to the
 * side are negligible (IEC 62305-3:2010 5.2.3 and Annex A: structures lower than 60 m, and below the
 * upper 20 % of taller ones): those are drawn and listed apart.
 *
 * <p>A model warning (layer {@code model-warning}) is an item a designer must look at: it names a
 * part that protects nothing directly beneath a stretch of it (a wire more than R above the surface
 * beneath it, which a sphere can pass under). It can be
 * accepted with a reason like any other item, which records the designer's answer; the analysis
 * still gives no verdict of full protection while it stands, accepted or not. Its plan geometry is
 * never lent to the proposal as accepted (see {@link #geometries}): accepting the warning says
 * nothing about what lies beneath the part.
 *
 * <p>Each item has a key made of its kind and the first 12 hex digits of the SHA-256 of its owner,
 * kind, plan coordinates and top elevation rounded to the decimetre, so the same edge keeps its key when the numbers
 * of a later analysis differ only in the centimetres. Two items with the same key (the same line
 * listed twice) get {@code -2}, {@code -3}, … in order. Keys contain only {@code a-z}, {@code 0-9}
 * and {@code -}, so they are safe in paths and attributes.
 */
public final class ReviewItems {

    /** The layers whose features are review items. */
    public static final Set<String> LAYERS = Set.of("exposed-edge", "exposed-corner", "facade-band",
            "model-warning");

    private ReviewItems() {
    }

    /**
     * One review item. {@code kind} is the edge kind of the result ({@code roof-edge},
     * {@code parapet}, {@code ridge}, {@code hip}, {@code rooftop-object-edge}), {@code corner},
     * {@code facade-band}, or for a model warning its kind ({@code free-span}). {@code length} is null
     * for corners; {@code bottom} is set for facade bands only; {@code top} is the highest elevation
     * in metres, null when the result does not give it (and for warnings). For a model warning,
     * {@code owner} is the part's name, {@code length} the plan length of the stretch concerned,
     * {@code heightAboveSurface} the part's greatest height above the surface beneath it and
     * {@code text} the warning in plain words; both are null for every other item.
     */
    public record Item(int number, String key, String owner, String kind, Double length, Double bottom,
            Double top, Double heightAboveSurface, String text) {

        /** True for a model warning, false for an exposed edge, corner or facade band. */
        public boolean isModelWarning() {
            return text != null;
        }
    }

    /** The items of a result, numbered from 1. */
    public static List<Item> of(String resultGeoJson) {
        return of(Json.MAPPER.readTree(resultGeoJson));
    }

    /** The items of a result read as a tree ({@link ParsedResults}), numbered from 1. */
    static List<Item> of(JsonNode result) {
        List<JsonNode> features = features(result);
        Map<JsonNode, String> keys = keys(features);
        List<Item> items = new ArrayList<>();
        for (JsonNode f : features) {
            String key = keys.get(f);
            if (key == null) {
                continue;
            }
            JsonNode p = f.path("properties");
            if (isWarning(f)) {
                items.add(new Item(items.size() + 1, key, owner(f), kind(f), planLength(f.path("geometry")), null,
                        null, number(p, "heightAboveSurface"), p.path("text").asString("")));
            } else {
                items.add(new Item(items.size() + 1, key, owner(f), kind(f), number(p, "length"), number(p, "bottom"),
                        number(p, "top"), null, null));
            }
        }
        return items;
    }

    /**
     * Plan geometries (local metres) of the review items with the given keys: lines for edges and
     * facade bands, points for corners. Model warnings give none: accepting one accepts nothing
     * that lies beneath its part.
     */
    public static List<org.locationtech.jts.geom.Geometry> geometries(String resultGeoJson, Set<String> wanted) {
        List<JsonNode> features = features(resultGeoJson);
        Map<JsonNode, String> keys = keys(features);
        org.locationtech.jts.geom.GeometryFactory gf = new org.locationtech.jts.geom.GeometryFactory();
        List<org.locationtech.jts.geom.Geometry> out = new ArrayList<>();
        for (JsonNode f : features) {
            String key = keys.get(f);
            if (key == null || !wanted.contains(key) || isWarning(f)) {
                continue;
            }
            List<org.locationtech.jts.geom.Coordinate> cs = new ArrayList<>();
            collect(f.path("geometry").path("coordinates"), cs);
            if (cs.size() == 1) {
                out.add(gf.createPoint(cs.get(0)));
            } else if (cs.size() > 1) {
                out.add(gf.createLineString(cs.toArray(new org.locationtech.jts.geom.Coordinate[0])));
            }
        }
        return out;
    }

    private static void collect(JsonNode node, List<org.locationtech.jts.geom.Coordinate> out) {
        if (node.isArray() && node.size() >= 2 && node.get(0).isNumber()) {
            out.add(new org.locationtech.jts.geom.Coordinate(node.get(0).asDouble(), node.get(1).asDouble()));
        } else if (node.isArray()) {
            node.forEach(child -> collect(child, out));
        }
    }

    /** The key of every review item among {@code features}, by feature identity. */
    public static Map<JsonNode, String> keys(List<JsonNode> features) {
        Map<JsonNode, String> keys = new IdentityHashMap<>();
        Map<String, Integer> seen = new HashMap<>();
        for (JsonNode f : features) {
            if (!LAYERS.contains(f.path("properties").path("layer").asString("")) || isNegligibleBand(f)) {
                continue;
            }
            String kind = kind(f);
            // a warning is keyed by its part's id, which a renamed part keeps
            StringBuilder identity = new StringBuilder(isWarning(f) ? "part:" + f.path("properties").path("part")
                    .asString("") : f.path("properties").path("owner").asString("")).append('|').append(kind);
            coordinates(f.path("geometry").path("coordinates"), identity);
            JsonNode top = f.path("properties").path("top");
            if (top.isNumber()) {
                identity.append(String.format(Locale.ROOT, "|%.1f", top.asDouble()));
            }
            String base = kind + "-" + sha256(identity.toString()).substring(0, 12);
            int count = seen.merge(base, 1, Integer::sum);
            keys.put(f, count == 1 ? base : base + "-" + count);
        }
        return keys;
    }

    /**
     * How many facade bands (or parts of them) of a stored result have flashes to the side
     * negligible (IEC 62305-3:2010 5.2.3): drawn and listed, not items of the review.
     */
    public static int negligibleBands(String resultGeoJson) {
        return negligibleBands(Json.MAPPER.readTree(resultGeoJson));
    }

    static int negligibleBands(JsonNode result) {
        return (int) features(result).stream().filter(ReviewItems::isNegligibleBand).count();
    }

    static List<JsonNode> features(String resultGeoJson) {
        return features(Json.MAPPER.readTree(resultGeoJson));
    }

    private static List<JsonNode> features(JsonNode result) {
        List<JsonNode> features = new ArrayList<>();
        result.path("features").forEach(features::add);
        return features;
    }

    /**
     * A facade band (or part of one) where flashes to the side are negligible (IEC 62305-3:2010
     * 5.2.3): drawn and listed, but nothing to accept. A band without {@code sideFlash} (a result
     * stored before bands were classified) counts as needing lateral air-termination.
     */
    static boolean isNegligibleBand(JsonNode f) {
        return f.path("properties").path("layer").asString("").equals("facade-band")
                && ResultGeoJson.SIDE_FLASH_NEGLIGIBLE.equals(f.path("properties").path("sideFlash").asString(""));
    }

    private static boolean isWarning(JsonNode f) {
        return f.path("properties").path("layer").asString("").equals("model-warning");
    }

    /** The name shown for an item: its structure's or object's, or a warning's part. */
    private static String owner(JsonNode f) {
        JsonNode p = f.path("properties");
        if (isWarning(f)) {
            String name = p.path("partName").asString("");
            return name.isBlank() ? p.path("part").asString("") : name;
        }
        return p.path("owner").asString("");
    }

    /** Plan length of a (Multi)LineString's positions as stored (local metres). */
    private static Double planLength(JsonNode geometry) {
        JsonNode c = geometry.path("coordinates");
        List<JsonNode> lines = new ArrayList<>();
        if ("LineString".equals(geometry.path("type").asString(""))) {
            lines.add(c);
        } else if ("MultiLineString".equals(geometry.path("type").asString(""))) {
            c.forEach(lines::add);
        } else {
            return null;
        }
        double length = 0;
        for (JsonNode line : lines) {
            for (int k = 1; k < line.size(); k++) {
                length += Math.hypot(line.get(k).path(0).asDouble() - line.get(k - 1).path(0).asDouble(),
                        line.get(k).path(1).asDouble() - line.get(k - 1).path(1).asDouble());
            }
        }
        return ResultGeoJson.round(length);
    }

    private static String kind(JsonNode f) {
        return switch (f.path("properties").path("layer").asString("")) {
            case "exposed-corner" -> "corner";
            case "facade-band" -> "facade-band";
            default -> f.path("properties").path("kind").asString("edge").toLowerCase(Locale.ROOT)
                    .replaceAll("[^a-z0-9-]", "-");
        };
    }

    private static void coordinates(JsonNode node, StringBuilder out) {
        if (node.isArray() && node.size() >= 2 && node.get(0).isNumber()) {
            out.append(String.format(Locale.ROOT, "|%.1f,%.1f", node.get(0).asDouble() + 0.0,
                    node.get(1).asDouble() + 0.0));
        } else if (node.isArray()) {
            node.forEach(child -> coordinates(child, out));
        }
    }

    private static Double number(JsonNode properties, String field) {
        JsonNode value = properties.path(field);
        return value.isNumber() ? value.asDouble() : null;
    }

    private static String sha256(String text) {
        try {
            return HexFormat.of().formatHex(
                    MessageDigest.getInstance("SHA-256").digest(text.getBytes(StandardCharsets.UTF_8)));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java runtime has SHA-256", e);
        }
    }
}
