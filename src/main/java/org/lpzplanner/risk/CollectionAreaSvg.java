package org.lpzplanner.risk;

import java.util.Locale;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.Polygon;
import org.lpzplanner.analysis.PlanSvg;
import org.lpzplanner.engine.model.RooftopObject;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.Structure;

/**
 * Draws the collection area A_D of a site on its plan as an inline SVG element, in the manner of
 * {@link PlanSvg}: local metres, north up (y flipped), structures shaded by height with their names
 * and top heights, rooftop objects, the collection area outline, a scale bar, a north arrow and a
 * legend. Names from the site file are escaped; every other text comes from the labels.
 */
final class CollectionAreaSvg {

    static final String ZONE = "#9cc3e6";
    static final String ZONE_EDGE = "#1f5fbf";
    private static final String OBJECT = "#b9ad94";
    private static final double WIDTH = 820;
    private static final double DRAW_HEIGHT = 520;
    private static final double MARGIN = 36;
    private static final double LEGEND_ROW = 20;

    private CollectionAreaSvg() {
    }

    static String render(Site site, Geometry zone, PlanSvg.Labels labels) {
        Envelope box = new Envelope(zone.getEnvelopeInternal());
        site.structures().forEach(s -> box.expandToInclude(s.footprint().getEnvelopeInternal()));
        if (box.isNull()) {
            box.expandToInclude(0, 0);
        }
        double scale = Math.min((WIDTH - 2 * MARGIN) / Math.max(box.getWidth(), 1),
                (DRAW_HEIGHT - 2 * MARGIN) / Math.max(box.getHeight(), 1));
        Frame frame = new Frame(box.getMinX(), box.getMaxY(), scale);
        double drawHeight = Math.max(box.getHeight(), 1) * scale + 2 * MARGIN;
        String[] legendKeys = {"risk.plan.legend.zone", "risk.plan.legend.structure", "risk.plan.legend.object"};
        String[] legendColours = {ZONE, "#9a9a9f", OBJECT};
        double height = drawHeight + 10 + LEGEND_ROW * legendKeys.length;
        double maxHeight = site.structures().stream().mapToDouble(Structure::topHeight).max().orElse(1);

        StringBuilder svg = new StringBuilder();
        svg.append(String.format(Locale.ROOT, "<svg xmlns=\"http://www.w3.org/2000/svg\" class=\"plan collection-area\""
                + " viewBox=\"0 0 %.0f %.0f\" width=\"%.0f\" height=\"%.0f\" role=\"img\" aria-label=\"%s\">",
                WIDTH, height, WIDTH, height, PlanSvg.escape(labels.text("risk.plan.title", site.name()))));
        svg.append(String.format(Locale.ROOT, "<rect x=\"0\" y=\"0\" width=\"%.0f\" height=\"%.0f\" fill=\"#fbfbf8\"/>",
                WIDTH, drawHeight));
        svg.append("<path class=\"collection-zone\" fill=\"").append(ZONE).append("\" fill-opacity=\"0.55\" stroke=\"")
                .append(ZONE_EDGE).append("\" stroke-width=\"1.5\" stroke-dasharray=\"6 3\" fill-rule=\"evenodd\" d=\"")
                .append(path(zone, frame)).append("\"/>");
        for (Structure s : site.structures()) {
            int grey = (int) Math.round(225 - 130 * Math.min(1, s.topHeight() / Math.max(maxHeight, 1e-9)));
            svg.append(String.format(Locale.ROOT, "<path class=\"structure\" fill=\"#%02x%02x%02x\" stroke=\"#333333\""
                    + " stroke-width=\"1\" fill-rule=\"evenodd\" d=\"", grey, grey, Math.min(255, grey + 6)))
                    .append(path(s.footprint(), frame)).append("\"><title>").append(PlanSvg.escape(name(s)))
                    .append("</title></path>");
        }
        for (RooftopObject o : site.rooftopObjects()) {
            svg.append("<path class=\"rooftop-object\" fill=\"").append(OBJECT)
                    .append("\" stroke=\"#555555\" stroke-width=\"0.8\" d=\"").append(path(o.footprint(), frame))
                    .append("\"/>");
        }
        for (Structure s : site.structures()) {
            Coordinate c = s.footprint().getEnvelopeInternal().centre();
            svg.append(String.format(Locale.ROOT, "<text class=\"structure-label\" x=\"%.1f\" y=\"%.1f\""
                    + " text-anchor=\"middle\" font-size=\"11\" font-family=\"sans-serif\" fill=\"#111111\""
                    + " stroke=\"#ffffff\" stroke-width=\"3\" paint-order=\"stroke\">%s</text>", frame.x(c.x),
                    frame.y(c.y), PlanSvg.escape(labels.text("risk.plan.structure", name(s),
                            RiskFormat.metres(s.topHeight())))));
        }
        scaleBar(svg, frame, drawHeight, labels);
        double x = WIDTH - MARGIN;
        svg.append(String.format(Locale.ROOT, "<g class=\"north-arrow\"><path d=\"M %.1f 14 L %.1f 44 L %.1f 36 L %.1f 44 Z\""
                + " fill=\"#222222\"/><text x=\"%.1f\" y=\"58\" text-anchor=\"middle\" font-size=\"12\""
                + " font-family=\"sans-serif\" font-weight=\"bold\">%s</text></g>", x, x - 8, x, x + 8, x,
                PlanSvg.escape(labels.text("plan.north"))));
        svg.append("<g class=\"legend\" font-size=\"12\" font-family=\"sans-serif\">");
        for (int i = 0; i < legendKeys.length; i++) {
            double y = drawHeight + 10 + i * LEGEND_ROW;
            svg.append(String.format(Locale.ROOT, "<rect x=\"%.1f\" y=\"%.1f\" width=\"18\" height=\"12\" fill=\"%s\""
                    + " stroke=\"#444444\" stroke-width=\"0.5\"/><text x=\"%.1f\" y=\"%.1f\">%s</text>", MARGIN, y,
                    legendColours[i], MARGIN + 26, y + 10, PlanSvg.escape(labels.text(legendKeys[i]))));
        }
        return svg.append("</g></svg>").toString();
    }

    private record Frame(double minX, double maxY, double scale) {
        double x(double x) {
            return MARGIN + (x - minX) * scale;
        }

        double y(double y) {
            return MARGIN + (maxY - y) * scale;
        }
    }

    private static String name(Structure s) {
        return s.name() == null || s.name().isBlank() ? s.id() : s.name();
    }

    private static void scaleBar(StringBuilder svg, Frame frame, double drawHeight, PlanSvg.Labels labels) {
        double target = (WIDTH - 2 * MARGIN) / 5 / frame.scale();
        double magnitude = Math.pow(10, Math.floor(Math.log10(target)));
        double length = magnitude;
        for (double step : new double[] {1, 2, 5, 10}) {
            if (step * magnitude <= target) {
                length = step * magnitude;
            }
        }
        double y = drawHeight - 14;
        svg.append(String.format(Locale.ROOT, "<g class=\"scale-bar\"><rect x=\"%.1f\" y=\"%.1f\" width=\"%.1f\""
                + " height=\"5\" fill=\"#222222\"/><text x=\"%.1f\" y=\"%.1f\" font-size=\"11\""
                + " font-family=\"sans-serif\">%s</text></g>", MARGIN, y, length * frame.scale(), MARGIN, y - 4,
                PlanSvg.escape(labels.text("plan.scale", RiskFormat.metres(length)))));
    }

    /** SVG path data of every polygon ring of a geometry. */
    private static String path(Geometry g, Frame frame) {
        StringBuilder d = new StringBuilder();
        for (int i = 0; i < g.getNumGeometries(); i++) {
            if (g.getGeometryN(i) instanceof Polygon p) {
                ring(d, p.getExteriorRing().getCoordinates(), frame);
                for (int h = 0; h < p.getNumInteriorRing(); h++) {
                    ring(d, p.getInteriorRingN(h).getCoordinates(), frame);
                }
            }
        }
        return d.toString();
    }

    private static void ring(StringBuilder d, Coordinate[] ring, Frame frame) {
        for (int i = 0; i < ring.length; i++) {
            d.append(i == 0 ? "M" : " L").append(String.format(Locale.ROOT, " %.1f %.1f", frame.x(ring[i].x),
                    frame.y(ring[i].y)));
        }
        if (ring.length > 0) {
            d.append(" Z ");
        }
    }
}
