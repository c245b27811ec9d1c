package org.lpzplanner.drawing;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.Arrays;
import java.util.Properties;
import org.junit.jupiter.api.Test;

/** The one style table: every layer once, with words for the pages and for the report. */
class PlanStyleTest {

    @Test
    void everyLayerHasExactlyOneStyleAndOneLegendPlace() {
        assertThat(PlanStyle.all().keySet()).containsExactly(Layer.values());
        assertThat(PlanStyle.legendOrder()).containsExactlyInAnyOrder(Layer.values());
    }

    @Test
    void everyLegendKeyIsInTheMessagesAndEveryLayerHasTheReportsWords() throws Exception {
        Properties messages = new Properties();
        try (InputStream in = PlanStyleTest.class.getResourceAsStream("/messages.properties")) {
            messages.load(new InputStreamReader(in, StandardCharsets.UTF_8));
        }
        for (Layer layer : Layer.values()) {
            LayerStyle style = PlanStyle.of(layer);
            assertThat(messages.getProperty(style.legendKey())).as(layer.name()).isNotBlank();
            assertThat(style.reportLegend()).as(layer.name()).isNotBlank();
        }
    }

    @Test
    void layersSharingALegendRowShareItsColourAndWords() {
        for (Layer a : Layer.values()) {
            for (Layer b : Layer.values()) {
                LayerStyle sa = PlanStyle.of(a), sb = PlanStyle.of(b);
                if (sa.legendKey().equals(sb.legendKey())) {
                    assertThat(sa.colour()).as(a + " and " + b).isEqualTo(sb.colour());
                    assertThat(sa.reportLegend()).as(a + " and " + b).isEqualTo(sb.reportLegend());
                }
            }
        }
    }

    @Test
    void aModelWarningsColourIsItsOwn() {
        Colour warning = PlanStyle.of(Layer.MODEL_WARNING).colour();
        assertThat(Arrays.stream(Layer.values()).filter(l -> l != Layer.MODEL_WARNING).map(l -> PlanStyle.of(l).colour()))
                .doesNotContain(warning);
    }

    @Test
    void whatTheSphereReachesHasOneColourOnPlanAndSection() {
        assertThat(PlanStyle.of(Layer.SECTION_EXPOSED).colour()).isEqualTo(PlanStyle.of(Layer.EXPOSED_ROOF).colour());
        assertThat(PlanStyle.of(Layer.SECTION_ROD).colour()).isEqualTo(PlanStyle.of(Layer.ROD).colour());
    }

    @Test
    void higherStructuresAreDarker() {
        assertThat(PlanStyle.structureFill(0).red()).isGreaterThan(PlanStyle.structureFill(0.5).red());
        assertThat(PlanStyle.structureFill(0.5).red()).isGreaterThan(PlanStyle.structureFill(1).red());
    }
}
