package org.lpzplanner.analysis;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.lpzplanner.drawing.PlanDrawing;
import org.lpzplanner.drawing.PlanItem;
import org.lpzplanner.drawing.PlanSvgRenderer;
import org.lpzplanner.drawing.Texts;
import org.lpzplanner.engine.io.Json;
import tools.jackson.databind.JsonNode;

/**
 * The plan of an analysed site as the pages show it: the {@link ResultDrawing} of a stored result,
 * with the accepted review items marked and the site's stored keep-out areas, drawn by
 * {@link PlanSvgRenderer} (its class comment gives the SVG's contract with the page scripts). The
 * report draws the same model to PDF.
 */
public final class PlanSvg {

    /** The drawing's height above its legend at most, in SVG units. */
    private static final double DRAW_HEIGHT = 560;

    private PlanSvg() {
    }

    /** The SVG markup for one result. */
    public static String render(String resultGeoJson, Texts texts) {
        return render(resultGeoJson, texts, Map.of());
    }

    /**
     * The SVG markup for one result, with the accepted review items marked.
     *
     * @param accepted the reason of each accepted item, by item key
     */
    public static String render(String resultGeoJson, Texts texts, Map<String, String> accepted) {
        return render(resultGeoJson, texts, accepted, List.of());
    }

    /**
     * The SVG markup for one result with the accepted review items marked and the site's stored
     * keep-out areas hatched (class {@code keep-out-area}, {@code data-keep-out-name}; they let
     * clicks through to the plan), named in their top left corner, with a legend row when there are
     * any.
     */
    public static String render(String resultGeoJson, Texts texts, Map<String, String> accepted,
            List<PlanItem.KeepOutArea> keepOut) {
        return render(Json.MAPPER.readTree(resultGeoJson), texts, accepted, keepOut);
    }

    /**
     * As {@link #render(String, Texts, Map, List)}, from a result already read
     * ({@link ParsedResults}); the tree is only read.
     */
    public static String render(JsonNode root, Texts texts, Map<String, String> accepted,
            List<PlanItem.KeepOutArea> keepOut) {
        List<JsonNode> features = new ArrayList<>();
        root.path("features").forEach(features::add);
        PlanDrawing drawing = ResultDrawing.of(features, accepted, Map.of()).addAll(keepOut).build();
        String name = root.path("name").isString() ? root.path("name").asString() : "";
        return PlanSvgRenderer.render(drawing, texts,
                new PlanSvgRenderer.Options("plan", texts.text("plan.title", name), DRAW_HEIGHT));
    }
}
