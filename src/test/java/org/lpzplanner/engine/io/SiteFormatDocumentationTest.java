package org.lpzplanner.engine.io;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.lpzplanner.engine.model.Conductor;
import org.lpzplanner.engine.model.Rod;
import org.lpzplanner.engine.model.RooftopObject;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.Structure;

/** The examples in docs/site-format.md read as the text says they do. */
class SiteFormatDocumentationTest {

    private static final Path DOC = Path.of("docs", "site-format.md");

    /** Contents of the fenced code blocks whose opening fence names the language ("" for none). */
    private static List<String> blocks(String language) throws IOException {
        List<String> blocks = new ArrayList<>();
        StringBuilder current = null;
        boolean wanted = false;
        for (String line : Files.readAllLines(DOC)) {
            if (line.startsWith("```")) {
                if (current == null) {
                    current = new StringBuilder();
                    wanted = line.substring(3).strip().equals(language);
                } else {
                    if (wanted) {
                        blocks.add(current.toString());
                    }
                    current = null;
                }
            } else if (current != null) {
                current.append(line).append('\n');
            }
        }
        return blocks;
    }

    @Test
    void workedExampleGivesTheDescribedFeatures() throws IOException {
        Site depot = SiteReader.readGeoJson(blocks("json").get(0), "depot.geojson").site();

        assertThat(depot.name()).isEqualTo("Tarnside Depot");
        assertThat(depot.structures()).extracting(Structure::id).containsExactly("hall", "S1", "S2", "S3");
        assertThat(depot.rooftopObjects()).extracting(RooftopObject::id).containsExactly("O1", "O2");
        assertThat(depot.rooftopObjects().get(1).footprint().getNumPoints()).isEqualTo(33);
        assertThat(depot.rods()).extracting(Rod::id).containsExactly("R1", "R2", "R3");
        assertThat(depot.conductors()).extracting(Conductor::followsSurface).containsExactly(true, false);
    }

    @Test
    void lonLatExampleIsABarnOfAboutTwentyOneByFiftyMetres() throws IOException {
        SiteDocument farm = SiteReader.readGeoJson(blocks("json").get(1), "farm.geojson");

        Structure barn = farm.site().structures().get(0);
        assertThat(farm.georeferenced()).isTrue();
        assertThat(barn.footprint().getEnvelopeInternal().getWidth()).isBetween(20.5, 21.5);
        assertThat(barn.footprint().getEnvelopeInternal().getHeight()).isBetween(49.5, 50.5);
    }

    @Test
    void wktExampleGivesTwoStructures() throws IOException {
        String wkt = blocks("").stream().filter(b -> b.contains("POLYGON")).findFirst().orElseThrow();

        assertThat(SiteReader.readWkt(wkt, "blocks.wkt").site().structures()).hasSize(2);
    }
}
