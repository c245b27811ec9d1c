package org.lpzplanner.drawing;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Locale;
import java.util.stream.Collectors;
import org.lpzplanner.common.Formats;

/**
 * Draws a {@link PlanDrawing} as an inline SVG element for the pages: the items in the order of
 * their layers with the styles of {@link PlanStyle}, the labels where {@link LabelPlacement} puts
 * them (names over the areas and bands, under edges, corners and parts, which must stay visible and
 * clickable; numbers on top), a scale bar, a north arrow (north is up: the y axis is flipped) and
 * the legend. Every text from a site file is escaped; every other word comes from {@link Texts}.
 *
 * <p>The {@code <svg>} element carries its frame so that a script can turn a point of the drawing
 * back into local metres: {@code x = originX + (svgX - margin) / scale} and, the y axis being
 * flipped, {@code y = originY - (svgY - margin) / scale} ({@code data-origin-x},
 * {@code data-origin-y}, {@code data-scale} in SVG units per metre, {@code data-margin},
 * {@code data-y-flipped}, and {@code data-draw-height}, where the legend begins). Its first
 * {@code <rect>} is the drawing's background. Rods carry their id in {@code data-rod-id}, conductors
 * in {@code data-conductor-id}; exposed edges, corners, facade bands and model warnings carry their
 * review key in {@code data-item-key}, and those a designer accepted the class {@code accepted} and
 * a title with the reason; keep-out areas carry {@code data-keep-out-name} and let clicks through.
 *
 * <p>Stateless and thread-safe.
 */
public final class PlanSvgRenderer {

    /** The drawing's width in SVG units. */
    public static final double WIDTH = 820;
    /** Room round the site inside the drawing, in SVG units. */
    public static final double MARGIN = 36;
    private static final double LEGEND_ROW = 20;
    private static final double U = PlanStyle.WEB_UNITS_PER_POINT;
    private static final String HATCH_ID = "keep-out-hatch";
    /** A sans-serif letter's mean width in ems, to keep labels apart without the browser's metrics. */
    private static final double MEAN_LETTER = 0.55;

    private PlanSvgRenderer() {
    }

    /**
     * How the drawing sits on its page.
     *
     * @param cssClass   classes of the {@code <svg>} element
     * @param ariaLabel  the drawing's accessible name
     * @param drawHeight the greatest height of the drawing above its legend, SVG units
     */
    public record Options(String cssClass, String ariaLabel, double drawHeight) {
    }

    public static String render(PlanDrawing drawing, Texts texts, Options options) {
        PlanFrame extent = drawing.frame();
        double scale = extent.scaleToFit(WIDTH - 2 * MARGIN, options.drawHeight() - 2 * MARGIN);
        Frame frame = new Frame(extent.minX(), extent.maxY(), scale);
        double drawHeight = Math.max(extent.height(), 1) * scale + 2 * MARGIN;
        List<Layer> legend = drawing.legend();
        double height = drawHeight + 10 + LEGEND_ROW * legend.size();

        SvgWriter svg = new SvgWriter();
        svg.start("svg").attr("xmlns", "http://www.w3.org/2000/svg").attr("class", options.cssClass())
                .attr("viewBox", "0 0 " + SvgWriter.whole(WIDTH) + " " + SvgWriter.whole(height)).attr("width", SvgWriter.whole(WIDTH))
                .attr("height", SvgWriter.whole(height)).attr("role", "img").attr("aria-label", options.ariaLabel())
                .attr("data-origin-x", SvgWriter.exact(frame.minX())).attr("data-origin-y", SvgWriter.exact(frame.maxY()))
                .attr("data-scale", SvgWriter.exact(scale)).attr("data-margin", SvgWriter.exact(MARGIN)).attr("data-y-flipped", "true")
                .attr("data-draw-height", SvgWriter.whole(drawHeight));
        svg.start("rect").attr("class", "plan-background").attr("x", "0").attr("y", "0").attr("width", SvgWriter.whole(WIDTH))
                .attr("height", SvgWriter.whole(drawHeight)).attr("fill", PlanStyle.BACKGROUND.hex()).end();
        if (drawing.has(Layer.KEEP_OUT) || legend.contains(Layer.KEEP_OUT)) {
            hatchPattern(svg, PlanStyle.of(Layer.KEEP_OUT));
        }
        List<LabelPlacement.Placed> labels = placeLabels(drawing, frame);
        for (Layer layer : Layer.values()) {
            if (!layer.onPlan()) {
                continue;
            }
            for (PlanItem item : drawing.items(layer)) {
                item(svg, drawing, item, frame, texts);
            }
            if (layer == Layer.MODEL_WARNING) {
                labels.stream().filter(p -> p.label().kind() != PlanLabel.Kind.NUMBER).forEach(p -> label(svg, p));
            }
        }
        labels.stream().filter(p -> p.label().kind() == PlanLabel.Kind.NUMBER).forEach(p -> label(svg, p));
        scaleBar(svg, scale, drawHeight, texts);
        northArrow(svg, texts);
        legend(svg, drawHeight + 10, legend, texts);
        return svg.end().finish();
    }

    /** Local metres to SVG units: the site's top left corner at (margin, margin), y flipped. */
    private record Frame(double minX, double maxY, double scale) {
        double x(double x) {
            return MARGIN + (x - minX) * scale;
        }

        double y(double y) {
            return MARGIN + (maxY - y) * scale;
        }
    }

    private static void item(SvgWriter svg, PlanDrawing drawing, PlanItem item, Frame f, Texts texts) {
        LayerStyle style = PlanStyle.of(item.layer());
        if (item instanceof PlanItem.ProtectedGround g) {
            area(svg.start("path").attr("class", "protected-ground"), style, style.colour(), g.rings(), f).end();
        } else if (item instanceof PlanItem.CollectionArea c) {
            area(svg.start("path").attr("class", "collection-zone"), style, style.colour(), c.rings(), f).end();
        } else if (item instanceof PlanItem.Structure s) {
            area(svg.start("path").attr("class", "structure"), style, PlanStyle.structureFill(drawing.shade(s)),
                    s.rings(), f).title(text(s.name())).end();
        } else if (item instanceof PlanItem.RooftopObject o) {
            area(svg.start("path").attr("class", "rooftop-object"), style, style.colour(), o.rings(), f)
                    .title(text(o.name())).end();
        } else if (item instanceof PlanItem.ExposedRoof r) {
            area(svg.start("path").attr("class", "exposed-roof"), style, style.colour(), r.rings(), f).end();
        } else if (item instanceof PlanItem.KeepOutArea k) {
            svg.start("path").attr("class", "keep-out-area").attr("data-keep-out-name", k.name())
                    .attr("pointer-events", "none");
            Map<String, String> hatched = areaAttributes(style, style.colour());
            hatched.put("fill", "url(#" + HATCH_ID + ")");
            hatched.forEach(svg::attr);
            svg.attr("d", path(k.paths(), f, true)).title(k.name()).end();
        } else if (item instanceof PlanItem.FacadeBand b && b.negligible()) {
            // flashes to the side negligible (IEC 62305-3:2010 5.2.3): drawn, not a review item
            line(svg.start("path").attr("class", "facade-band side-flash-negligible"), style, b.paths(), f)
                    .title(texts.text("plan.negligibleBand", Formats.height(b.bottom()), Formats.height(b.top())))
                    .end();
        } else if (item instanceof PlanItem.FacadeBand b) {
            reviewed(line(svg.start("path").attr("class", klass("facade-band", b.review()))
                    .attr("data-item-key", b.review().key()), style, b.paths(), f), b.review(), texts).end();
        } else if (item instanceof PlanItem.ExposedEdge e) {
            reviewed(line(svg.start("path").attr("class", klass("exposed-edge", e.review()))
                    .attr("data-item-key", e.review().key()), style, e.paths(), f), e.review(), texts).end();
        } else if (item instanceof PlanItem.ExposedCorner c) {
            svg.start("circle").attr("class", klass("exposed-corner", c.review()))
                    .attr("data-item-key", c.review().key()).attr("cx", f.x(c.x())).attr("cy", f.y(c.y()))
                    .attr("r", SvgWriter.size(style.markSize() * U)).attr("fill", style.colour().hex());
            reviewed(svg, c.review(), texts).end();
        } else if (item instanceof PlanItem.ModelWarningStretch w) {
            svg.start("path").attr("class", klass("model-warning", w.review()));
            if (w.review() != null) {
                svg.attr("data-item-key", w.review().key());
            }
            String title = w.text() + (w.review() != null && w.review().accepted()
                    ? " " + texts.text("review.status.accepted", w.review().acceptedReason()) : "");
            line(svg, style, w.paths(), f).title(title).end();
        } else if (item instanceof PlanItem.Conductor c) {
            line(svg.start("path").attr("class", "conductor").attr("data-conductor-id", c.id()), style, c.paths(), f)
                    .end();
        } else if (item instanceof PlanItem.DownConductor d) {
            double side = style.markSize() * U;
            svg.start("rect").attr("class", "down-conductor").attr("x", f.x(d.x()) - side / 2)
                    .attr("y", f.y(d.y()) - side / 2).attr("width", SvgWriter.size(side))
                    .attr("height", SvgWriter.size(side)).attr("fill", style.colour().hex()).end();
        } else if (item instanceof PlanItem.Rod r) {
            svg.start("circle").attr("class", "rod").attr("data-rod-id", r.id()).attr("cx", f.x(r.x()))
                    .attr("cy", f.y(r.y())).attr("r", SvgWriter.size(style.markSize() * U))
                    .attr("fill", PlanStyle.WHITE.hex()).attr("stroke", style.colour().hex())
                    .attr("stroke-width", SvgWriter.size(style.width() * U)).title(text(r.name())).end();
        }
    }

    private static String klass(String kind, PlanItem.Review review) {
        return review != null && review.accepted() ? kind + " accepted" : kind;
    }

    /** The title of an accepted item: the designer's reason. */
    private static SvgWriter reviewed(SvgWriter svg, PlanItem.Review review, Texts texts) {
        return review.accepted() ? svg.title(texts.text("review.status.accepted", review.acceptedReason())) : svg;
    }

    private static SvgWriter area(SvgWriter svg, LayerStyle style, Colour fill, List<List<double[]>> rings, Frame f) {
        areaAttributes(style, fill).forEach(svg::attr);
        return svg.attr("fill-rule", "evenodd").attr("d", path(rings, f, true));
    }

    /**
     * The presentation attributes of an area on the layer as this renderer writes them (fill,
     * opacity, outline): for a script that draws a layer into a plan already on the page.
     */
    public static Map<String, String> areaAttributes(Layer layer) {
        LayerStyle style = PlanStyle.of(layer);
        return areaAttributes(style, style.colour());
    }

    private static Map<String, String> areaAttributes(LayerStyle style, Colour fill) {
        Map<String, String> attributes = new LinkedHashMap<>();
        attributes.put("fill", fill.hex());
        if (style.opacity() < 1) {
            attributes.put("fill-opacity", SvgWriter.size(style.opacity()));
        }
        if (style.outline() == null) {
            attributes.put("stroke", "none");
        } else {
            attributes.put("stroke", style.outline().hex());
            attributes.put("stroke-width", SvgWriter.size(style.width() * U));
            if (style.dashed()) {
                attributes.put("stroke-dasharray", dash(style));
            }
        }
        return attributes;
    }

    private static SvgWriter line(SvgWriter svg, LayerStyle style, List<List<double[]>> lines, Frame f) {
        svg.attr("fill", "none").attr("stroke", style.colour().hex());
        if (style.opacity() < 1) {
            svg.attr("stroke-opacity", SvgWriter.size(style.opacity()));
        }
        svg.attr("stroke-linecap", style.roundCap() ? "round" : "butt")
                .attr("stroke-width", SvgWriter.size(style.width() * U));
        if (style.dashed()) {
            svg.attr("stroke-dasharray", dash(style));
        }
        return svg.attr("d", path(lines, f, false));
    }

    private static String dash(LayerStyle style) {
        return Arrays.stream(style.dash()).mapToObj(d -> SvgWriter.size(d * U)).collect(Collectors.joining(" "));
    }

    /** SVG path data: "M x y L x y …", each ring closed with " Z ", lines apart by a space. */
    private static String path(List<List<double[]>> paths, Frame f, boolean close) {
        StringBuilder d = new StringBuilder();
        for (List<double[]> points : paths) {
            if (points.isEmpty()) {
                continue;
            }
            if (!close && d.length() > 0) {
                d.append(' ');
            }
            for (int i = 0; i < points.size(); i++) {
                d.append(i == 0 ? "M " : " L ").append(SvgWriter.coordinate(f.x(points.get(i)[0]))).append(' ')
                        .append(SvgWriter.coordinate(f.y(points.get(i)[1])));
            }
            if (close) {
                d.append(" Z ");
            }
        }
        return d.toString();
    }

    private static List<LabelPlacement.Placed> placeLabels(PlanDrawing drawing, Frame f) {
        List<LabelPlacement.Wanted> wanted = new ArrayList<>();
        for (PlanLabel label : drawing.labels()) {
            double size = label.kind().size() * U;
            // y up for the placement: the SVG's y negated
            wanted.add(new LabelPlacement.Wanted(label, f.x(label.x()), -f.y(label.y()),
                    MEAN_LETTER * size * label.text().length(), size));
        }
        return LabelPlacement.placeAll(wanted, U);
    }

    private static void label(SvgWriter svg, LabelPlacement.Placed p) {
        PlanLabel label = p.label();
        boolean centred = label.kind() == PlanLabel.Kind.NAME;
        String cssClass = centred ? "structure-label"
                : label.kind() == PlanLabel.Kind.AREA_NAME ? "keep-out-label" : "item-number";
        svg.start("text").attr("class", cssClass).attr("x", centred ? p.centreX() : p.x()).attr("y", -p.baseline());
        if (centred) {
            svg.attr("text-anchor", "middle");
        }
        svg.attr("font-size", SvgWriter.size(p.size())).attr("font-family", "sans-serif")
                .attr("fill", PlanStyle.of(label.layer()).labelColour().hex()).attr("stroke", PlanStyle.WHITE.hex())
                .attr("stroke-width", "3").attr("stroke-linejoin", "round").attr("paint-order", "stroke")
                .attr("pointer-events", "none")
                .text(label.text()).end();
    }

    private static void hatchPattern(SvgWriter svg, LayerStyle style) {
        LayerStyle.Hatch hatch = style.hatch();
        String step = SvgWriter.size(hatch.spacing() * U);
        svg.start("defs").start("pattern").attr("id", HATCH_ID).attr("patternUnits", "userSpaceOnUse")
                .attr("width", step).attr("height", step).attr("patternTransform", "rotate(45)");
        svg.start("rect").attr("width", step).attr("height", step).attr("fill", PlanStyle.WHITE.hex())
                .attr("fill-opacity", SvgWriter.size(hatch.veilOpacity())).end();
        svg.start("line").attr("x1", "0").attr("y1", "0").attr("x2", "0").attr("y2", step)
                .attr("stroke", style.colour().hex()).attr("stroke-width", SvgWriter.size(hatch.width() * U)).end();
        svg.end().end();
    }

    private static void scaleBar(SvgWriter svg, double scale, double drawHeight, Texts texts) {
        double length = ScaleBar.length((WIDTH - 2 * MARGIN) / 5 / scale);
        double y = drawHeight - 14;
        svg.start("g").attr("class", "scale-bar");
        svg.start("rect").attr("x", MARGIN).attr("y", y).attr("width", length * scale).attr("height", "5")
                .attr("fill", PlanStyle.INK.hex()).end();
        svg.start("text").attr("x", MARGIN).attr("y", y - 4).attr("font-size", "11").attr("font-family", "sans-serif")
                .text(texts.text("plan.scale", Formats.scaleStep(length))).end();
        svg.end();
    }

    private static void northArrow(SvgWriter svg, Texts texts) {
        double x = WIDTH - MARGIN;
        svg.start("g").attr("class", "north-arrow");
        svg.start("path").attr("d", String.format(Locale.ROOT, "M %.1f 14 L %.1f 44 L %.1f 36 L %.1f 44 Z", x, x - 8,
                x, x + 8)).attr("fill", PlanStyle.INK.hex()).end();
        svg.start("text").attr("x", x).attr("y", "58").attr("text-anchor", "middle").attr("font-size", "12")
                .attr("font-family", "sans-serif").attr("font-weight", "bold").text(texts.text("plan.north")).end();
        svg.end();
    }

    private static void legend(SvgWriter svg, double top, List<Layer> rows, Texts texts) {
        svg.start("g").attr("class", "legend").attr("font-size", "12").attr("font-family", "sans-serif");
        for (int i = 0; i < rows.size(); i++) {
            double y = top + i * LEGEND_ROW;
            LayerStyle style = PlanStyle.of(rows.get(i));
            svg.start("rect").attr("x", MARGIN).attr("y", y).attr("width", "18").attr("height", "12")
                    .attr("fill", style.hatch() != null ? "url(#" + HATCH_ID + ")" : style.colour().hex());
            if (style.opacity() < 1) {
                svg.attr("fill-opacity", SvgWriter.size(style.opacity()));
            }
            svg.attr("stroke", PlanStyle.SWATCH_OUTLINE.hex()).attr("stroke-width", "0.5").end();
            svg.start("text").attr("x", MARGIN + 26).attr("y", y + 10).text(texts.text(style.legendKey())).end();
        }
        svg.end();
    }

    private static String text(String value) {
        return value == null ? "" : value;
    }

}
