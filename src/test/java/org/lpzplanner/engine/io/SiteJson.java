package org.lpzplanner.engine.io;

import java.util.Locale;
import java.util.stream.Collectors;
import java.util.stream.Stream;

/**
 * Builds small GeoJSON site texts for tests. Fragments are written with single quotes, which are
 * turned into double quotes, so that test cases stay readable.
 */
final class SiteJson {

    static final String SOURCE = "site.geojson";

    private SiteJson() {}

    /** A FeatureCollection in local metres. */
    static String local(String... features) {
        return "{\"type\":\"FeatureCollection\",\"coordinates\":\"local-metres\",\"features\":[" + join(features) + "]}";
    }

    /** A FeatureCollection in WGS84 lon/lat. */
    static String lonLat(String... features) {
        return "{\"type\":\"FeatureCollection\",\"features\":[" + join(features) + "]}";
    }

    /** A feature; {@code properties} is the inside of the properties object, single-quoted. */
    static String feature(String properties, String geometry) {
        return q("{'type':'Feature','properties':{" + properties + "},'geometry':" + geometry + "}");
    }

    /** A plain flat-roofed structure, 10 m high, 20 × 10 m at the origin. */
    static String building() {
        return feature("'kind':'structure','height':10", rectangle(0, 0, 20, 10));
    }

    /** A rectangular Polygon geometry, counter-clockwise. */
    static String rectangle(double x0, double y0, double x1, double y1) {
        return polygon(ring(x0, y0, x1, y0, x1, y1, x0, y1, x0, y0));
    }

    /** A Polygon geometry from rings made with {@link #ring}. */
    static String polygon(String... rings) {
        return "{\"type\":\"Polygon\",\"coordinates\":[" + String.join(",", rings) + "]}";
    }

    /** A ring from x, y pairs, taken as written (not closed automatically). */
    static String ring(double... xy) {
        StringBuilder text = new StringBuilder("[");
        for (int i = 0; i < xy.length; i += 2) {
            text.append(i == 0 ? "" : ",").append('[').append(n(xy[i])).append(',').append(n(xy[i + 1])).append(']');
        }
        return text.append(']').toString();
    }

    static String point(double x, double y) {
        return "{\"type\":\"Point\",\"coordinates\":[" + n(x) + "," + n(y) + "]}";
    }

    /** A LineString geometry; each position given as its own array of 2 or 3 numbers. */
    static String lineString(double[]... positions) {
        return "{\"type\":\"LineString\",\"coordinates\":[" + Stream.of(positions)
                .map(p -> "[" + java.util.Arrays.stream(p).mapToObj(SiteJson::n).collect(Collectors.joining(",")) + "]")
                .collect(Collectors.joining(",")) + "]}";
    }

    /** Single quotes to double quotes. */
    static String q(String text) {
        return text.replace('\'', '"');
    }

    private static String join(String... features) {
        return String.join(",", features);
    }

    private static String n(double value) {
        return String.format(Locale.ROOT, "%.10f", value);
    }
}
