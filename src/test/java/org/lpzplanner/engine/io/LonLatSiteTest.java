package org.lpzplanner.engine.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.lpzplanner.engine.io.SiteJson.SOURCE;
import static org.lpzplanner.engine.io.SiteJson.feature;
import static org.lpzplanner.engine.io.SiteJson.local;
import static org.lpzplanner.engine.io.SiteJson.lonLat;
import static org.lpzplanner.engine.io.SiteJson.point;
import static org.lpzplanner.engine.io.SiteJson.polygon;
import static org.lpzplanner.engine.io.SiteJson.rectangle;
import static org.lpzplanner.engine.io.SiteJson.ring;

import org.assertj.core.data.Offset;
import org.assertj.core.data.Percentage;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;

/**
 * Sites given in lon/lat land on the local plane at true size. Expected sizes come from the WGS84
 * ellipsoid's closed-form degree lengths (see {@link Wgs84}), not from proj4j.
 */
class LonLatSiteTest {

    private static final Percentage TENTH_OF_A_PERCENT = Percentage.withPercentage(0.1);

    /** A lon/lat rectangle of the given size in metres, south-west corner at (lon, lat). */
    private static String rectangleOfMetres(double lon, double lat, double widthM, double depthM) {
        double dLon = widthM / Wgs84.metresPerDegreeLongitude(lat + depthM / 2 / Wgs84.metresPerDegreeLatitude(lat));
        double dLat = depthM / Wgs84.metresPerDegreeLatitude(lat + depthM / 2 / Wgs84.metresPerDegreeLatitude(lat));
        return rectangle(lon, lat, lon + dLon, lat + dLat);
    }

    @ParameterizedTest(name = "at latitude {0}")
    @ValueSource(doubles = {0.2, 50.0})
    void hundredMetreSquareKeepsItsSideLengths(double lat) {
        Geometry square = SiteReader.readGeoJson(lonLat(feature("'kind':'structure','height':10",
                rectangleOfMetres(7.5, lat, 100, 100))), SOURCE).site().structures().get(0).footprint();

        Coordinate[] c = square.getCoordinates();
        for (int i = 0; i < 4; i++) {
            assertThat(c[i].distance(c[i + 1])).as("side %d", i).isCloseTo(100.0, TENTH_OF_A_PERCENT);
        }
        // The corners stay right angles: the diagonals are equal to within a centimetre.
        assertThat(c[0].distance(c[2])).isCloseTo(c[1].distance(c[3]), Offset.offset(0.01));
    }

    @ParameterizedTest(name = "at latitude {0}")
    @ValueSource(doubles = {0.2, 50.0})
    void lonLatAndLocalMetreVersionsOfABuildingHaveTheSameArea(double lat) {
        String properties = "'kind':'structure','height':12";
        double localArea = SiteReader.readGeoJson(local(feature(properties, rectangle(0, 0, 60, 30))), SOURCE)
                .site().structures().get(0).footprint().getArea();
        double lonLatArea = SiteReader.readGeoJson(lonLat(feature(properties, rectangleOfMetres(-3.2, lat, 60, 30))),
                SOURCE).site().structures().get(0).footprint().getArea();

        assertThat(lonLatArea).isCloseTo(localArea, TENTH_OF_A_PERCENT);
    }

    @ParameterizedTest(name = "at latitude {0}")
    @ValueSource(doubles = {0.2, 50.0})
    void projectionIsCentredOnTheSitesBoundingBox(double lat) {
        SiteDocument document = SiteReader.readGeoJson(lonLat(feature("'kind':'structure','height':5",
                polygon(ring(10.0, lat, 10.002, lat, 10.002, lat + 0.001, 10.0, lat + 0.001, 10.0, lat)))), SOURCE);

        assertThat(document.georeferenced()).isTrue();
        assertThat(document.projection().centreLon()).isCloseTo(10.001, Offset.offset(1e-12));
        assertThat(document.projection().centreLat()).isCloseTo(lat + 0.0005, Offset.offset(1e-12));
        assertThat(document.site().structures().get(0).footprint().getCentroid().getX()).isCloseTo(0, Offset.offset(0.01));
    }

    @ParameterizedTest(name = "at latitude {0}")
    @ValueSource(doubles = {0.2, 50.0})
    void addingAPartFarFromTheStructuresDoesNotMoveTheLocalOrigin(double lat) {
        // positions held in local metres (the plan, undo steps) must not shift when a mast or rod
        // is placed outside the structures' extent: the origin follows the structures alone
        String barn = feature("'kind':'structure','height':5",
                polygon(ring(10.0, lat, 10.002, lat, 10.002, lat + 0.001, 10.0, lat + 0.001, 10.0, lat)));
        String mast = feature("'kind':'rod','height':20", point(10.004, lat + 0.003));
        SiteDocument without = SiteReader.readGeoJson(lonLat(barn), SOURCE);
        SiteDocument with = SiteReader.readGeoJson(lonLat(barn, mast), SOURCE);

        assertThat(with.projection().centreLon()).isEqualTo(without.projection().centreLon());
        assertThat(with.projection().centreLat()).isEqualTo(without.projection().centreLat());
        Coordinate[] a = without.site().structures().get(0).footprint().getCoordinates();
        Coordinate[] b = with.site().structures().get(0).footprint().getCoordinates();
        for (int i = 0; i < a.length; i++) {
            assertThat(b[i].distance(a[i])).as("corner %d", i).isLessThan(1e-9);
        }
    }
}
