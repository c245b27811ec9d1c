package org.lpzplanner.drawing;

/** Supplies a drawing's own words (legend, north mark, scale, titles) by message key. */
@FunctionalInterface
public interface Texts {
    String text(String key, Object... args);
}
