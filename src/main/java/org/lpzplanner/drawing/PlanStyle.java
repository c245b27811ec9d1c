package org.lpzplanner.drawing;

import java.util.Collections;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

/**
 * The one style table: for every {@link Layer}, its colour, stroke, dash and legend words (a message
 * key for the pages, the report's own words for the printed report). The SVG renderer, the report's
 * PDF painter, the section drawings and the collection-area drawing all read it, so a layer looks
 * the same on screen and on paper. The colours are our own.
 *
 * <p>Sizes are in points on paper; the pages draw {@link #WEB_UNITS_PER_POINT} SVG units per point
 * (an 820-unit wide drawing holds about what a 492-point wide A4 frame holds).
 */
public final class PlanStyle {

    /** SVG units drawn for one point of the paper's sizes. */
    public static final double WEB_UNITS_PER_POINT = 5.0 / 3.0;

    /** The drawing's ground. */
    public static final Colour BACKGROUND = Colour.of(0xfbfbf8);
    /** Names and numbers on a drawing (with a white halo). */
    public static final Colour LABEL = Colour.of(0x111111);
    /** The halo round names and numbers, the fill of rods and the veil under hatching. */
    public static final Colour WHITE = Colour.of(0xffffff);

    /** The ink of a drawing's furniture: north arrow, scale bar, axes. */
    public static final Colour INK = Colour.of(0x222222);
    /** The outline of a legend's swatches. */
    public static final Colour SWATCH_OUTLINE = Colour.of(0x444444);

    /** The grid of detail sheets drawn over an overview, in the parts' blue. */
    public static final Colour SHEET_GRID = Colour.of(0x1f5fbf);

    /** Size of structure names, in points. */
    public static final double NAME_SIZE = 6.6;
    /** Size of the names of areas written in a corner (keep-out areas), in points. */
    public static final double AREA_NAME_SIZE = 6;
    /** Size of item, part and down-conductor numbers, in points. */
    public static final double NUMBER_SIZE = 5.5;

    /** Reached by the sphere (LPZ 0A): exposed roof on the plan, the exposed profile on a section. */
    private static final Colour LPZ_0A = Colour.of(0xf28c28);
    /** Air-termination parts, on the plan and on a section. */
    private static final Colour PART = Colour.of(0x1f5fbf);
    private static final Colour EDGE = Colour.of(0xc8102e);
    private static final Colour KEEP_OUT = Colour.of(0x1b6e5a);
    private static final Colour DARK_OUTLINE = Colour.of(0x333333);
    private static final double[] SOLID = {};

    private static final Map<Layer, LayerStyle> TABLE = table();

    /**
     * The order of the legend's rows; layers that share words (edges and corners, rods and
     * conductors) share a row.
     */
    private static final List<Layer> LEGEND_ORDER = List.of(Layer.COLLECTION_AREA, Layer.STRUCTURE,
            Layer.ROOFTOP_OBJECT, Layer.PROTECTED_GROUND, Layer.EXPOSED_ROOF, Layer.FACADE_BAND,
            Layer.FACADE_NEGLIGIBLE, Layer.EXPOSED_EDGE, Layer.EXPOSED_CORNER, Layer.ACCEPTED_ITEM, Layer.ROD,
            Layer.CONDUCTOR, Layer.DOWN_CONDUCTOR, Layer.MODEL_WARNING, Layer.KEEP_OUT, Layer.SECTION_PROFILE,
            Layer.SECTION_EXPOSED, Layer.SECTION_ENVELOPE, Layer.SECTION_ROD, Layer.SECTION_SPHERE);

    private PlanStyle() {
    }

    /** How the layer is drawn. */
    public static LayerStyle of(Layer layer) {
        return TABLE.get(layer);
    }

    /** Every layer's style, in the order of {@link Layer}. */
    public static Map<Layer, LayerStyle> all() {
        return Collections.unmodifiableMap(TABLE);
    }

    /** Every layer in the order of the legend's rows. */
    public static List<Layer> legendOrder() {
        return LEGEND_ORDER;
    }

    /**
     * The fill of a structure by its height: from a light grey for the lowest (share 0) to a dark
     * one for the highest (share 1) of the drawing.
     */
    public static Colour structureFill(double share) {
        return Colour.grey((int) Math.round(225 - 130 * Math.max(0, Math.min(1, share))));
    }

    private static Map<Layer, LayerStyle> table() {
        Map<Layer, LayerStyle> t = new EnumMap<>(Layer.class);
        t.put(Layer.PROTECTED_GROUND, area(Colour.of(0xcfe9c8), null, 1, 0, "plan.legend.ground",
                "Protected open ground (LPZ 0B)"));
        t.put(Layer.COLLECTION_AREA, new LayerStyle(Colour.of(0x9cc3e6), PART, 0.55, 0.9, new double[] {3.6, 1.8},
                false, 0, null, LABEL, "plan.legend.collectionArea", "Collection area A_D of the risk estimate"));
        t.put(Layer.STRUCTURE, area(structureFill(0.5), DARK_OUTLINE, 1, 0.6, "plan.legend.structure",
                "Structure (darker is higher)"));
        t.put(Layer.ROOFTOP_OBJECT, area(Colour.of(0xb9ad94), Colour.of(0x555555), 1, 0.48, "plan.legend.object",
                "Rooftop object"));
        t.put(Layer.EXPOSED_ROOF, area(LPZ_0A, null, 0.75, 0, "plan.legend.roof", "Exposed roof area (LPZ 0A)"));
        t.put(Layer.KEEP_OUT, new LayerStyle(KEEP_OUT, KEEP_OUT, 1, 0.9, new double[] {3.6, 1.8}, false, 0,
                new LayerStyle.Hatch(3.6, 0.6, 0.5), LABEL, "plan.legend.keepOut", "Keep-out area, hatched (K1, …)"));
        t.put(Layer.FACADE_NEGLIGIBLE, line(Colour.of(0xc4b0da), 1, 3, new double[] {1.8, 1.8}, true,
                "plan.legend.facadeNegligible", "Facade band, side flashes negligible (5.2.3)"));
        t.put(Layer.FACADE_BAND, line(Colour.of(0x7b4fa0), 1, 3, SOLID, true, "plan.legend.facade",
                "Facade band, lateral air-termination (5.2.3)"));
        t.put(Layer.MODEL_WARNING, line(Colour.of(0xe09b00), 0.8, 6.6, new double[] {5.4, 3}, false,
                "plan.legend.warning", "Model warning: part > R above surface (E…)"));
        t.put(Layer.ACCEPTED_ITEM, mark(Colour.of(0x8a8a8a), 1.5, new double[] {3, 2}, 2.1, "plan.legend.accepted",
                "Accepted item (dashed grey)"));
        t.put(Layer.EXPOSED_EDGE, line(EDGE, 1, 1.5, SOLID, true, "plan.legend.edge",
                "Exposed edge / corner (E1, E2, …)"));
        t.put(Layer.EXPOSED_CORNER, mark(EDGE, 0, SOLID, 2.1, "plan.legend.edge", "Exposed edge / corner (E1, E2, …)"));
        t.put(Layer.CONDUCTOR, line(PART, 1, 1.2, new double[] {3, 1.8}, true, "plan.legend.part",
                "Air-termination rod / conductor (A1, …)"));
        t.put(Layer.DOWN_CONDUCTOR, mark(Colour.of(0x111111), 0, SOLID, 4, "plan.legend.downConductor",
                "Down-conductor (D1, …)"));
        t.put(Layer.ROD, new LayerStyle(PART, PART, 1, 1.2, SOLID, false, 3, null, LABEL, "plan.legend.part",
                "Air-termination rod / conductor (A1, …)"));
        t.put(Layer.SECTION_PROFILE, area(Colour.of(0xa7a9b0), DARK_OUTLINE, 1, 0.6, "section.legend.structure",
                "Structure"));
        t.put(Layer.SECTION_EXPOSED, line(LPZ_0A, 1, 3, SOLID, true, "section.legend.exposed", "Exposed (LPZ 0A)"));
        t.put(Layer.SECTION_ENVELOPE, line(Colour.of(0x0b6e8a), 1, 1.2, new double[] {3.6, 1.8}, false,
                "section.legend.envelope", "Envelope (LPZ 0A / 0B boundary)"));
        t.put(Layer.SECTION_ROD, line(PART, 1, 1.5, SOLID, false, "section.legend.rod", "Rod"));
        t.put(Layer.SECTION_SPHERE, new LayerStyle(Colour.of(0x6d6d6d), null, 1, 0.72, SOLID, false, 1.2, null, LABEL,
                "section.legend.sphere", "Sphere"));
        return t;
    }

    private static LayerStyle area(Colour fill, Colour outline, double opacity, double width, String key,
            String words) {
        return new LayerStyle(fill, outline, opacity, width, SOLID, false, 0, null, LABEL, key, words);
    }

    private static LayerStyle line(Colour colour, double opacity, double width, double[] dash, boolean roundCap,
            String key, String words) {
        return new LayerStyle(colour, null, opacity, width, dash, roundCap, 0, null, LABEL, key, words);
    }

    private static LayerStyle mark(Colour colour, double width, double[] dash, double size, String key,
            String words) {
        return new LayerStyle(colour, null, 1, width, dash, true, size, null, LABEL, key, words);
    }
}
