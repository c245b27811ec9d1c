package org.lpzplanner.plan;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.multipart;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.redirectedUrl;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.redirectedUrlPattern;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import org.junit.jupiter.api.Test;
import org.lpzplanner.accounts.SignedIn;
import org.lpzplanner.common.Cautions;
import org.lpzplanner.sites.SampleFiles;
import org.lpzplanner.sites.SiteService;
import org.lpzplanner.sites.StoredSite;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.request.MockHttpServletRequestBuilder;
import org.springframework.web.util.HtmlUtils;

/** Rename, duplicate and delete from the pages. */
@SpringBootTest
@AutoConfigureMockMvc
@SignedIn
class SiteActionPagesTest {

    @Autowired
    MockMvc mvc;

    @Autowired
    SiteService sites;

    long uploadThroughThePage(String fileName, String name) throws Exception {
        String location = mvc.perform(multipart("/sites").file(SampleFiles.sample(fileName)).param("name", name)
                        .param("level", "II"))
                .andExpect(status().is3xxRedirection()).andExpect(redirectedUrlPattern("/sites/*"))
                .andReturn().getResponse().getRedirectedUrl();
        return Long.parseLong(location.substring(location.lastIndexOf('/') + 1));
    }

    String html(MockHttpServletRequestBuilder request, int status) throws Exception {
        return mvc.perform(request).andExpect(status().is(status)).andReturn().getResponse()
                .getContentAsString(StandardCharsets.UTF_8);
    }

    @Test
    void renameFormChangesTheNameAndThePageShowsItEscaped() throws Exception {
        long id = uploadThroughThePage("harbour-warehouse.geojson", "Shed");
        long version = sites.get(id).version();

        mvc.perform(post("/sites/" + id + "/name").param("name", "  Quay <b>shed</b> & store ")
                        .param("version", String.valueOf(version)))
                .andExpect(status().is3xxRedirection()).andExpect(redirectedUrl("/sites/" + id));

        assertThat(sites.get(id).name()).isEqualTo("Quay <b>shed</b> & store");
        String plan = html(get("/sites/" + id), 200);
        assertThat(plan).contains("Quay &lt;b&gt;shed&lt;/b&gt; &amp; store").doesNotContain("<b>shed");
        assertThat(html(get("/"), 200)).contains("Quay &lt;b&gt;shed&lt;/b&gt; &amp; store");
    }

    @Test
    void renameWithAStaleVersionShowsTheClashWithStatus409AndChangesNothing() throws Exception {
        long id = uploadThroughThePage("harbour-warehouse.geojson", "Shed");
        StoredSite before = sites.get(id);

        String page = html(post("/sites/" + id + "/name").param("name", "Other <name>")
                .param("version", String.valueOf(before.version() - 1)), 409);

        assertThat(page).contains("id=\"rename-clash\"", "changed meanwhile", "Other &lt;name&gt;",
                "rolling sphere method", "Protection level II");
        for (String caution : Cautions.lines()) {
            assertThat(page).contains(HtmlUtils.htmlEscape(caution));
        }
        assertThat(sites.get(id)).isEqualTo(before);
    }

    @Test
    void renameToABlankNameIsRefusedWith400AndChangesNothing() throws Exception {
        long id = uploadThroughThePage("harbour-warehouse.geojson", "Shed");
        StoredSite before = sites.get(id);

        String page = html(post("/sites/" + id + "/name").param("name", "   ")
                .param("version", String.valueOf(before.version())), 400);

        assertThat(page).contains("id=\"rename-error\"", "name must not be empty");
        assertThat(sites.get(id)).isEqualTo(before);
    }

    @Test
    void duplicateFromThePageOpensTheCopyWithTheSameFileBytes() throws Exception {
        long id = uploadThroughThePage("courtyard-block.wkt", "Block");

        String location = mvc.perform(post("/sites/" + id + "/duplicate"))
                .andExpect(status().is3xxRedirection()).andReturn().getResponse().getRedirectedUrl();
        long copy = Long.parseLong(location.substring(location.lastIndexOf('/') + 1));

        assertThat(copy).isNotEqualTo(id);
        assertThat(sites.get(copy).name()).isEqualTo("Block (copy)");
        assertThat(sites.get(copy).sourceText().getBytes(StandardCharsets.UTF_8))
                .isEqualTo(Files.readAllBytes(SiteApiTest.SAMPLES.resolve("courtyard-block.wkt")));
        assertThat(html(get("/sites/" + copy), 200)).contains("Block (copy)", "not been analysed yet");
    }

    @Test
    void deleteAsksForConfirmationAndAPlainGetDeletesNothing() throws Exception {
        long id = uploadThroughThePage("harbour-warehouse.geojson", "Keep <me>");

        String confirm = html(get("/sites/" + id + "/delete"), 200);
        assertThat(confirm).contains("id=\"delete-form\"", "name=\"confirm\"", "Keep &lt;me&gt;");
        assertThat(sites.list()).anyMatch(s -> s.id() == id);

        String refused = html(post("/sites/" + id + "/delete")
                .param("version", String.valueOf(sites.get(id).version())), 400);
        assertThat(refused).contains("id=\"delete-not-confirmed\"", "Nothing was deleted");
        assertThat(sites.list()).anyMatch(s -> s.id() == id);
    }

    @Test
    void confirmedDeleteRemovesTheSiteAndReturnsToTheList() throws Exception {
        long id = uploadThroughThePage("harbour-warehouse.geojson", "Going");

        mvc.perform(post("/sites/" + id + "/delete").param("confirm", "yes")
                        .param("version", String.valueOf(sites.get(id).version())))
                .andExpect(status().is3xxRedirection()).andExpect(redirectedUrl("/"));

        assertThat(sites.list()).noneMatch(s -> s.id() == id);
        html(get("/sites/" + id), 404);
    }

    @Test
    void deleteWithAStaleVersionShowsTheClashWithStatus409AndKeepsTheSite() throws Exception {
        long id = uploadThroughThePage("harbour-warehouse.geojson", "Busy");
        StoredSite before = sites.get(id);

        String page = html(post("/sites/" + id + "/delete").param("confirm", "yes")
                .param("version", String.valueOf(before.version() + 3)), 409);

        assertThat(page).contains("id=\"delete-clash\"");
        assertThat(sites.get(id)).isEqualTo(before);
    }

    @Test
    void actionsOnAnUnknownSiteAnswer404Pages() throws Exception {
        assertThat(html(get("/sites/717171/delete"), 404)).contains("There is no site with id 717171");
        html(post("/sites/717171/delete").param("confirm", "yes").param("version", "0"), 404);
        html(post("/sites/717171/name").param("name", "X").param("version", "0"), 404);
        html(post("/sites/717171/duplicate"), 404);
        html(post("/sites/717171/structures").param("structure", "0").param("height", "5")
                .param("version", "0"), 404);
    }

    @Test
    void siteListOffersOpenDownloadDuplicateAndDeleteForEachSite() throws Exception {
        long id = uploadThroughThePage("harbour-warehouse.geojson", "Listed");

        String list = html(get("/"), 200);
        assertThat(list).contains("href=\"/api/sites/" + id + "/file\"", "action=\"/sites/" + id + "/duplicate\"",
                "href=\"/sites/" + id + "/delete\"");
    }
}
