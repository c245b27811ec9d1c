package org.lpzplanner.accounts;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.multipart;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.nio.charset.StandardCharsets;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.mock.web.MockMultipartFile;
import org.springframework.test.web.servlet.MockMvc;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * A name that is markup stays text everywhere it is shown: site name, structure and rod names
 * (in the page and inside the SVG plan and section), comments, acceptance reasons and the history.
 */
@SpringBootTest
@AutoConfigureMockMvc
@SignedIn
class HostileNamesTest {

    static final String HOSTILE = "<script>alert(1)</script> & \"quotes\"";
    /** The same escaped as HTML and XML text (HTML 5 and XML 1.0 predefined entities). */
    static final String ESCAPED = "&lt;script&gt;alert(1)&lt;/script&gt; &amp; &quot;quotes&quot;";

    @Autowired
    MockMvc mvc;

    private static String json(String text) {
        return "\"" + text.replace("\\", "\\\\").replace("\"", "\\\"") + "\"";
    }

    @Test
    void hostileNamesAreEscapedInPagesAndDrawings() throws Exception {
        String geoJson = "{\"type\":\"FeatureCollection\",\"coordinates\":\"local-metres\",\"name\":" + json(HOSTILE)
                + ",\"features\":[{\"type\":\"Feature\",\"properties\":{\"kind\":\"structure\",\"name\":"
                + json(HOSTILE) + ",\"height\":6},\"geometry\":{\"type\":\"Polygon\",\"coordinates\":"
                + "[[[0,0],[10,0],[10,10],[0,10],[0,0]]]}},{\"type\":\"Feature\",\"properties\":{\"kind\":\"rod\","
                + "\"name\":" + json(HOSTILE) + ",\"height\":2},\"geometry\":{\"type\":\"Point\",\"coordinates\":[5,5]}}]}";
        String location = mvc.perform(multipart("/sites").file(new MockMultipartFile("file", "hostile.geojson", null,
                geoJson.getBytes(StandardCharsets.UTF_8))).param("name", HOSTILE))
                .andExpect(status().is3xxRedirection()).andReturn().getResponse().getRedirectedUrl();
        long id = Long.parseLong(location.substring(location.lastIndexOf('/') + 1));

        JsonNode items = JsonMapper.builder().build().readTree(mvc.perform(get("/api/sites/{id}/analyses/latest/items", id))
                .andReturn().getResponse().getContentAsString()).get("items");
        assertThat(items.size()).as("a bare 10 m block has exposed edges").isPositive();
        mvc.perform(post("/sites/{id}/accepted", id).param("key", items.get(0).get("key").stringValue())
                .param("reason", HOSTILE)).andExpect(status().is3xxRedirection());
        mvc.perform(post("/sites/{id}/comments", id).param("comment", HOSTILE)).andExpect(status().is3xxRedirection());

        String plan = page("/sites/" + id);
        String section = page("/sites/" + id + "/section?x1=0&y1=5&x2=10&y2=5");
        String list = page("/");
        for (String html : new String[] {plan, section, list}) {
            assertThat(html).doesNotContain("<script>alert(1)</script>").doesNotContain("\"quotes\"")
                    .contains(ESCAPED);
        }
        // inside the plan drawing: structure and rod titles and the acceptance reason
        String svg = plan.substring(plan.indexOf("<svg"), plan.indexOf("</svg>"));
        assertThat(svg).contains("<title>" + ESCAPED).contains(ESCAPED + "</title>");
        // inside the section drawing: the rod next to the cut
        String sectionSvg = section.substring(section.indexOf("<svg"), section.indexOf("</svg>"));
        assertThat(sectionSvg).contains(ESCAPED);
        // the comment and the history
        assertThat(plan.substring(plan.indexOf("id=\"comments\""))).contains("<p>" + ESCAPED + "</p>");
        assertThat(plan.substring(plan.indexOf("id=\"history\""))).contains(ESCAPED);
    }

    /**
     * In the PDF a name is text drawn as it is: markup shows as its characters, and characters the
     * font lacks (a control character, an emoji, a right-to-left override) do not break the report.
     */
    @Test
    void hostileNamesPrintAsPlainTextInTheReport() throws Exception {
        String odd = "Hall\u0007 \uD83D\uDE00 \u202Eevil\u202C\ttab";
        String geoJson = "{\"type\":\"FeatureCollection\",\"coordinates\":\"local-metres\",\"features\":["
                + "{\"type\":\"Feature\",\"properties\":{\"kind\":\"structure\",\"name\":" + JsonMapper.builder().build().writeValueAsString(odd)
                + ",\"height\":6},\"geometry\":{\"type\":\"Polygon\",\"coordinates\":"
                + "[[[0,0],[10,0],[10,10],[0,10],[0,0]]]}},{\"type\":\"Feature\",\"properties\":{\"kind\":\"rod\","
                + "\"name\":" + json(HOSTILE) + ",\"height\":2},\"geometry\":{\"type\":\"Point\",\"coordinates\":[5,5]}}]}";
        String location = mvc.perform(multipart("/sites").file(new MockMultipartFile("file", "hostile.geojson", null,
                geoJson.getBytes(StandardCharsets.UTF_8))).param("name", HOSTILE))
                .andExpect(status().is3xxRedirection()).andReturn().getResponse().getRedirectedUrl();
        long id = Long.parseLong(location.substring(location.lastIndexOf('/') + 1));
        byte[] pdf = mvc.perform(get("/api/sites/{id}/revisions/1/report", id)).andExpect(status().isOk())
                .andReturn().getResponse().getContentAsByteArray();
        try (var document = org.apache.pdfbox.Loader.loadPDF(pdf)) {
            String text = new org.apache.pdfbox.text.PDFTextStripper().getText(document);
            assertThat(text).contains("<script>alert(1)</script> & \"quotes\"").contains("Hall");
        }
    }

    private String page(String url) throws Exception {
        var response = mvc.perform(get(url)).andExpect(status().isOk()).andReturn().getResponse();
        return response.getContentAsString(StandardCharsets.UTF_8);
    }
}
