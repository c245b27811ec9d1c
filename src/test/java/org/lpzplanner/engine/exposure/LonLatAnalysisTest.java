package org.lpzplanner.engine.exposure;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Locale;
import org.assertj.core.data.Offset;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.lpzplanner.engine.io.LocalProjection;
import org.lpzplanner.engine.io.SiteDocument;
import org.lpzplanner.engine.io.SiteReader;
import org.lpzplanner.engine.model.ProtectionLevel;
import org.lpzplanner.engine.model.SphereSpec;

/**
 * The same site given in local metres and in lon/lat (RFC 7946 positions) gives the same analysis.
 * The lon/lat file is made from the local one with a projection centred elsewhere, so the reader's
 * own plane is shifted against the original: only the shapes must agree, to the projection's
 * round-trip error (well under a millimetre over 100 m).
 */
class LonLatAnalysisTest {

    private static final double[][] HALL = {{0, 0}, {40, 0}, {40, 18}, {0, 18}, {0, 0}};
    private static final double[][] ANNEX = {{46, 4}, {70, 4}, {70, 30}, {46, 30}, {46, 4}};
    private static final double[] ROD = {20, 9};

    @Test
    void lonLatAndLocalMetreVersionsGiveTheSameExposure() {
        SiteDocument local = SiteReader.readGeoJson(site(null), "local.geojson");
        LocalProjection maker = new LocalProjection(4.35, 50.85);
        SiteDocument lonLat = SiteReader.readGeoJson(site(maker), "lonlat.geojson");

        AnalysisOptions options = new AnalysisOptions(SphereSpec.of(ProtectionLevel.II), 0.5, 0.001);
        AnalysisResult a = ExposureAnalysis.analyze(local.site(), options);
        AnalysisResult b = ExposureAnalysis.analyze(lonLat.site(), options);

        // shapes agree to the grid: exposed areas within a few cells' worth, lengths within a piece
        assertThat(b.totalExposedRoofArea()).isCloseTo(a.totalExposedRoofArea(), Offset.offset(2.0));
        assertThat(b.totalExposedEdgeLength()).isCloseTo(a.totalExposedEdgeLength(), Offset.offset(1.0));
        assertThat(b.protectedGround().planArea()).isCloseTo(a.protectedGround().planArea(), Offset.offset(20.0));
        assertThat(b.parts()).hasSameSizeAs(a.parts());
        assertThat(b.parts().get(0).intercepts()).isEqualTo(a.parts().get(0).intercepts());

        // the envelope at the same physical points agrees to its query tolerance plus the round trip
        for (double[] p : new double[][] {{10, 9}, {20.4, 9.3}, {43, 10}, {58, 17}, {-6, 9}, {75, 35}}) {
            Coordinate ll = maker.toLonLat(p[0], p[1]);
            Coordinate q = lonLat.projection().toLocal(ll.x, ll.y);
            double ea = a.envelope().heightAt(p[0], p[1], 0.001);
            double eb = b.envelope().heightAt(q.x, q.y, 0.001);
            assertThat(eb).as("envelope at local (%.1f, %.1f)", p[0], p[1]).isCloseTo(ea, Offset.offset(0.005));
        }
    }

    /** The test site as GeoJSON, in local metres (projection null) or in lon/lat through the projection. */
    private static String site(LocalProjection projection) {
        StringBuilder sb = new StringBuilder("{\"type\":\"FeatureCollection\",");
        if (projection == null) {
            sb.append("\"coordinates\":\"local-metres\",");
        }
        sb.append("\"features\":[");
        sb.append(feature("{\"kind\":\"structure\",\"name\":\"Hall\",\"height\":9,\"roof\":\"gable\",\"ridgeHeight\":13,\"ridgeBearing\":90}",
                "{\"type\":\"Polygon\",\"coordinates\":[" + ring(HALL, projection) + "]}")).append(',');
        sb.append(feature("{\"kind\":\"structure\",\"name\":\"Annex\",\"height\":14,\"parapet\":0.8}",
                "{\"type\":\"Polygon\",\"coordinates\":[" + ring(ANNEX, projection) + "]}")).append(',');
        sb.append(feature("{\"kind\":\"rod\",\"name\":\"Ridge rod\",\"height\":2}",
                "{\"type\":\"Point\",\"coordinates\":" + position(ROD, projection) + "}"));
        return sb.append("]}").toString();
    }

    private static String feature(String properties, String geometry) {
        return "{\"type\":\"Feature\",\"properties\":" + properties + ",\"geometry\":" + geometry + "}";
    }

    private static String ring(double[][] points, LocalProjection projection) {
        StringBuilder sb = new StringBuilder("[");
        for (int i = 0; i < points.length; i++) {
            sb.append(i > 0 ? "," : "").append(position(points[i], projection));
        }
        return sb.append(']').toString();
    }

    private static String position(double[] p, LocalProjection projection) {
        if (projection == null) {
            return String.format(Locale.ROOT, "[%.6f,%.6f]", p[0], p[1]);
        }
        Coordinate ll = projection.toLonLat(p[0], p[1]);
        return String.format(Locale.ROOT, "[%.10f,%.10f]", ll.x, ll.y);
    }
}
