package org.lpzplanner.engine.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.lpzplanner.engine.io.SiteJson.SOURCE;
import static org.lpzplanner.engine.io.SiteJson.feature;
import static org.lpzplanner.engine.io.SiteJson.local;
import static org.lpzplanner.engine.io.SiteJson.lonLat;
import static org.lpzplanner.engine.io.SiteJson.point;
import static org.lpzplanner.engine.io.SiteJson.rectangle;

import java.util.Arrays;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Polygon;
import org.lpzplanner.engine.model.RooftopObject;

/** Circles (a Point with a radius) become regular 32-gons inscribed in the circle. */
class CircleFootprintTest {

    private static final int N = 32;

    /** Regular polygon area, closed form: n/2 · r² · sin(2π/n). */
    private static double inscribedArea(int n, double r) {
        return n / 2.0 * r * r * Math.sin(2 * Math.PI / n);
    }

    @Test
    void circleBecomesInscribed32GonWithTheClosedFormArea() {
        RooftopObject flue = SiteReader.readGeoJson(local(
                feature("'kind':'structure','height':10", rectangle(0, 0, 20, 20)),
                feature("'kind':'rooftop-object','radius':0.8,'top':14", point(10, 12))), SOURCE)
                .site().rooftopObjects().get(0);

        Polygon footprint = flue.footprint();
        assertThat(footprint.getExteriorRing().getNumPoints()).isEqualTo(N + 1); // closed ring repeats its first
        assertThat(footprint.getArea()).isCloseTo(inscribedArea(N, 0.8), within(1e-9));
        Coordinate centre = new Coordinate(10, 12);
        assertThat(Arrays.stream(footprint.getCoordinates()).mapToDouble(c -> c.distance(centre)))
                .allSatisfy(d -> assertThat(d).isCloseTo(0.8, within(1e-9)));
        assertThat(flue.top()).isEqualTo(14.0);
    }

    @Test
    void radiusInALonLatFileIsInMetres() {
        RooftopObject chimney = SiteReader.readGeoJson(lonLat(
                feature("'kind':'structure','height':10", rectangle(8, 50, 8.0003, 50.0002)),
                feature("'kind':'rooftop-object','radius':0.5,'top':22", point(8.0001, 50.0001))), SOURCE)
                .site().rooftopObjects().get(0);

        assertThat(chimney.footprint().getArea()).isCloseTo(inscribedArea(N, 0.5), within(1e-9));
    }
}
