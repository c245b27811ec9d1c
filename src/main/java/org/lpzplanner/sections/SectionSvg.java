package org.lpzplanner.sections;

import java.util.List;
import java.util.Locale;
import java.util.stream.Collectors;
import org.lpzplanner.analysis.PlanSvg;
import org.lpzplanner.sections.SiteSection.Point;

/**
 * Draws a {@link SiteSection} as an inline SVG element: distance along the cut across, height up,
 * both at the same scale, with labelled axes; the structure profile filled, the part of it in LPZ
 * 0A marked along its top, rods as vertical lines, the envelope as a curve and the sphere at its
 * resting positions (clipped to the drawing), then a legend.
 *
 * <p>The {@code <svg>} element carries its frame: {@code s = (svgX - data-margin-left) / data-scale}
 * and {@code z = data-z-max - (svgY - data-margin-top) / data-scale}; also {@code data-length},
 * {@code data-radius}, {@code data-envelope-max} and {@code data-envelope-max-at} (metres). The
 * envelope path lists its samples in {@code data-samples} as "s,E" pairs. Rod names are escaped;
 * every other text comes from {@link PlanSvg.Labels}.
 */
public final class SectionSvg {

    static final String PROFILE = "#a7a9b0";
    static final String ENVELOPE = "#0b6e8a";
    static final String SPHERE = "#6d6d6d";

    private static final double WIDTH = 820;
    private static final double MAX_DRAW_HEIGHT = 480;
    private static final double LEFT = 56;
    private static final double TOP = 20;
    private static final double RIGHT = 20;
    private static final double BOTTOM = 48;
    private static final double LEGEND_ROW = 20;

    private SectionSvg() {
    }

    /** The SVG markup of one section. */
    public static String render(SiteSection section, PlanSvg.Labels labels) {
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
        String[] legendKeys = {"section.legend.structure", "section.legend.exposed", "section.legend.envelope",
            "section.legend.rod", "section.legend.sphere"};
        double height = drawHeight + 10 + LEGEND_ROW * legendKeys.length;
        Point max = section.envelopeMax();

        StringBuilder svg = new StringBuilder();
        svg.append(String.format(Locale.ROOT, "<svg xmlns=\"http://www.w3.org/2000/svg\" class=\"section\""
                + " viewBox=\"0 0 %.0f %.0f\" width=\"%.0f\" height=\"%.0f\" role=\"img\" aria-label=\"%s\""
                + " data-length=\"%s\" data-radius=\"%s\" data-scale=\"%s\" data-margin-left=\"%s\""
                + " data-margin-top=\"%s\" data-z-max=\"%s\" data-envelope-max=\"%s\" data-envelope-max-at=\"%s\">",
                WIDTH, height, WIDTH, height, PlanSvg.escape(labels.text("section.title")), exact(length),
                exact(section.radius()), exact(scale), exact(LEFT), exact(TOP), exact(zMax), exact(max.z()),
                exact(max.s())));
        svg.append(String.format(Locale.ROOT,
                "<defs><clipPath id=\"section-clip\"><rect x=\"%.1f\" y=\"%.1f\" width=\"%.1f\" height=\"%.1f\"/>"
                + "</clipPath></defs>", f.x(0), f.z(zMax), length * scale, zMax * scale));
        svg.append(String.format(Locale.ROOT, "<rect x=\"0\" y=\"0\" width=\"%.0f\" height=\"%.0f\" fill=\"#fbfbf8\"/>",
                WIDTH, drawHeight));
        profile(svg, section, f);
        for (SiteSection.RodMark r : section.rods()) {
            svg.append(String.format(Locale.ROOT, "<line class=\"section-rod\" x1=\"%.1f\" y1=\"%.1f\" x2=\"%.1f\""
                    + " y2=\"%.1f\" stroke=\"%s\" stroke-width=\"2.5\"><title>%s</title></line>", f.x(r.s()),
                    f.z(r.base()), f.x(r.s()), f.z(r.top()), PlanSvg.PART, PlanSvg.escape(r.name())));
        }
        svg.append("<path class=\"envelope\" fill=\"none\" stroke=\"").append(ENVELOPE)
                .append("\" stroke-width=\"2\" stroke-dasharray=\"6 3\" data-samples=\"")
                .append(section.envelope().stream().map(p -> String.format(Locale.ROOT, "%.2f,%.3f", p.s(), p.z()))
                        .collect(Collectors.joining(" ")))
                .append("\" d=\"").append(line(section.envelope(), f)).append("\"/>");
        svg.append("<g class=\"spheres\" clip-path=\"url(#section-clip)\">");
        for (Point c : section.spheres()) {
            svg.append(String.format(Locale.ROOT, "<circle class=\"sphere\" cx=\"%.1f\" cy=\"%.1f\" r=\"%.1f\""
                    + " fill=\"none\" stroke=\"%s\" stroke-width=\"1.2\"/>", f.x(c.s()), f.z(c.z()),
                    section.radius() * scale, SPHERE));
            if (c.z() < zMax) {
                svg.append(String.format(Locale.ROOT, "<circle class=\"sphere-centre\" cx=\"%.1f\" cy=\"%.1f\""
                        + " r=\"2\" fill=\"%s\"/>", f.x(c.s()), f.z(c.z()), SPHERE));
            }
        }
        svg.append("</g>");
        axes(svg, length, zMax, f, labels);
        legend(svg, drawHeight + 10, legendKeys, labels);
        return svg.append("</svg>").toString();
    }

    private record Frame(double scale, double zMax) {
        double x(double s) {
            return LEFT + s * scale;
        }

        double z(double z) {
            return TOP + (zMax - z) * scale;
        }
    }

    private static void profile(StringBuilder svg, SiteSection section, Frame f) {
        List<Point> profile = section.profile();
        StringBuilder d = new StringBuilder(String.format(Locale.ROOT, "M%.1f %.1f", f.x(0), f.z(0)));
        for (Point p : profile) {
            d.append(String.format(Locale.ROOT, " L%.1f %.1f", f.x(p.s()), f.z(p.z())));
        }
        d.append(String.format(Locale.ROOT, " L%.1f %.1f Z", f.x(section.length()), f.z(0)));
        svg.append("<path class=\"profile\" fill=\"").append(PROFILE)
                .append("\" stroke=\"#333333\" stroke-width=\"1\" d=\"").append(d).append("\"/>");
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
            svg.append("<path class=\"exposed-profile\" fill=\"none\" stroke=\"").append(PlanSvg.EXPOSED_ROOF)
                    .append("\" stroke-width=\"5\" stroke-linecap=\"round\" d=\"").append(path).append("\"/>");
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

    private static void axes(StringBuilder svg, double length, double zMax, Frame f, PlanSvg.Labels labels) {
        svg.append("<g class=\"axes\" font-size=\"11\" font-family=\"sans-serif\" stroke-width=\"1\">");
        svg.append(String.format(Locale.ROOT, "<line x1=\"%.1f\" y1=\"%.1f\" x2=\"%.1f\" y2=\"%.1f\" stroke=\"#222222\"/>",
                f.x(0), f.z(0), f.x(length), f.z(0)));
        svg.append(String.format(Locale.ROOT, "<line x1=\"%.1f\" y1=\"%.1f\" x2=\"%.1f\" y2=\"%.1f\" stroke=\"#222222\"/>",
                f.x(0), f.z(0), f.x(0), f.z(zMax)));
        double step = tickStep(length, 10);
        for (int k = 0; k * step <= length + 1e-9; k++) {
            double s = k * step;
            svg.append(String.format(Locale.ROOT, "<line x1=\"%.1f\" y1=\"%.1f\" x2=\"%.1f\" y2=\"%.1f\" stroke=\"#222222\"/>"
                    + "<text x=\"%.1f\" y=\"%.1f\" text-anchor=\"middle\">%s</text>", f.x(s), f.z(0), f.x(s),
                    f.z(0) + 5, f.x(s), f.z(0) + 17, tick(s)));
        }
        double zStep = tickStep(zMax, 5);
        for (int k = 0; k * zStep <= zMax + 1e-9; k++) {
            double z = k * zStep;
            svg.append(String.format(Locale.ROOT, "<line x1=\"%.1f\" y1=\"%.1f\" x2=\"%.1f\" y2=\"%.1f\" stroke=\"#222222\"/>"
                    + "<text x=\"%.1f\" y=\"%.1f\" text-anchor=\"end\">%s</text>", f.x(0) - 5, f.z(z), f.x(0), f.z(z),
                    f.x(0) - 8, f.z(z) + 4, tick(z)));
        }
        svg.append(String.format(Locale.ROOT, "<text class=\"axis-title\" x=\"%.1f\" y=\"%.1f\" text-anchor=\"middle\">%s</text>",
                f.x(length / 2), f.z(0) + 36, PlanSvg.escape(labels.text("section.axis.distance"))));
        svg.append(String.format(Locale.ROOT, "<text class=\"axis-title\" x=\"%.1f\" y=\"%.1f\" text-anchor=\"middle\""
                + " transform=\"rotate(-90 %.1f %.1f)\">%s</text>", 14.0, f.z(zMax / 2), 14.0, f.z(zMax / 2),
                PlanSvg.escape(labels.text("section.axis.height"))));
        svg.append("</g>");
    }

    /** A round tick spacing (1, 2 or 5 times a power of ten, at least 1 m) giving at most about {@code count} ticks. */
    static double tickStep(double range, int count) {
        double raw = Math.max(range / count, 1);
        double power = Math.pow(10, Math.floor(Math.log10(raw)));
        for (double m : new double[] {1, 2, 5, 10}) {
            if (m * power >= raw) {
                return m * power;
            }
        }
        return 10 * power;
    }

    private static String tick(double value) {
        return String.valueOf(Math.round(value));
    }

    private static void legend(StringBuilder svg, double top, String[] keys, PlanSvg.Labels labels) {
        String[] colours = {PROFILE, PlanSvg.EXPOSED_ROOF, ENVELOPE, PlanSvg.PART, SPHERE};
        svg.append("<g class=\"legend\" font-size=\"12\" font-family=\"sans-serif\">");
        for (int i = 0; i < keys.length; i++) {
            double y = top + i * LEGEND_ROW;
            svg.append(String.format(Locale.ROOT, "<rect x=\"%.1f\" y=\"%.1f\" width=\"18\" height=\"12\" fill=\"%s\""
                    + " stroke=\"#444444\" stroke-width=\"0.5\"/><text x=\"%.1f\" y=\"%.1f\">%s</text>", LEFT, y,
                    colours[i], LEFT + 26, y + 10, PlanSvg.escape(labels.text(keys[i]))));
        }
        svg.append("</g>");
    }

    private static String exact(double value) {
        return String.format(Locale.ROOT, "%.6f", value);
    }
}
