package org.lpzplanner.drawing;

import java.util.Arrays;

/**
 * How one layer is drawn, on screen and on paper alike. Widths, dashes and mark sizes are in points
 * on paper; the SVG renderer draws {@link PlanStyle#WEB_UNITS_PER_POINT} units per point.
 *
 * @param colour       the layer's colour: the fill of areas, the stroke of lines and marks, and the
 *                     legend swatch
 * @param outline      the outline of areas and rods, or null for none
 * @param opacity      opacity of the fill of areas, or of the stroke of lines (1 is opaque)
 * @param width        stroke width of lines and outlines
 * @param dash         dash pattern (on, off, …), or an empty array for a solid line
 * @param roundCap     lines end round (else square-cut)
 * @param markSize     radius of a point mark (rods, corners), side of a square one (down-conductors)
 * @param hatch        diagonal hatching over a half-transparent veil, or null
 * @param labelColour  colour of the names and numbers written for items of the layer
 * @param legendKey    message key of the legend's words on the pages
 * @param reportLegend the legend's words in the printed report
 */
public record LayerStyle(Colour colour, Colour outline, double opacity, double width, double[] dash, boolean roundCap,
        double markSize, Hatch hatch, Colour labelColour, String legendKey, String reportLegend) {

    public LayerStyle {
        dash = dash.clone();
    }

    /** The dash pattern (a copy). */
    @Override
    public double[] dash() {
        return dash.clone();
    }

    public boolean dashed() {
        return dash.length > 0;
    }

    /**
     * Hatching: lines at 45° every {@code spacing} points of {@code width} in the layer's colour over
     * a white veil of the given opacity, so that what lies below stays visible on dark roofs too.
     */
    public record Hatch(double spacing, double width, double veilOpacity) {
    }

    @Override
    public boolean equals(Object other) {
        return other instanceof LayerStyle s && s.colour.equals(colour) && java.util.Objects.equals(s.outline, outline)
                && s.opacity == opacity && s.width == width && Arrays.equals(s.dash, dash) && s.roundCap == roundCap
                && s.markSize == markSize && java.util.Objects.equals(s.hatch, hatch)
                && s.labelColour.equals(labelColour) && s.legendKey.equals(legendKey)
                && s.reportLegend.equals(reportLegend);
    }

    @Override
    public int hashCode() {
        return java.util.Objects.hash(colour, outline, opacity, width, Arrays.hashCode(dash), roundCap, markSize, hatch,
                labelColour, legendKey, reportLegend);
    }
}
