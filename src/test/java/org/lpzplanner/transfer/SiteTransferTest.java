package org.lpzplanner.transfer;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.multipart;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.header;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.lpzplanner.accounts.SignedIn;
import org.lpzplanner.airtermination.AirTerminationService;
import org.lpzplanner.analysis.AnalysisService;
import org.lpzplanner.analysis.ReviewService;
import org.lpzplanner.comments.CommentService;
import org.lpzplanner.design.DesignService;
import org.lpzplanner.keepout.KeepOutAreaService;
import org.lpzplanner.sections.SiteCutService;
import org.lpzplanner.sites.SiteService;
import org.lpzplanner.sites.StoredSite;
import org.lpzplanner.sites.StructureCorrection;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.mock.web.MockMultipartFile;
import org.springframework.test.web.servlet.MockMvc;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.ObjectNode;

@SpringBootTest
@AutoConfigureMockMvc
@SignedIn
class SiteTransferTest {

    private static final JsonMapper JSON = JsonMapper.builder().build();

    @Autowired
    MockMvc mvc;
    @Autowired
    SiteService sites;
    @Autowired
    AnalysisService analyses;
    @Autowired
    AirTerminationService parts;
    @Autowired
    ReviewService reviews;
    @Autowired
    JdbcClient jdbc;
    @Autowired
    DesignService design;
    @Autowired
    org.lpzplanner.design.DownConductorService downConductors;
    @Autowired
    CommentService comments;
    @Autowired
    SiteCutService cuts;
    @Autowired
    KeepOutAreaService keepOut;

    /** A site with an added rod, a corrected structure (two earlier files), two revisions and an accepted item. */
    private long workedSite() throws Exception {
        StoredSite site = sites.create("harbour-warehouse.geojson",
                Files.readAllBytes(Path.of("sample-sites/harbour-warehouse.geojson")), "Quay shed \u00e9\u00df\"<x>", "III", null);
        analyses.run(site.id(), null, null, "2");
        parts.addRod(site.id(), sites.get(site.id()).version(),
                new AirTerminationService.RodInput(null, "North rod", 3.0, 4.0, "2.5"));
        sites.correctStructure(site.id(), sites.get(site.id()).version(),
                new StructureCorrection(0, "9.5", null, null, null, null));
        analyses.run(site.id(), null, null, "2");
        String key = reviews.latest(site.id()).orElseThrow().items().get(0).key();
        reviews.accept(site.id(), key, "covered by a natural component (steel gutter)");
        mvc.perform(org.springframework.test.web.servlet.request.MockMvcRequestBuilders.put("/api/sites/" + site.id()
                        + "/risk").contentType(org.springframework.http.MediaType.APPLICATION_JSON)
                        .content("{\"flashDensity\": \"4\", \"location\": \"surrounded_by_higher\", \"lineCount\": 2}"))
                .andExpect(status().isOk());
        // design edits: one building's down-conductors moved, one metal installation marked
        org.lpzplanner.design.DownConductorService.DownConductors planned = downConductors.list(site.id()).get(0);
        java.util.List<double[]> moved = new java.util.ArrayList<>(planned.positions());
        moved.set(0, new double[] {moved.get(0)[0] + 0.5, moved.get(0)[1]});
        downConductors.save(site.id(), planned.buildingId(), moved);
        design.addInstallation(site.id(), "Vent pipe \u00e9", 4.0, 5.0, 9.0, "CONCRETE_OR_BRICK");
        cuts.save(site.id(), "Quay \u00e9 section", new String[] {"-10", "20", "90.25", "20"});
        keepOut.save(site.id(), "Skylight \u00e9 north", java.util.List.of(new double[] {10, 30}, new double[] {14.5, 30},
                new double[] {14.5, 33}, new double[] {10, 33}));
        comments.comment(site.id(), "Check the gutter bonding \u2013 \"north\" side");
        comments.markReviewed(site.id());
        sites.updateCoverDetails(site.id(), sites.get(site.id()).version(), "4 Quay Row, \u00c9tang",
                "Mara \"Q\" Quill");
        return site.id();
    }

    private byte[] export(long id) throws Exception {
        return mvc.perform(get("/api/sites/" + id + "/export")).andExpect(status().isOk())
                .andExpect(header().string("Content-Disposition", org.hamcrest.Matchers.containsString(
                        "harbour-warehouse.site-export.json")))
                .andReturn().getResponse().getContentAsByteArray();
    }

    private long importFile(byte[] content) throws Exception {
        String body = mvc.perform(multipart("/api/sites/import").file(new MockMultipartFile("file", "x.json",
                        "application/json", content)))
                .andExpect(status().isCreated()).andReturn().getResponse().getContentAsString();
        return JSON.readTree(body).path("id").asLong();
    }

    private long rows() {
        return jdbc.sql("SELECT (SELECT COUNT(*) FROM sites) + (SELECT COUNT(*) FROM site_file_versions)"
                + " + (SELECT COUNT(*) FROM analysis_revisions) + (SELECT COUNT(*) FROM accepted_items)"
                + " + (SELECT COUNT(*) FROM site_risk_inputs) + (SELECT COUNT(*) FROM down_conductor_positions)"
                + " + (SELECT COUNT(*) FROM metal_installations) + (SELECT COUNT(*) FROM site_comments)"
                + " + (SELECT COUNT(*) FROM site_cuts) + (SELECT COUNT(*) FROM site_keep_out_areas)"
                + " + (SELECT COUNT(*) FROM revision_reviews) + (SELECT COUNT(*) FROM audit_events)")
                .query(Long.class).single();
    }

    @Test
    void aDuplicateKeepsTheDataStoredBesideTheFileButNotTheAnalysesNorTheDiscussion() throws Exception {
        long id = workedSite();
        JsonNode original = JSON.readTree(export(id));

        long copy = sites.duplicate(id).id();
        JsonNode copied = JSON.readTree(export(copy));

        for (String member : java.util.List.of("riskInputs", "downConductors", "metalInstallations", "savedCuts",
                "keepOutAreas")) {
            assertThat(original.path(member).isMissingNode()).as(member).isFalse();
            assertThat(copied.path(member)).as(member).isEqualTo(original.path(member));
        }
        assertThat(copied.path("keepOutAreas")).hasSize(1);
        assertThat(copied.path("revisions")).isEmpty();
        assertThat(copied.path("comments")).isEmpty();
        // the original keeps its own rows
        assertThat(JSON.readTree(export(id)).path("keepOutAreas")).isEqualTo(original.path("keepOutAreas"));
        assertThat(downConductors.list(copy).get(0).edited()).isTrue();
    }

    @Test
    void exportedSiteImportsBackUnchanged() throws Exception {
        long id = workedSite();
        byte[] first = export(id);
        JsonNode doc = JSON.readTree(first);
        assertThat(doc.path("earlierFiles")).hasSize(2);
        assertThat(doc.path("revisions")).hasSize(2);
        assertThat(doc.path("revisions").get(1).path("accepted")).hasSize(1);
        assertThat(doc.path("site").path("fileText").stringValue()).contains("North rod");
        assertThat(doc.path("riskInputs").path("flashDensity").asDouble()).isEqualTo(4.0);
        assertThat(doc.path("revisions").get(1).path("sourceText").stringValue()).contains("North rod");
        assertThat(doc.path("revisions").get(1).path("reviews")).hasSize(1);
        assertThat(doc.path("downConductors")).hasSize(1);
        assertThat(doc.path("metalInstallations").get(0).path("material").stringValue()).isEqualTo("CONCRETE_OR_BRICK");
        assertThat(doc.path("comments").get(0).path("body").stringValue()).contains("gutter bonding");
        assertThat(doc.path("savedCuts")).hasSize(1);
        assertThat(doc.path("savedCuts").get(0).path("x2").asDouble()).isEqualTo(90.25);
        assertThat(doc.path("keepOutAreas")).hasSize(1);
        assertThat(doc.path("keepOutAreas").get(0).path("corners").get(1).get(0).asDouble()).isEqualTo(14.5);
        assertThat(doc.path("site").path("address").stringValue()).isEqualTo("4 Quay Row, \u00c9tang");
        assertThat(doc.path("site").path("designer").stringValue()).isEqualTo("Mara \"Q\" Quill");
        JsonNode trail = doc.path("auditTrail");
        assertThat(trail.size()).isGreaterThanOrEqualTo(4);
        assertThat(trail.get(0).path("action").stringValue()).isEqualTo("upload");

        long copy = importFile(first);
        assertThat(copy).isNotEqualTo(id);
        byte[] second = export(copy);
        // equal but for the audit trail and the engine's times: the export holds no database ids,
        // and the import computed every revision's results again, to the same results; the trail
        // starts anew with the import
        JsonNode newTrail = JSON.readTree(second).path("auditTrail");
        assertThat(newTrail).hasSize(1);
        assertThat(newTrail.get(0).path("action").stringValue()).isEqualTo("import");
        assertThat(newTrail.get(0).path("detail").stringValue()).contains(trail.size() + " earlier audit event(s)")
                .contains("results of 2 revision(s) computed again here, 0 of them unlike the file's");
        assertThat(withoutTimes(beforeTrail(second))).isEqualTo(withoutTimes(beforeTrail(first)));
        assertThat(sites.get(copy).sourceText()).isEqualTo(sites.get(id).sourceText());
        assertThat(reviews.latest(copy).orElseThrow().acceptedCount()).isEqualTo(1);
        assertThat(downConductors.list(copy).get(0).edited()).isTrue();
        assertThat(downConductors.list(copy).get(0).positions().get(0))
                .containsExactly(downConductors.list(id).get(0).positions().get(0));
        assertThat(design.separations(copy)).hasSameSizeAs(design.separations(id));
        assertThat(comments.comments(copy)).hasSize(1);
        assertThat(cuts.cuts(copy)).singleElement().satisfies(c -> {
            assertThat(c.name()).isEqualTo("Quay \u00e9 section");
            assertThat(new double[] {c.x1(), c.y1(), c.x2(), c.y2()}).containsExactly(-10, 20, 90.25, 20);
        });
        assertThat(keepOut.areas(copy)).singleElement().satisfies(k -> {
            assertThat(k.name()).isEqualTo("Skylight \u00e9 north");
            assertThat(k.corners()).hasSize(4);
            assertThat(k.corners().get(2)).containsExactly(14.5, 33);
            assertThat(k.area()).isEqualTo(4.5 * 3); // 4.5 m × 3 m
        });
        assertThat(comments.reviews(copy)).hasSize(1);
        assertThat(sites.get(copy).address()).isEqualTo("4 Quay Row, \u00c9tang");
        assertThat(sites.get(copy).designer()).isEqualTo("Mara \"Q\" Quill");
        mvc.perform(get("/api/sites/" + copy + "/file/versions/2")).andExpect(status().isOk());
    }

    @Test
    void anExportWrittenBeforeKeepOutAreasImportsWithNone() throws Exception {
        long id = workedSite();
        ObjectNode older = (ObjectNode) JSON.readTree(export(id));
        older.remove("keepOutAreas");
        long copy = importFile(bytes(older));
        assertThat(keepOut.areas(copy)).isEmpty();
        assertThat(cuts.cuts(copy)).hasSize(1);
    }

    @Test
    void anExportWrittenBeforeCoverDetailsImportsWithThemEmpty() throws Exception {
        ObjectNode older = (ObjectNode) JSON.readTree(export(workedSite()));
        ((ObjectNode) older.get("site")).remove("address");
        ((ObjectNode) older.get("site")).remove("designer");
        long copy = importFile(bytes(older));
        assertThat(sites.get(copy).address()).isEmpty();
        assertThat(sites.get(copy).designer()).isEmpty();
        ObjectNode cleared = (ObjectNode) JSON.readTree(export(workedSite()));
        ((ObjectNode) cleared.get("site")).putNull("address");
        assertThat(sites.get(importFile(bytes(cleared))).address()).isEmpty();
    }

    @Test
    void riskInputsWithTheirLinesTravelWithTheExport() throws Exception {
        long id = workedSite();
        JsonNode risk = JSON.readTree(export(id)).path("riskInputs");
        // two lines given by their count: each at the most conservative start, 1000 m
        assertThat(risk.path("lineCount").asInt()).isEqualTo(2);
        assertThat(risk.path("lines")).hasSize(2);
        assertThat(risk.path("lines").get(0).path("installation").stringValue()).isEqualTo("OVERHEAD");
        assertThat(risk.path("lines").get(0).path("length").asDouble()).isEqualTo(1000.0);
        assertThat(risk.path("lifeCriticalSystems").isNull()).isTrue();

        long copy = importFile(export(id));
        JsonNode imported = JSON.readTree(mvc.perform(get("/api/sites/" + copy + "/risk")).andExpect(status().isOk())
                .andReturn().getResponse().getContentAsString()).path("inputs");
        JsonNode original = JSON.readTree(mvc.perform(get("/api/sites/" + id + "/risk")).andExpect(status().isOk())
                .andReturn().getResponse().getContentAsString()).path("inputs");
        assertThat(imported).isEqualTo(original);
    }

    @Test
    void riskInputsOfAnEarlierExportImportWithTheFormerDefaultsCleared() throws Exception {
        // as an earlier release wrote them: no lines of their own (a count and one length), no
        // answer on life-critical systems, and the values that form pre-filled
        ObjectNode older = (ObjectNode) JSON.readTree(export(workedSite()));
        ObjectNode risk = (ObjectNode) older.get("riskInputs");
        risk.remove("lines");
        risk.remove("lifeCriticalSystems");
        risk.put("flashDensitySource", "THUNDERSTORM_DAYS").putNull("flashDensity").put("thunderstormDays", 25.0)
                .put("fireRisk", "ORDINARY").put("specialHazard", "NONE").put("structureUse", "OTHER")
                .put("fireProvisions", "MANUAL").put("lineCount", 2).put("lineLength", 600.0);

        long copy = importFile(bytes(older));

        JsonNode answer = JSON.readTree(mvc.perform(get("/api/sites/" + copy + "/risk")).andExpect(status().isOk())
                .andReturn().getResponse().getContentAsString());
        JsonNode inputs = answer.path("inputs");
        // values equal to a former default may never have been chosen: cleared, as migration V15 does
        for (String cleared : java.util.List.of("thunderstormDays", "fireRisk", "specialHazard", "structureUse",
                "lifeCriticalSystems")) {
            assertThat(inputs.path(cleared).isNull()).as(cleared).isTrue();
        }
        assertThat(answer.path("complete").asBoolean()).isFalse();
        assertThat(answer.path("options")).isEmpty();
        // a value that differs was chosen: kept; two lines of 600 m at the most conservative values
        assertThat(inputs.path("fireProvisions").stringValue()).isEqualTo("MANUAL");
        assertThat(inputs.path("location").stringValue()).isEqualTo("SURROUNDED_BY_HIGHER");
        assertThat(inputs.path("lines")).hasSize(2);
        assertThat(inputs.path("lines").get(1).path("length").asDouble()).isEqualTo(600.0);
        assertThat(inputs.path("lines").get(1).path("shielding").stringValue()).isEqualTo("UNSHIELDED");
    }

    @Test
    void anotherTeamsSiteIsNotExported() throws Exception {
        long id = sites.create("harbour-warehouse.geojson",
                Files.readAllBytes(Path.of("sample-sites/harbour-warehouse.geojson")), "Other shed", "III", null).id();
        jdbc.sql("INSERT INTO teams (name, name_key, created_at) VALUES ('Export elsewhere', 'export elsewhere', CURRENT_TIMESTAMP)").update();
        jdbc.sql("UPDATE sites SET team_id = (SELECT id FROM teams WHERE name = 'Export elsewhere') WHERE id = ?")
                .param(id).update();
        mvc.perform(get("/api/sites/" + id + "/export")).andExpect(status().isNotFound());
    }

    @Test
    void importFormOpensTheNewSiteAndTheListLinksTheExport() throws Exception {
        long id = workedSite();
        byte[] file = export(id);
        String location = mvc.perform(multipart("/sites/import").file(new MockMultipartFile("file", "a.json",
                        "application/json", file)))
                .andExpect(status().is3xxRedirection()).andReturn().getResponse().getRedirectedUrl();
        assertThat(location).matches("/sites/\\d+");
        mvc.perform(get("/")).andExpect(status().isOk())
                .andExpect(org.springframework.test.web.servlet.result.MockMvcResultMatchers.content()
                        .string(org.hamcrest.Matchers.containsString("/api/sites/" + id + "/export")));
        mvc.perform(get("/sites/" + id)).andExpect(status().isOk())
                .andExpect(org.springframework.test.web.servlet.result.MockMvcResultMatchers.content()
                        .string(org.hamcrest.Matchers.containsString("id=\"site-export\"")));
    }

    @Test
    void badImportFilesAreRefusedByMemberAndStoreNothing() throws Exception {
        long id = workedSite();
        ObjectNode good = (ObjectNode) JSON.readTree(export(id));
        long before = rows();

        refused("{not json".getBytes(StandardCharsets.UTF_8), "file", "not valid JSON at line 1");
        refused("[]".getBytes(StandardCharsets.UTF_8), "file", "JSON object");
        ObjectNode wrongFormat = good.deepCopy();
        wrongFormat.put("format", "something-else");
        refused(bytes(wrongFormat), "format", "not a site export");
        ObjectNode newer = good.deepCopy();
        newer.put("formatVersion", 2);
        refused(bytes(newer), "formatVersion", "reads version 1");
        ObjectNode noText = good.deepCopy();
        ((ObjectNode) noText.get("site")).remove("fileText");
        refused(bytes(noText), "site.fileText", "is missing");
        ObjectNode badLevel = good.deepCopy();
        ((ObjectNode) badLevel.get("revisions").get(1)).put("level", "V");
        refused(bytes(badLevel), "revisions[1].level", "one of I, II, III, IV");
        ObjectNode repeated = good.deepCopy();
        ((ObjectNode) repeated.get("revisions").get(1)).put("revision", 1);
        refused(bytes(repeated), "revisions[1].revision", "repeats revision 1");
        ObjectNode infinite = good.deepCopy();
        ((ObjectNode) infinite.get("revisions").get(0)).put("sphereRadius", "Infinity");
        refused(bytes(infinite), "revisions[0].sphereRadius", "finite number");
        ObjectNode badTime = good.deepCopy();
        ((ObjectNode) badTime.get("revisions").get(1).get("accepted").get(0)).put("createdAt", "yesterday");
        refused(bytes(badTime), "revisions[1].accepted[0].createdAt", "UTC time");
        ObjectNode badRisk = good.deepCopy();
        ((ObjectNode) badRisk.get("riskInputs")).put("fireRisk", "EXTREME");
        refused(bytes(badRisk), "riskInputs.fireRisk", "must be one of");
        ObjectNode badLine = good.deepCopy();
        ((ObjectNode) badLine.get("riskInputs").get("lines").get(1)).put("shielding", "FOIL");
        refused(bytes(badLine), "riskInputs.lines[1].shielding", "must be one of");
        ObjectNode shortLine = good.deepCopy();
        ((ObjectNode) shortLine.get("riskInputs").get("lines").get(0)).put("length", 0);
        refused(bytes(shortLine), "riskInputs.lines[0].length", "above 0");
        ObjectNode miscounted = good.deepCopy();
        ((ObjectNode) miscounted.get("riskInputs")).put("lineCount", 3);
        refused(bytes(miscounted), "riskInputs.lineCount", "number of entries of lines");
        ObjectNode badAnswer = good.deepCopy();
        ((ObjectNode) badAnswer.get("riskInputs")).put("lifeCriticalSystems", "MAYBE");
        refused(bytes(badAnswer), "riskInputs.lifeCriticalSystems", "YES or NO");
        ObjectNode badMetal = good.deepCopy();
        ((ObjectNode) badMetal.get("metalInstallations").get(0)).put("material", "WOOD");
        refused(bytes(badMetal), "metalInstallations[0].material", "must be one of");
        ObjectNode shortCut = good.deepCopy();
        ((ObjectNode) shortCut.get("savedCuts").get(0)).put("x2", -9.5).put("y2", 20);
        refused(bytes(shortCut), "savedCuts[0]", "1 m to 2000 m apart");
        ObjectNode bowTie = good.deepCopy();
        // the sides (10, 30)-(14.5, 30) and (14.5, 33)-(10, 33) swapped into a bow tie crossing itself
        ((ObjectNode) bowTie.get("keepOutAreas").get(0)).set("corners", JSON.readTree("[[10, 30], [14.5, 33],"
                + " [14.5, 30], [10, 33]]"));
        refused(bytes(bowTie), "keepOutAreas[0].corners", "crosses itself");
        ObjectNode badCorner = good.deepCopy();
        ((ObjectNode) badCorner.get("keepOutAreas").get(0)).set("corners", JSON.readTree("[[10, 30], [\"x\", 30],"
                + " [14.5, 33]]"));
        refused(bytes(badCorner), "keepOutAreas[0].corners[1]", "[x, y]");
        ObjectNode unnamed = good.deepCopy();
        ((ObjectNode) unnamed.get("keepOutAreas").get(0)).put("name", "");
        refused(bytes(unnamed), "keepOutAreas[0].name", "must not be empty");
        ObjectNode badPosition = good.deepCopy();
        ((tools.jackson.databind.node.ArrayNode) badPosition.get("downConductors").get(0).get("positions")).set(1,
                JSON.getNodeFactory().stringNode("north"));
        refused(bytes(badPosition), "downConductors[0].positions[1]", "[x, y]");
        ObjectNode twiceReviewed = good.deepCopy();
        var marks = (tools.jackson.databind.node.ArrayNode) twiceReviewed.get("revisions").get(1).get("reviews");
        marks.add(marks.get(0).deepCopy());
        refused(bytes(twiceReviewed), "revisions[1].reviews[1].reviewer", "repeats reviewer");
        ObjectNode blankComment = good.deepCopy();
        ((ObjectNode) blankComment.get("comments").get(0)).put("body", " ");
        refused(bytes(blankComment), "comments[0].body", "");
        ObjectNode twoLineAddress = good.deepCopy();
        ((ObjectNode) twoLineAddress.get("site")).put("address", "4 Quay Row\nSecond line");
        refused(bytes(twoLineAddress), "site.address", "one line of text without control characters");
        ObjectNode longDesigner = good.deepCopy();
        ((ObjectNode) longDesigner.get("site")).put("designer", "d".repeat(201));
        refused(bytes(longDesigner), "site.designer", "at most 200 characters");

        // the site file inside is checked like an upload: the engine's reader names the feature
        ObjectNode badSiteFile = good.deepCopy();
        ((ObjectNode) badSiteFile.get("site")).put("fileText",
                good.get("site").get("fileText").stringValue().replaceFirst("\"height\"\\s*:\\s*[0-9.]+", "\"height\": -3"));
        String answer = mvc.perform(multipart("/api/sites/import").file(new MockMultipartFile("file", "x.json",
                        "application/json", bytes(badSiteFile))))
                .andExpect(status().isBadRequest()).andExpect(jsonPath("$.field").value("height"))
                .andReturn().getResponse().getContentAsString();
        assertThat(answer).contains("harbour-warehouse.geojson");

        mvc.perform(multipart("/sites/import").file(new MockMultipartFile("file", "x.json", "application/json",
                        bytes(repeated))))
                .andExpect(status().isBadRequest())
                .andExpect(org.springframework.test.web.servlet.result.MockMvcResultMatchers.content()
                        .string(org.hamcrest.Matchers.containsString("repeats revision 1")));
        assertThat(rows()).isEqualTo(before);
    }

    /** The export's text up to the audit trail (the trail is the last member). */
    private static String beforeTrail(byte[] export) {
        String text = new String(export, StandardCharsets.UTF_8);
        assertThat(text).contains("\"auditTrail\"");
        return text.substring(0, text.indexOf("\"auditTrail\""));
    }

    /**
     * The export's text up to the audit trail with every time the engine measured written as 0: the
     * revision's {@code engineMillis} and its result's {@code envelopeMillis} and {@code totalMillis}
     * (they differ from run to run; everything else the engine gives does not).
     */
    private static String withoutTimes(String beforeTrail) {
        ObjectNode doc = (ObjectNode) JSON.readTree(beforeTrail.replaceAll(",\\s*$", "") + "}");
        for (JsonNode revision : doc.path("revisions")) {
            ObjectNode result = (ObjectNode) JSON.readTree(revision.path("resultGeoJson").stringValue());
            ((ObjectNode) result.path("analysis")).put("envelopeMillis", 0).put("totalMillis", 0);
            ((ObjectNode) revision).put("engineMillis", 0).put("resultGeoJson", result.toString());
        }
        return doc.toPrettyString();
    }

    private static byte[] bytes(JsonNode node) {
        return JSON.writeValueAsBytes(node);
    }

    private void refused(byte[] content, String field, String message) throws Exception {
        mvc.perform(multipart("/api/sites/import").file(new MockMultipartFile("file", "x.json", "application/json",
                        content)))
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.field").value(field))
                .andExpect(jsonPath("$.error").value(org.hamcrest.Matchers.containsString(message)))
                .andExpect(jsonPath("$.error").value(org.hamcrest.Matchers.containsString("nothing was stored")));
    }
}
