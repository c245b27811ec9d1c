package org.lpzplanner.engine.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.assertj.core.data.Percentage;

/** The local plane: origin at the centre, metres east and north, and a faithful inverse. */
class LocalProjectionTest {

    @Test
    void centreIsTheOrigin() {
        LocalProjection projection = new LocalProjection(8.25, 50.5);

        Coordinate origin = projection.toLocal(8.25, 50.5);

        assertThat(origin.x).isCloseTo(0, within(1e-6));
        assertThat(origin.y).isCloseTo(0, within(1e-6));
        assertThat(projection.definition()).startsWith("+proj=tmerc").contains("+k=1", "+ellps=WGS84", "+units=m");
    }

    @Test
    void centredOnABoundingBoxUsesItsCentre() {
        LocalProjection projection = LocalProjection.centredOn(new Envelope(8.0, 8.2, 50.0, 50.4));

        assertThat(projection.centreLon()).isCloseTo(8.1, within(1e-12));
        assertThat(projection.centreLat()).isCloseTo(50.2, within(1e-12));
    }

    @Test
    void xPointsEastAndYNorth() {
        LocalProjection projection = new LocalProjection(-2.4, 54.2);

        Coordinate northEast = projection.toLocal(-2.399, 54.201);

        assertThat(northEast.x).isPositive();
        assertThat(northEast.y).isPositive();
    }

    @ParameterizedTest
    @ValueSource(doubles = {0.0, 50.0, -33.9, 64.1})
    void inverseReturnsTheOriginalLonLat(double lat) {
        LocalProjection projection = new LocalProjection(12.0, lat);

        Coordinate local = projection.toLocal(12.004, lat + 0.003);
        Coordinate back = projection.toLonLat(local.x, local.y);

        assertThat(back.x).isCloseTo(12.004, within(1e-9));
        assertThat(back.y).isCloseTo(lat + 0.003, within(1e-9));
    }

    @ParameterizedTest
    @ValueSource(doubles = {0.0, 50.0})
    void oneThousandthDegreeStepsMatchTheEllipsoid(double lat) {
        LocalProjection projection = new LocalProjection(0.0, lat);

        double north = projection.toLocal(0.0, lat + 0.001).y;
        double east = projection.toLocal(0.001, lat).x;

        // Expected: closed-form WGS84 radii of curvature (see Wgs84), independent of proj4j.
        assertThat(north).isCloseTo(0.001 * Wgs84.metresPerDegreeLatitude(lat + 0.0005), Percentage.withPercentage(0.1));
        assertThat(east).isCloseTo(0.001 * Wgs84.metresPerDegreeLongitude(lat), Percentage.withPercentage(0.1));
    }

    @Test
    void degreeLengthsAgreeWithWellKnownValues() {
        // Recalled textbook values, not re-derived: 1° of latitude ≈ 110,574 m at the equator and
        // ≈ 111,229 m at 50°; 1° of longitude ≈ 111,320 m at the equator and ≈ 71,696 m at 50°.
        // Because they are from memory the tolerance is a wide 0.5 %.
        Percentage recalled = Percentage.withPercentage(0.5);
        assertThat(new LocalProjection(0, 0).toLocal(0, 0.01).y * 100).isCloseTo(110_574, recalled);
        assertThat(new LocalProjection(0, 50).toLocal(0, 50.01).y * 100).isCloseTo(111_229, recalled);
        assertThat(new LocalProjection(0, 0).toLocal(0.01, 0).x * 100).isCloseTo(111_320, recalled);
        assertThat(new LocalProjection(0, 50).toLocal(0.01, 50).x * 100).isCloseTo(71_696, recalled);
    }

    @Test
    void invalidCentreIsRejected() {
        assertThatThrownBy(() -> new LocalProjection(200, 10)).isInstanceOf(IllegalArgumentException.class)
                .hasMessageContaining("longitude in [-180, 180]");
        assertThatThrownBy(() -> new LocalProjection(10, Double.NaN)).isInstanceOf(IllegalArgumentException.class);
    }
}
