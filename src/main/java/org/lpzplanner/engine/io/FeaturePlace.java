package org.lpzplanner.engine.io;

/**
 * A feature of a GeoJSON site file.
 *
 * @param source file name
 * @param index  0-based position in the {@code features} array
 * @param name   the feature's name, or null
 */
record FeaturePlace(String source, int index, String name) implements Place {

    @Override
    public String label() {
        return name == null || name.isBlank() ? "feature " + index : "feature " + index + " (\"" + name + "\")";
    }

    @Override
    public SiteFormatException fail(String field, String problem) {
        return SiteFormatException.atFeature(source, index, name, field, problem);
    }
}
