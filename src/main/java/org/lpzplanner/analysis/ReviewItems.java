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
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * The items of a stored {@link ResultGeoJson} a designer reviews one by one: every exposed edge
 * (roof edge, parapet, ridge, hip, rooftop object edge), exposed corner and facade band, in the
 * order the result lists them. Exposed roof areas are not items of this list.
 *
 * <p>Each item has a key made of its kind and the first 12 hex digits of the SHA-256 of its owner,
 * kind, plan coordinates and top elevation rounded to the decimetre, so the same edge keeps its key when the numbers
 * of a later analysis differ only in the centimetres. Two items with the same key (the same line
 * listed twice) get {@code -2}, {@code -3}, … in order. Keys contain only {@code a-z}, {@code 0-9}
 * and {@code -}, so they are safe in paths and attributes.
 */
public final class ReviewItems {

    /** The layers whose features are review items. */
    public static final Set<String> LAYERS = Set.of("exposed-edge", "exposed-corner", "facade-band");

    private static final JsonMapper JSON = JsonMapper.builder().build();

    private ReviewItems() {
    }

    /**
     * One review item. {@code kind} is the edge kind of the result ({@code roof-edge},
     * {@code parapet}, {@code ridge}, {@code hip}, {@code rooftop-object-edge}), {@code corner} or
     * {@code facade-band}. {@code length} is null for corners; {@code bottom} is set for facade bands
     * only; {@code top} is the highest elevation in metres, null when the result does not give it.
     */
    public record Item(int number, String key, String owner, String kind, Double length, Double bottom,
            Double top) {
    }

    /** The items of a result, numbered from 1. */
    public static List<Item> of(String resultGeoJson) {
        List<JsonNode> features = features(resultGeoJson);
        Map<JsonNode, String> keys = keys(features);
        List<Item> items = new ArrayList<>();
        for (JsonNode f : features) {
            String key = keys.get(f);
            if (key != null) {
                JsonNode p = f.path("properties");
                items.add(new Item(items.size() + 1, key, p.path("owner").asString(""), kind(f), number(p, "length"),
                        number(p, "bottom"), number(p, "top")));
            }
        }
        return items;
    }

    /** The key of every review item among {@code features}, by feature identity. */
    public static Map<JsonNode, String> keys(List<JsonNode> features) {
        Map<JsonNode, String> keys = new IdentityHashMap<>();
        Map<String, Integer> seen = new HashMap<>();
        for (JsonNode f : features) {
            if (!LAYERS.contains(f.path("properties").path("layer").asString(""))) {
                continue;
            }
            String kind = kind(f);
            StringBuilder identity = new StringBuilder(f.path("properties").path("owner").asString(""))
                    .append('|').append(kind);
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

    static List<JsonNode> features(String resultGeoJson) {
        List<JsonNode> features = new ArrayList<>();
        JSON.readTree(resultGeoJson).path("features").forEach(features::add);
        return features;
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
