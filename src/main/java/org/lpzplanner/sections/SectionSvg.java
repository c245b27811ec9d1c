package org.lpzplanner.sections;

import java.util.List;
import java.util.Locale;
import java.util.stream.Collectors;
import org.lpzplanner.common.Formats;
import org.lpzplanner.drawing.Layer;
import org.lpzplanner.drawing.LayerStyle;
import org.lpzplanner.drawing.PlanStyle;
import org.lpzplanner.drawing.ScaleBar;
import org.lpzplanner.drawing.SvgWriter;
import org.lpzplanner.drawing.Texts;
import org.lpzplanner.sections.SiteSection.Point;

/**
 * Draws a {@link SiteSection} as an inline SVG element: distance along the cut across, height up,
 * both at the same scale, with labelled axes; the structure profile filled, the part of it in LPZ
 * 0A marked along its top, rods as vertical lines, the envelope as a curve and the sphere at its
 * resting positions (clipped to the drawing), then a legend. Colours, strokes and legend words come
 * from {@link PlanStyle}, as for the report's drawing of the same section.
 *
 * <p>The {@code <svg>} element carries its frame: {@code s = (svgX - data-margin-left) / data-scale}
 * and {@code z = data-z-max - (svgY - data-margin-top) / data-scale}; also {@code data-length},
 * {@code data-radius}, {@code data-envelope-max} and {@code data-envelope-max-at} (metres). The
 * envelope path lists its samples in {@code data-samples} as "s,E" pairs. Rod names are escaped;
 * every other text comes from {@link Texts}.
 */
public final class SectionSvg {

    private static final double WIDTH = 820;
    private static final double MAX_DRAW_HEIGHT = 480;
    private static final double LEFT = 56;
    private static final double TOP = 20;
    private static final double RIGHT = 20;
    private static final double BOTTOM = 48;
    private static final double LEGEND_ROW = 20;
    private static final double U = PlanStyle.WEB_UNITS_PER_POINT;
    private static final List<Layer> LEGEND = List.of(Layer.SECTION_PROFILE, Layer.SECTION_EXPOSED,
            Layer.SECTION_ENVELOPE, Layer.SECTION_ROD, Layer.SECTION_SPHERE);

    private SectionSvg() {
    }

    /** The SVG markup of one section. */
    public static String render(SiteSection section, Texts texts) {
        double length = section.length();
        double highest = 1;
        for (Point p : section.profile()) {
            highest = Math.max(highest, p.z());
        }
        for (Point p : section.envelope()) {
            highest = Math.max(highest, p.z());
        }
        for (SiteSection.RodMark r : section.rods()) {
            highest = Math.max(highest, r.top());
        }
        double lowestCentre = section.spheres().stream().mapToDouble(Point::z).min().orElse(0);
        double zMax = Math.max(highest * 1.15, Math.min(lowestCentre, highest + section.radius()));
        double scale = Math.min((WIDTH - LEFT - RIGHT) / length, (MAX_DRAW_HEIGHT - TOP - BOTTOM) / zMax);
        double drawHeight = TOP + zMax * scale + BOTTOM;
        Frame f = new Frame(scale, zMax);
        double height = drawHeight + 10 + LEGEND_ROW * LEGEND.size();
        Point max = section.envelopeMax();

        SvgWriter svg = new SvgWriter();
        svg.start("svg").attr("xmlns", "http://www.w3.org/2000/svg").attr("class", "section")
                .attr("viewBox", "0 0 " + SvgWriter.whole(WIDTH) + " " + SvgWriter.whole(height)).attr("width", SvgWriter.whole(WIDTH))
                .attr("height", SvgWriter.whole(height)).attr("role", "img").attr("aria-label", texts.text("section.title"))
                .attr("data-length", SvgWriter.exact(length)).attr("data-radius", SvgWriter.exact(section.radius()))
                .attr("data-scale", SvgWriter.exact(scale)).attr("data-margin-left", SvgWriter.exact(LEFT))
                .attr("data-margin-top", SvgWriter.exact(TOP)).attr("data-z-max", SvgWriter.exact(zMax))
                .attr("data-envelope-max", SvgWriter.exact(max.z())).attr("data-envelope-max-at", SvgWriter.exact(max.s()));
        svg.start("defs").start("clipPath").attr("id", "section-clip");
        svg.start("rect").attr("x", f.x(0)).attr("y", f.z(zMax)).attr("width", length * scale)
                .attr("height", zMax * scale).end();
        svg.end().end();
        svg.start("rect").attr("x", "0").attr("y", "0").attr("width", SvgWriter.whole(WIDTH)).attr("height", SvgWriter.whole(drawHeight))
                .attr("fill", PlanStyle.BACKGROUND.hex()).end();
        profile(svg, section, f);
        LayerStyle rod = PlanStyle.of(Layer.SECTION_ROD);
        for (SiteSection.RodMark r : section.rods()) {
            svg.start("line").attr("class", "section-rod").attr("x1", f.x(r.s())).attr("y1", f.z(r.base()))
                    .attr("x2", f.x(r.s())).attr("y2", f.z(r.top())).attr("stroke", rod.colour().hex())
                    .attr("stroke-width", SvgWriter.size(rod.width() * U)).title(r.name()).end();
        }
        LayerStyle envelope = PlanStyle.of(Layer.SECTION_ENVELOPE);
        svg.start("path").attr("class", "envelope").attr("fill", "none").attr("stroke", envelope.colour().hex())
                .attr("stroke-width", SvgWriter.size(envelope.width() * U)).attr("stroke-dasharray", dash(envelope))
                .attr("data-samples", section.envelope().stream()
                        .map(p -> String.format(Locale.ROOT, "%.2f,%.3f", p.s(), p.z())).collect(Collectors.joining(" ")))
                .attr("d", line(section.envelope(), f)).end();
        LayerStyle sphere = PlanStyle.of(Layer.SECTION_SPHERE);
        svg.start("g").attr("class", "spheres").attr("clip-path", "url(#section-clip)");
        for (Point c : section.spheres()) {
            svg.start("circle").attr("class", "sphere").attr("cx", f.x(c.s())).attr("cy", f.z(c.z()))
                    .attr("r", section.radius() * scale).attr("fill", "none").attr("stroke", sphere.colour().hex())
                    .attr("stroke-width", SvgWriter.size(sphere.width() * U)).end();
            if (c.z() < zMax) {
                svg.start("circle").attr("class", "sphere-centre").attr("cx", f.x(c.s())).attr("cy", f.z(c.z()))
                        .attr("r", SvgWriter.size(sphere.markSize() * U)).attr("fill", sphere.colour().hex()).end();
            }
        }
        svg.end();
        axes(svg, length, zMax, f, texts);
        legend(svg, drawHeight + 10, texts);
        return svg.end().finish();
    }

    private record Frame(double scale, double zMax) {
        double x(double s) {
            return LEFT + s * scale;
        }

        double z(double z) {
            return TOP + (zMax - z) * scale;
        }
    }

    private static void profile(SvgWriter svg, SiteSection section, Frame f) {
        List<Point> profile = section.profile();
        StringBuilder d = new StringBuilder(String.format(Locale.ROOT, "M%.1f %.1f", f.x(0), f.z(0)));
        for (Point p : profile) {
            d.append(String.format(Locale.ROOT, " L%.1f %.1f", f.x(p.s()), f.z(p.z())));
        }
        d.append(String.format(Locale.ROOT, " L%.1f %.1f Z", f.x(section.length()), f.z(0)));
        LayerStyle structure = PlanStyle.of(Layer.SECTION_PROFILE);
        svg.start("path").attr("class", "profile").attr("fill", structure.colour().hex())
                .attr("stroke", structure.outline().hex()).attr("stroke-width", SvgWriter.size(structure.width() * U))
                .attr("d", d.toString()).end();
        LayerStyle exposed = PlanStyle.of(Layer.SECTION_EXPOSED);
        int i = 0;
        while (i < profile.size()) {
            if (!section.exposed().get(i)) {
                i++;
                continue;
            }
            int j = i;
            while (j + 1 < profile.size() && section.exposed().get(j + 1)) {
                j++;
            }
            List<Point> run = profile.subList(i, j + 1);
            String path = run.size() == 1
                    ? String.format(Locale.ROOT, "M%.1f %.1f h0.01", f.x(run.get(0).s()), f.z(run.get(0).z()))
                    : line(run, f);
            svg.start("path").attr("class", "exposed-profile").attr("fill", "none")
                    .attr("stroke", exposed.colour().hex()).attr("stroke-width", SvgWriter.size(exposed.width() * U))
                    .attr("stroke-linecap", exposed.roundCap() ? "round" : "butt").attr("d", path).end();
            i = j + 1;
        }
    }

    private static String line(List<Point> points, Frame f) {
        StringBuilder d = new StringBuilder();
        for (Point p : points) {
            d.append(d.isEmpty() ? "M" : " L").append(String.format(Locale.ROOT, "%.1f %.1f", f.x(p.s()), f.z(p.z())));
        }
        return d.toString();
    }

    private static String dash(LayerStyle style) {
        StringBuilder out = new StringBuilder();
        for (double d : style.dash()) {
            out.append(out.isEmpty() ? "" : " ").append(SvgWriter.size(d * U));
        }
        return out.toString();
    }

    private static void axes(SvgWriter svg, double length, double zMax, Frame f, Texts texts) {
        svg.start("g").attr("class", "axes").attr("font-size", "11").attr("font-family", "sans-serif")
                .attr("stroke-width", "1");
        axisLine(svg, f.x(0), f.z(0), f.x(length), f.z(0));
        axisLine(svg, f.x(0), f.z(0), f.x(0), f.z(zMax));
        double step = tickStep(length, 10);
        for (int k = 0; k * step <= length + 1e-9; k++) {
            double s = k * step;
            axisLine(svg, f.x(s), f.z(0), f.x(s), f.z(0) + 5);
            svg.start("text").attr("x", f.x(s)).attr("y", f.z(0) + 17).attr("text-anchor", "middle").text(Formats.scaleStep(s))
                    .end();
        }
        double zStep = tickStep(zMax, 5);
        for (int k = 0; k * zStep <= zMax + 1e-9; k++) {
            double z = k * zStep;
            axisLine(svg, f.x(0) - 5, f.z(z), f.x(0), f.z(z));
            svg.start("text").attr("x", f.x(0) - 8).attr("y", f.z(z) + 4).attr("text-anchor", "end").text(Formats.scaleStep(z))
                    .end();
        }
        svg.start("text").attr("class", "axis-title").attr("x", f.x(length / 2)).attr("y", f.z(0) + 36)
                .attr("text-anchor", "middle").text(texts.text("section.axis.distance")).end();
        svg.start("text").attr("class", "axis-title").attr("x", 14.0).attr("y", f.z(zMax / 2))
                .attr("text-anchor", "middle")
                .attr("transform", String.format(Locale.ROOT, "rotate(-90 %.1f %.1f)", 14.0, f.z(zMax / 2)))
                .text(texts.text("section.axis.height")).end();
        svg.end();
    }

    private static void axisLine(SvgWriter svg, double x1, double y1, double x2, double y2) {
        svg.start("line").attr("x1", x1).attr("y1", y1).attr("x2", x2).attr("y2", y2).attr("stroke", PlanStyle.INK.hex()).end();
    }

    /** A round tick spacing (1, 2 or 5 times a power of ten, at least 1 m) giving at most about {@code count} ticks. */
    static double tickStep(double range, int count) {
        return ScaleBar.step(Math.max(range / count, 1));
    }


    private static void legend(SvgWriter svg, double top, Texts texts) {
        svg.start("g").attr("class", "legend").attr("font-size", "12").attr("font-family", "sans-serif");
        for (int i = 0; i < LEGEND.size(); i++) {
            double y = top + i * LEGEND_ROW;
            LayerStyle style = PlanStyle.of(LEGEND.get(i));
            svg.start("rect").attr("x", LEFT).attr("y", y).attr("width", "18").attr("height", "12")
                    .attr("fill", style.colour().hex()).attr("stroke", PlanStyle.SWATCH_OUTLINE.hex()).attr("stroke-width", "0.5").end();
            svg.start("text").attr("x", LEFT + 26).attr("y", y + 10).text(texts.text(style.legendKey())).end();
        }
        svg.end();
    }
}
