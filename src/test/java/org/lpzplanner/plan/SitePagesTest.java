package org.lpzplanner.plan;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.multipart;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.redirectedUrlPattern;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.nio.charset.StandardCharsets;
import org.junit.jupiter.api.Test;
import org.lpzplanner.accounts.SignedIn;
import org.lpzplanner.common.Cautions;
import org.lpzplanner.sites.SampleFiles;
import org.lpzplanner.sites.SiteService;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.mock.web.MockMultipartFile;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.web.util.HtmlUtils;

@SpringBootTest
@AutoConfigureMockMvc
@SignedIn
class SitePagesTest {

    @Autowired
    MockMvc mvc;

    @Autowired
    SiteService sites;

    private long uploadThroughThePage(String fileName, String name) throws Exception {
        String location = mvc.perform(multipart("/sites").file(SampleFiles.sample(fileName)).param("name", name)
                        .param("level", "II"))
                .andExpect(status().is3xxRedirection()).andExpect(redirectedUrlPattern("/sites/*"))
                .andReturn().getResponse().getRedirectedUrl();
        return Long.parseLong(location.substring(location.lastIndexOf('/') + 1));
    }

    private String page(String url, int status) throws Exception {
        var response = mvc.perform(get(url)).andExpect(status().is(status)).andReturn().getResponse();
        response.setCharacterEncoding("UTF-8");
        return response.getContentAsString(StandardCharsets.UTF_8);
    }

    @Test
    void siteListShowsAStoredSiteWithItsExposureAtAGlance() throws Exception {
        uploadThroughThePage("harbour-warehouse.geojson", "Listed warehouse");

        String html = page("/", 200);
        assertThat(html).contains("Listed warehouse", "exposed: ", "m\u00b2 roof", "<form");
    }

    /**
     * A shed with a 15 m rod in the middle of its 10 m x 10 m roof: at level I (R = 20 m,
     * IEC 62305-3:2010 Table 2) the rod's protected radius on the roof is sqrt(2 R h - h^2)
     * = sqrt(375) = 19.4 m, beyond the roof's corners at 7.1 m. Far from it, a wire strung 45 m above
     * open ground between two masts, more than R above what lies beneath it: a model warning, no
     * exposed item. The list must not read "exposed: 0 m²" nor give a verdict of protection.
     */
    @Test
    void siteListSaysAWarningStandsWhenNothingIsCountedAsExposed() throws Exception {
        String geoJson = """
                {"type": "FeatureCollection", "coordinates": "local-metres", "features": [
                  {"type": "Feature", "properties": {"kind": "structure", "name": "Shed", "height": 3},
                   "geometry": {"type": "Polygon", "coordinates": [[[195, -5], [205, -5], [205, 5], [195, 5], [195, -5]]]}},
                  {"type": "Feature", "properties": {"kind": "rod", "name": "Shed rod", "height": 15},
                   "geometry": {"type": "Point", "coordinates": [200, 0]}},
                  {"type": "Feature", "properties": {"kind": "rod", "name": "West mast", "height": 45},
                   "geometry": {"type": "Point", "coordinates": [0, 0]}},
                  {"type": "Feature", "properties": {"kind": "rod", "name": "East mast", "height": 45},
                   "geometry": {"type": "Point", "coordinates": [100, 0]}},
                  {"type": "Feature", "properties": {"kind": "conductor", "name": "Span wire"},
                   "geometry": {"type": "LineString", "coordinates": [[0, 0, 45], [100, 0, 45]]}}
                ]}""";
        String location = mvc.perform(multipart("/sites").file(new MockMultipartFile("file", "span.geojson",
                        "application/geo+json", geoJson.getBytes(StandardCharsets.UTF_8)))
                        .param("name", "Warned yard").param("level", "I"))
                .andExpect(status().is3xxRedirection()).andReturn().getResponse().getRedirectedUrl();
        long id = Long.parseLong(location.substring(location.lastIndexOf('/') + 1));
        String plan = page("/sites/" + id, 200);
        assertThat(plan).contains("Span wire", "No verdict of full protection");

        String list = page("/", 200);
        String row = list.substring(list.indexOf("Warned yard"));
        row = row.substring(0, row.indexOf("</tr>"));
        assertThat(row).contains("not fully protected: a warning or another item stands")
                .doesNotContain("exposed: 0", "no exposed items");
    }

    @Test
    void theUploadAddressAskedForAsAPageLeadsToTheSiteList() throws Exception {
        mvc.perform(get("/sites")).andExpect(status().is3xxRedirection())
                .andExpect(org.springframework.test.web.servlet.result.MockMvcResultMatchers.redirectedUrl("/"));
    }

    @Test
    void uploadErrorIsShownOnThePageAndNothingIsStored() throws Exception {
        long before = sites.count();
        MockMultipartFile broken = new MockMultipartFile("file", "broken.geojson", "application/json",
                "{\"type\": \"FeatureCollection\"".getBytes(StandardCharsets.UTF_8));

        var response = mvc.perform(multipart("/sites").file(broken)).andExpect(status().isBadRequest())
                .andReturn().getResponse();
        String html = response.getContentAsString(StandardCharsets.UTF_8);
        assertThat(html).contains("id=\"upload-error\"", "The file was not stored", "broken.geojson");
        assertThat(sites.count()).isEqualTo(before);
    }

    @Test
    void planPageDrawsTheSiteWithNamesCautionsMethodAndLevel() throws Exception {
        long id = uploadThroughThePage("courtyard-block.wkt", "Courtyard <block> & co");

        String html = page("/sites/" + id, 200);
        assertThat(html).contains("<svg", "class=\"structure\"", "class=\"north-arrow\"", "class=\"scale-bar\"",
                "class=\"legend\"", "rolling sphere method", "Protection level II", "sphere radius 30 m");
        assertThat(html).contains("Courtyard &lt;block&gt; &amp; co").doesNotContain("<block>");
        for (String caution : Cautions.lines()) {
            assertThat(html).contains(HtmlUtils.htmlEscape(caution));
        }
    }

    @Test
    void planPageNamesTheStructuresOfALonLatSite() throws Exception {
        long id = uploadThroughThePage("millbrook-hall.geojson", "Hall");
        var document = sites.document(sites.get(id));

        String html = page("/sites/" + id, 200);
        document.site().structures().forEach(s -> assertThat(html).contains(HtmlUtils.htmlEscape(s.name())));
    }

    @Test
    void unknownSiteGetsA404PageSayingSo() throws Exception {
        String html = page("/sites/424242", 404);
        assertThat(html).contains("Site not found", "There is no site with id 424242");
    }
}
