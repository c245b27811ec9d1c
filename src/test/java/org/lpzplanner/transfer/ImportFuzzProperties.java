package org.lpzplanner.transfer;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.multipart;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.put;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.LongStream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.lpzplanner.accounts.SignedIn;
import org.lpzplanner.airtermination.RodEdits;
import org.lpzplanner.airtermination.RodInput;
import org.lpzplanner.analysis.AnalysisService;
import org.lpzplanner.analysis.ReviewService;
import org.lpzplanner.comments.CommentService;
import org.lpzplanner.design.MetalInstallationService;
import org.lpzplanner.engine.io.BadSiteFiles;
import org.lpzplanner.sections.SiteCutService;
import org.lpzplanner.sites.SiteService;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.MediaType;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.mock.web.MockMultipartFile;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.MvcResult;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.ArrayNode;
import tools.jackson.databind.node.JsonNodeFactory;
import tools.jackson.databind.node.ObjectNode;

/**
 * Generated bad site export files through the import API: a real export of a worked site damaged
 * in one place each (cut short; a member of the wrong JSON type; a required member left out; a
 * revision number repeated; the site file inside replaced by one of the generated bad site files;
 * a revision's own site file or an earlier file cut off or given a NaN or infinite coordinate).
 * Every one is answered 400 naming the member (or the site file's feature and field; for a file
 * kept with a revision, the revision's number) and saying nothing was stored, and the database
 * holds exactly the rows it held before. Replay one seed with {@code -Dlpz.seed=N}.
 */
@SpringBootTest
@AutoConfigureMockMvc
@SignedIn
class ImportFuzzProperties {

    private static final int FILES_PER_SEED = 1000;
    private static final int STORED_FILES_PER_SEED = 30;
    /** A geometry's coordinates in a site file, and one number among them. */
    private static final Pattern GEOMETRY = Pattern.compile("\"coordinates\"\\s*:\\s*(\\[[^}]*\\])");
    private static final Pattern NUMBER = Pattern.compile("-?[0-9]+(\\.[0-9]+)?");
    /** Not numbers a site file may hold: bare NaN and Infinity are not JSON, 1e999 overflows to infinity. */
    private static final List<String> NOT_FINITE = List.of("NaN", "\"NaN\"", "1e999", "-1e999", "Infinity");
    private static final JsonMapper JSON = JsonMapper.builder().build();
    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;
    /**
     * Members a file may leave out: those written after the format's first release (read as empty),
     * what a revision read (revisions stored before that was kept have none) and risk inputs left
     * at their defaults or not chosen yet, cover details left empty, and keep-out areas (none stored).
     */
    private static final List<String> OPTIONAL = List.of("customRadius", "tolerance", "reviews", "riskInputs",
            "downConductors", "metalInstallations", "savedCuts", "comments", "auditTrail", "flashDensity",
            "thunderstormDays", "lineLength", "siteName", "sourceName", "sourceText", "locationFactor", "lineCount",
            "address", "designer", "keepOutAreas", "flashDensitySource", "fireRisk", "specialHazard",
            "structureUse", "lifeCriticalSystems", "lines");

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
    MetalInstallationService installations;
    @Autowired
    org.lpzplanner.design.DownConductorService downConductors;
    @Autowired
    CommentService comments;
    @Autowired
    SiteCutService cuts;
    @Autowired
    JdbcClient jdbc;

    static LongStream seeds() {
        String replay = System.getProperty("lpz.seed");
        if (replay != null && !replay.isBlank()) {
            return LongStream.of(Long.parseLong(replay.trim()));
        }
        return LongStream.of(20_261_201L, 20_261_202L);
    }

    /** An export of a site with a rod, two revisions, an accepted item, risk inputs, design edits, a cut and a comment. */
    private ObjectNode workedExport() throws Exception {
        long id = sites.create("harbour-warehouse.geojson",
                Files.readAllBytes(Path.of("sample-sites/harbour-warehouse.geojson")), "Fuzz shed", "III", null).id();
        analyses.run(id, null, null, "2");
        rods.add(id, sites.get(id).version(), new RodInput(null, "North rod", 3.0, 4.0, "2.5"));
        reviews.accept(id, reviews.latest(id).orElseThrow().items().get(0).key(), "covered by the steel gutter");
        mvc.perform(put("/api/sites/" + id + "/risk").contentType(MediaType.APPLICATION_JSON)
                .content("{\"flashDensity\": \"4\", \"lineCount\": 2}")).andExpect(status().isOk());
        org.lpzplanner.design.DownConductorService.DownConductors planned = downConductors.list(id).get(0);
        downConductors.save(id, planned.buildingId(), planned.positions());
        installations.add(id, "Vent pipe", 4.0, 5.0, 9.0, "CONCRETE_OR_BRICK");
        cuts.save(id, "Quay section", new String[] {"-10", "20", "90.25", "20"});
        comments.comment(id, "Check the gutter bonding");
        comments.markReviewed(id);
        byte[] export = mvc.perform(get("/api/sites/" + id + "/export")).andExpect(status().isOk()).andReturn()
                .getResponse().getContentAsByteArray();
        return (ObjectNode) JSON.readTree(export);
    }

    private long rows() {
        return jdbc.sql("SELECT (SELECT COUNT(*) FROM sites) + (SELECT COUNT(*) FROM site_file_versions)"
                + " + (SELECT COUNT(*) FROM analysis_revisions) + (SELECT COUNT(*) FROM accepted_items)"
                + " + (SELECT COUNT(*) FROM site_risk_inputs) + (SELECT COUNT(*) FROM down_conductor_positions)"
                + " + (SELECT COUNT(*) FROM metal_installations) + (SELECT COUNT(*) FROM site_comments)"
                + " + (SELECT COUNT(*) FROM site_cuts) + (SELECT COUNT(*) FROM revision_reviews)"
                + " + (SELECT COUNT(*) FROM audit_events)").query(Long.class).single();
    }

    /** One place in the document: a member of an object or an element of an array. */
    private record Place(JsonNode parent, String member, int index, String path) {

        JsonNode value() {
            return member != null ? parent.get(member) : parent.get(index);
        }

        void set(JsonNode value) {
            if (member != null) {
                ((ObjectNode) parent).set(member, value);
            } else {
                ((ArrayNode) parent).set(index, value);
            }
        }
    }

    private static void places(JsonNode node, String path, List<Place> out) {
        if (node.isObject()) {
            for (Map.Entry<String, JsonNode> e : node.properties()) {
                String p = path.isEmpty() ? e.getKey() : path + "." + e.getKey();
                out.add(new Place(node, e.getKey(), -1, p));
                places(e.getValue(), p, out);
            }
        } else if (node.isArray()) {
            for (int i = 0; i < node.size(); i++) {
                String p = path + "[" + i + "]";
                out.add(new Place(node, null, i, p));
                places(node.get(i), p, out);
            }
        }
    }

    /** A value of another JSON type than {@code value}'s, that no member of that type accepts. */
    private static JsonNode otherType(JsonNode value, Random random) {
        if (value.isNumber()) {
            return random.nextBoolean() ? NODES.stringNode("north") : NODES.booleanNode(true);
        }
        if (value.isString()) {
            return random.nextBoolean() ? NODES.objectNode() : NODES.arrayNode().add(7);
        }
        if (value.isBoolean()) {
            return NODES.stringNode("yes");
        }
        if (value.isArray()) {
            return random.nextBoolean() ? NODES.objectNode() : NODES.stringNode("[]");
        }
        if (value.isObject()) {
            return random.nextBoolean() ? NODES.arrayNode() : NODES.numberNode(1);
        }
        return NODES.objectNode(); // null (an optional member left empty)
    }

    /** A damaged copy of the export, with what was damaged. */
    private record Damage(String description, byte[] content) {
    }

    private static Damage damage(ObjectNode good, Random random) {
        ObjectNode doc = good.deepCopy();
        List<Place> all = new ArrayList<>();
        places(doc, "", all);
        switch (random.nextInt(5)) {
            case 0 -> {
                byte[] bytes = JSON.writeValueAsBytes(doc);
                int cut = 1 + random.nextInt(bytes.length - 2);
                return new Damage("cut short at byte " + cut, java.util.Arrays.copyOf(bytes, cut));
            }
            case 1 -> {
                Place p = all.get(random.nextInt(all.size()));
                p.set(otherType(p.value(), random));
                return new Damage(p.path() + " of the wrong type", JSON.writeValueAsBytes(doc));
            }
            case 2 -> {
                List<Place> required = all.stream().filter(p -> p.member() != null && !OPTIONAL.contains(p.member()))
                        .toList();
                Place p = required.get(random.nextInt(required.size()));
                ((ObjectNode) p.parent()).remove(p.member());
                return new Damage(p.path() + " left out", JSON.writeValueAsBytes(doc));
            }
            case 3 -> {
                ArrayNode revisions = (ArrayNode) doc.get("revisions");
                ((ObjectNode) revisions.get(1)).put("revision", revisions.get(0).get("revision").asInt());
                return new Damage("revision number repeated", JSON.writeValueAsBytes(doc));
            }
            default -> {
                BadSiteFiles.Case bad = BadSiteFiles.generate(random);
                if (!utf8(bad.content())) {
                    // a JSON string cannot hold such a byte: the export file itself carries it
                    byte[] bytes = JSON.writeValueAsBytes(doc);
                    int at = 1 + random.nextInt(bytes.length - 2);
                    byte[] out = new byte[bytes.length + 1];
                    System.arraycopy(bytes, 0, out, 0, at);
                    out[at] = (byte) 0xFF;
                    System.arraycopy(bytes, at, out, at + 1, bytes.length - at);
                    return new Damage("a byte that is not UTF-8 at " + at, out);
                }
                ((ObjectNode) doc.get("site")).put("fileText", new String(bad.content(), StandardCharsets.UTF_8));
                return new Damage("site file: " + bad.description(), JSON.writeValueAsBytes(doc));
            }
        }
    }

    private static boolean utf8(byte[] bytes) {
        try {
            StandardCharsets.UTF_8.newDecoder().decode(java.nio.ByteBuffer.wrap(bytes));
            return true;
        } catch (java.nio.charset.CharacterCodingException e) {
            return false;
        }
    }

    /** A site file kept inside the export damaged in one place, and where it sits. */
    private record FileDamage(String description, String member, String names, ObjectNode archive) {
    }

    /**
     * A revision's own site file (or the first earlier file) cut off at a random character, or with
     * one coordinate made NaN or infinite; a revision's checksum is made to match its damaged file,
     * so that the reader alone has to find the damage.
     */
    private static FileDamage damageStoredFile(ObjectNode good, Random random) {
        ObjectNode doc = good.deepCopy();
        int target = random.nextInt(3);
        ObjectNode holder = (ObjectNode) (target < 2 ? doc.get("revisions").get(target) : doc.get("earlierFiles").get(0));
        String textMember = target < 2 ? "sourceText" : "text";
        String text = holder.get(textMember).stringValue();
        String damaged;
        String description;
        if (random.nextBoolean()) {
            int cut = 1 + random.nextInt(text.lastIndexOf('}') - 1);
            damaged = text.substring(0, cut);
            description = "cut off at character " + cut;
        } else {
            List<int[]> numbers = new ArrayList<>();
            Matcher geometry = GEOMETRY.matcher(text);
            while (geometry.find()) {
                Matcher number = NUMBER.matcher(text).region(geometry.start(1), geometry.end(1));
                while (number.find()) {
                    numbers.add(new int[] {number.start(), number.end()});
                }
            }
            int[] at = numbers.get(random.nextInt(numbers.size()));
            String value = NOT_FINITE.get(random.nextInt(NOT_FINITE.size()));
            damaged = text.substring(0, at[0]) + value + text.substring(at[1]);
            description = "coordinate at character " + at[0] + " made " + value;
        }
        holder.put(textMember, damaged);
        if (target < 2) {
            holder.put("inputsSha256", AnalysisService.sha256(damaged));
            return new FileDamage("revisions[" + target + "] " + description, "revisions[" + target + "].sourceText",
                    "revision " + holder.get("revision").asInt(), doc);
        }
        return new FileDamage("earlierFiles[0] " + description, "earlierFiles[0].text",
                "file " + holder.get("number").asInt(), doc);
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void cutOffOrNotFiniteSiteFilesInsideTheExportAreRefusedNamingTheirRevision(long seed) throws Exception {
        ObjectNode good = workedExport();
        long before = rows();
        Random random = new Random(seed);
        List<String> accepted = new ArrayList<>();
        for (int i = 0; i < STORED_FILES_PER_SEED; i++) {
            FileDamage d = damageStoredFile(good, random);
            String label = "seed " + seed + " file " + i + " (" + d.description() + ")";
            MvcResult result = mvc.perform(multipart("/api/sites/import").file(new MockMultipartFile("file",
                    "fuzz.site-export.json", "application/json", JSON.writeValueAsBytes(d.archive())))).andReturn();
            String body = result.getResponse().getContentAsString();
            JsonNode error = result.getResponse().getStatus() == 400 ? JSON.readTree(body) : null;
            if (error == null) {
                accepted.add(label + ": " + result.getResponse().getStatus() + " " + body);
            } else if (!error.path("field").asString().equals(d.member())
                    || !error.path("error").asString().contains(d.names())
                    || !error.path("error").asString().contains("nothing was stored")) {
                accepted.add(label + ": does not name " + d.member() + " and " + d.names() + ": " + body);
            }
        }
        assertThat(accepted).as("damaged stored site files not refused with 400 naming where they are").isEmpty();
        assertThat(rows()).isEqualTo(before);
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void everyDamagedExportIsRefused400AndStoresNothing(long seed) throws Exception {
        ObjectNode good = workedExport();
        long before = rows();
        Random random = new Random(seed);
        List<String> accepted = new ArrayList<>();
        for (int i = 0; i < FILES_PER_SEED; i++) {
            Damage d = damage(good, random);
            String label = "seed " + seed + " file " + i + " (" + d.description() + ")";
            MvcResult result = mvc.perform(multipart("/api/sites/import").file(new MockMultipartFile("file",
                    "fuzz.site-export.json", "application/json", d.content()))).andReturn();
            String body = result.getResponse().getContentAsString();
            JsonNode error = result.getResponse().getStatus() == 400 ? JSON.readTree(body) : null;
            if (error == null) {
                accepted.add(label + ": " + result.getResponse().getStatus() + " " + body);
            } else if (d.description().startsWith("site file")) {
                // the engine's reader names the file (and the feature and field where it can), like an upload
                if (!error.path("file").asString().equals("harbour-warehouse.geojson")
                        && !error.path("field").asString().equals("site.fileText")) {
                    accepted.add(label + ": names neither file nor member: " + body);
                }
            } else if (error.path("field").asString().isBlank()
                    || !error.path("error").asString().contains("nothing was stored")) {
                accepted.add(label + ": names no member or does not say nothing was stored: " + body);
            }
        }
        assertThat(accepted).as("damaged files not refused with 400 naming what is wrong").isEmpty();
        assertThat(rows()).isEqualTo(before);
    }
}
