package org.lpzplanner.report;

import java.awt.Color;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.pdmodel.graphics.state.RenderingMode;

/**
 * The pages of a report being laid out: A4 portrait, fixed margins, a footer band kept free on
 * every page, and a cursor {@link #y} that moves down as blocks are placed. Opens a page when a
 * block does not fit ({@link #ensure}). Text goes through {@link PdfFonts#safe}. Not thread-safe.
 */
final class PdfPages {

    static final float WIDTH = PDRectangle.A4.getWidth();
    static final float HEIGHT = PDRectangle.A4.getHeight();
    static final float MARGIN = 42;
    static final float CONTENT_WIDTH = WIDTH - 2 * MARGIN;
    static final float TOP = HEIGHT - MARGIN;

    final PDDocument document;
    final PdfFonts fonts;
    final float bottom;
    final List<PDPage> pages = new ArrayList<>();
    PDPageContentStream out;
    float y;

    PdfPages(PDDocument document, PdfFonts fonts, float footerHeight) {
        this.document = document;
        this.fonts = fonts;
        this.bottom = MARGIN + footerHeight;
    }

    /** Height available on an empty page. */
    float pageSpace() {
        return TOP - bottom;
    }

    boolean atTop() {
        return out != null && y >= TOP - 0.01f;
    }

    void newPage() {
        try {
            if (out != null) {
                out.close();
            }
            PDPage page = new PDPage(PDRectangle.A4);
            document.addPage(page);
            pages.add(page);
            out = new PDPageContentStream(document, page);
            y = TOP;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Opens a new page unless {@code height} points still fit above the footer. */
    void ensure(float height) {
        if (out == null || (y - height < bottom && !atTop())) {
            newPage();
        }
    }

    void finish() {
        try {
            if (out != null) {
                out.close();
                out = null;
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Draws one line of text with its baseline at (x, baseline). */
    void text(String text, float x, float baseline, float size, boolean bold, Color colour) {
        text(out, fonts, text, x, baseline, size, bold, colour);
    }

    static void text(PDPageContentStream out, PdfFonts fonts, String text, float x, float baseline, float size,
            boolean bold, Color colour) {
        try {
            fonts.use(out, size);
            out.beginText();
            out.setNonStrokingColor(colour);
            if (bold) {
                out.setStrokingColor(colour);
                out.setLineWidth(size / 30f);
                out.setRenderingMode(RenderingMode.FILL_STROKE);
            }
            out.newLineAtOffset(x, baseline);
            out.showText(fonts.safe(text));
            if (bold) {
                out.setRenderingMode(RenderingMode.FILL);
            }
            out.endText();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** The text broken into lines no wider than {@code width} at the size; long words are split. */
    static List<String> wrap(PdfFonts fonts, String text, float size, float width) {
        List<String> lines = new ArrayList<>();
        String paragraph = fonts.safe(text);
        {
            StringBuilder line = new StringBuilder();
            for (String word : paragraph.trim().split(" +")) {
                if (word.isEmpty()) {
                    continue;
                }
                String candidate = line.isEmpty() ? word : line + " " + word;
                if (fonts.width(candidate, size) <= width) {
                    line.setLength(0);
                    line.append(candidate);
                    continue;
                }
                if (!line.isEmpty()) {
                    lines.add(line.toString());
                    line.setLength(0);
                }
                while (fonts.width(word, size) > width && word.length() > 1) {
                    int cut = word.length() - 1;
                    while (cut > 1 && fonts.width(word.substring(0, cut), size) > width) {
                        cut--;
                    }
                    lines.add(word.substring(0, cut));
                    word = word.substring(cut);
                }
                line.append(word);
            }
            if (!line.isEmpty()) {
                lines.add(line.toString());
            }
        }
        if (lines.isEmpty()) {
            lines.add("");
        }
        return lines;
    }

    void fillRect(float x, float yBottom, float w, float h, Color colour) {
        try {
            out.setNonStrokingColor(colour);
            out.addRect(x, yBottom, w, h);
            out.fill();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    void strokeRect(float x, float yBottom, float w, float h, Color colour, float lineWidth) {
        try {
            out.setStrokingColor(colour);
            out.setLineWidth(lineWidth);
            out.addRect(x, yBottom, w, h);
            out.stroke();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    void line(float x1, float y1, float x2, float y2, Color colour, float lineWidth) {
        try {
            out.setStrokingColor(colour);
            out.setLineWidth(lineWidth);
            out.moveTo(x1, y1);
            out.lineTo(x2, y2);
            out.stroke();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
