package org.lpzplanner.cli;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

/** Small site and points files written into a test's temporary folder. */
final class TestFiles {

    /** The sample sites shipped with the product, relative to the project folder tests run in. */
    static final Path SAMPLES = Path.of("sample-sites");

    private TestFiles() {
    }

    static Path write(Path folder, String name, String text) {
        try {
            return Files.writeString(folder.resolve(name), text, StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /**
     * A local-metres site: one free-standing rod of the given height at (0, 0) on open ground, and
     * a small 3 m shed 150 m away (a site needs a structure; at that distance a 3 m shed cannot
     * reach the envelope near the rod, whose protected radius is at most R).
     */
    static Path rodSite(Path folder, double rodHeight) {
        return write(folder, "rod-field.geojson", """
                {"type": "FeatureCollection", "name": "Rod field", "coordinates": "local-metres", "features": [
                  {"type": "Feature", "properties": {"kind": "rod", "name": "Mast", "height": %s},
                   "geometry": {"type": "Point", "coordinates": [0, 0]}},
                  {"type": "Feature", "properties": {"kind": "structure", "name": "Shed", "height": 3},
                   "geometry": {"type": "Polygon", "coordinates": [[[150, 150], [154, 150], [154, 154], [150, 154], [150, 150]]]}}
                ]}
                """.formatted(rodHeight));
    }

    /** A local-metres site with one bare flat-roofed block, 20 × 10 m and 6 m high, no parapet. */
    static Path bareBlock(Path folder) {
        return write(folder, "bare-block.geojson", """
                {"type": "FeatureCollection", "name": "Bare block", "coordinates": "local-metres", "features": [
                  {"type": "Feature", "properties": {"kind": "structure", "name": "Block", "height": 6},
                   "geometry": {"type": "Polygon", "coordinates": [[[0, 0], [20, 0], [20, 10], [0, 10], [0, 0]]]}}
                ]}
                """);
    }
}
