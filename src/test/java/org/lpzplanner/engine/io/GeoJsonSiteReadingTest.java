package org.lpzplanner.engine.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.lpzplanner.engine.io.SiteJson.SOURCE;
import static org.lpzplanner.engine.io.SiteJson.building;
import static org.lpzplanner.engine.io.SiteJson.feature;
import static org.lpzplanner.engine.io.SiteJson.lineString;
import static org.lpzplanner.engine.io.SiteJson.local;
import static org.lpzplanner.engine.io.SiteJson.point;
import static org.lpzplanner.engine.io.SiteJson.q;
import static org.lpzplanner.engine.io.SiteJson.rectangle;

import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.lpzplanner.engine.model.Conductor;
import org.lpzplanner.engine.model.Rod;
import org.lpzplanner.engine.model.RoofShape;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.Structure;

/** What a valid GeoJSON site file turns into. */
class GeoJsonSiteReadingTest {

    private static SiteDocument read(String json) {
        return SiteReader.readGeoJson(json, SOURCE);
    }

    @Test
    void localRectangleKeepsItsAreaAndHeights() {
        Site site = read(local(feature("'kind':'structure','name':'Store','height':10,'parapet':1",
                rectangle(0, 0, 20, 10)))).site();

        Structure store = site.structures().get(0);
        assertThat(store.footprint().getArea()).isCloseTo(200.0, within(1e-9)); // 20 m x 10 m
        assertThat(store.height()).isEqualTo(10.0);
        assertThat(store.roof()).isEqualTo(new RoofShape.Flat(1.0));
        assertThat(store.topHeight()).isEqualTo(11.0);
        assertThat(store.name()).isEqualTo("Store");
    }

    @Test
    void localMetreFileHasNoProjection() {
        SiteDocument document = read(local(building()));

        assertThat(document.projection()).isNull();
        assertThat(document.georeferenced()).isFalse();
        assertThat(document.sourceName()).isEqualTo(SOURCE);
    }

    @Test
    void defaultsAreFlatRoofGeneratedIdAndFileNameAsSiteName() {
        Site site = read(local(building())).site();

        Structure structure = site.structures().get(0);
        assertThat(site.name()).isEqualTo("site");
        assertThat(structure.id()).isEqualTo("S1");
        assertThat(structure.name()).isEqualTo("S1");
        assertThat(structure.roof()).isEqualTo(new RoofShape.Flat(0.0));
    }

    @Test
    void siteNameComesFromTheFileWhenGiven() {
        String json = q("{'type':'FeatureCollection','name':'Quayside','coordinates':'local-metres','features':["
                + building() + "]}");

        assertThat(read(json).site().name()).isEqualTo("Quayside");
    }

    @Test
    void idsComeFromTheFeatureOrItsPropertiesAndGeneratedOnesSkipThem() {
        String withMemberId = q("{'type':'Feature','id':7,'properties':{'kind':'structure','height':5},'geometry':"
                + rectangle(0, 0, 5, 5) + "}");
        String withPropertyId = feature("'kind':'structure','id':'S1','height':5", rectangle(10, 0, 15, 5));

        Site site = read(local(withMemberId, withPropertyId, building(),
                feature("'kind':'structure','height':10", rectangle(30, 0, 50, 10)))).site();

        assertThat(site.structures()).extracting(Structure::id).containsExactly("7", "S1", "S2", "S3");
    }

    @Test
    void generatedIdsArePrefixedByKind() {
        Site site = read(local(building(),
                feature("'kind':'rooftop-object','top':12", rectangle(2, 2, 3, 3)),
                feature("'kind':'rod','height':2", point(1, 1)),
                feature("'kind':'conductor','heightAboveRoof':0.1", lineString(new double[] {0, 0}, new double[] {5, 0})),
                feature("'kind':'rod','height':2", point(4, 4)))).site();

        assertThat(site.rooftopObjects().get(0).id()).isEqualTo("O1");
        assertThat(site.rods()).extracting(Rod::id).containsExactly("R1", "R2");
        assertThat(site.conductors().get(0).id()).isEqualTo("C1");
    }

    @Test
    void roofFormsCarryTheirParameters() {
        Site site = read(local(
                feature("'kind':'structure','height':6,'roof':'gable','ridgeHeight':9,'ridgeBearing':45",
                        rectangle(0, 0, 10, 20)),
                feature("'kind':'structure','height':6,'roof':'hip','ridgeHeight':10", rectangle(20, 0, 30, 20)),
                feature("'kind':'structure','height':4,'roof':'shed','ridgeHeight':6,'highSideBearing':-90",
                        rectangle(40, 0, 50, 20)))).site();

        assertThat(site.structures()).extracting(Structure::roof).containsExactly(
                new RoofShape.Gable(9, 45), new RoofShape.Hip(10), new RoofShape.Shed(6, 270));
    }

    @Test
    void multiPolygonWithCourtyardKeepsTheHole() {
        String geometry = q("{'type':'MultiPolygon','coordinates':["
                + "[[[0,0],[40,0],[40,30],[0,30],[0,0]],[[10,8],[10,22],[30,22],[30,8],[10,8]]],"
                + "[[[50,0],[60,0],[60,10],[50,10],[50,0]]]]}");

        Structure block = read(local(feature("'kind':'structure','height':12", geometry))).site().structures().get(0);

        // 40 x 30 outer minus a 20 x 14 courtyard, plus a 10 x 10 part.
        assertThat(block.footprint().getArea()).isCloseTo(1200 - 280 + 100, within(1e-9));
        assertThat(block.footprint().getNumGeometries()).isEqualTo(2);
    }

    @Test
    void overlappingAndTouchingStructuresAreAccepted() {
        Site site = read(local(
                feature("'kind':'structure','height':10", rectangle(0, 0, 20, 10)),
                feature("'kind':'structure','height':14", rectangle(15, 5, 25, 30)),
                feature("'kind':'structure','height':8", rectangle(25, 0, 35, 10)))).site();

        assertThat(site.structures()).hasSize(3);
    }

    @Test
    void footprintElevationsAreIgnored() {
        String geometry = q("{'type':'Polygon','coordinates':[[[0,0,3],[10,0,3],[10,10,3],[0,10,3],[0,0,3]]]}");

        Structure s = read(local(feature("'kind':'structure','height':12", geometry))).site().structures().get(0);

        assertThat(s.footprint().getCoordinates()).allSatisfy(c -> assertThat(c.getZ()).isNaN());
    }

    @Test
    void rodKeepsPositionAndHeight() {
        Rod rod = read(local(building(), feature("'kind':'rod','name':'Mast','height':25", point(30, -4))))
                .site().rods().get(0);

        assertThat(rod).isEqualTo(new Rod("R1", "Mast", 30, -4, 25));
    }

    @Test
    void conductorWithElevationsKeepsThem() {
        Conductor wire = read(local(building(), feature("'kind':'conductor'",
                lineString(new double[] {0, 0, 18}, new double[] {15, 0, 16.5}, new double[] {30, 0, 18}))))
                .site().conductors().get(0);

        assertThat(wire.followsSurface()).isFalse();
        assertThat(wire.path()).extracting(Coordinate::getZ).containsExactly(18.0, 16.5, 18.0);
    }

    @Test
    void conductorWithHeightAboveRoofFollowsTheSurfaceAndDropsElevations() {
        Conductor edge = read(local(building(), feature("'kind':'conductor','heightAboveRoof':0.1",
                lineString(new double[] {0, 0, 99}, new double[] {20, 0}))))
                .site().conductors().get(0);

        assertThat(edge.followsSurface()).isTrue();
        assertThat(edge.heightAboveRoof()).isEqualTo(0.1);
        assertThat(edge.path()).extracting(Coordinate::getZ).allSatisfy(z -> assertThat(z).isNaN());
    }

    @Test
    void localMetreFileIsTakenAtItsWordEvenIfItLooksLikeLonLat() {
        // Declared local metres: the reader does not guess, so a 2 m x 1.5 m shed near (8, 50) is fine.
        SiteDocument document = read(local(feature("'kind':'structure','height':3", rectangle(8, 50, 10, 51.5))));

        assertThat(document.projection()).isNull();
        assertThat(document.site().structures().get(0).footprint().getArea()).isCloseTo(3.0, within(1e-9));
    }
}
