package org.lpzplanner.drawing;

import java.util.ArrayDeque;
import java.util.Deque;
import java.util.Locale;

/**
 * Writes SVG markup element by element: attributes and text are escaped as they are written, and
 * every element is closed in order, so nothing is patched afterwards. Not thread-safe: one writer
 * per drawing.
 */
public final class SvgWriter {

    private final StringBuilder out = new StringBuilder();
    private final Deque<String> open = new ArrayDeque<>();
    private boolean inStartTag;

    /** Opens an element; its attributes follow, then its content, then {@link #end()}. */
    public SvgWriter start(String name) {
        closeStartTag();
        out.append('<').append(name);
        open.push(name);
        inStartTag = true;
        return this;
    }

    /** An attribute of the element just opened, its value escaped. */
    public SvgWriter attr(String name, String value) {
        if (!inStartTag) {
            throw new IllegalStateException("attribute " + name + " after the content of <" + open.peek() + ">");
        }
        out.append(' ').append(name).append("=\"").append(escape(value)).append('"');
        return this;
    }

    /** A coordinate attribute, to a tenth of a unit. */
    public SvgWriter attr(String name, double value) {
        return attr(name, coordinate(value));
    }

    /** Text content, escaped. */
    public SvgWriter text(String text) {
        closeStartTag();
        out.append(escape(text));
        return this;
    }

    /** A {@code <title>} element holding the text (a tooltip in the browser). */
    public SvgWriter title(String text) {
        return start("title").text(text).end();
    }

    /** Closes the element opened last: {@code />} when it has no content. */
    public SvgWriter end() {
        String name = open.pop();
        if (inStartTag) {
            out.append("/>");
            inStartTag = false;
        } else {
            out.append("</").append(name).append('>');
        }
        return this;
    }

    /** The markup written; every element must be closed. */
    public String finish() {
        if (!open.isEmpty()) {
            throw new IllegalStateException("<" + open.peek() + "> is not closed");
        }
        return out.toString();
    }

    private void closeStartTag() {
        if (inStartTag) {
            out.append('>');
            inStartTag = false;
        }
    }

    /** A coordinate to a tenth of a unit: "36.0". */
    public static String coordinate(double value) {
        return String.format(Locale.ROOT, "%.1f", value);
    }

    /** A whole number of units, for the drawing's width and height: "720". */
    public static String whole(double value) {
        return String.format(Locale.ROOT, "%.0f", value);
    }

    /** A frame number for the data attributes the page scripts read, exact enough to invert the drawing. */
    public static String exact(double value) {
        return String.format(Locale.ROOT, "%.6f", value);
    }

    /** A size or dash length to a hundredth, without trailing zeros: "2.5", "5", "0.8". */
    public static String size(double value) {
        String text = String.format(Locale.ROOT, "%.2f", value);
        text = text.replaceAll("0+$", "");
        return text.endsWith(".") ? text.substring(0, text.length() - 1) : text;
    }

    /** Escapes text for XML content and attribute values; control characters become spaces. */
    public static String escape(String text) {
        StringBuilder escaped = new StringBuilder(text.length());
        for (char c : text.toCharArray()) {
            switch (c) {
                case '&' -> escaped.append("&amp;");
                case '<' -> escaped.append("&lt;");
                case '>' -> escaped.append("&gt;");
                case '"' -> escaped.append("&quot;");
                case '\'' -> escaped.append("&#39;");
                default -> escaped.append(c < 0x20 && c != '\t' && c != '\n' && c != '\r' ? ' ' : c);
            }
        }
        return escaped.toString();
    }
}
