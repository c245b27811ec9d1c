package org.lpzplanner.cli;

import org.locationtech.jts.geom.Coordinate;
import org.lpzplanner.engine.io.LocalProjection;
import org.lpzplanner.engine.io.SiteDocument;

/**
 * The coordinates a site file was written in, and the conversions between them and the engine's
 * local metres: positions in files the user gives and in files written for the user are in the
 * site file's own coordinates (WGS84 lon/lat or local metres).
 *
 * <p>Written positions are rounded to 1e-7 degrees (about 1 cm) or to 1 mm; elevations to 1 mm.
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

    /** A local position as written: {x, y} or {x, y, z} in the site's coordinates, rounded. */
    double[] written(Coordinate local, boolean withZ) {
        double x;
        double y;
        if (projection == null) {
            x = round(local.x, 1e3);
            y = round(local.y, 1e3);
        } else {
            Coordinate lonLat = projection.toLonLat(local.x, local.y);
            x = round(lonLat.x, 1e7);
            y = round(lonLat.y, 1e7);
        }
        return withZ ? new double[] {x, y, round(local.getZ(), 1e3)} : new double[] {x, y};
    }

    /** A value rounded to 1/scale; scales are powers of ten so the result prints cleanly. */
    static double round(double value, double scale) {
        double r = Math.round(value * scale) / scale;
        return r == 0 ? 0 : r; // no "-0.0" in output
    }
}
