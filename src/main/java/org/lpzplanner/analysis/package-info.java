/**
 * Analyses of stored sites: revisions with their inputs and results (the result GeoJSON written by
 * {@link org.lpzplanner.analysis.ResultGeoJson}, the one writer), review items and their
 * acceptances, background analysis jobs within a bounded pool, and the last analyses kept in
 * memory for updates after edits; the plan drawn as SVG from a stored result.
 *
 * <p>Rules of the package: depends on sites and below; a revision's results are only ever what
 * this app computed from the revision's own site file and settings; a stored result is read once
 * per revision ({@link org.lpzplanner.analysis.ParsedResults}).
 */
package org.lpzplanner.analysis;
