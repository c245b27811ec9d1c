package org.lpzplanner.engine.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.lpzplanner.engine.model.RoofShape;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.Structure;

/** The one-structure-per-line WKT format. */
class WktSiteReadingTest {

    private static final String SOURCE = "blocks.wkt";

    private static SiteFormatException rejected(String text) {
        return assertThrows(SiteFormatException.class, () -> SiteReader.readWkt(text, SOURCE));
    }

    @Test
    void eachLineIsAFlatRoofedStructure() {
        String text = """
                # two blocks, local metres
                POLYGON ((0 0, 40 0, 40 30, 0 30, 0 0), (10 8, 10 22, 30 22, 30 8, 10 8)) 14

                MULTIPOLYGON (((50 0, 60 0, 60 10, 50 10, 50 0)), ((70 0, 80 0, 80 10, 70 10, 70 0)));9.5
                """;

        SiteDocument document = SiteReader.readWkt(text, SOURCE);

        Site site = document.site();
        assertThat(document.projection()).isNull();
        assertThat(site.name()).isEqualTo("blocks");
        assertThat(site.structures()).extracting(Structure::name).containsExactly("Structure 1", "Structure 2");
        assertThat(site.structures()).extracting(Structure::id).containsExactly("S1", "S2");
        assertThat(site.structures()).extracting(Structure::height).containsExactly(14.0, 9.5);
        assertThat(site.structures()).extracting(Structure::roof).containsOnly(new RoofShape.Flat(0));
        // 40 x 30 minus a 20 x 14 courtyard.
        assertThat(site.structures().get(0).footprint().getArea()).isCloseTo(920.0, within(1e-9));
    }

    @Test
    void textWithoutStructuresIsRejected() {
        SiteFormatException e = rejected("# nothing here\n\n");

        assertThat(e.line()).isNull();
        assertThat(e.getMessage()).contains("blocks.wkt: the site has no structure", "POLYGON ((");
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
        "POLYGON ((0 0, 10 0, 10 10, 0 10, 0 0))       | height   | is missing",
        "POLYGON ((0 0, 10 0, 10 10, 0 10, 0 0)) tall  | height   | must be a number > 0, got \"tall\"",
        "POLYGON ((0 0, 10 0, 10 10, 0 10, 0 0)) 0     | height   | must be a number > 0, got \"0\"",
        "POLYGON ((0 0, 10 0, 10 10, 0 10, 0 0)) NaN   | height   | must be a number > 0, got \"NaN\"",
        "POLYGON ((0 0, 10 0, 10 10, 0 10, 0 0)) 4000  | height   | must be at most 1000 m, got 4000",
        "POLYGON ((0 0, 10 0, 10 10, 0 10)) 5          | geometry | is not readable WKT",
        "POLYGIN ((0 0, 10 0, 10 10, 0 10, 0 0)) 5     | geometry | is not readable WKT",
        "LINESTRING (0 0, 10 0) 5                      | geometry | must be a POLYGON or MULTIPOLYGON, got LINESTRING",
        "POLYGON ((0 0, 10 10, 10 0, 0 10, 0 0)) 5     | geometry | self-intersection",
        "12                                            | geometry | expected a WKT POLYGON or MULTIPOLYGON",
    })
    void badLineIsReportedByItsNumber(String badLine, String field, String problem) {
        SiteFormatException e = rejected("# header\nPOLYGON ((0 0, 5 0, 5 5, 0 5, 0 0)) 3\n" + badLine + "\n");

        assertThat(e.line()).isEqualTo(3);
        assertThat(e.field()).isEqualTo(field);
        assertThat(e.getMessage()).startsWith("blocks.wkt: line 3, field \"" + field + "\": ").contains(problem);
    }

    @Test
    void structuresFarApartAreRejectedByLine() {
        SiteFormatException e = rejected("POLYGON ((0 0, 5 0, 5 5, 0 5, 0 0)) 3\n\n"
                + "POLYGON ((0 30000, 5 30000, 5 30005, 0 30005, 0 30000)) 3\n");

        assertThat(e.getMessage()).contains("north-south", "southmost point belongs to line 1",
                "northmost to line 3");
    }

    @Test
    void repeatedOutlineIsRejectedNamingBothLines() {
        // the same square written from another corner is the same outline
        SiteFormatException e = rejected("POLYGON ((0 0, 5 0, 5 5, 0 5, 0 0)) 3\n"
                + "POLYGON ((20 0, 25 0, 25 5, 20 5, 20 0)) 3\n"
                + "POLYGON ((5 5, 0 5, 0 0, 5 0, 5 5)) 4\n");

        assertThat(e.line()).isEqualTo(3);
        assertThat(e.field()).isEqualTo("geometry");
        assertThat(e.getMessage()).contains("repeats the outline of line 1");
    }

    @Test
    void footprintUnderOneSquareMetreIsRejected() {
        SiteFormatException e = rejected("POLYGON ((0 0, 0.5 0, 0.5 0.5, 0 0.5, 0 0)) 3\n");

        assertThat(e.field()).isEqualTo("geometry");
        assertThat(e.getMessage()).contains("encloses only 0.25 m²", "at least 1 m²");
    }

    @Test
    void heightUnderOneCentimetreIsRejected() {
        SiteFormatException e = rejected("POLYGON ((0 0, 10 0, 10 10, 0 10, 0 0)) 1e-320\n");

        assertThat(e.field()).isEqualTo("height");
        assertThat(e.getMessage()).contains("line 1", "at least 0.01 m", "1e-320");
    }
}
