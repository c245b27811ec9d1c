package org.lpzplanner.engine.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** Reading from a file: the format is chosen by extension, else by content. */
class SiteFileReadingTest {

    private static final String GEOJSON = SiteJson.local(SiteJson.building());
    private static final String WKT = "POLYGON ((0 0, 20 0, 20 10, 0 10, 0 0)) 10\n";

    @TempDir
    Path folder;

    private Path write(String name, String content) throws IOException {
        return Files.writeString(folder.resolve(name), content, StandardCharsets.UTF_8);
    }

    @ParameterizedTest
    @ValueSource(strings = {"yard.json", "yard.geojson", "YARD.GEOJSON"})
    void jsonExtensionsAreReadAsGeoJson(String name) throws IOException {
        SiteDocument document = SiteReader.read(write(name, GEOJSON));

        assertThat(document.sourceName()).isEqualTo(name);
        assertThat(document.site().structures()).hasSize(1);
    }

    @ParameterizedTest
    @ValueSource(strings = {"yard.wkt", "yard.txt"})
    void textExtensionsAreReadAsWkt(String name) throws IOException {
        SiteDocument document = SiteReader.read(write(name, WKT));

        assertThat(document.site().structures().get(0).name()).isEqualTo("Structure 1");
        assertThat(document.site().name()).isEqualTo("yard");
    }

    @Test
    void wktInAFileNamedJsonIsReportedAsInvalidJson() throws IOException {
        SiteFormatException e = assertThrows(SiteFormatException.class, () -> SiteReader.read(write("yard.json", WKT)));

        assertThat(e.getMessage()).startsWith("yard.json: line 1").contains("not valid JSON");
    }

    @Test
    void unknownExtensionIsSniffedByContent() throws IOException {
        assertThat(SiteReader.read(write("yard.site", "  \n" + GEOJSON)).site().structures().get(0).id()).isEqualTo("S1");
        assertThat(SiteReader.read(write("blocks", WKT)).site().structures().get(0).name()).isEqualTo("Structure 1");
    }

    @Test
    void byteOrderMarkIsSkipped() throws IOException {
        SiteDocument document = SiteReader.read(write("bom.geojson", "\uFEFF" + GEOJSON));

        assertThat(document.site().structures()).hasSize(1);
    }

    @Test
    void missingFileIsReportedByName() {
        SiteFormatException e = assertThrows(SiteFormatException.class,
                () -> SiteReader.read(folder.resolve("absent.geojson")));

        assertThat(e.source()).isEqualTo("absent.geojson");
        assertThat(e.getMessage()).startsWith("absent.geojson: the file does not exist");
    }

    @Test
    void folderIsNotASiteFile() throws IOException {
        Path sub = Files.createDirectory(folder.resolve("sites.geojson"));

        SiteFormatException e = assertThrows(SiteFormatException.class, () -> SiteReader.read(sub));

        assertThat(e.getMessage()).isEqualTo("sites.geojson: is a folder, not a site file");
    }

    @Test
    void nonUtf8FileIsRejected() throws IOException {
        Path file = Files.write(folder.resolve("latin.geojson"), new byte[] {'{', (byte) 0xE9, (byte) 0xFF, '}'});

        SiteFormatException e = assertThrows(SiteFormatException.class, () -> SiteReader.read(file));

        assertThat(e.getMessage()).contains("latin.geojson: the file is not UTF-8 text");
    }

    @Test
    void emptyGeoJsonFileIsRejected() throws IOException {
        SiteFormatException e = assertThrows(SiteFormatException.class, () -> SiteReader.read(write("e.geojson", "")));

        assertThat(e.getMessage()).isEqualTo("e.geojson: the file is empty; expected a GeoJSON FeatureCollection");
    }
}
