/**
 * Reading site files (GeoJSON after RFC 7946 with this product's properties, and WKT) into the
 * model, with the local projection of longitude and latitude to metres (proj4j).
 *
 * <p>Rules of the package: every refusal is a {@link org.lpzplanner.engine.io.SiteFormatException}
 * naming the file, feature and field and saying what to do; nothing is guessed or repaired
 * silently; limits on the size of a site are stated in {@link org.lpzplanner.engine.io.SiteLimits}.
 * Depends on the model only.
 */
package org.lpzplanner.engine.io;
