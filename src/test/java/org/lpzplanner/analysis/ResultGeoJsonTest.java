package org.lpzplanner.analysis;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LinearRing;
import org.locationtech.jts.geom.Polygon;
import org.lpzplanner.engine.exposure.AnalysisOptions;
import org.lpzplanner.engine.exposure.AnalysisResult;
import org.lpzplanner.engine.exposure.ExposureAnalysis;
import org.lpzplanner.engine.io.SiteDocument;
import org.lpzplanner.engine.io.SiteReader;
import org.lpzplanner.engine.model.ProtectionLevel;
import org.lpzplanner.engine.model.SphereSpec;
import tools.jackson.databind.JsonNode;

/**
 * The result GeoJSON checked as GeoJSON (RFC 7946) and against closed forms of the sphere geometry:
 * geometry is read back from the written coordinates, not from the properties.
 */
class ResultGeoJsonTest {

    private static final GeometryFactory GEOMETRY = new GeometryFactory();

    /** A 20 m × 10 m flat-roofed block, 8 m high, and a 12 m mast 40 m east of it, in local metres. */
    private static final String LOCAL = """
            {"type": "FeatureCollection", "name": "Block", "coordinates": "local-metres", "features": [
              {"type": "Feature", "id": "block", "properties": {"kind": "structure", "name": "Block", "height": 8},
               "geometry": {"type": "Polygon", "coordinates": [[[0, 0], [20, 0], [20, 10], [0, 10], [0, 0]]]}},
              {"type": "Feature", "id": "mast", "properties": {"kind": "rod", "name": "Mast", "height": 12},
               "geometry": {"type": "Point", "coordinates": [60, 5]}}]}
            """;

    /** The same kind of block in lon/lat (about 21 m × 11 m at 51.2° N). */
    private static final String LON_LAT = """
            {"type": "FeatureCollection", "name": "Yard", "features": [
              {"type": "Feature", "id": "shed", "properties": {"kind": "structure", "name": "Shed", "height": 8},
               "geometry": {"type": "Polygon", "coordinates": [[[4.512, 51.201], [4.5123, 51.201], [4.5123, 51.2011],
                 [4.512, 51.2011], [4.512, 51.201]]]}}]}
            """;

    private static JsonNode published(String text, ProtectionLevel level) {
        SiteDocument document = SiteReader.readGeoJson(text, "site.geojson");
        AnalysisResult result = ExposureAnalysis.analyze(document.site(), AnalysisOptions.of(SphereSpec.of(level)));
        return ResultGeoJson.published(ResultGeoJson.write(document, result));
    }

    private static List<JsonNode> layer(JsonNode collection, String layer) {
        List<JsonNode> out = new ArrayList<>();
        collection.path("features").forEach(f -> {
            if (f.path("properties").path("layer").asString().equals(layer)) {
                out.add(f);
            }
        });
        return out;
    }

    /** A GeoJSON MultiPolygon as a JTS geometry, rings as written. */
    private static Geometry multiPolygon(JsonNode geometry) {
        assertThat(geometry.path("type").asString()).isEqualTo("MultiPolygon");
        List<Polygon> polygons = new ArrayList<>();
        for (JsonNode polygon : geometry.path("coordinates")) {
            List<LinearRing> rings = new ArrayList<>();
            for (JsonNode ring : polygon) {
                Coordinate[] cs = new Coordinate[ring.size()];
                for (int k = 0; k < ring.size(); k++) {
                    cs[k] = new Coordinate(ring.get(k).get(0).asDouble(), ring.get(k).get(1).asDouble());
                }
                rings.add(GEOMETRY.createLinearRing(cs)); // RFC 7946 3.1.6: closed, at least 4 positions
            }
            polygons.add(GEOMETRY.createPolygon(rings.get(0), rings.subList(1, rings.size()).toArray(LinearRing[]::new)));
        }
        return GEOMETRY.createMultiPolygon(polygons.toArray(Polygon[]::new));
    }

    /** Visits every position in nested GeoJSON coordinates. */
    private static void forEachPosition(JsonNode coordinates, Consumer<JsonNode> visit) {
        if (coordinates.size() > 0 && coordinates.get(0).isNumber()) {
            visit.accept(coordinates);
        } else {
            coordinates.forEach(c -> forEachPosition(c, visit));
        }
    }

    @Test
    void protectedGroundAroundALowBlockIsItsFootprintGrownByTheProtectedDistance() {
        JsonNode result = published(LOCAL, ProtectionLevel.II);
        assertThat(result.path("coordinates").asString()).isEqualTo("local-metres");
        assertThat(result.path("type").asString()).isEqualTo("FeatureCollection");

        // A sphere of R = 30 m resting on the ground at plan distance d from a block of height
        // H = 8 m touches its roof edge iff d^2 + (R - H)^2 < R^2, i.e. d < d_c = sqrt(H(2R - H))
        // = sqrt(416) (domain closed form 2/3). The ground it cannot reach around the block is the
        // footprint grown by d_c, less the footprint. The mast's own disc (radius
        // sqrt(h(2R - h)) = 24 m) reaches to 16 m east of the block, so within 10 m of the block
        // and west of it only the block decides.
        double dc = Math.sqrt(8 * (60 - 8));
        Geometry footprint = GEOMETRY.createPolygon(new Coordinate[] {new Coordinate(0, 0), new Coordinate(20, 0),
            new Coordinate(20, 10), new Coordinate(0, 10), new Coordinate(0, 0)});
        List<JsonNode> ground = layer(result, "protected-ground");
        assertThat(ground).hasSize(1);
        Geometry written = multiPolygon(ground.get(0).path("geometry"));
        assertThat(ground.get(0).path("properties").path("area").asDouble())
                .as("the area property is the written geometry's").isCloseTo(written.getArea(), within(1.0));
        assertThat(ground.get(0).path("properties").path("zone").asString()).isEqualTo("LPZ 0B");

        Geometry near = footprint.buffer(10, 32).difference(footprint);
        double exactNear = near.getArea(); // d_c > 10 m: the whole 10 m ring is protected
        assertThat(dc).isGreaterThan(10);
        double writtenNear = written.intersection(near).getArea();
        // conservative grid (0.5 m cells): never more than the exact area, short of it by at most a
        // cell along the ring's outer boundary (perimeter 2(L+W) + 2 pi 10 ~ 123 m)
        assertThat(writtenNear).isLessThanOrEqualTo(exactNear + 0.5);
        assertThat(writtenNear).isGreaterThan(exactNear - 0.5 * 123);

        // and nothing is protected beyond d_c from the block on its west side, away from the mast
        Geometry west = GEOMETRY.createPolygon(new Coordinate[] {new Coordinate(-dc - 5, -5),
            new Coordinate(-dc - 0.01, -5), new Coordinate(-dc - 0.01, 15), new Coordinate(-dc - 5, 15),
            new Coordinate(-dc - 5, -5)});
        assertThat(written.intersection(west).getArea()).isLessThan(0.01);
    }

    @Test
    void bareFlatRoofIsExposedAllOverWithEdgesAndCornersAtWallTopAndTheMastTipAtItsHeight() {
        JsonNode result = published(LOCAL, ProtectionLevel.II);
        // a flat roof lower than R with nothing above it: a sphere resting on it touches every
        // roof point (domain closed form 3), so the exposed part is the whole 20 m × 10 m roof
        List<JsonNode> roofs = layer(result, "exposed-roof");
        double exposed = roofs.stream().mapToDouble(f -> multiPolygon(f.path("geometry")).getArea()).sum();
        assertThat(exposed).isCloseTo(200, within(2.0));
        assertThat(roofs).allSatisfy(f -> {
            assertThat(f.path("properties").path("ownerId").asString()).isEqualTo("block");
            assertThat(f.path("properties").path("roofArea").asDouble()).isCloseTo(200, within(0.01));
            // RFC 7946 3.1.6: exterior rings counter-clockwise
            Polygon p = (Polygon) multiPolygon(f.path("geometry")).getGeometryN(0);
            assertThat(org.locationtech.jts.algorithm.Orientation.isCCW(p.getExteriorRing().getCoordinates())).isTrue();
        });
        // the roof's outline is its edges, at the wall top (8 m) all along
        assertThat(layer(result, "exposed-edge")).isNotEmpty().allSatisfy(f ->
                forEachPosition(f.path("geometry").path("coordinates"), p -> assertThat(p.get(2).asDouble()).isEqualTo(8.0)));
        assertThat(layer(result, "exposed-corner")).hasSize(4).allSatisfy(f ->
                assertThat(f.path("geometry").path("coordinates").get(2).asDouble()).isEqualTo(8.0));
        // a mast on open ground stands on z = 0: its tip is at its height
        JsonNode mast = layer(result, "rod").get(0);
        assertThat(mast.path("geometry").path("coordinates").get(0).asDouble()).isEqualTo(60.0);
        assertThat(mast.path("geometry").path("coordinates").get(2).asDouble()).isEqualTo(12.0);
        assertThat(mast.path("properties").path("intercepts").asBoolean()).isTrue();
        assertThat(result.path("analysis").path("elevations").asString()).isEqualTo("metres above ground");
        assertThat(result.path("analysis").path("cautions").size()).isPositive();
    }

    @Test
    void aLonLatSiteGivesLonLatResultsOnTheFilesOwnCoordinates() {
        JsonNode result = published(LON_LAT, ProtectionLevel.II);
        // RFC 7946 section 4: WGS84 lon/lat, no other coordinate reference member
        assertThat(result.has("coordinates")).isFalse();
        assertThat(result.path("localOrigin").path("latitude").asDouble()).isCloseTo(51.20105, within(1e-6));
        // the whole roof is exposed (closed form 3), so the exposed outline runs through the
        // footprint's corners as the file gives them, in degrees
        JsonNode structure = layer(result, "structure").get(0);
        Geometry footprint = multiPolygon(structure.path("geometry"));
        Geometry fromFile = GEOMETRY.createPolygon(new Coordinate[] {new Coordinate(4.512, 51.201),
            new Coordinate(4.5123, 51.201), new Coordinate(4.5123, 51.2011), new Coordinate(4.512, 51.2011),
            new Coordinate(4.512, 51.201)});
        // results keep centimetres in local metres: 5 mm is 4.5e-8 degree of latitude and, at
        // 51.2 degrees north, 7.2e-8 degree of longitude (1 degree = 111.32 km x cos(latitude))
        assertThat(footprint.getEnvelopeInternal().getMinX()).isCloseTo(4.512, within(1e-7));
        assertThat(footprint.getEnvelopeInternal().getMaxY()).isCloseTo(51.2011, within(1e-7));
        // 1e-10 square degree is about 0.8 m^2 here: a 5 mm band along the 64 m outline is 0.3 m^2
        assertThat(footprint.symDifference(fromFile).getArea()).isLessThan(1e-10);
        Geometry exposed = multiPolygon(layer(result, "exposed-roof").get(0).path("geometry"));
        // about 1e-9 square degrees is 7 m^2 here; the roof is ~231 m^2 and fully exposed
        assertThat(exposed.symDifference(fromFile).getArea()).isLessThan(0.02 * fromFile.getArea());
        int[] count = {0};
        result.path("features").forEach(f -> forEachPosition(f.path("geometry").path("coordinates"), p -> {
            count[0]++;
            assertThat(p.get(0).asDouble()).isBetween(4.5115, 4.5128);
            assertThat(p.get(1).asDouble()).isBetween(51.2007, 51.2014);
        }));
        assertThat(count[0]).isPositive();
        // elevations stay metres above ground
        assertThat(layer(result, "exposed-corner")).allSatisfy(f ->
                assertThat(f.path("geometry").path("coordinates").get(2).asDouble()).isEqualTo(8.0));
    }

    /**
     * A 10 m × 10 m hut, 5 m high, under a wire strung at 45 m between two 45 m masts 100 m apart.
     * At level I (R = 20 m, IEC 62305-3:2010 Table 2) the wire runs more than R above what lies
     * beneath it, where a sphere can pass under it (rolling sphere method, IEC 62305-3:2010 Annex A).
     */
    static final Path WIRE_ABOVE_HUT = Path.of("src/test/resources/sites/wire-above-hut.geojson");
    static final Path WIRE_ABOVE_HUT_LON_LAT = Path.of("src/test/resources/sites/wire-above-hut-lonlat.geojson");

    @Test
    void aWireMoreThanTheRadiusAboveWhatLiesBeneathIsAModelWarningFeatureNamingThePart() throws Exception {
        JsonNode result = published(Files.readString(WIRE_ABOVE_HUT), ProtectionLevel.I);

        List<JsonNode> warnings = layer(result, "model-warning");
        assertThat(warnings).hasSize(1);
        JsonNode p = warnings.get(0).path("properties");
        assertThat(p.path("part").asString()).isEqualTo("wire");
        assertThat(p.path("partName").asString()).isEqualTo("Span wire");
        assertThat(p.path("kind").asString()).isEqualTo("free-span");
        // IEC 62305-3:2010 Table 2: R = 20 m at level I; the wire is at 45 m above the ground,
        // the lowest surface beneath it, and 40 m above the hut's 5 m roof: more than R either way
        assertThat(p.path("radius").asDouble()).isEqualTo(20.0);
        assertThat(p.path("heightAboveSurface").asDouble()).isGreaterThan(20.0).isLessThanOrEqualTo(45.0);
        assertThat(p.path("text").asString()).contains("Span wire");
        // RFC 7946 3.1.5: a MultiLineString's members are arrays of two or more positions; here
        // plan positions along the wire (y = 0, x from 0 to 100), one of them above the hut
        JsonNode geometry = warnings.get(0).path("geometry");
        assertThat(geometry.path("type").asString()).isEqualTo("MultiLineString");
        assertThat(geometry.path("coordinates").size()).isPositive();
        geometry.path("coordinates").forEach(line -> assertThat(line.size()).isGreaterThanOrEqualTo(2));
        List<JsonNode> positions = new ArrayList<>();
        forEachPosition(geometry.path("coordinates"), positions::add);
        assertThat(positions).allSatisfy(q -> {
            assertThat(q.get(0).asDouble()).isBetween(0.0, 100.0);
            assertThat(q.get(1).asDouble()).isCloseTo(0.0, within(0.01));
        });
        boolean overHut = false;
        for (JsonNode line : geometry.path("coordinates")) {
            for (int k = 1; k < line.size(); k++) {
                double a = line.get(k - 1).get(0).asDouble(), b = line.get(k).get(0).asDouble();
                overHut |= Math.min(a, b) <= 50 && Math.max(a, b) >= 50;
            }
        }
        assertThat(overHut).as("a stretch passes over the hut's middle (x = 50)").isTrue();

        JsonNode summary = result.path("analysis").path("summary");
        assertThat(summary.path("fullyProtected").asBoolean()).isFalse();
        assertThat(summary.path("warnings").size()).isEqualTo(1);
        JsonNode listed = summary.path("warnings").get(0);
        assertThat(listed.path("part").asString()).isEqualTo("wire");
        assertThat(listed.path("partName").asString()).isEqualTo("Span wire");
        assertThat(listed.path("kind").asString()).isEqualTo("free-span");
        assertThat(listed.path("heightAboveSurface").asDouble()).isEqualTo(p.path("heightAboveSurface").asDouble());
        assertThat(listed.path("radius").asDouble()).isEqualTo(20.0);
        assertThat(listed.path("text").asString()).isEqualTo(p.path("text").asString());
    }

    @Test
    void aSiteWithoutWarningsHasAnEmptyWarningListAndNoWarningFeatures() {
        JsonNode result = published(LOCAL, ProtectionLevel.II);
        assertThat(layer(result, "model-warning")).isEmpty();
        assertThat(result.path("analysis").path("summary").path("warnings").isArray()).isTrue();
        assertThat(result.path("analysis").path("summary").path("warnings").size()).isZero();
    }

    @Test
    void aLonLatSitesModelWarningIsPublishedInLonLatLikeTheOtherLayers() throws Exception {
        JsonNode result = published(Files.readString(WIRE_ABOVE_HUT_LON_LAT), ProtectionLevel.I);
        List<JsonNode> warnings = layer(result, "model-warning");
        assertThat(warnings).hasSize(1);
        // RFC 7946 section 4: [longitude, latitude]; the wire runs along 51.2 N from 4.5 E to
        // 4.501434 E (100 m at 51.2 N: 1 degree of longitude = 111.32 km x cos(51.2 degrees));
        // 1e-6 degree is under 0.1 m
        List<JsonNode> positions = new ArrayList<>();
        forEachPosition(warnings.get(0).path("geometry").path("coordinates"), positions::add);
        assertThat(positions).isNotEmpty().allSatisfy(q -> {
            assertThat(q.get(0).asDouble()).isBetween(4.5 - 1e-6, 4.501434 + 1e-6);
            assertThat(q.get(1).asDouble()).isCloseTo(51.2, within(1e-6));
        });
    }

    @Test
    void theStoredFormStaysInLocalMetres() {
        SiteDocument document = SiteReader.readGeoJson(LON_LAT, "site.geojson");
        AnalysisResult result = ExposureAnalysis.analyze(document.site(), AnalysisOptions.of(SphereSpec.of(ProtectionLevel.IV)));
        JsonNode stored = tools.jackson.databind.json.JsonMapper.builder().build()
                .readTree(ResultGeoJson.write(document, result));
        assertThat(stored.path("coordinates").asString()).isEqualTo("local-metres");
        JsonNode corner = layer(stored, "exposed-corner").get(0).path("geometry").path("coordinates");
        // the shed is about 21 m × 11 m around the origin (centre of the file's bounding box)
        assertThat(Math.abs(corner.get(0).asDouble())).isCloseTo(10.5, within(0.3));
        assertThat(Math.abs(corner.get(1).asDouble())).isCloseTo(5.6, within(0.3));
    }
}
