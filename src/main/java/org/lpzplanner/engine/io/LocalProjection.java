package org.lpzplanner.engine.io;

import java.util.Locale;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.proj4j.CRSFactory;
import org.locationtech.proj4j.CoordinateReferenceSystem;
import org.locationtech.proj4j.CoordinateTransform;
import org.locationtech.proj4j.CoordinateTransformFactory;
import org.locationtech.proj4j.Proj4jException;
import org.locationtech.proj4j.ProjCoordinate;

/**
 * The plane a lon/lat site is laid out on: a transverse Mercator projection on the WGS84 ellipsoid
 * with scale 1 on its central meridian, centred on the site, so that local x points east, y north
 * and both are metres. Over a site of a few kilometres the scale error stays far below a
 * millimetre per metre, which is why one local plane is good enough for the rolling-sphere method.
 *
 * <p>Instances are immutable in effect and safe to share between threads.
 */
public final class LocalProjection {

    private static final String GEOGRAPHIC = "+proj=longlat +ellps=WGS84 +no_defs";

    private final double centreLon;
    private final double centreLat;
    private final String definition;
    private final CoordinateTransform forward;
    private final CoordinateTransform inverse;

    /**
     * A projection with its origin (0, 0) at the given point.
     *
     * @throws IllegalArgumentException when the centre is not a finite longitude in [-180, 180] and
     *                                  latitude in [-90, 90]
     */
    public LocalProjection(double centreLon, double centreLat) {
        if (!(centreLon >= -180 && centreLon <= 180) || !(centreLat >= -90 && centreLat <= 90)) {
            throw new IllegalArgumentException(
                    "projection centre must be longitude in [-180, 180] and latitude in [-90, 90], got "
                            + centreLon + ", " + centreLat);
        }
        this.centreLon = centreLon;
        this.centreLat = centreLat;
        this.definition = String.format(Locale.ROOT,
                "+proj=tmerc +lat_0=%.10f +lon_0=%.10f +k=1 +x_0=0 +y_0=0 +ellps=WGS84 +units=m", centreLat, centreLon);
        CRSFactory crsFactory = new CRSFactory();
        CoordinateReferenceSystem geographic = crsFactory.createFromParameters("WGS84-lonlat", GEOGRAPHIC);
        CoordinateReferenceSystem local = crsFactory.createFromParameters("site-plane", definition);
        CoordinateTransformFactory transforms = new CoordinateTransformFactory();
        this.forward = transforms.createTransform(geographic, local);
        this.inverse = transforms.createTransform(local, geographic);
    }

    /** A projection centred on the centre of a lon/lat bounding box (x = longitude, y = latitude). */
    public static LocalProjection centredOn(Envelope lonLatBounds) {
        if (lonLatBounds.isNull()) {
            throw new IllegalArgumentException("cannot centre a projection on an empty bounding box");
        }
        return new LocalProjection(lonLatBounds.centre().x, lonLatBounds.centre().y);
    }

    /** Longitude of the origin, degrees east. */
    public double centreLon() { return centreLon; }

    /** Latitude of the origin, degrees north. */
    public double centreLat() { return centreLat; }

    /** The proj4 definition of the local plane, for display and for re-creating it elsewhere. */
    public String definition() { return definition; }

    /**
     * Local metres (x east, y north, z NaN) of a WGS84 longitude/latitude in degrees.
     *
     * @throws IllegalArgumentException when the point cannot be projected (far from the centre or
     *                                  not a valid longitude/latitude)
     */
    public Coordinate toLocal(double lon, double lat) {
        ProjCoordinate out = apply(forward, lon, lat);
        return new Coordinate(out.x, out.y);
    }

    /**
     * WGS84 longitude (x) and latitude (y) in degrees of a point in local metres; z is NaN.
     *
     * @throws IllegalArgumentException when the point cannot be un-projected
     */
    public Coordinate toLonLat(double x, double y) {
        ProjCoordinate out = apply(inverse, x, y);
        return new Coordinate(out.x, out.y);
    }

    // proj4j transforms keep scratch state between calls, so calls are serialised.
    private synchronized ProjCoordinate apply(CoordinateTransform transform, double a, double b) {
        ProjCoordinate out = new ProjCoordinate();
        try {
            transform.transform(new ProjCoordinate(a, b), out);
        } catch (Proj4jException e) {
            throw new IllegalArgumentException("cannot project (" + a + ", " + b + "): " + e.getMessage(), e);
        }
        if (!Double.isFinite(out.x) || !Double.isFinite(out.y)) {
            throw new IllegalArgumentException("cannot project (" + a + ", " + b + "): result is not finite");
        }
        return out;
    }

    @Override
    public String toString() {
        return "LocalProjection[" + definition + "]";
    }
}
