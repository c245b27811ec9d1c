package org.lpzplanner.engine.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Polygon;
import org.lpzplanner.engine.model.Conductor;
import org.lpzplanner.engine.model.RoofShape;
import org.lpzplanner.engine.model.RooftopObject;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.Structure;

/** The sample sites shipped with the product read cleanly and hold what their descriptions say. */
class SampleSitesTest {

    private static final Path SAMPLES = Path.of("sample-sites");

    static Stream<Path> sampleFiles() throws IOException {
        try (Stream<Path> files = Files.list(SAMPLES)) {
            return files.filter(f -> !f.getFileName().toString().endsWith(".md")).sorted().toList().stream();
        }
    }

    private static Site site(String name) {
        return SiteReader.read(SAMPLES.resolve(name)).site();
    }

    @Test
    void everyDescribedSampleIsPresent() throws IOException {
        assertThat(sampleFiles().map(f -> f.getFileName().toString())).containsExactlyInAnyOrder(
                "brookfield-campus.geojson", "courtyard-block.wkt", "harbour-warehouse.geojson",
                "meridian-tower.geojson", "millbrook-hall.geojson");
    }

    @ParameterizedTest
    @MethodSource("sampleFiles")
    void everySampleReads(Path file) {
        SiteDocument document = SiteReader.read(file);

        assertThat(document.site().structures()).isNotEmpty();
        assertThat(document.sourceName()).isEqualTo(file.getFileName().toString());
    }

    @Test
    void campusHasTwelveStructuresOfEveryRoofFormOverAbout250By200Metres() {
        SiteDocument document = SiteReader.read(SAMPLES.resolve("brookfield-campus.geojson"));
        Site campus = document.site();

        assertThat(document.georeferenced()).isTrue();
        assertThat(campus.structures()).hasSize(12);
        assertThat(campus.structures()).extracting(s -> s.roof().getClass().getSimpleName())
                .contains("Flat", "Gable", "Hip", "Shed");
        assertThat(campus.structures()).extracting(Structure::topHeight)
                .allSatisfy(h -> assertThat(h).isBetween(6.0, 36.5));
        assertThat(campus.structures()).anySatisfy(s -> assertThat(((Polygon) s.footprint()).getNumInteriorRing()).isOne());
        assertThat(campus.rods()).hasSize(2);
        assertThat(campus.conductors()).singleElement().satisfies(c -> assertThat(c.followsSurface()).isTrue());
        Envelope extent = new Envelope();
        campus.structures().forEach(s -> extent.expandToInclude(s.footprint().getEnvelopeInternal()));
        // Laid out as 245 m x 198 m; the projection keeps lengths to well under 0.1 %.
        assertThat(extent.getWidth()).isCloseTo(245, within(0.5));
        assertThat(extent.getHeight()).isCloseTo(198, within(0.5));
    }

    @Test
    void campusLShapedWingIsTwoOverlappingStructures() {
        List<Structure> wing = site("brookfield-campus.geojson").structures().stream()
                .filter(s -> s.name().startsWith("Rowan Wing")).toList();

        assertThat(wing).hasSize(2);
        assertThat(wing.get(0).footprint().intersection(wing.get(1).footprint()).getArea())
                .isCloseTo(15 * 15, within(1.0)); // the 15 m x 15 m corner they share
    }

    @Test
    void warehouseIsEightyByFortyWithFourRooftopObjectsAndNoAirTermination() {
        Site warehouse = site("harbour-warehouse.geojson");

        Structure hall = warehouse.structures().get(0);
        assertThat(hall.footprint().getArea()).isCloseTo(80 * 40, within(1e-9)); // 80 m x 40 m as drawn
        assertThat(hall.roof()).isEqualTo(new RoofShape.Flat(1));
        assertThat(hall.height()).isEqualTo(10);
        assertThat(warehouse.rooftopObjects()).hasSize(4);
        assertThat(warehouse.rooftopObjects()).extracting(o -> o.footprint().getNumPoints()).contains(33);
        assertThat(warehouse.rods()).isEmpty();
        assertThat(warehouse.conductors()).isEmpty();
    }

    @Test
    void towerRisesFromAnOverlappingPodium() {
        Site tower = site("meridian-tower.geojson");

        Structure podium = tower.structures().get(0);
        Structure shaft = tower.structures().get(1);
        assertThat(podium.height()).isEqualTo(12);
        assertThat(shaft.height()).isEqualTo(95);
        assertThat(shaft.footprint().intersects(podium.footprint())).isTrue();
        assertThat(podium.footprint().contains(shaft.footprint())).isFalse();
        assertThat(tower.rooftopObjects()).extracting(RooftopObject::top).containsExactly(101.0);
    }

    @Test
    void hallHasChimneyMastAndCatenaryWithElevations() {
        Site hall = site("millbrook-hall.geojson");

        Structure building = hall.structures().get(0);
        assertThat(building.roof()).isEqualTo(new RoofShape.Gable(13, 90));
        assertThat(building.footprint().getArea()).isCloseTo(40 * 18, within(40 * 18 * 0.001)); // 0.1 %
        assertThat(hall.rooftopObjects()).singleElement().satisfies(c -> assertThat(c.top()).isEqualTo(22));
        assertThat(hall.rods()).extracting(r -> r.height()).containsExactly(25.0, 18.0, 18.0);
        Conductor wire = hall.conductors().get(0);
        assertThat(wire.followsSurface()).isFalse();
        // As written in the sample: 18 m at the mast tips, a parabolic sag of 1.5 m at mid-span.
        assertThat(wire.path()).extracting(Coordinate::getZ).containsExactly(18.0, 16.875, 16.5, 16.875, 18.0);
    }

    @Test
    void courtyardBlockHasThreeStructuresOneAroundACourtyard() {
        Site block = site("courtyard-block.wkt");

        assertThat(block.structures()).hasSize(3);
        // 40 m x 30 m outline minus the 20 m x 14 m courtyard, as written on line 3 of the file.
        assertThat(block.structures().get(0).footprint().getArea()).isCloseTo(40 * 30 - 20 * 14, within(1e-9));
        assertThat(block.structures().get(2).footprint().getNumGeometries()).isEqualTo(2);
    }
}
