package org.lpzplanner.analysis;

/**
 * What one analysis read, kept with its revision so that the revision can be printed again exactly:
 * the site's name and its file, verbatim, as they were when the analysis ran, and the tolerance of
 * exact envelope values. The sphere and grid resolution are columns of the revision itself.
 *
 * @param siteName   the site's name at the time
 * @param sourceName the site file's name, e.g. {@code north-yard.geojson}
 * @param sourceText the site file's text, verbatim (its SHA-256 is the revision's checksum)
 * @param tolerance  tolerance of exact envelope values, metres
 */
public record RevisionInputs(String siteName, String sourceName, String sourceText, double tolerance) {
}
