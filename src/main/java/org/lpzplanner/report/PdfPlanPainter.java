package org.lpzplanner.report;

import java.awt.Color;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.lpzplanner.report.PlanDrawing.Label;
import org.lpzplanner.report.PlanDrawing.Layer;
import org.lpzplanner.report.PlanDrawing.Shape;

/**
 * Draws the plan to a stated scale on A4: an overview page at the largest standard scale that fits
 * the site, then, when that scale is smaller than 1:{@value #DETAIL_SCALE}, detail sheets at
 * 1:{@value #DETAIL_SCALE} tiling the site (numbered on the overview, which then names only the
 * structures; item, part and down-conductor numbers are on the detail sheets). Every sheet has a scale bar, a
 * north arrow (north is up: local y) and the legend. Shapes are clipped to the drawing frame.
 */
final class PdfPlanPainter {

    /** Standard scale denominators, largest scale first. */
    static final int[] SCALES = {100, 200, 250, 500, 1000, 1250, 2000, 2500, 5000, 10000, 20000, 50000, 100000};
    /** Sites that need a smaller scale than this get detail sheets at this scale. */
    static final int DETAIL_SCALE = 1000;
    static final float LEGEND_HEIGHT = 66;
    private static final float POINTS_PER_MM = 72f / 25.4f;
    private static final float PAD = 10;

    private static final Color GROUND = new Color(0xcf, 0xe9, 0xc8);
    private static final Color OBJECT = new Color(0xb9, 0xad, 0x94);
    private static final Color EXPOSED_ROOF = new Color(0xf5, 0xb0, 0x6c);
    private static final Color FACADE = new Color(0x7b, 0x4f, 0xa0);
    /** Facade bands where flashes to the side are negligible: the band's purple, light and dashed. */
    private static final Color FACADE_NEGLIGIBLE = new Color(0xc4, 0xb0, 0xda);
    private static final Color EDGE = new Color(0xc8, 0x10, 0x2e);
    private static final Color ACCEPTED = new Color(0x8a, 0x8a, 0x8a);
    private static final Color PART = new Color(0x1f, 0x5f, 0xbf);
    private static final Color DOWN = new Color(0x11, 0x11, 0x11);
    /** Hatch and outline of keep-out areas (our own dark teal). */
    private static final Color KEEP_OUT = new Color(0x1b, 0x6e, 0x5a);
    /** Stretches of parts a model warning is about: a broad dashed amber band under the part. */
    private static final Color WARNING = new Color(0xe0, 0x9b, 0x00);

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
        double w = plan.width() + 2 * margin, h = plan.height() + 2 * margin;
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
        double cx = (plan.minX() + plan.maxX()) / 2, cy = (plan.minY() + plan.maxY()) / 2;
        sheet(p, plan, title, overview, cx, cy, frameTop, frameBottom, !tiled);
        if (tiled) {
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
                        p.strokeRect(px, py, (float) (tileW * k), (float) (tileH * k), PART, 0.8f);
                        p.text(String.valueOf(n), Math.max(px, PdfPages.MARGIN) + 3,
                                Math.min(py + (float) (tileH * k), frameTop) - 10, 8, true, PART);
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

    /** One sheet: the site centred on (cx, cy) at the scale, clipped to the frame, with its furniture. */
    private static void sheet(PdfPages p, PlanDrawing plan, String title, int denominator, double cx, double cy,
            float frameTop, float frameBottom, boolean numbers) {
        p.text(title, PdfPages.MARGIN, p.y - 10, 10, true, PdfReportRenderer.TEXT);
        float frameW = PdfPages.CONTENT_WIDTH, frameH = frameTop - frameBottom;
        float k = pointsPerMetre(denominator);
        float ox = PdfPages.MARGIN + frameW / 2, oy = frameBottom + frameH / 2;
        PDPageContentStream out = p.out;
        try {
            out.saveGraphicsState();
            out.addRect(PdfPages.MARGIN, frameBottom, frameW, frameH);
            out.clip();
            p.fillRect(PdfPages.MARGIN, frameBottom, frameW, frameH, new Color(0xfb, 0xfb, 0xf8));
            for (Shape s : plan.shapes()) {
                shape(out, s, k, ox, oy, cx, cy);
            }
            // Names first, then the numbers around them: a number goes where it overlaps no label
            // already placed, so that D44 next to E0 does not read as "D440".
            List<float[]> taken = new ArrayList<>();
            for (boolean small : new boolean[] {false, true}) {
                for (Label l : plan.labels()) {
                    float x = (float) (ox + (l.x() - cx) * k), y = (float) (oy + (l.y() - cy) * k);
                    if (l.small() != small || (l.small() && !numbers) || x < PdfPages.MARGIN
                            || x > PdfPages.MARGIN + frameW || y < frameBottom || y > frameTop) {
                        continue;
                    }
                    float size = l.small() ? 5.5f : 7f;
                    String text = p.fonts.safe(l.text());
                    float tw = p.fonts.width(text, size);
                    float[] at = l.small() ? placeNumber(taken, x, y, tw, size) : new float[] {x - tw / 2, y - size / 3};
                    taken.add(box(at[0], at[1], tw, size));
                    halo(out, p.fonts, text, at[0], at[1], size);
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

    private static void shape(PDPageContentStream out, Shape s, float k, float ox, float oy, double cx, double cy)
            throws IOException {
        Layer layer = s.layer();
        switch (layer) {
            case PROTECTED_GROUND, STRUCTURE, ROOFTOP_OBJECT, EXPOSED_ROOF -> {
                for (List<double[]> ring : s.paths()) {
                    path(out, ring, k, ox, oy, cx, cy, true);
                }
                if (layer == Layer.STRUCTURE) {
                    int grey = Math.round(225 - 120 * (float) s.shade());
                    out.setNonStrokingColor(new Color(grey, grey, Math.min(255, grey + 6)));
                    out.setStrokingColor(new Color(0x33, 0x33, 0x33));
                    out.setLineWidth(0.6f);
                    out.fillAndStrokeEvenOdd();
                } else if (layer == Layer.ROOFTOP_OBJECT) {
                    out.setNonStrokingColor(OBJECT);
                    out.setStrokingColor(new Color(0x55, 0x55, 0x55));
                    out.setLineWidth(0.5f);
                    out.fillAndStrokeEvenOdd();
                } else {
                    out.setNonStrokingColor(layer == Layer.PROTECTED_GROUND ? GROUND : EXPOSED_ROOF);
                    out.fillEvenOdd();
                }
            }
            case MODEL_WARNING -> {
                for (List<double[]> line : s.paths()) {
                    if (line.size() > 1) {
                        path(out, line, k, ox, oy, cx, cy, false);
                    }
                }
                out.setStrokingColor(WARNING);
                out.setLineWidth(5f);
                out.setLineDashPattern(new float[] {5, 3}, 0);
                out.stroke();
                out.setLineDashPattern(new float[0], 0);
            }
            case FACADE_NEGLIGIBLE -> {
                List<double[]> line = s.paths().get(0);
                if (line.size() > 1) {
                    path(out, line, k, ox, oy, cx, cy, false);
                    out.setStrokingColor(FACADE_NEGLIGIBLE);
                    out.setLineWidth(3f);
                    out.setLineDashPattern(new float[] {2, 2}, 0);
                    out.stroke();
                    out.setLineDashPattern(new float[0], 0);
                }
            }
            case FACADE_BAND, EXPOSED_EDGE, ACCEPTED_ITEM, CONDUCTOR -> {
                List<double[]> line = s.paths().get(0);
                if (line.size() == 1) {
                    dot(out, line.get(0), k, ox, oy, cx, cy, 2f, ACCEPTED);
                    return;
                }
                path(out, line, k, ox, oy, cx, cy, false);
                out.setStrokingColor(switch (layer) {
                    case FACADE_BAND -> FACADE;
                    case EXPOSED_EDGE -> EDGE;
                    case ACCEPTED_ITEM -> ACCEPTED;
                    default -> PART;
                });
                out.setLineWidth(layer == Layer.FACADE_BAND ? 3f : layer == Layer.CONDUCTOR ? 1.2f : 1.5f);
                out.setLineDashPattern(layer == Layer.CONDUCTOR || layer == Layer.ACCEPTED_ITEM ? new float[] {3, 2}
                        : new float[0], 0);
                out.stroke();
                out.setLineDashPattern(new float[0], 0);
            }
            case KEEP_OUT -> {
                List<double[]> ring = s.paths().get(0);
                out.saveGraphicsState();
                path(out, ring, k, ox, oy, cx, cy, true);
                out.clip();
                double minX = Double.POSITIVE_INFINITY, minY = Double.POSITIVE_INFINITY;
                double maxX = Double.NEGATIVE_INFINITY, maxY = Double.NEGATIVE_INFINITY;
                for (double[] xy : ring) {
                    minX = Math.min(minX, ox + (xy[0] - cx) * k);
                    maxX = Math.max(maxX, ox + (xy[0] - cx) * k);
                    minY = Math.min(minY, oy + (xy[1] - cy) * k);
                    maxY = Math.max(maxY, oy + (xy[1] - cy) * k);
                }
                hatch(out, (float) minX, (float) minY, (float) (maxX - minX), (float) (maxY - minY));
                out.restoreGraphicsState();
                path(out, ring, k, ox, oy, cx, cy, true);
                out.setStrokingColor(KEEP_OUT);
                out.setLineWidth(0.9f);
                out.setLineDashPattern(new float[] {4, 2}, 0);
                out.stroke();
                out.setLineDashPattern(new float[0], 0);
            }
            case EXPOSED_CORNER -> dot(out, s.paths().get(0).get(0), k, ox, oy, cx, cy, 2.2f, EDGE);
            case DOWN_CONDUCTOR -> {
                double[] xy = s.paths().get(0).get(0);
                float x = (float) (ox + (xy[0] - cx) * k), y = (float) (oy + (xy[1] - cy) * k);
                out.setNonStrokingColor(DOWN);
                out.addRect(x - 2, y - 2, 4, 4);
                out.fill();
            }
            case ROD -> {
                double[] xy = s.paths().get(0).get(0);
                float x = (float) (ox + (xy[0] - cx) * k), y = (float) (oy + (xy[1] - cy) * k);
                circle(out, x, y, 3.2f);
                out.setNonStrokingColor(Color.WHITE);
                out.setStrokingColor(PART);
                out.setLineWidth(1.4f);
                out.fillAndStroke();
            }
        }
    }

    /**
     * A half-transparent white veil (what lies below stays visible, on dark roofs too) and diagonal
     * lines (45°, 3 pt apart) over a rectangle; the caller clips them to the area.
     */
    private static void hatch(PDPageContentStream out, float x, float y, float w, float h) throws IOException {
        out.saveGraphicsState();
        org.apache.pdfbox.pdmodel.graphics.state.PDExtendedGraphicsState veil =
                new org.apache.pdfbox.pdmodel.graphics.state.PDExtendedGraphicsState();
        veil.setNonStrokingAlphaConstant(0.55f);
        out.setGraphicsStateParameters(veil);
        out.setNonStrokingColor(Color.WHITE);
        out.addRect(x, y, w, h);
        out.fill();
        out.restoreGraphicsState();
        float step = 3f;
        for (float d = -h; d <= w; d += step) {
            out.moveTo(x + d, y);
            out.lineTo(x + d + h, y + h);
        }
        out.setStrokingColor(KEEP_OUT);
        out.setLineWidth(0.6f);
        out.stroke();
    }

    private static void path(PDPageContentStream out, List<double[]> points, float k, float ox, float oy, double cx,
            double cy, boolean close) throws IOException {
        for (int i = 0; i < points.size(); i++) {
            float x = (float) (ox + (points.get(i)[0] - cx) * k), y = (float) (oy + (points.get(i)[1] - cy) * k);
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

    private static void dot(PDPageContentStream out, double[] xy, float k, float ox, float oy, double cx, double cy,
            float r, Color colour) throws IOException {
        circle(out, (float) (ox + (xy[0] - cx) * k), (float) (oy + (xy[1] - cy) * k), r);
        out.setNonStrokingColor(colour);
        out.fill();
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

    private static void halo(PDPageContentStream out, PdfFonts fonts, String safeText, float x, float y, float size)
            throws IOException {
        fonts.use(out, size);
        out.beginText();
        out.setStrokingColor(Color.WHITE);
        out.setLineWidth(size / 4);
        out.setRenderingMode(org.apache.pdfbox.pdmodel.graphics.state.RenderingMode.STROKE);
        out.newLineAtOffset(x, y);
        out.showText(safeText);
        out.endText();
        out.beginText();
        out.setRenderingMode(org.apache.pdfbox.pdmodel.graphics.state.RenderingMode.FILL);
        out.setNonStrokingColor(PdfReportRenderer.TEXT);
        out.newLineAtOffset(x, y);
        out.showText(safeText);
        out.endText();
    }

    private static void northArrow(PdfPages p, float x, float top) {
        try {
            PDPageContentStream out = p.out;
            out.setNonStrokingColor(PdfReportRenderer.TEXT);
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
        double target = 110 / k;
        double magnitude = Math.pow(10, Math.floor(Math.log10(target)));
        double length = magnitude;
        for (double step : new double[] {1, 2, 5, 10}) {
            if (step * magnitude <= target) {
                length = step * magnitude;
            }
        }
        float x = PdfPages.MARGIN + 10;
        float seg = (float) (length * k / 4);
        p.fillRect(x - 4, y - 4, seg * 4 + 60, 22, Color.WHITE);
        for (int i = 0; i < 4; i++) {
            if (i % 2 == 0) {
                p.fillRect(x + i * seg, y, seg, 4, PdfReportRenderer.TEXT);
            }
        }
        p.strokeRect(x, y, seg * 4, 4, PdfReportRenderer.TEXT, 0.5f);
        p.text("0", x - 2, y + 7, 6.5f, false, PdfReportRenderer.TEXT);
        p.text(ReportFacts.oneDecimal(length).replace(".0", "") + " m", x + seg * 4 - 4, y + 7, 6.5f, false,
                PdfReportRenderer.TEXT);
        p.text("1:" + denominator, x + seg * 4 + 22, y, 6.5f, true, PdfReportRenderer.TEXT);
    }

    private static void legend(PdfPages p, float top, PlanDrawing plan) {
        List<String> names = new ArrayList<>(List.of("Structure (darker is higher)", "Rooftop object",
                "Protected open ground (LPZ 0B)", "Exposed roof area (LPZ 0A)",
                "Facade band, lateral air-termination (5.2.3)", "Exposed edge / corner (E1, E2, …)",
                "Accepted item (dashed grey)",
                "Air-termination rod / conductor (A1, …)", "Down-conductor (D1, …)"));
        // a null colour is the keep-out hatch
        List<Color> colours = new ArrayList<>(List.of(new Color(0xa0, 0xa0, 0xa6), OBJECT, GROUND, EXPOSED_ROOF,
                FACADE, EDGE, ACCEPTED, PART, DOWN));
        if (plan.has(Layer.FACADE_NEGLIGIBLE)) {
            names.add("Facade band, side flashes negligible (5.2.3)");
            colours.add(FACADE_NEGLIGIBLE);
        }
        if (plan.has(Layer.MODEL_WARNING)) {
            names.add("Model warning: part > R above surface (E…)");
            colours.add(WARNING);
        }
        if (plan.has(Layer.KEEP_OUT)) {
            names.add("Keep-out area, hatched (K1, …)");
            colours.add(null);
        }
        float colW = PdfPages.CONTENT_WIDTH / 3;
        for (int i = 0; i < names.size(); i++) {
            float x = PdfPages.MARGIN + (i % 3) * colW, y = top - (i / 3) * 14;
            if (colours.get(i) == null) {
                p.fillRect(x, y - 8, 14, 8, Color.WHITE);
                try {
                    p.out.saveGraphicsState();
                    p.out.addRect(x, y - 8, 14, 8);
                    p.out.clip();
                    hatch(p.out, x, y - 8, 14, 8);
                    p.out.restoreGraphicsState();
                } catch (IOException e) {
                    throw new UncheckedIOException(e);
                }
            } else {
                p.fillRect(x, y - 8, 14, 8, colours.get(i));
            }
            p.strokeRect(x, y - 8, 14, 8, PdfReportRenderer.MUTED, 0.3f);
            p.text(names.get(i), x + 19, y - 7.5f, 7, false, PdfReportRenderer.TEXT);
        }
    }

    /**
     * Where a small number label beside the point (x, y) goes: up and to the right of it, else the
     * first of the other corners, above or below that overlaps no box in {@code taken}; when all
     * overlap, the place that overlaps least (it is still drawn: a number is never left out).
     *
     * @return the text's baseline start {x, y}
     */
    static float[] placeNumber(List<float[]> taken, float x, float y, float width, float size) {
        float[][] places = {{x + 3, y + 2}, {x + 3, y - 2 - size}, {x - 3 - width, y + 2},
            {x - 3 - width, y - 2 - size}, {x - width / 2, y + 4}, {x - width / 2, y - 4 - size}};
        float[] best = places[0];
        double least = Double.MAX_VALUE;
        for (float[] place : places) {
            float[] candidate = box(place[0], place[1], width, size);
            double covered = taken.stream().mapToDouble(t -> overlapArea(t, candidate)).sum();
            if (covered == 0) {
                return place;
            }
            if (covered < least) {
                least = covered;
                best = place;
            }
        }
        return best;
    }

    private static double overlapArea(float[] a, float[] b) {
        return Math.max(0, Math.min(a[2], b[2]) - Math.max(a[0], b[0]))
                * Math.max(0, Math.min(a[3], b[3]) - Math.max(a[1], b[1]));
    }

    /** The box {left, bottom, right, top} a label's text covers, with its halo. */
    static float[] box(float x, float baseline, float width, float size) {
        return new float[] {x - 0.8f, baseline - size * 0.25f, x + width + 0.8f, baseline + size * 0.8f};
    }

    static boolean overlap(float[] a, float[] b) {
        return a[0] < b[2] && b[0] < a[2] && a[1] < b[3] && b[1] < a[3];
    }
}
