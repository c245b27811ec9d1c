package org.lpzplanner.report;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.List;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.lpzplanner.common.Formats;
import org.lpzplanner.drawing.Layer;
import org.lpzplanner.drawing.LayerStyle;
import org.lpzplanner.drawing.PlanStyle;
import org.lpzplanner.drawing.ScaleBar;
import org.lpzplanner.sections.SiteSection;
import org.lpzplanner.sections.SiteSection.Point;

/**
 * Draws a {@link SiteSection} to a standard scale, the same across and up: the structure profile
 * filled, the part of it in LPZ 0A marked along its top, rods, the envelope (dashed) and the sphere
 * at its resting positions clipped to the frame, with distance and height ticks and a one-line legend.
 * Colours, strokes and legend words come from {@link PlanStyle}, as for the page's drawing of the
 * same section.
 */
final class PdfSectionPainter {

    static final float MAX_FRAME_HEIGHT = 250;
    private static final float LEFT = 30;
    private static final float BOTTOM = 18;
    private static final List<Layer> LEGEND = List.of(Layer.SECTION_PROFILE, Layer.SECTION_EXPOSED,
            Layer.SECTION_ENVELOPE, Layer.SECTION_ROD, Layer.SECTION_SPHERE);

    private PdfSectionPainter() {
    }

    static void paint(PdfPages p, ReportBlock.Section block) {
        SiteSection s = block.section();
        double highest = 1;
        for (Point pt : s.profile()) {
            highest = Math.max(highest, pt.z());
        }
        for (Point pt : s.envelope()) {
            highest = Math.max(highest, pt.z());
        }
        for (SiteSection.RodMark r : s.rods()) {
            highest = Math.max(highest, r.top());
        }
        double zMax = highest * 1.25 + 2;
        float drawW = PdfPages.CONTENT_WIDTH - LEFT - 6;
        int denominator = PdfPlanPainter.fitScale(s.length(), zMax, drawW, MAX_FRAME_HEIGHT - BOTTOM - 6);
        float k = PdfPlanPainter.pointsPerMetre(denominator);
        float frameH = (float) (zMax * k) + BOTTOM + 6;
        List<String> caption = PdfPages.wrap(p.fonts, block.caption() + " Scale 1:" + denominator
                + " on A4, the same across and up.", 7.8f, PdfPages.CONTENT_WIDTH);
        float needed = 16 + caption.size() * 10 + frameH + 22;
        p.ensure(needed);
        p.text(block.title(), PdfPages.MARGIN, p.y - 10.5f, 10.5f, true, PdfReportRenderer.TEXT);
        p.y -= 15;
        for (String line : caption) {
            p.text(line, PdfPages.MARGIN, p.y - 7.8f, 7.8f, false, PdfReportRenderer.MUTED);
            p.y -= 10;
        }
        float frameTop = p.y - 2, frameBottom = frameTop - frameH;
        float x0 = PdfPages.MARGIN + LEFT, z0 = frameBottom + BOTTOM;
        float drawRight = x0 + (float) (s.length() * k);
        PDPageContentStream out = p.out;
        try {
            out.saveGraphicsState();
            out.addRect(x0, z0, drawRight - x0, frameTop - z0);
            out.clip();
            // profile
            out.moveTo(x0, z0);
            for (Point pt : s.profile()) {
                out.lineTo(x0 + (float) (pt.s() * k), z0 + (float) (pt.z() * k));
            }
            out.lineTo(drawRight, z0);
            out.closePath();
            LayerStyle structure = PlanStyle.of(Layer.SECTION_PROFILE);
            out.setNonStrokingColor(structure.colour().awt());
            out.setStrokingColor(structure.outline().awt());
            out.setLineWidth((float) structure.width());
            out.fillAndStroke();
            exposedRuns(out, s, k, x0, z0);
            LayerStyle rod = PlanStyle.of(Layer.SECTION_ROD);
            for (SiteSection.RodMark r : s.rods()) {
                out.setStrokingColor(rod.colour().awt());
                out.setLineWidth((float) rod.width());
                out.moveTo(x0 + (float) (r.s() * k), z0 + (float) (r.base() * k));
                out.lineTo(x0 + (float) (r.s() * k), z0 + (float) (r.top() * k));
                out.stroke();
            }
            List<Point> env = s.envelope();
            for (int i = 0; i < env.size(); i++) {
                float x = x0 + (float) (env.get(i).s() * k), z = z0 + (float) (env.get(i).z() * k);
                if (i == 0) {
                    out.moveTo(x, z);
                } else {
                    out.lineTo(x, z);
                }
            }
            LayerStyle envelope = PlanStyle.of(Layer.SECTION_ENVELOPE);
            out.setStrokingColor(envelope.colour().awt());
            out.setLineWidth((float) envelope.width());
            out.setLineDashPattern(points(envelope.dash()), 0);
            out.stroke();
            out.setLineDashPattern(new float[0], 0);
            LayerStyle sphere = PlanStyle.of(Layer.SECTION_SPHERE);
            for (Point c : s.spheres()) {
                PdfPlanPainter.circle(out, x0 + (float) (c.s() * k), z0 + (float) (c.z() * k),
                        (float) (s.radius() * k));
                out.setStrokingColor(sphere.colour().awt());
                out.setLineWidth((float) sphere.width());
                out.stroke();
            }
            out.restoreGraphicsState();
            p.fonts.forget();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        p.line(x0, z0, drawRight, z0, PlanStyle.INK.awt(), 0.8f);
        p.line(x0, z0, x0, frameTop, PlanStyle.INK.awt(), 0.6f);
        ticks(p, s.length(), zMax, k, x0, z0, frameTop);
        p.y = frameBottom - 4;
        legend(p);
        p.y -= 14;
    }

    private static void exposedRuns(PDPageContentStream out, SiteSection s, float k, float x0, float z0)
            throws IOException {
        List<Point> profile = s.profile();
        LayerStyle exposed = PlanStyle.of(Layer.SECTION_EXPOSED);
        out.setStrokingColor(exposed.colour().awt());
        out.setLineWidth((float) exposed.width());
        for (int i = 0; i + 1 < profile.size(); i++) {
            if (s.exposed().get(i) && s.exposed().get(i + 1)) {
                out.moveTo(x0 + (float) (profile.get(i).s() * k), z0 + (float) (profile.get(i).z() * k));
                out.lineTo(x0 + (float) (profile.get(i + 1).s() * k), z0 + (float) (profile.get(i + 1).z() * k));
                out.stroke();
            }
        }
    }

    private static void ticks(PdfPages p, double length, double zMax, float k, float x0, float z0, float top) {
        double step = niceStep(length / 6);
        for (double d = 0; d <= length + 1e-9; d += step) {
            float x = x0 + (float) (d * k);
            p.line(x, z0, x, z0 - 3, PlanStyle.INK.awt(), 0.5f);
            p.text(Formats.scaleStep(d), x - 4, z0 - 11, 6, false, PdfReportRenderer.MUTED);
        }
        p.text("m along the cut", x0 + (float) (length * k) - 48, z0 - 17, 6, false, PdfReportRenderer.MUTED);
        double zStep = niceStep(zMax / 4);
        for (double z = zStep; z <= zMax + 1e-9; z += zStep) {
            float y = z0 + (float) (z * k);
            if (y > top - 4) {
                break;
            }
            p.line(x0 - 3, y, x0, y, PlanStyle.INK.awt(), 0.5f);
            p.text(Formats.scaleStep(z) + " m", PdfPages.MARGIN, y - 2, 6, false,
                    PdfReportRenderer.MUTED);
        }
    }

    private static double niceStep(double target) {
        return ScaleBar.step(Math.max(target, 1e-6));
    }

    /** The legend in one line: the report's words for each layer of a section. */
    private static void legend(PdfPages p) {
        float x = PdfPages.MARGIN;
        for (Layer layer : LEGEND) {
            LayerStyle style = PlanStyle.of(layer);
            p.fillRect(x, p.y - 7, 12, 6, style.colour().awt());
            p.text(style.reportLegend(), x + 15, p.y - 7, 6.8f, false, PdfReportRenderer.TEXT);
            x += 15 + p.fonts.width(p.fonts.safe(style.reportLegend()), 6.8f) + 14;
        }
    }

    private static float[] points(double[] values) {
        float[] out = new float[values.length];
        for (int i = 0; i < values.length; i++) {
            out[i] = (float) values[i];
        }
        return out;
    }
}
