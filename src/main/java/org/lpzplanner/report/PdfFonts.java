package org.lpzplanner.report;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.HashMap;
import java.util.Map;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.font.PDType0Font;

/**
 * The report's one typeface, Liberation Sans (SIL Open Font License 1.1, shipped inside PDFBox; see
 * licenses/LiberationSans-OFL.txt), embedded as a subset, and the text measures built on it. Text a
 * user typed can hold any Unicode: characters the font has no glyph for print as {@value #MISSING},
 * control characters as spaces, so no name can break a report. One instance per document; not
 * thread-safe.
 */
final class PdfFonts {

    static final String FONT_RESOURCE = "/org/apache/pdfbox/resources/ttf/LiberationSans-Regular.ttf";
    static final char MISSING = '?';

    /** Characters the font lacks with a near one it has: superscript and other minus signs. */
    private static final Map<Integer, Integer> NEAREST = Map.of(0x207B, (int) '-', 0x2212, (int) '-',
            0x2010, (int) '-', 0x2011, (int) '-');

    final PDType0Font font;
    private final Map<Integer, Boolean> hasGlyph = new HashMap<>();
    private final Map<Integer, Float> advance = new HashMap<>();
    private PDPageContentStream selectedOn;
    private float selectedSize;

    PdfFonts(PDDocument document) {
        try (InputStream in = PdfFonts.class.getResourceAsStream(FONT_RESOURCE)) {
            if (in == null) {
                throw new IllegalStateException("the report font " + FONT_RESOURCE + " is missing from the class path");
            }
            font = PDType0Font.load(document, in, true);
        } catch (IOException e) {
            throw new UncheckedIOException("the report font cannot be read", e);
        }
    }

    /**
     * Selects the font at the size on the stream unless it is already selected there. PDFBox builds
     * the font's glyph substitution worker on every font selection, which costs far more than the
     * text, so repeated selections are skipped. Call {@link #forget} after restoring a graphics
     * state, which restores the font selected before it.
     */
    void use(PDPageContentStream out, float size) throws IOException {
        if (out != selectedOn || size != selectedSize) {
            out.setFont(font, size);
            selectedOn = out;
            selectedSize = size;
        }
    }

    /** The font selection of the current stream is unknown again. */
    void forget() {
        selectedOn = null;
    }

    /** The text with every character the font cannot show replaced, ready for {@code showText}. */
    String safe(String text) {
        if (text == null) {
            return "";
        }
        StringBuilder out = new StringBuilder(text.length());
        text.codePoints().forEach(cp -> {
            if (Character.isISOControl(cp) || Character.isWhitespace(cp)) {
                out.append(' ');
            } else if (hasGlyph.computeIfAbsent(cp, this::lookUp)) {
                out.appendCodePoint(cp);
            } else if (NEAREST.containsKey(cp) && hasGlyph.computeIfAbsent(NEAREST.get(cp), this::lookUp)) {
                out.appendCodePoint(NEAREST.get(cp));
            } else {
                out.append(MISSING);
            }
        });
        return out.toString();
    }

    /**
     * Width in points of already safe text at the size: the sum of the glyph advances (the text is
     * shown without kerning), each looked up once per document.
     */
    float width(String safeText, float size) {
        float units = 0;
        for (int i = 0; i < safeText.length(); ) {
            int cp = safeText.codePointAt(i);
            units += advance.computeIfAbsent(cp, this::advanceOf);
            i += Character.charCount(cp);
        }
        return units / 1000f * size;
    }

    private float advanceOf(int codePoint) {
        try {
            return font.getStringWidth(new String(Character.toChars(codePoint)));
        } catch (IOException | IllegalArgumentException e) {
            return 500;
        }
    }

    private boolean lookUp(int codePoint) {
        try {
            // Throws when the font maps the character to no glyph.
            font.encode(new String(Character.toChars(codePoint)));
            return true;
        } catch (IllegalArgumentException | IOException e) {
            return false;
        }
    }
}
