package org.lpzplanner.analysis;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * Draws the plan of an analysed site as an inline SVG element, from the stored
 * {@link ResultGeoJson}: structures shaded by height (darker is higher) with their names, rooftop
 * objects, protected open ground, exposed roof areas, facade bands (those where flashes to the side
 * are negligible, IEC 62305-3:2010 5.2.3, light and dashed), exposed edges and corners,
 * the stretches of parts a model warning is about, air-termination parts, a scale bar, a north
 * arrow and a legend. North is up (the y axis is
 * flipped). Every text from the site file is escaped; every other text comes from {@link Labels}.
 *
 * <p>The {@code <svg>} element carries its frame so that a script can turn a point of the drawing
 * back into local metres: {@code x = originX + (svgX - margin) / scale} and, the y axis being
 * flipped, {@code y = originY - (svgY - margin) / scale} ({@code data-origin-x},
 * {@code data-origin-y}, {@code data-scale} in SVG units per metre, {@code data-margin},
 * {@code data-y-flipped}). Rods carry their id in {@code data-rod-id}, conductors in {@code data-conductor-id}. Exposed edges, corners,
 * facade bands and model warnings carry their {@link ReviewItems} key in {@code data-item-key}; those a designer
 * accepted also get the class {@code accepted} and a title with the reason (escaped).
 */
public final class PlanSvg {

    /** Supplies the plan's own words (legend, north mark, scale), by message key. */
    @FunctionalInterface
    public interface Labels {
        String text(String key, Object... args);
    }

    /** Colours of the plan, also used by the legend. */
    static final String GROUND = "#cfe9c8";
    static final String OBJECT = "#b9ad94";
    public static final String EXPOSED_ROOF = "#f28c28";
    static final String FACADE = "#7b4fa0";
    /** Facade bands where flashes to the side are negligible: the band's purple, light and dashed. */
    static final String FACADE_NEGLIGIBLE = "#c4b0da";
    static final String EDGE = "#c8102e";
    public static final String PART = "#1f5fbf";
    /** Hatch of stored keep-out areas (our own: dark teal diagonal lines over what lies below). */
    static final String KEEP_OUT = "#1b6e5a";
    /**
     * Stretches of parts a model warning is about (our own: a broad dashed amber band laid under
     * the part, so the part stays visible on top of it).
     */
    static final String WARNING = "#e09b00";

    private static final JsonMapper JSON = JsonMapper.builder().build();
    private static final double WIDTH = 820;
    private static final double DRAW_HEIGHT = 560;
    private static final double MARGIN = 36;
    private static final double LEGEND_ROW = 20;

    private PlanSvg() {
    }

    /** The SVG markup for one result. */
    public static String render(String resultGeoJson, Labels labels) {
        return render(resultGeoJson, labels, Map.of());
    }

    /**
     * The SVG markup for one result, with the accepted review items marked.
     *
     * @param accepted the reason of each accepted item, by item key
     */
    public static String render(String resultGeoJson, Labels labels, Map<String, String> accepted) {
        return render(resultGeoJson, labels, accepted, List.of());
    }

    /** A keep-out area the site stores: its name and outline in local metres (ring not closed). */
    public record KeepOut(String name, List<double[]> corners) {
    }

    /**
     * The SVG markup for one result with the accepted review items marked and the site's stored
     * keep-out areas hatched on top (class {@code keep-out-area}, {@code data-keep-out-name}; they let
     * clicks through to the plan) with a legend row when there are any.
     */
    public static String render(String resultGeoJson, Labels labels, Map<String, String> accepted,
            List<KeepOut> keepOut) {
        return render(JSON.readTree(resultGeoJson), labels, accepted, keepOut);
    }

    /** As {@link #render(String, Labels, Map, List)}, from a result already read ({@link ParsedResults}). */
    public static String render(JsonNode root, Labels labels, Map<String, String> accepted, List<KeepOut> keepOut) {
        List<JsonNode> features = new ArrayList<>();
        root.path("features").forEach(features::add);
        Map<JsonNode, String> keys = ReviewItems.keys(features);
        double[] box = bounds(features);
        for (KeepOut k : keepOut) {
            for (double[] c : k.corners()) {
                box[0] = Math.min(box[0], c[0]);
                box[1] = Math.min(box[1], c[1]);
                box[2] = Math.max(box[2], c[0]);
                box[3] = Math.max(box[3], c[1]);
            }
        }
        double dx = Math.max(box[2] - box[0], 1);
        double dy = Math.max(box[3] - box[1], 1);
        double scale = Math.min((WIDTH - 2 * MARGIN) / dx, (DRAW_HEIGHT - 2 * MARGIN) / dy);
        double drawHeight = dy * scale + 2 * MARGIN;
        Frame frame = new Frame(box[0], box[3], scale);
        List<LegendRow> legendRows = new ArrayList<>(List.of(new LegendRow("plan.legend.structure", "#9a9a9f"),
                new LegendRow("plan.legend.object", OBJECT), new LegendRow("plan.legend.ground", GROUND),
                new LegendRow("plan.legend.roof", EXPOSED_ROOF), new LegendRow("plan.legend.facade", FACADE)));
        if (features.stream().anyMatch(ReviewItems::isNegligibleBand)) {
            legendRows.add(new LegendRow("plan.legend.facadeNegligible", FACADE_NEGLIGIBLE));
        }
        legendRows.addAll(List.of(new LegendRow("plan.legend.edge", EDGE), new LegendRow("plan.legend.part", PART)));
        if (features.stream().anyMatch(f -> layer(f).equals("model-warning"))) {
            legendRows.add(new LegendRow("plan.legend.warning", WARNING));
        }
        if (!keepOut.isEmpty()) {
            legendRows.add(new LegendRow("plan.legend.keepOut", "url(#keep-out-hatch)"));
        }
        double height = drawHeight + 10 + LEGEND_ROW * legendRows.size();
        double maxHeight = features.stream().filter(f -> layer(f).equals("structure"))
                .mapToDouble(f -> f.path("properties").path("height").asDouble(0)).max().orElse(1);

        StringBuilder svg = new StringBuilder();
        svg.append(String.format(Locale.ROOT, "<svg xmlns=\"http://www.w3.org/2000/svg\" class=\"plan\" viewBox=\"0 0 %.0f %.0f\""
                + " width=\"%.0f\" height=\"%.0f\" role=\"img\" aria-label=\"%s\" data-origin-x=\"%s\" data-origin-y=\"%s\""
                + " data-scale=\"%s\" data-margin=\"%s\" data-y-flipped=\"true\" data-draw-height=\"%.0f\">",
                WIDTH, height, WIDTH, height, escape(labels.text("plan.title", text(root, "name"))),
                exact(frame.minX()), exact(frame.maxY()), exact(frame.scale()), exact(MARGIN), drawHeight));
        if (!keepOut.isEmpty()) {
            svg.append("<defs><pattern id=\"keep-out-hatch\" patternUnits=\"userSpaceOnUse\" width=\"7\" height=\"7\""
                    + " patternTransform=\"rotate(45)\"><rect width=\"7\" height=\"7\" fill=\"#ffffff\" fill-opacity=\"0.35\"/>"
                    + "<line x1=\"0\" y1=\"0\" x2=\"0\" y2=\"7\" stroke=\"").append(KEEP_OUT)
                    .append("\" stroke-width=\"2\"/></pattern></defs>");
        }
        svg.append(String.format(Locale.ROOT, "<rect x=\"0\" y=\"0\" width=\"%.0f\" height=\"%.0f\" fill=\"#fbfbf8\"/>",
                WIDTH, drawHeight));
        for (String layer : ResultGeoJson.LAYERS) {
            if (layer.equals("exposed-edge")) {
                // names go under the edges, corners and parts, which must stay visible and clickable
                for (JsonNode f : features) {
                    if (layer(f).equals("structure")) {
                        label(svg, f, frame);
                    }
                }
            }
            for (JsonNode f : features) {
                if (!layer(f).equals(layer)) {
                    continue;
                }
                String key = keys.get(f);
                if (layer.equals("model-warning")) {
                    warning(svg, f, frame, key, key == null ? null : accepted.get(key), labels);
                    continue;
                }
                draw(svg, f, frame, maxHeight, labels);
                if (key != null) {
                    markItem(svg, key, accepted.get(key), labels);
                }
            }
        }
        keepOut(svg, keepOut, frame);
        scaleBar(svg, frame, drawHeight, labels);
        northArrow(svg, labels);
        legend(svg, drawHeight + 10, legendRows, labels);
        return svg.append("</svg>").toString();
    }

    private static void keepOut(StringBuilder svg, List<KeepOut> areas, Frame frame) {
        if (areas.isEmpty()) {
            return;
        }
        svg.append("<g id=\"keep-out-areas\" pointer-events=\"none\">");
        for (KeepOut k : areas) {
            StringBuilder d = new StringBuilder();
            double minX = Double.POSITIVE_INFINITY, maxY = Double.NEGATIVE_INFINITY;
            for (int i = 0; i < k.corners().size(); i++) {
                double[] c = k.corners().get(i);
                minX = Math.min(minX, c[0]);
                maxY = Math.max(maxY, c[1]);
                d.append(i == 0 ? "M" : " L").append(String.format(Locale.ROOT, " %.1f %.1f", frame.x(c[0]),
                        frame.y(c[1])));
            }
            d.append(" Z");
            svg.append("<path class=\"keep-out-area\" data-keep-out-name=\"").append(escape(k.name()))
                    .append("\" fill=\"url(#keep-out-hatch)\" stroke=\"").append(KEEP_OUT)
                    .append("\" stroke-width=\"1.5\" stroke-dasharray=\"6 3\" d=\"").append(d).append("\"><title>")
                    .append(escape(k.name())).append("</title></path>");
            // the name at the area's top left, clear of the structure names, which sit in the middle
            svg.append(String.format(Locale.ROOT, "<text class=\"keep-out-label\" x=\"%.1f\" y=\"%.1f\""
                    + " font-size=\"10\" font-family=\"sans-serif\" fill=\"%s\" stroke=\"#ffffff\""
                    + " stroke-width=\"3\" paint-order=\"stroke\">%s</text>",
                    frame.x(minX) + 3, frame.y(maxY) + 11, KEEP_OUT, escape(k.name())));
        }
        svg.append("</g>");
    }

    private record Frame(double minX, double maxY, double scale) {
        double x(double x) {
            return MARGIN + (x - minX) * scale;
        }

        double y(double y) {
            return MARGIN + (maxY - y) * scale;
        }
    }

    private static void draw(StringBuilder svg, JsonNode f, Frame frame, double maxHeight, Labels labels) {
        JsonNode properties = f.path("properties");
        JsonNode g = f.path("geometry");
        switch (layer(f)) {
            case "structure" -> {
                double share = Math.min(1, properties.path("height").asDouble(0) / maxHeight);
                int grey = (int) Math.round(225 - 130 * share);
                String fill = String.format(Locale.ROOT, "#%02x%02x%02x", grey, grey, grey + 6 > 255 ? 255 : grey + 6);
                svg.append("<path class=\"structure\" fill=\"").append(fill)
                        .append("\" stroke=\"#333333\" stroke-width=\"1\" fill-rule=\"evenodd\" d=\"")
                        .append(polygonPath(g, frame)).append("\"><title>").append(escape(text(f, "name")))
                        .append("</title></path>");
            }
            case "rooftop-object" -> svg.append("<path class=\"rooftop-object\" fill=\"").append(OBJECT)
                    .append("\" stroke=\"#555555\" stroke-width=\"0.8\" fill-rule=\"evenodd\" d=\"")
                    .append(polygonPath(g, frame)).append("\"><title>").append(escape(text(f, "name")))
                    .append("</title></path>");
            case "protected-ground" -> svg.append("<path class=\"protected-ground\" fill=\"").append(GROUND)
                    .append("\" stroke=\"none\" fill-rule=\"evenodd\" d=\"").append(polygonPath(g, frame))
                    .append("\"/>");
            case "exposed-roof" -> svg.append("<path class=\"exposed-roof\" fill=\"").append(EXPOSED_ROOF)
                    .append("\" fill-opacity=\"0.75\" stroke=\"none\" fill-rule=\"evenodd\" d=\"")
                    .append(polygonPath(g, frame)).append("\"/>");
            case "facade-band" -> {
                if (ReviewItems.isNegligibleBand(f)) {
                    // flashes to the side negligible (IEC 62305-3:2010 5.2.3): drawn, not an item
                    line(svg, "facade-band side-flash-negligible", g, frame, FACADE_NEGLIGIBLE, 5, "3 3");
                    svg.replace(svg.length() - 2, svg.length(), "><title>" + escape(labels.text(
                            "plan.negligibleBand", number(properties.path("bottom").asDouble()),
                            number(properties.path("top").asDouble()))) + "</title></path>");
                } else {
                    line(svg, "facade-band", g, frame, FACADE, 5, null);
                }
            }
            case "exposed-edge" -> line(svg, "exposed-edge", g, frame, EDGE, 2.5, null);
            case "conductor" -> {
                line(svg, "conductor", g, frame, PART, 2, "5 3");
                svg.insert(svg.length() - 2, " data-conductor-id=\"" + escape(text(f, "id")) + "\"");
            }
            case "exposed-corner" -> svg.append(String.format(Locale.ROOT,
                    "<circle class=\"exposed-corner\" cx=\"%.1f\" cy=\"%.1f\" r=\"3.5\" fill=\"%s\"/>",
                    frame.x(g.path("coordinates").path(0).asDouble()), frame.y(g.path("coordinates").path(1).asDouble()),
                    EDGE));
            case "rod" -> svg.append(String.format(Locale.ROOT,
                    "<circle class=\"rod\" data-rod-id=\"%s\" cx=\"%.1f\" cy=\"%.1f\" r=\"5\" fill=\"#ffffff\" stroke=\"%s\""
                    + " stroke-width=\"2\"><title>%s</title></circle>", escape(text(f, "id")),
                    frame.x(g.path("coordinates").path(0).asDouble()), frame.y(g.path("coordinates").path(1).asDouble()),
                    PART, escape(text(f, "name"))));
            default -> {
                // layers this drawing does not know are left out
            }
        }
    }

    /**
     * Adds the item key (and, when accepted, the class and a title) to the element just drawn, the
     * last start tag in {@code svg}.
     */
    private static void markItem(StringBuilder svg, String key, String reason, Labels labels) {
        int start = svg.lastIndexOf("<");
        int classAt = svg.indexOf("class=\"", start) + "class=\"".length();
        int classEnd = svg.indexOf("\"", classAt);
        if (reason != null) {
            svg.insert(classEnd, " accepted");
        }
        int tagEnd = svg.lastIndexOf("/>");
        if (tagEnd < start) {
            tagEnd = svg.length();
        }
        StringBuilder extra = new StringBuilder(" data-item-key=\"").append(escape(key)).append('"');
        svg.insert(tagEnd, extra);
        if (reason != null) {
            int close = svg.lastIndexOf("/>");
            svg.replace(close, close + 2, "><title>" + escape(labels.text("review.status.accepted", reason))
                    + "</title></" + svg.substring(start + 1, svg.indexOf(" ", start)) + ">");
        }
    }

    private static void line(StringBuilder svg, String cssClass, JsonNode g, Frame frame, String colour, double width,
            String dash) {
        StringBuilder d = new StringBuilder();
        ring(d, g.path("coordinates"), frame, false);
        svg.append("<path class=\"").append(cssClass).append("\" fill=\"none\" stroke=\"").append(colour)
                .append("\" stroke-linecap=\"round\" stroke-width=\"").append(width).append('"');
        if (dash != null) {
            svg.append(" stroke-dasharray=\"").append(dash).append('"');
        }
        svg.append(" d=\"").append(d).append("\"/>");
    }

    private static void label(StringBuilder svg, JsonNode f, Frame frame) {
        double[] box = bounds(List.of(f));
        double x = frame.x((box[0] + box[2]) / 2);
        double y = frame.y((box[1] + box[3]) / 2);
        String text = escape(text(f, "name")) + String.format(Locale.ROOT, " (%s m)",
                number(f.path("properties").path("height").asDouble()));
        svg.append(String.format(Locale.ROOT, "<text class=\"structure-label\" x=\"%.1f\" y=\"%.1f\" text-anchor=\"middle\""
                + " font-size=\"11\" font-family=\"sans-serif\" fill=\"#111111\" stroke=\"#ffffff\" stroke-width=\"3\""
                + " paint-order=\"stroke\" pointer-events=\"none\">%s</text>", x, y, text));
    }

    private static void scaleBar(StringBuilder svg, Frame frame, double drawHeight, Labels labels) {
        double target = (WIDTH - 2 * MARGIN) / 5 / frame.scale();
        double magnitude = Math.pow(10, Math.floor(Math.log10(target)));
        double length = magnitude;
        for (double step : new double[] {1, 2, 5, 10}) {
            if (step * magnitude <= target) {
                length = step * magnitude;
            }
        }
        double px = length * frame.scale();
        double y = drawHeight - 14;
        svg.append(String.format(Locale.ROOT, "<g class=\"scale-bar\"><rect x=\"%.1f\" y=\"%.1f\" width=\"%.1f\" height=\"5\""
                + " fill=\"#222222\"/><text x=\"%.1f\" y=\"%.1f\" font-size=\"11\" font-family=\"sans-serif\">%s</text></g>",
                MARGIN, y, px, MARGIN, y - 4, escape(labels.text("plan.scale", number(length)))));
    }

    private static void northArrow(StringBuilder svg, Labels labels) {
        double x = WIDTH - MARGIN;
        svg.append(String.format(Locale.ROOT, "<g class=\"north-arrow\"><path d=\"M %.1f 14 L %.1f 44 L %.1f 36 L %.1f 44 Z\""
                + " fill=\"#222222\"/><text x=\"%.1f\" y=\"58\" text-anchor=\"middle\" font-size=\"12\""
                + " font-family=\"sans-serif\" font-weight=\"bold\">%s</text></g>", x, x - 8, x, x + 8, x,
                escape(labels.text("plan.north"))));
    }

    /** A legend row: the message key of its words and the fill of its swatch. */
    private record LegendRow(String key, String fill) {
    }

    private static void legend(StringBuilder svg, double top, List<LegendRow> rows, Labels labels) {
        svg.append("<g class=\"legend\" font-size=\"12\" font-family=\"sans-serif\">");
        for (int i = 0; i < rows.size(); i++) {
            double y = top + i * LEGEND_ROW;
            svg.append(String.format(Locale.ROOT, "<rect x=\"%.1f\" y=\"%.1f\" width=\"18\" height=\"12\" fill=\"%s\""
                    + " stroke=\"#444444\" stroke-width=\"0.5\"/><text x=\"%.1f\" y=\"%.1f\">%s</text>", MARGIN, y,
                    rows.get(i).fill(), MARGIN + 26, y + 10, escape(labels.text(rows.get(i).key()))));
        }
        svg.append("</g>");
    }

    /**
     * The stretch a model warning is about: a broad dashed band in its own colour, under the part
     * (drawn before rods and conductors), with the review key, the warning's words as its title
     * and, when the designer accepted it, the class {@code accepted} and the reason.
     */
    private static void warning(StringBuilder svg, JsonNode f, Frame frame, String key, String reason,
            Labels labels) {
        StringBuilder d = new StringBuilder();
        JsonNode g = f.path("geometry");
        if ("LineString".equals(g.path("type").asString(""))) {
            ring(d, g.path("coordinates"), frame, false);
        } else {
            for (JsonNode line : g.path("coordinates")) {
                if (d.length() > 0) {
                    d.append(' ');
                }
                ring(d, line, frame, false);
            }
        }
        if (d.length() == 0) {
            return;
        }
        svg.append("<path class=\"model-warning").append(reason != null ? " accepted" : "").append('"');
        if (key != null) {
            svg.append(" data-item-key=\"").append(escape(key)).append('"');
        }
        svg.append(" fill=\"none\" stroke=\"").append(WARNING).append("\" stroke-opacity=\"0.8\" stroke-width=\"11\""
                + " stroke-dasharray=\"9 5\" stroke-linecap=\"butt\" d=\"").append(d).append("\"><title>")
                .append(escape(text(f, "text")));
        if (reason != null) {
            svg.append(' ').append(escape(labels.text("review.status.accepted", reason)));
        }
        svg.append("</title></path>");
    }

    /** SVG path data of a (Multi)Polygon's rings. */
    private static String polygonPath(JsonNode g, Frame frame) {
        StringBuilder d = new StringBuilder();
        JsonNode coordinates = g.path("coordinates");
        if ("Polygon".equals(g.path("type").asString())) {
            coordinates.forEach(r -> ring(d, r, frame, true));
        } else {
            coordinates.forEach(p -> p.forEach(r -> ring(d, r, frame, true)));
        }
        return d.toString();
    }

    private static void ring(StringBuilder d, JsonNode positions, Frame frame, boolean close) {
        for (int i = 0; i < positions.size(); i++) {
            JsonNode p = positions.get(i);
            d.append(i == 0 ? "M" : " L").append(String.format(Locale.ROOT, " %.1f %.1f",
                    frame.x(p.path(0).asDouble()), frame.y(p.path(1).asDouble())));
        }
        if (close && positions.size() > 0) {
            d.append(" Z ");
        }
    }

    /** minX, minY, maxX, maxY over all positions of the features. */
    private static double[] bounds(List<JsonNode> features) {
        double[] box = {Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY,
            Double.NEGATIVE_INFINITY};
        for (JsonNode f : features) {
            collect(f.path("geometry").path("coordinates"), box);
        }
        if (box[0] > box[2]) {
            return new double[] {0, 0, 1, 1};
        }
        return box;
    }

    private static void collect(JsonNode node, double[] box) {
        if (node.isArray() && node.size() >= 2 && node.get(0).isNumber()) {
            double x = node.get(0).asDouble();
            double y = node.get(1).asDouble();
            box[0] = Math.min(box[0], x);
            box[1] = Math.min(box[1], y);
            box[2] = Math.max(box[2], x);
            box[3] = Math.max(box[3], y);
        } else if (node.isArray()) {
            node.forEach(child -> collect(child, box));
        }
    }

    private static String layer(JsonNode f) {
        return f.path("properties").path("layer").asString("");
    }

    private static String text(JsonNode node, String field) {
        JsonNode value = node.has("properties") ? node.path("properties").path(field) : node.path(field);
        return value.isNull() || value.isMissingNode() ? "" : value.asString();
    }

    static String number(double value) {
        return value == Math.rint(value) ? String.valueOf((long) value) : String.format(Locale.ROOT, "%.1f", value);
    }

    /** A coordinate-frame number for the data attributes, exact enough to invert the drawing. */
    private static String exact(double value) {
        return String.format(Locale.ROOT, "%.6f", value);
    }

    /** Escapes text for SVG/XML content and attribute values. */
    public static String escape(String text) {
        StringBuilder out = new StringBuilder(text.length());
        for (char c : text.toCharArray()) {
            switch (c) {
                case '&' -> out.append("&amp;");
                case '<' -> out.append("&lt;");
                case '>' -> out.append("&gt;");
                case '"' -> out.append("&quot;");
                case '\'' -> out.append("&#39;");
                default -> out.append(c < 0x20 && c != '\t' && c != '\n' && c != '\r' ? ' ' : c);
            }
        }
        return out.toString();
    }
}
