package org.lpzplanner.sections;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.nio.charset.StandardCharsets;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.lpzplanner.sites.Uploads;
import org.lpzplanner.accounts.SignedIn;
import org.lpzplanner.common.Cautions;
import org.lpzplanner.sites.SampleFiles;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.mock.web.MockMultipartFile;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.web.util.HtmlUtils;

@SpringBootTest
@AutoConfigureMockMvc
@SignedIn
class SectionPagesTest {

    /**
     * One free-standing 10 m rod at the origin on open ground, local metres; a site needs a
     * structure, so a low shed stands far away (over 200 m from the cut, beyond any sphere's reach).
     */
    private static final String LONE_ROD = """
            {"type": "FeatureCollection", "name": "Lone mast", "coordinates": "local-metres", "features": [
              {"type": "Feature", "properties": {"kind": "rod", "name": "Mast", "height": 10},
               "geometry": {"type": "Point", "coordinates": [0, 0]}},
              {"type": "Feature", "properties": {"kind": "structure", "name": "Shed", "height": 3},
               "geometry": {"type": "Polygon", "coordinates": [[[200, 200], [204, 200], [204, 204], [200, 204], [200, 200]]]}}
            ]}
            """;

    @Autowired
    MockMvc mvc;

    private long upload(MockMultipartFile file, String name) throws Exception {
        return Uploads.throughPage(mvc, file, name, "II");
    }

    private String page(String url, int status) throws Exception {
        var response = mvc.perform(get(url)).andExpect(status().is(status)).andReturn().getResponse();
        return response.getContentAsString(StandardCharsets.UTF_8);
    }

    private static double attribute(String html, String name) {
        Matcher m = Pattern.compile(" " + name + "=\"([^\"]*)\"").matcher(html);
        assertThat(m.find()).as(name).isTrue();
        return Double.parseDouble(m.group(1));
    }

    /** The envelope samples of the drawing, E by distance along the cut. */
    private static Map<Double, Double> envelopeSamples(String html) {
        Matcher m = Pattern.compile("class=\"envelope\"[^>]* data-samples=\"([^\"]*)\"").matcher(html);
        assertThat(m.find()).isTrue();
        Map<Double, Double> samples = new LinkedHashMap<>();
        for (String pair : m.group(1).split(" ")) {
            String[] parts = pair.split(",");
            samples.put(Double.parseDouble(parts[0]), Double.parseDouble(parts[1]));
        }
        return samples;
    }

    @Test
    void sectionOfTheWarehouseDrawsProfileEnvelopeSphereAndCautions() throws Exception {
        long id = upload(SampleFiles.sample("harbour-warehouse.geojson"), "Quay <shed> & co");

        String html = page("/sites/" + id + "/section?x1=-30&y1=20&x2=110&y2=20", 200);
        assertThat(html).contains("<svg xmlns=\"http://www.w3.org/2000/svg\" class=\"section\"",
                "class=\"profile\"", "class=\"envelope\"", "class=\"exposed-profile\"", "class=\"sphere\"",
                "class=\"axes\"", "class=\"legend\"", "Distance along the cut (m)", "Height (m)",
                "rolling sphere method", "Protection level II", "sphere radius 30 m");
        assertThat(html).contains("Quay &lt;shed&gt; &amp; co").doesNotContain("<shed>");
        for (String caution : Cautions.lines()) {
            assertThat(html).contains(HtmlUtils.htmlEscape(caution));
        }
        // the flat roof (10 m) with its 1 m parapet: nothing on the cut stands above the chiller bay
        // and flue, so the highest envelope point lies on the roof, between 10 and 12.8 m
        assertThat(attribute(html, "data-envelope-max")).isBetween(10.0, 12.8);
        assertThat(attribute(html, "data-length")).isCloseTo(140, within(1e-9));
    }

    @Test
    void planPageOffersACutThroughTheMiddleOfTheSiteAlongX() throws Exception {
        long id = upload(SampleFiles.sample("harbour-warehouse.geojson"), "Quay");

        String html = page("/sites/" + id, 200);
        // footprint x 0..80, y 0..40, reaching one sphere radius (30 m) beyond each side
        assertThat(html).contains("id=\"section-form\"", "action=\"/sites/" + id + "/section\"",
                "name=\"x1\" inputmode=\"decimal\" size=\"8\" value=\"-30\"",
                "name=\"y1\" inputmode=\"decimal\" size=\"8\" value=\"20\"",
                "name=\"x2\" inputmode=\"decimal\" size=\"8\" value=\"110\"");
        String section = page("/sites/" + id + "/section", 200);
        assertThat(section).contains("class=\"section\"", "value=\"-30\"", "value=\"110\"");
    }

    @Test
    void envelopeAcrossALoneRodPeaksAtItsTipAndMeetsTheGroundBeyondItsProtectedRadius() throws Exception {
        long id = upload(new MockMultipartFile("file", "lone-mast.geojson", "application/json",
                LONE_ROD.getBytes(StandardCharsets.UTF_8)), "Lone mast");

        String html = page("/sites/" + id + "/section?x1=-40&y1=0&x2=40&y2=0", 200);
        assertThat(html).contains("class=\"section-rod\"");
        // the rod tip is the envelope's highest point: 10 m at the rod, 40 m along the cut
        assertThat(attribute(html, "data-envelope-max")).isCloseTo(10, within(0.01));
        assertThat(attribute(html, "data-envelope-max-at")).isCloseTo(40, within(1e-9));
        Map<Double, Double> e = envelopeSamples(html);
        // closed form, R = 30, h = 10: protected radius d = sqrt(h(2R - h)) = 22.36 m, so 30 m away
        // from the rod the envelope lies on the ground
        assertThat(e.get(10.0)).isCloseTo(0, within(0.01));
        assertThat(e.get(70.0)).isCloseTo(0, within(0.01));
        // closed form inside d: the arc of the sphere resting on the ground at d and touching the tip,
        // E(r) = R - sqrt(R^2 - (d - r)^2); at r = 10 m that is 2.665 m
        double d = Math.sqrt(10 * (2 * 30 - 10));
        double expected = 30 - Math.sqrt(30 * 30 - (d - 10) * (d - 10));
        assertThat(e.get(30.0)).isCloseTo(expected, within(0.01));
        assertThat(e.get(50.0)).isCloseTo(expected, within(0.01));
    }

    @Test
    void numberThatCannotBeReadGivesA400PageNamingTheField() throws Exception {
        long id = upload(SampleFiles.sample("harbour-warehouse.geojson"), "Quay");

        String html = page("/sites/" + id + "/section?x1=0&y1=abc&x2=10&y2=0", 400);
        assertThat(html).contains("y1 must be a number of metres", "&quot;abc&quot;");
        assertThat(page("/sites/" + id + "/section?x1=0&y1=0&x2=10", 400)).contains("y2 is missing");
        assertThat(page("/sites/" + id + "/section?x1=0&y1=0&x2=10&y2=NaN", 400)).contains("y2 must be a number");
    }

    @Test
    void cutShorterThanOneMetreGivesA400Page() throws Exception {
        long id = upload(SampleFiles.sample("harbour-warehouse.geojson"), "Quay");

        String html = page("/sites/" + id + "/section?x1=5&y1=5&x2=5.5&y2=5.5", 400);
        assertThat(html).contains("at least 1 m apart");
    }

    @Test
    void sectionOfAnUnknownSiteGivesTheNotFoundPage() throws Exception {
        String html = page("/sites/987654/section?x1=0&y1=0&x2=10&y2=0", 404);
        assertThat(html).contains("987654");
    }
}
