package org.lpzplanner.cli;

import org.locationtech.jts.geom.Coordinate;
import org.lpzplanner.engine.io.LocalProjection;
import org.lpzplanner.engine.io.SiteDocument;

/**
 * The coordinates a site file was written in, and the conversion from them to the engine's local
 * metres: positions in files the user gives are in the site file's own coordinates (WGS84 lon/lat
 * or local metres). Result files are written by {@link org.lpzplanner.analysis.ResultGeoJson}.
 */
final class SiteFrame {

    private final LocalProjection projection;

    private SiteFrame(LocalProjection projection) {
        this.projection = projection;
    }

    /** The frame of a site read from a file. */
    static SiteFrame of(SiteDocument document) {
        return new SiteFrame(document.projection());
    }

    /** Whether positions are WGS84 longitude/latitude (else local metres). */
    boolean lonLat() {
        return projection != null;
    }

    /** The projection of a lon/lat site, or null for local metres. */
    LocalProjection projection() {
        return projection;
    }

    /**
     * Local metres of a position given in the site's coordinates (x = longitude, y = latitude for
     * lon/lat sites).
     *
     * @throws IllegalArgumentException when a longitude/latitude is out of range or cannot be projected
     */
    Coordinate toLocal(double x, double y) {
        if (projection == null) {
            return new Coordinate(x, y);
        }
        if (!(x >= -180 && x <= 180 && y >= -90 && y <= 90)) {
            throw new IllegalArgumentException("longitude must lie in [-180, 180] and latitude in [-90, 90]");
        }
        return projection.toLocal(x, y);
    }
}
