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
