package org.lpzplanner.engine.io;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

/** The message form users see: file, then place, then field, then the problem. */
class SiteFormatExceptionTest {

    @Test
    void featureProblemNamesIndexNameAndField() {
        SiteFormatException e = SiteFormatException.atFeature("site.geojson", 3, "North hall", "height",
                "must be a number ≥ 0, got \"abc\"");

        assertThat(e.getMessage())
                .isEqualTo("site.geojson: feature 3 (\"North hall\"), field \"height\": must be a number ≥ 0, got \"abc\"");
        assertThat(e.problem()).isEqualTo("must be a number ≥ 0, got \"abc\"");
        assertThat(e.line()).isNull();
    }

    @Test
    void lineProblemNamesLineAndColumn() {
        SiteFormatException e = SiteFormatException.atLine("blocks.wkt", 4, 17, null, "unexpected end", null);

        assertThat(e.getMessage()).isEqualTo("blocks.wkt: line 4, column 17: unexpected end");
        assertThat(e.featureIndex()).isNull();
    }

    @Test
    void fileProblemHasOnlyTheSource() {
        SiteFormatException e = new SiteFormatException("site.geojson", "the site has no structure");

        assertThat(e.getMessage()).isEqualTo("site.geojson: the site has no structure");
        assertThat(e.field()).isNull();
    }

    @Test
    void memberProblemNamesTheMember() {
        SiteFormatException e = SiteFormatException.atMember("site.geojson", "type", "must be \"FeatureCollection\"");

        assertThat(e.getMessage()).isEqualTo("site.geojson: field \"type\": must be \"FeatureCollection\"");
    }
}
