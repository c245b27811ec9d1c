package org.lpzplanner.drawing;

import java.util.Locale;

/** An opaque colour, 8 bits per channel; renderers turn it into their own colour type. */
public record Colour(int red, int green, int blue) {

    public Colour {
        if ((red | green | blue) < 0 || red > 255 || green > 255 || blue > 255) {
            throw new IllegalArgumentException("a channel lies outside 0 to 255");
        }
    }

    /** The colour of a 24-bit value written 0xRRGGBB. */
    public static Colour of(int rgb) {
        return new Colour(rgb >> 16 & 0xff, rgb >> 8 & 0xff, rgb & 0xff);
    }

    /** A grey with a little blue, as structures are shaded: level 0 (black) to 255 (white). */
    public static Colour grey(int level) {
        return new Colour(level, level, Math.min(255, level + 6));
    }

    /** As SVG and CSS write it: "#c8102e". */
    public String hex() {
        return String.format(Locale.ROOT, "#%02x%02x%02x", red, green, blue);
    }

    /** As java.awt writes it, for PDFBox. */
    public java.awt.Color awt() {
        return new java.awt.Color(red, green, blue);
    }
}
