package org.lpzplanner.transfer;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.multipart;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.hamcrest.Matchers;
import org.junit.jupiter.api.Test;
import org.lpzplanner.accounts.SignedIn;
import org.lpzplanner.airtermination.RodEdits;
import org.lpzplanner.airtermination.RodInput;
import org.lpzplanner.analysis.AnalysisRepository;
import org.lpzplanner.analysis.AnalysisRevision;
import org.lpzplanner.analysis.AnalysisService;
import org.lpzplanner.analysis.ReviewItems;
import org.lpzplanner.analysis.ReviewService;
import org.lpzplanner.sites.SiteService;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.mock.web.MockMultipartFile;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.ResultActions;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.ArrayNode;
import tools.jackson.databind.node.ObjectNode;

/**
 * An imported site's revisions hold the results this app computes from each revision's own site
 * file and settings, whatever results the export file carries; a revision whose file or settings
 * cannot be analysed here refuses the import by its number. The truth every check is held against
 * is the app's own analysis of the same file: the revisions of the exported site.
 */
@SpringBootTest
@AutoConfigureMockMvc
@SignedIn
class RevisionReanalysisTest {

    private static final JsonMapper JSON = JsonMapper.builder().build();
    private static final List<String> EXPOSED_LAYERS = List.of("exposed-roof", "exposed-edge", "exposed-corner",
            "facade-band");

    @Autowired
    MockMvc mvc;
    @Autowired
    SiteService sites;
    @Autowired
    AnalysisService analyses;
    @Autowired
    RodEdits rods;
    @Autowired
    ReviewService reviews;
    @Autowired
    AnalysisRepository revisions;
    @Autowired
    JdbcClient jdbc;

    /**
     * The warehouse sample at level III: revision 1 as uploaded on a 2 m grid (small and quick),
     * revision 2 the analysis after a rod was added (its roof stays exposed), one item of revision 2
     * accepted.
     */
    private long analysedWarehouse() throws Exception {
        long id = sites.create("harbour-warehouse.geojson",
                Files.readAllBytes(Path.of("sample-sites/harbour-warehouse.geojson")), "Quay shed", "III", null).id();
        analyses.run(id, null, null, "2");
        rods.add(id, sites.get(id).version(), new RodInput(null, "North rod", 3.0, 4.0, "2.5"));
        reviews.accept(id, reviews.latest(id).orElseThrow().items().get(0).key(), "covered by the steel gutter");
        return id;
    }

    private ObjectNode export(long id) throws Exception {
        return (ObjectNode) JSON.readTree(mvc.perform(get("/api/sites/" + id + "/export")).andExpect(status().isOk())
                .andReturn().getResponse().getContentAsByteArray());
    }

    private ResultActions importing(JsonNode archive) throws Exception {
        return mvc.perform(multipart("/api/sites/import").file(new MockMultipartFile("file", "x.site-export.json",
                "application/json", JSON.writeValueAsBytes(archive))));
    }

    private long imported(JsonNode archive) throws Exception {
        String body = importing(archive).andExpect(status().isCreated()).andReturn().getResponse().getContentAsString();
        return JSON.readTree(body).path("id").asLong();
    }

    private void refused(JsonNode archive, String field, String... words) throws Exception {
        ResultActions answer = importing(archive).andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.field").value(field))
                .andExpect(jsonPath("$.error").value(Matchers.containsString("nothing was stored")));
        for (String word : words) {
            answer.andExpect(jsonPath("$.error").value(Matchers.containsString(word)));
        }
    }

    private long sites() {
        return jdbc.sql("SELECT COUNT(*) FROM sites").query(Long.class).single();
    }

    private String importEvent(long siteId) {
        return jdbc.sql("SELECT detail FROM audit_events WHERE site_id = ? AND action = 'import'").param(siteId)
                .query(String.class).single();
    }

    /** The revision as a forger would write it: fully protected, nothing exposed, the exposed features gone. */
    private static void forgeFullProtection(ObjectNode revision) {
        revision.put("fullyProtected", true).put("exposedRoofArea", 0.0).put("exposedEdgeLength", 0.0)
                .put("exposedCorners", 0).put("facadeBands", 0);
        ObjectNode result = (ObjectNode) JSON.readTree(revision.get("resultGeoJson").stringValue());
        ArrayNode kept = JSON.createArrayNode();
        for (JsonNode feature : result.get("features")) {
            if (!EXPOSED_LAYERS.contains(feature.path("properties").path("layer").stringValue())) {
                kept.add(feature);
            }
        }
        result.set("features", kept);
        ((ObjectNode) result.get("analysis").get("summary")).put("fullyProtected", true).put("exposedRoofArea", 0.0)
                .put("exposedEdgeLength", 0.0).put("exposedCorners", 0).put("facadeBands", 0);
        revision.put("resultGeoJson", result.toString());
    }

    private String reportText(long siteId, int revision) throws Exception {
        byte[] pdf = mvc.perform(get("/api/sites/" + siteId + "/revisions/" + revision + "/report"))
                .andExpect(status().isOk()).andReturn().getResponse().getContentAsByteArray();
        try (PDDocument document = Loader.loadPDF(pdf)) {
            return new PDFTextStripper().getText(document).replaceAll("\\s+", " ");
        }
    }

    /** The printed "Exposed roof area" in m², as the report writes it. */
    private static String printedRoofArea(String text) {
        Matcher m = Pattern.compile("Exposed roof area ([0-9.]+) m²").matcher(text);
        assertThat(m.find()).as("the report prints the exposed roof area").isTrue();
        return m.group(1);
    }

    @Test
    void aRevisionForgedFullyProtectedIsStoredAndPrintedWithTheExposureComputedFromItsFile() throws Exception {
        long id = analysedWarehouse();
        AnalysisRevision truth = analyses.latest(id).orElseThrow();
        assertThat(truth.fullyProtected()).isFalse();
        assertThat(truth.exposedRoofArea()).isPositive();
        ObjectNode forged = export(id);
        forgeFullProtection((ObjectNode) forged.get("revisions").get(1));

        long copy = imported(forged);

        AnalysisRevision stored = analyses.latest(copy).orElseThrow();
        assertThat(stored.revision()).isEqualTo(2);
        assertThat(stored.fullyProtected()).isFalse();
        assertThat(stored.exposedRoofArea()).isEqualTo(truth.exposedRoofArea());
        assertThat(stored.exposedEdgeLength()).isEqualTo(truth.exposedEdgeLength());
        assertThat(stored.exposedCorners()).isEqualTo(truth.exposedCorners());
        assertThat(stored.facadeBands()).isEqualTo(truth.facadeBands());
        assertThat(ReviewItems.of(stored.resultGeoJson())).isEqualTo(ReviewItems.of(truth.resultGeoJson()));
        // the acceptance names an item the computed result has, so it is kept
        assertThat(reviews.latest(copy).orElseThrow().acceptedCount()).isEqualTo(1);

        String printed = reportText(copy, 2);
        assertThat(printed).doesNotContain("No exposed items remain").contains("Exposed items remain");
        assertThat(printedRoofArea(printed)).isEqualTo(printedRoofArea(reportText(id, 2))).isNotEqualTo("0.00");
        // revision 1 was exported honestly and computes to what the file says; revision 2 does not
        assertThat(importEvent(copy)).contains("results of 2 revision(s) computed again here, 1 of them unlike"
                + " the file's");
    }

    @Test
    void aRevisionWhoseSiteFileDoesNotMatchItsChecksumIsRefusedByNumber() throws Exception {
        ObjectNode good = export(analysedWarehouse());
        long before = sites();

        ObjectNode edited = good.deepCopy();
        ObjectNode second = (ObjectNode) edited.get("revisions").get(1);
        second.put("sourceText", second.get("sourceText").stringValue() + "\n");
        refused(edited, "revisions[1].inputsSha256", "revision 2", "SHA-256");

        ObjectNode swapped = good.deepCopy();
        ((ObjectNode) swapped.get("revisions").get(0)).set("sourceText",
                good.get("revisions").get(1).get("sourceText"));
        refused(swapped, "revisions[0].inputsSha256", "revision 1");

        mvc.perform(multipart("/sites/import").file(new MockMultipartFile("file", "x.json", "application/json",
                        JSON.writeValueAsBytes(edited))))
                .andExpect(status().isBadRequest())
                .andExpect(content().string(Matchers.containsString("revisions[1].inputsSha256")));
        assertThat(sites()).isEqualTo(before);
    }

    @Test
    void aRevisionsSiteFileIsCheckedAsAnUploadAndRefusedByNumber() throws Exception {
        ObjectNode good = export(analysedWarehouse());
        long before = sites();
        String file = good.get("revisions").get(0).get("sourceText").stringValue();

        // a height the reader refuses, with the checksum made to match: the reader itself must refuse it
        String negative = file.replaceFirst("\"height\"\\s*:\\s*10", "\"height\": -3");
        assertThat(negative).isNotEqualTo(file);
        ObjectNode badHeight = withRevisionFile(good, 0, negative);
        refused(badHeight, "revisions[0].sourceText", "revision 1", "feature 0", "\"height\"");

        // an earlier file (number 1) is read the same way
        ObjectNode badEarlier = good.deepCopy();
        ((ObjectNode) badEarlier.get("earlierFiles").get(0)).put("text", negative);
        refused(badEarlier, "earlierFiles[0].text", "file 1", "\"height\"");

        // a revision holding a site file must name it, or it cannot be read as the upload would
        ObjectNode unnamed = good.deepCopy();
        ((ObjectNode) unnamed.get("revisions").get(1)).remove("sourceName");
        refused(unnamed, "revisions[1].sourceName", "revision 2");
        assertThat(sites()).isEqualTo(before);
    }

    /** A copy of the archive with revision {@code index}'s site file replaced and its checksum matched. */
    static ObjectNode withRevisionFile(ObjectNode archive, int index, String text) {
        ObjectNode copy = archive.deepCopy();
        ((ObjectNode) copy.get("revisions").get(index)).put("sourceText", text)
                .put("inputsSha256", AnalysisService.sha256(text));
        return copy;
    }

    @Test
    void revisionSettingsTheAnalysisFormRefusesOrAGridTooLargeRefuseTheImportByNumber() throws Exception {
        ObjectNode good = export(analysedWarehouse());
        long before = sites();

        ObjectNode fine = good.deepCopy();
        ((ObjectNode) fine.get("revisions").get(0)).put("resolution", 0.01);
        refused(fine, "revisions[0].resolution", "revision 1", "0.05");

        ObjectNode wide = good.deepCopy();
        ((ObjectNode) wide.get("revisions").get(1)).put("sphereRadius", 5000);
        refused(wide, "revisions[1].sphereRadius", "revision 2", "1000");

        // the largest sphere on the finest grid: far over the cells an analysis may use, refused
        // before anything is computed
        ObjectNode large = good.deepCopy();
        ((ObjectNode) large.get("revisions").get(1)).put("sphereRadius", 1000).put("resolution", 0.05);
        refused(large, "revisions[1].resolution", "revision 2", "grid of");
        assertThat(sites()).isEqualTo(before);
    }

    @Test
    void acceptancesOfItemsTheComputedResultDoesNotHaveAreDropped() throws Exception {
        long id = analysedWarehouse();
        ObjectNode archive = export(id);
        ((ArrayNode) archive.get("revisions").get(1).get("accepted")).addObject().put("key", "corner-000000000000")
                .put("reason", "no such corner").put("createdAt", "2026-05-01T09:30:00Z");

        long copy = imported(archive);

        var review = reviews.latest(copy).orElseThrow();
        assertThat(review.acceptedCount()).isEqualTo(1);
        assertThat(review.accepted().keySet()).isEqualTo(reviews.latest(id).orElseThrow().accepted().keySet());
        // revision 2 was an update of revision 1's analysis after the rod was added; computed afresh
        // here it gives the same results, as the engine promises
        assertThat(importEvent(copy)).contains("0 of them unlike the file's").contains("1 accepted item(s) dropped");
    }

    @Test
    void aRevisionStoredWithoutItsFileIsAnalysedFromTheExportsFileWithItsChecksumOrRefused() throws Exception {
        long id = analysedWarehouse();
        ObjectNode older = export(id);
        // as revisions were stored before they kept what they read, and with forged results
        ObjectNode first = (ObjectNode) older.get("revisions").get(0);
        first.remove(List.of("siteName", "sourceName", "sourceText", "tolerance"));
        forgeFullProtection(first);

        long copy = imported(older);

        AnalysisRevision truth = revisions.find(id, 1).orElseThrow();
        AnalysisRevision stored = revisions.find(copy, 1).orElseThrow();
        assertThat(stored.fullyProtected()).isFalse();
        assertThat(stored.exposedRoofArea()).isEqualTo(truth.exposedRoofArea());
        assertThat(ReviewItems.of(stored.resultGeoJson())).isEqualTo(ReviewItems.of(truth.resultGeoJson()));

        // the file it read (the first upload, earlier file 1) is not in the export either
        ObjectNode lost = older.deepCopy();
        lost.set("earlierFiles", JSON.createArrayNode());
        long before = sites();
        refused(lost, "revisions[0].sourceText", "revision 1", "checksum");
        assertThat(sites()).isEqualTo(before);
    }
}
