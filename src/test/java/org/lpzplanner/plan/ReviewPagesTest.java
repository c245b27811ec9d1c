package org.lpzplanner.plan;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.redirectedUrl;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.lpzplanner.accounts.SignedIn;
import org.lpzplanner.analysis.AcceptedItemRepository;
import org.lpzplanner.analysis.AnalysisService;
import org.lpzplanner.analysis.ResultGeoJson;
import org.lpzplanner.common.Cautions;
import org.lpzplanner.sites.SiteService;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.web.util.HtmlUtils;

@SpringBootTest
@AutoConfigureMockMvc
@SignedIn
class ReviewPagesTest {

    private static final Pattern ROW_KEY = Pattern.compile("<tr tabindex=\"0\" data-item-key=\"([a-z0-9-]+)\"");

    @Autowired
    MockMvc mvc;

    @Autowired
    SiteService sites;

    @Autowired
    AnalysisService analyses;

    @Autowired
    AcceptedItemRepository accepted;

    private long siteId;

    @BeforeEach
    void analysedWarehouse() throws Exception {
        siteId = sites.create("harbour-warehouse.geojson",
                Files.readAllBytes(Path.of("sample-sites/harbour-warehouse.geojson")), "Quay shed", "II", null).id();
        analyses.run(siteId, null, null, null);
    }

    private String page(int status) throws Exception {
        var response = mvc.perform(get("/sites/" + siteId)).andExpect(status().is(status)).andReturn().getResponse();
        return response.getContentAsString(StandardCharsets.UTF_8);
    }

    private static List<String> rowKeys(String html) {
        List<String> keys = new ArrayList<>();
        Matcher m = ROW_KEY.matcher(html);
        while (m.find()) {
            keys.add(m.group(1));
        }
        return keys;
    }

    @Test
    void planPageListsEveryExposedItemOfTheWarehouseWithTheSameKeyAsOnThePlan() throws Exception {
        String html = page(200);

        List<String> keys = rowKeys(html);
        assertThat(keys).isNotEmpty().doesNotHaveDuplicates();
        for (String key : keys) {
            // drawn on the plan, which comes before the list
            assertThat(html.indexOf(" data-item-key=\"" + key + "\"")).isLessThan(html.indexOf("id=\"review-list\""));
        }
        assertThat(html).contains("id=\"review-list\"", "Parapet", "Corner", "exposed", "class=\"accept-form\"",
                "exposed items: " + keys.size() + ", accepted: 0", "/js/review-list.js");
        assertThat(html).contains(ResultGeoJson.METHOD, "Protection level II, sphere radius 30 m");
        assertThat(html).contains(HtmlUtils.htmlEscape(Cautions.lines().get(0)));
    }

    @Test
    void acceptFormMarksTheItemAcceptedWithItsReasonEscaped() throws Exception {
        String key = rowKeys(page(200)).get(0);

        mvc.perform(post("/sites/" + siteId + "/accepted").param("key", key)
                        .param("reason", "covered by <b>gutter</b> & frame"))
                .andExpect(status().is3xxRedirection()).andExpect(redirectedUrl("/sites/" + siteId + "#review"));

        String html = page(200);
        assertThat(html).contains("accepted: covered by &lt;b&gt;gutter&lt;/b&gt; &amp; frame", "accepted: 1",
                "class=\"remove-form\"").doesNotContain("<b>gutter</b>");
        // the plan marks the accepted item and carries the reason, escaped, in its title
        assertThat(html).containsPattern("class=\"exposed-[a-z]+ accepted\"[^>]*data-item-key=\"" + key + "\"");

        mvc.perform(post("/sites/" + siteId + "/accepted/remove").param("key", key))
                .andExpect(status().is3xxRedirection());
        assertThat(page(200)).contains("accepted: 0");
    }

    @Test
    void acceptFormWithoutReasonShowsTheErrorAndStoresNothing() throws Exception {
        String key = rowKeys(page(200)).get(0);

        var response = mvc.perform(post("/sites/" + siteId + "/accepted").param("key", key).param("reason", " "))
                .andExpect(status().isBadRequest()).andReturn().getResponse();
        assertThat(response.getContentAsString(StandardCharsets.UTF_8))
                .contains("id=\"review-error\"", "reason is required", "aria-invalid=\"true\"");
        assertThat(accepted.reasons(analyses.latest(siteId).orElseThrow().id())).isEmpty();
    }

    @Test
    void acceptFormWithUnknownKeyShowsNotFound() throws Exception {
        mvc.perform(post("/sites/" + siteId + "/accepted").param("key", "hip-000000000000").param("reason", "x"))
                .andExpect(status().isNotFound());
    }
}
