package org.lpzplanner.report;

import java.awt.Color;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.graphics.state.PDExtendedGraphicsState;
import org.apache.pdfbox.pdmodel.graphics.state.RenderingMode;
import org.lpzplanner.common.Formats;
import org.lpzplanner.drawing.LabelPlacement;
import org.lpzplanner.drawing.Layer;
import org.lpzplanner.drawing.LayerStyle;
import org.lpzplanner.drawing.PlanDrawing;
import org.lpzplanner.drawing.PlanItem;
import org.lpzplanner.drawing.PlanLabel;
import org.lpzplanner.drawing.PlanStyle;
import org.lpzplanner.drawing.ScaleBar;

/**
 * Draws a {@link PlanDrawing} to a stated scale on A4, with the styles of {@link PlanStyle} and the
 * labels where {@link LabelPlacement} puts them, as the pages draw the same model: an overview page
 * at the largest standard scale that fits the site, then, when that scale is smaller than
 * 1:{@value #DETAIL_SCALE}, detail sheets at 1:{@value #DETAIL_SCALE} tiling the site (numbered on
 * the overview, which then names only the structures; item, part and down-conductor numbers are on
 * the detail sheets). Every sheet has a scale bar, a north arrow (north is up: local y) and the
 * legend. Items are clipped to the drawing frame.
 */
final class PdfPlanPainter {

    /** Standard scale denominators, largest scale first. */
    static final int[] SCALES = {100, 200, 250, 500, 1000, 1250, 2000, 2500, 5000, 10000, 20000, 50000, 100000};
    /** Sites that need a smaller scale than this get detail sheets at this scale. */
    static final int DETAIL_SCALE = 1000;
    static final float LEGEND_HEIGHT = 66;
    private static final float POINTS_PER_MM = 72f / 25.4f;
    private static final float PAD = 10;

    private PdfPlanPainter() {
    }

    /** Points on paper per metre at a scale 1:denominator. */
    static float pointsPerMetre(int denominator) {
        return 1000f / denominator * POINTS_PER_MM;
    }

    /** The largest standard scale at which {@code metres} fit {@code points} of paper. */
    static int fitScale(double widthMetres, double heightMetres, float widthPoints, float heightPoints) {
        for (int d : SCALES) {
            if (widthMetres * pointsPerMetre(d) <= widthPoints && heightMetres * pointsPerMetre(d) <= heightPoints) {
                return d;
            }
        }
        return SCALES[SCALES.length - 1];
    }

    static void paint(PdfPages p, PlanDrawing plan) {
        float frameTop = p.y - 18;
        float frameBottom = p.bottom + LEGEND_HEIGHT;
        float frameW = PdfPages.CONTENT_WIDTH, frameH = frameTop - frameBottom;
        double margin = 4; // metres of ground shown round the site
        double w = plan.frame().width() + 2 * margin, h = plan.frame().height() + 2 * margin;
        int overview = fitScale(w, h, frameW - 2 * PAD, frameH - 2 * PAD);
        int cols = 1, rows = 1;
        double tileW = 0, tileH = 0;
        boolean tiled = overview > DETAIL_SCALE;
        if (tiled) {
            float k = pointsPerMetre(DETAIL_SCALE);
            tileW = (frameW - 2 * PAD) / k;
            tileH = (frameH - 2 * PAD) / k;
            cols = (int) Math.ceil(w / tileW);
            rows = (int) Math.ceil(h / tileH);
        }
        String title = tiled ? "Overview, scale 1:" + overview + " on A4; detail sheets 1 to " + (cols * rows)
                + " at 1:" + DETAIL_SCALE + " follow" : "Plan, scale 1:" + overview + " on A4";
        double cx = plan.frame().centreX(), cy = plan.frame().centreY();
        sheet(p, plan, title, overview, cx, cy, frameTop, frameBottom, !tiled);
        if (tiled) {
            Color grid = PlanStyle.SHEET_GRID.awt();
            float k = pointsPerMetre(overview);
            float ox = PdfPages.MARGIN + frameW / 2, oy = (frameTop + frameBottom) / 2;
            // The tile grid is centred on the site, like the overview.
            double x0 = cx - cols * tileW / 2, y1 = cy + rows * tileH / 2;
            int n = 0;
            try {
                p.out.saveGraphicsState();
                p.out.addRect(PdfPages.MARGIN, frameBottom, frameW, frameH);
                p.out.clip();
                for (int r = 0; r < rows; r++) {
                    for (int c = 0; c < cols; c++) {
                        n++;
                        double tx = x0 + c * tileW, ty = y1 - (r + 1) * tileH;
                        float px = (float) (ox + (tx - cx) * k), py = (float) (oy + (ty - cy) * k);
                        p.strokeRect(px, py, (float) (tileW * k), (float) (tileH * k), grid, 0.8f);
                        p.text(String.valueOf(n), Math.max(px, PdfPages.MARGIN) + 3,
                                Math.min(py + (float) (tileH * k), frameTop) - 10, 8, true, grid);
                    }
                }
                p.out.restoreGraphicsState();
                p.fonts.forget();
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
            n = 0;
            for (int r = 0; r < rows; r++) {
                for (int c = 0; c < cols; c++) {
                    n++;
                    p.newPage();
                    double tcx = x0 + (c + 0.5) * tileW, tcy = y1 - (r + 0.5) * tileH;
                    sheet(p, plan, "Detail sheet " + n + " of " + (cols * rows) + " (row " + (r + 1) + ", column "
                            + (c + 1) + "), scale 1:" + DETAIL_SCALE + " on A4", DETAIL_SCALE, tcx, tcy,
                            p.y - 18, p.bottom + LEGEND_HEIGHT, true);
                }
            }
        }
        p.y = p.bottom;
    }

    /** Local metres to points on the page: the sheet's centre (cx, cy) at (ox, oy), k points per metre. */
    private record Sheet(float k, float ox, float oy, double cx, double cy) {
        float x(double x) {
            return (float) (ox + (x - cx) * k);
        }

        float y(double y) {
            return (float) (oy + (y - cy) * k);
        }
    }

    /** One sheet: the site centred on (cx, cy) at the scale, clipped to the frame, with its furniture. */
    private static void sheet(PdfPages p, PlanDrawing plan, String title, int denominator, double cx, double cy,
            float frameTop, float frameBottom, boolean numbers) {
        p.text(title, PdfPages.MARGIN, p.y - 10, 10, true, PdfReportRenderer.TEXT);
        float frameW = PdfPages.CONTENT_WIDTH, frameH = frameTop - frameBottom;
        float k = pointsPerMetre(denominator);
        Sheet s = new Sheet(k, PdfPages.MARGIN + frameW / 2, frameBottom + frameH / 2, cx, cy);
        List<LabelPlacement.Placed> labels = placeLabels(p, plan, s, frameBottom, frameTop, numbers);
        PDPageContentStream out = p.out;
        try {
            out.saveGraphicsState();
            out.addRect(PdfPages.MARGIN, frameBottom, frameW, frameH);
            out.clip();
            p.fillRect(PdfPages.MARGIN, frameBottom, frameW, frameH, PlanStyle.BACKGROUND.awt());
            for (Layer layer : Layer.values()) {
                if (!layer.onPlan()) {
                    continue;
                }
                for (PlanItem item : plan.items(layer)) {
                    item(p, plan, item, s);
                }
                if (layer == Layer.MODEL_WARNING) {
                    for (LabelPlacement.Placed l : labels) {
                        if (l.label().kind() != PlanLabel.Kind.NUMBER) {
                            halo(out, p.fonts, l);
                        }
                    }
                }
            }
            for (LabelPlacement.Placed l : labels) {
                if (l.label().kind() == PlanLabel.Kind.NUMBER) {
                    halo(out, p.fonts, l);
                }
            }
            out.restoreGraphicsState();
            p.fonts.forget();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        p.strokeRect(PdfPages.MARGIN, frameBottom, frameW, frameH, PdfReportRenderer.TEXT, 0.8f);
        northArrow(p, PdfPages.MARGIN + frameW - 22, frameTop - 12);
        scaleBar(p, denominator, k, frameBottom + 10);
        legend(p, frameBottom - 10, plan);
    }

    /**
     * The sheet's labels placed, names first: those whose point lies in the frame, numbers only on
     * sheets that show them.
     */
    private static List<LabelPlacement.Placed> placeLabels(PdfPages p, PlanDrawing plan, Sheet s, float frameBottom,
            float frameTop, boolean numbers) {
        List<LabelPlacement.Wanted> wanted = new ArrayList<>();
        for (PlanLabel l : plan.labels()) {
            float x = s.x(l.x()), y = s.y(l.y());
            if ((l.kind() == PlanLabel.Kind.NUMBER && !numbers) || x < PdfPages.MARGIN
                    || x > PdfPages.MARGIN + PdfPages.CONTENT_WIDTH || y < frameBottom || y > frameTop) {
                continue;
            }
            String text = p.fonts.safe(l.text());
            float size = (float) l.kind().size();
            wanted.add(new LabelPlacement.Wanted(new PlanLabel(text, l.x(), l.y(), l.kind(), l.layer()), x, y,
                    p.fonts.width(text, size), size));
        }
        return LabelPlacement.placeAll(wanted, 1);
    }

    private static void item(PdfPages p, PlanDrawing plan, PlanItem item, Sheet s) throws IOException {
        PDPageContentStream out = p.out;
        LayerStyle style = PlanStyle.of(item.layer());
        if (item instanceof PlanItem.KeepOutArea k) {
            keepOut(out, k, style, s);
        } else if (item instanceof PlanItem.Structure structure) {
            area(p, item.paths(), style, PlanStyle.structureFill(plan.shade(structure)), s);
        } else if (item instanceof PlanItem.ProtectedGround || item instanceof PlanItem.CollectionArea
                || item instanceof PlanItem.RooftopObject || item instanceof PlanItem.ExposedRoof) {
            area(p, item.paths(), style, style.colour(), s);
        } else if (item instanceof PlanItem.ExposedCorner c) {
            circle(out, s.x(c.x()), s.y(c.y()), (float) style.markSize());
            out.setNonStrokingColor(style.colour().awt());
            out.fill();
        } else if (item instanceof PlanItem.DownConductor d) {
            float side = (float) style.markSize();
            out.setNonStrokingColor(style.colour().awt());
            out.addRect(s.x(d.x()) - side / 2, s.y(d.y()) - side / 2, side, side);
            out.fill();
        } else if (item instanceof PlanItem.Rod r) {
            circle(out, s.x(r.x()), s.y(r.y()), (float) style.markSize());
            out.setNonStrokingColor(PlanStyle.WHITE.awt());
            out.setStrokingColor(style.colour().awt());
            out.setLineWidth((float) style.width());
            out.setLineDashPattern(new float[0], 0);
            out.fillAndStroke();
        } else {
            lines(p, item.paths(), style, s);
        }
    }

    /** Polygons filled even-odd in the fill given, translucent as the style says, outlined when it has one. */
    private static void area(PdfPages p, List<List<double[]>> rings, LayerStyle style, org.lpzplanner.drawing.Colour fill,
            Sheet s) throws IOException {
        PDPageContentStream out = p.out;
        boolean translucent = style.opacity() < 1;
        if (translucent) {
            out.saveGraphicsState();
            PDExtendedGraphicsState alpha = new PDExtendedGraphicsState();
            alpha.setNonStrokingAlphaConstant((float) style.opacity());
            out.setGraphicsStateParameters(alpha);
        }
        for (List<double[]> ring : rings) {
            path(out, ring, s, true);
        }
        out.setNonStrokingColor(fill.awt());
        if (style.outline() != null) {
            stroke(out, style, style.outline());
            out.fillAndStrokeEvenOdd();
        } else {
            out.fillEvenOdd();
        }
        if (translucent) {
            out.restoreGraphicsState();
            p.fonts.forget();
        }
    }

    /** Lines in the style's colour, width and dash, translucent as the style says. */
    private static void lines(PdfPages p, List<List<double[]>> lines, LayerStyle style, Sheet s) throws IOException {
        PDPageContentStream out = p.out;
        boolean any = false;
        for (List<double[]> line : lines) {
            if (line.size() > 1) {
                path(out, line, s, false);
                any = true;
            }
        }
        if (!any) {
            return;
        }
        boolean translucent = style.opacity() < 1;
        if (translucent) {
            out.saveGraphicsState();
            PDExtendedGraphicsState alpha = new PDExtendedGraphicsState();
            alpha.setStrokingAlphaConstant((float) style.opacity());
            out.setGraphicsStateParameters(alpha);
        }
        stroke(out, style, style.colour());
        out.stroke();
        if (translucent) {
            out.restoreGraphicsState();
            p.fonts.forget();
        }
    }

    private static void stroke(PDPageContentStream out, LayerStyle style, org.lpzplanner.drawing.Colour colour)
            throws IOException {
        out.setStrokingColor(colour.awt());
        out.setLineWidth((float) style.width());
        out.setLineCapStyle(style.roundCap() ? 1 : 0);
        double[] dash = style.dash();
        float[] pattern = new float[dash.length];
        for (int i = 0; i < dash.length; i++) {
            pattern[i] = (float) dash[i];
        }
        out.setLineDashPattern(pattern, 0);
    }

    private static void keepOut(PDPageContentStream out, PlanItem.KeepOutArea area, LayerStyle style, Sheet s)
            throws IOException {
        List<double[]> ring = area.corners();
        out.saveGraphicsState();
        path(out, ring, s, true);
        out.clip();
        float minX = Float.POSITIVE_INFINITY, minY = Float.POSITIVE_INFINITY;
        float maxX = Float.NEGATIVE_INFINITY, maxY = Float.NEGATIVE_INFINITY;
        for (double[] xy : ring) {
            minX = Math.min(minX, s.x(xy[0]));
            maxX = Math.max(maxX, s.x(xy[0]));
            minY = Math.min(minY, s.y(xy[1]));
            maxY = Math.max(maxY, s.y(xy[1]));
        }
        hatch(out, style, minX, minY, maxX - minX, maxY - minY);
        out.restoreGraphicsState();
        path(out, ring, s, true);
        stroke(out, style, style.outline());
        out.stroke();
    }

    /**
     * The style's hatching over a rectangle: a half-transparent white veil (what lies below stays
     * visible, on dark roofs too) and diagonal lines at 45°; the caller clips them to the area.
     */
    private static void hatch(PDPageContentStream out, LayerStyle style, float x, float y, float w, float h)
            throws IOException {
        LayerStyle.Hatch hatch = style.hatch();
        out.saveGraphicsState();
        PDExtendedGraphicsState veil = new PDExtendedGraphicsState();
        veil.setNonStrokingAlphaConstant((float) hatch.veilOpacity());
        out.setGraphicsStateParameters(veil);
        out.setNonStrokingColor(PlanStyle.WHITE.awt());
        out.addRect(x, y, w, h);
        out.fill();
        out.restoreGraphicsState();
        float step = (float) hatch.spacing();
        for (float d = -h; d <= w; d += step) {
            out.moveTo(x + d, y);
            out.lineTo(x + d + h, y + h);
        }
        out.setStrokingColor(style.colour().awt());
        out.setLineWidth((float) hatch.width());
        out.setLineDashPattern(new float[0], 0);
        out.stroke();
    }

    private static void path(PDPageContentStream out, List<double[]> points, Sheet s, boolean close)
            throws IOException {
        for (int i = 0; i < points.size(); i++) {
            float x = s.x(points.get(i)[0]), y = s.y(points.get(i)[1]);
            if (i == 0) {
                out.moveTo(x, y);
            } else {
                out.lineTo(x, y);
            }
        }
        if (close) {
            out.closePath();
        }
    }

    static void circle(PDPageContentStream out, float x, float y, float r) throws IOException {
        float c = r * 0.5523f;
        out.moveTo(x + r, y);
        out.curveTo(x + r, y + c, x + c, y + r, x, y + r);
        out.curveTo(x - c, y + r, x - r, y + c, x - r, y);
        out.curveTo(x - r, y - c, x - c, y - r, x, y - r);
        out.curveTo(x + c, y - r, x + r, y - c, x + r, y);
        out.closePath();
    }

    /** A placed label: white halo (round joins, no spikes at sharp glyph corners), then the text in its layer's label colour. */
    private static void halo(PDPageContentStream out, PdfFonts fonts, LabelPlacement.Placed l) throws IOException {
        float size = (float) l.size(), x = (float) l.x(), y = (float) l.baseline();
        String text = l.label().text();
        fonts.use(out, size);
        out.beginText();
        out.setStrokingColor(PlanStyle.WHITE.awt());
        out.setLineWidth(size / 4);
        out.setLineDashPattern(new float[0], 0);
        out.setLineJoinStyle(1);
        out.setRenderingMode(RenderingMode.STROKE);
        out.newLineAtOffset(x, y);
        out.showText(text);
        out.endText();
        out.setLineJoinStyle(0);
        out.beginText();
        out.setRenderingMode(RenderingMode.FILL);
        out.setNonStrokingColor(PlanStyle.of(l.label().layer()).labelColour().awt());
        out.newLineAtOffset(x, y);
        out.showText(text);
        out.endText();
    }

    private static void northArrow(PdfPages p, float x, float top) {
        try {
            PDPageContentStream out = p.out;
            out.setNonStrokingColor(PlanStyle.INK.awt());
            out.moveTo(x, top);
            out.lineTo(x - 7, top - 26);
            out.lineTo(x, top - 20);
            out.lineTo(x + 7, top - 26);
            out.closePath();
            out.fill();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        p.text("N", x - 3.5f, top - 37, 10, true, PdfReportRenderer.TEXT);
    }

    private static void scaleBar(PdfPages p, int denominator, float k, float y) {
        double length = ScaleBar.length(110 / k);
        float x = PdfPages.MARGIN + 10;
        float seg = (float) (length * k / 4);
        p.fillRect(x - 4, y - 4, seg * 4 + 60, 22, PlanStyle.WHITE.awt());
        for (int i = 0; i < 4; i++) {
            if (i % 2 == 0) {
                p.fillRect(x + i * seg, y, seg, 4, PlanStyle.INK.awt());
            }
        }
        p.strokeRect(x, y, seg * 4, 4, PlanStyle.INK.awt(), 0.5f);
        p.text("0", x - 2, y + 7, 6.5f, false, PdfReportRenderer.TEXT);
        p.text(Formats.scaleStep(length) + " m", x + seg * 4 - 4, y + 7, 6.5f, false, PdfReportRenderer.TEXT);
        p.text("1:" + denominator, x + seg * 4 + 22, y, 6.5f, true, PdfReportRenderer.TEXT);
    }

    /** The drawing's legend in three columns: the report's words for each row. */
    private static void legend(PdfPages p, float top, PlanDrawing plan) {
        List<Layer> rows = plan.legend();
        float colW = PdfPages.CONTENT_WIDTH / 3;
        for (int i = 0; i < rows.size(); i++) {
            LayerStyle style = PlanStyle.of(rows.get(i));
            float x = PdfPages.MARGIN + (i % 3) * colW, y = top - (i / 3) * 14;
            p.fillRect(x, y - 8, 14, 8, PlanStyle.WHITE.awt());
            try {
                p.out.saveGraphicsState();
                p.out.addRect(x, y - 8, 14, 8);
                p.out.clip();
                if (style.hatch() != null) {
                    hatch(p.out, style, x, y - 8, 14, 8);
                } else {
                    if (style.opacity() < 1) {
                        PDExtendedGraphicsState alpha = new PDExtendedGraphicsState();
                        alpha.setNonStrokingAlphaConstant((float) style.opacity());
                        p.out.setGraphicsStateParameters(alpha);
                    }
                    p.fillRect(x, y - 8, 14, 8, style.colour().awt());
                }
                p.out.restoreGraphicsState();
                p.fonts.forget();
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
            p.strokeRect(x, y - 8, 14, 8, PlanStyle.SWATCH_OUTLINE.awt(), 0.3f);
            p.text(style.reportLegend(), x + 19, y - 7.5f, 7, false, PdfReportRenderer.TEXT);
        }
    }

    /**
     * Where a small number label beside the point (x, y) goes, in points ({@link
     * LabelPlacement#beside}): {@code taken} holds boxes {left, bottom, right, top}.
     *
     * @return the text's baseline start {x, y}
     */
    static float[] placeNumber(List<float[]> taken, float x, float y, float width, float size) {
        LabelPlacement placement = new LabelPlacement(1);
        taken.forEach(t -> placement.take(new LabelPlacement.Box(t[0], t[1], t[2], t[3])));
        double[] at = placement.beside(x, y, width, size);
        return new float[] {(float) at[0], (float) at[1]};
    }

    /** The box {left, bottom, right, top} a label's text covers, with its halo, in points. */
    static float[] box(float x, float baseline, float width, float size) {
        LabelPlacement.Box b = LabelPlacement.box(x, baseline, width, size, 1);
        return new float[] {(float) b.left(), (float) b.bottom(), (float) b.right(), (float) b.top()};
    }

    static boolean overlap(float[] a, float[] b) {
        return new LabelPlacement.Box(a[0], a[1], a[2], a[3]).overlaps(new LabelPlacement.Box(b[0], b[1], b[2], b[3]));
    }
}
