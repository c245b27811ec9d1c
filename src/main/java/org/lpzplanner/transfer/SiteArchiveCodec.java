package org.lpzplanner.transfer;

import static org.lpzplanner.transfer.ArchiveFields.array;
import static org.lpzplanner.transfer.ArchiveFields.bad;
import static org.lpzplanner.transfer.ArchiveFields.bool;
import static org.lpzplanner.transfer.ArchiveFields.instant;
import static org.lpzplanner.transfer.ArchiveFields.member;
import static org.lpzplanner.transfer.ArchiveFields.nonBlankText;
import static org.lpzplanner.transfer.ArchiveFields.nonNegative;
import static org.lpzplanner.transfer.ArchiveFields.number;
import static org.lpzplanner.transfer.ArchiveFields.object;
import static org.lpzplanner.transfer.ArchiveFields.optionalArray;
import static org.lpzplanner.transfer.ArchiveFields.optionalPositive;
import static org.lpzplanner.transfer.ArchiveFields.text;
import static org.lpzplanner.transfer.ArchiveFields.whole;

import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Pattern;
import org.lpzplanner.engine.design.SeparationDistance;
import org.lpzplanner.engine.io.Json;
import org.lpzplanner.engine.model.ProtectionLevel;
import org.lpzplanner.engine.risk.EntrySurgeProtection;
import org.lpzplanner.engine.risk.FireProvisions;
import org.lpzplanner.engine.risk.FireRisk;
import org.lpzplanner.engine.risk.LineEnvironment;
import org.lpzplanner.engine.risk.LineInstallation;
import org.lpzplanner.engine.risk.LineShielding;
import org.lpzplanner.engine.risk.LineTouchProtection;
import org.lpzplanner.engine.risk.LineTransformer;
import org.lpzplanner.engine.risk.LocationFactor;
import org.lpzplanner.engine.risk.SpecialHazard;
import org.lpzplanner.engine.risk.StructureUse;
import org.lpzplanner.engine.risk.SurfaceType;
import org.lpzplanner.engine.risk.TouchStepProtection;
import org.lpzplanner.engine.risk.WithstandVoltage;
import org.lpzplanner.risk.FlashDensitySource;
import org.lpzplanner.risk.RiskSettings;
import org.lpzplanner.risk.StoredLine;
import org.lpzplanner.keepout.KeepOutAreaService;
import org.lpzplanner.keepout.KeepOutOutline;
import org.lpzplanner.sites.CoverDetails;
import org.lpzplanner.system.InvalidInputException;
import tools.jackson.core.JacksonException;
import tools.jackson.databind.JsonNode;

/**
 * Writes a {@link SiteArchive} as a site export file (UTF-8 JSON, described in docs/site-export.md)
 * and reads one back, checking every member; a bad file is refused with the member's path.
 */
final class SiteArchiveCodec {

    static final String FORMAT = "lpz-planner-site-export";
    static final int FORMAT_VERSION = 1;

    private static final Pattern SHA256 = Pattern.compile("[0-9a-f]{64}");
    /** Column widths of the tables the rows go into. */
    private static final int NAME = 200;
    private static final int FILE_NAME = 255;
    private static final int ITEM_KEY = 80;
    private static final int REASON = 500;
    private static final int LONG_TEXT = 50_000_000;
    private static final int ACCOUNT = 254;
    private static final int COMMENT = 4000;
    private static final int CUT_NAME = 100;
    private static final int DETAIL = 1000;
    private static final int ACTION = 40;

    private SiteArchiveCodec() {}

    static byte[] write(SiteArchive archive) {
        Map<String, Object> document = new LinkedHashMap<>();
        document.put("format", FORMAT);
        document.put("formatVersion", FORMAT_VERSION);
        document.put("site", archive.site());
        document.put("earlierFiles", archive.earlierFiles());
        document.put("revisions", archive.revisions());
        document.put("riskInputs", archive.riskInputs());
        document.put("downConductors", archive.downConductors());
        document.put("metalInstallations", archive.metalInstallations());
        document.put("savedCuts", archive.savedCuts());
        document.put("keepOutAreas", archive.keepOutAreas());
        document.put("comments", archive.comments());
        document.put("auditTrail", archive.auditTrail());
        return Json.MAPPER.writerWithDefaultPrettyPrinter().writeValueAsBytes(document);
    }

    /** @throws InvalidInputException naming the member at fault */
    static SiteArchive read(byte[] bytes) {
        if (bytes == null || bytes.length == 0) {
            throw new InvalidInputException("file", "site export: the file is empty; nothing was stored");
        }
        JsonNode root;
        try {
            String text = StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT).decode(ByteBuffer.wrap(bytes)).toString();
            root = Json.MAPPER.readTree(text);
        } catch (CharacterCodingException e) {
            throw new InvalidInputException("file", "site export: the file is not UTF-8 text; nothing was stored");
        } catch (JacksonException e) {
            String where = e.getLocation() == null ? "" : " at line " + e.getLocation().getLineNr() + ", column "
                    + e.getLocation().getColumnNr();
            throw new InvalidInputException("file", "site export: the file is not valid JSON" + where
                    + "; nothing was stored");
        }
        if (root == null || !root.isObject()) {
            throw new InvalidInputException("file", "site export: the file must hold a JSON object with \"format\": \""
                    + FORMAT + "\"; nothing was stored");
        }
        JsonNode format = root.get("format");
        if (format == null || !format.isString() || !FORMAT.equals(format.stringValue())) {
            throw bad("format", "must be \"" + FORMAT + "\": this is not a site export of LPZ Planner");
        }
        long version = whole(root, "", "formatVersion", 1, Integer.MAX_VALUE);
        if (version != FORMAT_VERSION) {
            throw bad("formatVersion", "is " + version + "; this version of LPZ Planner reads version "
                    + FORMAT_VERSION);
        }
        SiteArchive.Site site = site(object(member(root, "", "site"), "site"));
        JsonNode risk = root.get("riskInputs");
        return new SiteArchive(site, earlierFiles(array(root, "", "earlierFiles")),
                revisions(array(root, "", "revisions")),
                risk == null || risk.isNull() ? null : riskInputs(object(risk, "riskInputs")),
                downConductors(optionalArray(root, "", "downConductors")),
                metalInstallations(optionalArray(root, "", "metalInstallations")),
                savedCuts(optionalArray(root, "", "savedCuts")),
                keepOutAreas(optionalArray(root, "", "keepOutAreas")),
                comments(optionalArray(root, "", "comments")), auditTrail(optionalArray(root, "", "auditTrail")));
    }

    private static List<SiteArchive.DownConductorEdit> downConductors(JsonNode array) {
        List<SiteArchive.DownConductorEdit> out = new ArrayList<>();
        Set<String> structures = new HashSet<>();
        for (int i = 0; i < array.size(); i++) {
            String p = "downConductors[" + i + "]";
            JsonNode node = object(array.get(i), p);
            String structure = nonBlankText(node, p, "structureId", NAME);
            if (!structures.add(structure)) {
                throw bad(p + ".structureId", "repeats structure " + structure);
            }
            JsonNode positions = array(node, p, "positions");
            if (positions.size() < 2 || positions.size() > 500) {
                throw bad(p + ".positions", "must hold 2 to 500 positions [x, y], got " + positions.size());
            }
            List<List<Double>> xy = new ArrayList<>();
            for (int k = 0; k < positions.size(); k++) {
                JsonNode pair = positions.get(k);
                if (!pair.isArray() || pair.size() != 2 || !pair.get(0).isNumber() || !pair.get(1).isNumber()
                        || !Double.isFinite(pair.get(0).asDouble()) || !Double.isFinite(pair.get(1).asDouble())) {
                    throw bad(p + ".positions[" + k + "]", "must be [x, y] in local metres");
                }
                xy.add(List.of(pair.get(0).asDouble(), pair.get(1).asDouble()));
            }
            out.add(new SiteArchive.DownConductorEdit(structure, xy, instant(node, p, "updatedAt")));
        }
        return out;
    }

    /** Cuts as the section page saves them: a name of at most 100 characters, ends 1 m to 2000 m apart. */
    private static List<SiteArchive.SavedCut> savedCuts(JsonNode array) {
        List<SiteArchive.SavedCut> out = new ArrayList<>();
        for (int i = 0; i < array.size(); i++) {
            String p = "savedCuts[" + i + "]";
            JsonNode node = object(array.get(i), p);
            String name = nonBlankText(node, p, "name", CUT_NAME);
            double x1 = number(node, p, "x1");
            double y1 = number(node, p, "y1");
            double x2 = number(node, p, "x2");
            double y2 = number(node, p, "y2");
            double length = Math.hypot(x2 - x1, y2 - y1);
            if (!(length >= 1 && length <= 2000)) {
                throw bad(p, "is " + length + " m long; a saved cut's ends must be 1 m to 2000 m apart");
            }
            out.add(new SiteArchive.SavedCut(name, x1, y1, x2, y2, instant(node, p, "createdAt")));
        }
        return out;
    }

    /** Areas as the design page stores them (checked by {@link KeepOutOutline}); exports before them have none. */
    private static List<SiteArchive.KeepOutArea> keepOutAreas(JsonNode array) {
        if (array.size() > KeepOutAreaService.MAX_AREAS) {
            throw bad("keepOutAreas", "holds " + array.size() + " areas; a site keeps at most "
                    + KeepOutAreaService.MAX_AREAS);
        }
        List<SiteArchive.KeepOutArea> out = new ArrayList<>();
        for (int i = 0; i < array.size(); i++) {
            String p = "keepOutAreas[" + i + "]";
            JsonNode node = object(array.get(i), p);
            String name = nonBlankText(node, p, "name", KeepOutAreaService.MAX_NAME);
            List<double[]> corners;
            try {
                corners = KeepOutOutline.read(node.get("corners"), "corners");
            } catch (InvalidInputException e) {
                throw bad(p + "." + e.field(), "is unusable: " + e.getMessage());
            }
            out.add(new SiteArchive.KeepOutArea(name.strip(), corners.stream().map(c -> List.of(c[0], c[1])).toList(),
                    instant(node, p, "createdAt")));
        }
        return out;
    }

    private static List<SiteArchive.MetalInstallation> metalInstallations(JsonNode array) {
        List<SiteArchive.MetalInstallation> out = new ArrayList<>();
        for (int i = 0; i < array.size(); i++) {
            String p = "metalInstallations[" + i + "]";
            JsonNode node = object(array.get(i), p);
            out.add(new SiteArchive.MetalInstallation(nonBlankText(node, p, "name", NAME), number(node, p, "x"),
                    number(node, p, "y"), nonNegative(node, p, "z"),
                    choice(node, p, "material", SeparationDistance.Material.class), instant(node, p, "createdAt")));
        }
        return out;
    }

    private static List<SiteArchive.Comment> comments(JsonNode array) {
        List<SiteArchive.Comment> out = new ArrayList<>();
        for (int i = 0; i < array.size(); i++) {
            String p = "comments[" + i + "]";
            JsonNode node = object(array.get(i), p);
            out.add(new SiteArchive.Comment(nonBlankText(node, p, "author", ACCOUNT),
                    nonBlankText(node, p, "body", COMMENT), instant(node, p, "createdAt")));
        }
        return out;
    }

    private static List<SiteArchive.AuditEntry> auditTrail(JsonNode array) {
        List<SiteArchive.AuditEntry> out = new ArrayList<>();
        for (int i = 0; i < array.size(); i++) {
            String p = "auditTrail[" + i + "]";
            JsonNode node = object(array.get(i), p);
            out.add(new SiteArchive.AuditEntry(nonBlankText(node, p, "actor", ACCOUNT),
                    nonBlankText(node, p, "action", ACTION), text(node, p, "detail", DETAIL),
                    instant(node, p, "createdAt")));
        }
        return out;
    }

    private static List<SiteArchive.Review> reviews(JsonNode array, String path) {
        List<SiteArchive.Review> out = new ArrayList<>();
        Set<String> reviewers = new HashSet<>();
        for (int i = 0; i < array.size(); i++) {
            String p = path + "[" + i + "]";
            JsonNode node = object(array.get(i), p);
            String reviewer = nonBlankText(node, p, "reviewer", ACCOUNT);
            if (!reviewers.add(reviewer)) {
                throw bad(p + ".reviewer", "repeats reviewer " + reviewer);
            }
            out.add(new SiteArchive.Review(reviewer, instant(node, p, "reviewedAt")));
        }
        return out;
    }

    private static SiteArchive.Site site(JsonNode node) {
        String p = "site";
        return new SiteArchive.Site(nonBlankText(node, p, "name", NAME), level(node, p),
                optionalPositive(node, p, "customRadius"), nonBlankText(node, p, "fileName", FILE_NAME),
                nonBlankText(node, p, "fileText", LONG_TEXT), instant(node, p, "createdAt"),
                instant(node, p, "updatedAt"), whole(node, p, "version", 0, Long.MAX_VALUE),
                coverDetail(node, p, "address"), coverDetail(node, p, "designer"));
    }

    /** An address or designer: checked as the site page checks it; absent or null (older files) is empty. */
    private static String coverDetail(JsonNode node, String path, String name) {
        String value = optionalText(node, path, name, CoverDetails.MAX_LENGTH);
        try {
            return value == null ? "" : CoverDetails.check(path + "." + name, value);
        } catch (InvalidInputException e) {
            throw bad(e.field(), e.getMessage().substring(e.field().length()).strip());
        }
    }

    private static List<SiteArchive.EarlierFile> earlierFiles(JsonNode array) {
        List<SiteArchive.EarlierFile> out = new ArrayList<>();
        Set<Integer> numbers = new HashSet<>();
        for (int i = 0; i < array.size(); i++) {
            String p = "earlierFiles[" + i + "]";
            JsonNode node = object(array.get(i), p);
            int number = (int) whole(node, p, "number", 1, Integer.MAX_VALUE);
            if (!numbers.add(number)) {
                throw bad(p + ".number", "repeats file number " + number);
            }
            out.add(new SiteArchive.EarlierFile(number, nonBlankText(node, p, "fileName", FILE_NAME),
                    nonBlankText(node, p, "text", LONG_TEXT), instant(node, p, "replacedAt")));
        }
        return out;
    }

    private static List<SiteArchive.Revision> revisions(JsonNode array) {
        List<SiteArchive.Revision> out = new ArrayList<>();
        Set<Integer> numbers = new HashSet<>();
        for (int i = 0; i < array.size(); i++) {
            String p = "revisions[" + i + "]";
            JsonNode node = object(array.get(i), p);
            int revision = (int) whole(node, p, "revision", 1, Integer.MAX_VALUE);
            if (!numbers.add(revision)) {
                throw bad(p + ".revision", "repeats revision " + revision);
            }
            String sha = text(node, p, "inputsSha256", 64);
            if (!SHA256.matcher(sha).matches()) {
                throw bad(p + ".inputsSha256", "must be 64 lower-case hexadecimal digits");
            }
            double radius = number(node, p, "sphereRadius");
            double resolution = number(node, p, "resolution");
            if (radius <= 0 || resolution <= 0) {
                throw bad(p + (radius <= 0 ? ".sphereRadius" : ".resolution"), "must be positive");
            }
            out.add(new SiteArchive.Revision(revision, level(node, p), radius, resolution, sha,
                    nonNegative(node, p, "exposedRoofArea"), nonNegative(node, p, "exposedEdgeLength"),
                    (int) whole(node, p, "exposedCorners", 0, Integer.MAX_VALUE),
                    (int) whole(node, p, "facadeBands", 0, Integer.MAX_VALUE),
                    nonNegative(node, p, "protectedGroundArea"), bool(node, p, "fullyProtected"),
                    nonBlankText(node, p, "resultGeoJson", LONG_TEXT),
                    whole(node, p, "engineMillis", 0, Long.MAX_VALUE), instant(node, p, "createdAt"),
                    accepted(array(node, p, "accepted"), p + ".accepted"), optionalText(node, p, "siteName", NAME),
                    optionalText(node, p, "sourceName", FILE_NAME), optionalText(node, p, "sourceText", LONG_TEXT),
                    optionalPositive(node, p, "tolerance"), reviews(optionalArray(node, p, "reviews"), p + ".reviews")));
        }
        return out;
    }

    private static List<SiteArchive.AcceptedItem> accepted(JsonNode array, String path) {
        List<SiteArchive.AcceptedItem> out = new ArrayList<>();
        Set<String> keys = new HashSet<>();
        for (int i = 0; i < array.size(); i++) {
            String p = path + "[" + i + "]";
            JsonNode node = object(array.get(i), p);
            String key = nonBlankText(node, p, "key", ITEM_KEY);
            if (!keys.add(key)) {
                throw bad(p + ".key", "repeats item " + key);
            }
            out.add(new SiteArchive.AcceptedItem(key, nonBlankText(node, p, "reason", REASON),
                    instant(node, p, "createdAt")));
        }
        return out;
    }

    /**
     * The risk inputs. An export written before incoming lines had their own factors has no member
     * {@code lines}: its inputs came from a form that pre-filled values since found unsafe as
     * defaults, so a value equal to such a former default is cleared, as migration V15 clears stored
     * ones (T_d 25, ordinary fire risk, no special hazard, other structure); its lines are the count
     * and one length, read like the rows of that time.
     */
    private static SiteArchive.RiskInputs riskInputs(JsonNode node) {
        String p = "riskInputs";
        boolean earlier = !node.has("lines");
        JsonNode count = node.get("lineCount");
        Integer lineCount = count == null || count.isNull() ? null
                : (int) whole(node, p, "lineCount", 0, RiskSettings.MAX_LINES);
        List<StoredLine> lines = earlier ? null : lines(node.get("lines"), p + ".lines");
        if (!earlier && !java.util.Objects.equals(lineCount, lines == null ? null : lines.size())) {
            throw bad(p + ".lineCount", "must be the number of entries of lines (" + (lines == null ? "null"
                    : lines.size()) + "), got " + lineCount);
        }
        String source = optionalChoice(node, p, "flashDensitySource", FlashDensitySource.class);
        Double days = optionalPositive(node, p, "thunderstormDays");
        String fireRisk = optionalChoice(node, p, "fireRisk", FireRisk.class);
        String hazard = optionalChoice(node, p, "specialHazard", SpecialHazard.class);
        String use = optionalChoice(node, p, "structureUse", StructureUse.class);
        if (earlier) {
            days = "THUNDERSTORM_DAYS".equals(source) && days != null && days == 25 ? null : days;
            fireRisk = "ORDINARY".equals(fireRisk) ? null : fireRisk;
            hazard = "NONE".equals(hazard) ? null : hazard;
            use = "OTHER".equals(use) ? null : use;
        }
        String lifeCritical = null;
        if (node.hasNonNull("lifeCriticalSystems")) {
            lifeCritical = text(node, p, "lifeCriticalSystems", 40);
            if (!lifeCritical.equals("YES") && !lifeCritical.equals("NO")) {
                throw bad(p + ".lifeCriticalSystems", "must be YES or NO, got \"" + lifeCritical + "\"");
            }
        }
        return new SiteArchive.RiskInputs(source, optionalPositive(node, p, "flashDensity"), days,
                locationFactor(node, p), choice(node, p, "surfaceType", SurfaceType.class), fireRisk,
                choice(node, p, "fireProvisions", FireProvisions.class), hazard, use,
                choice(node, p, "touchStep", TouchStepProtection.class), nonNegative(node, p, "personsInZone"),
                nonNegative(node, p, "personsTotal"), nonNegative(node, p, "hoursPerYear"), lineCount,
                optionalPositive(node, p, "lineLength"), instant(node, p, "updatedAt"), lifeCritical, lines);
    }

    /** The incoming lines: null (not answered) or an array of at most 20 lines, each member checked. */
    private static List<StoredLine> lines(JsonNode node, String path) {
        if (node == null || node.isNull()) {
            return null;
        }
        if (!node.isArray()) {
            throw bad(path, "must be an array or null");
        }
        if (node.size() > RiskSettings.MAX_LINES) {
            throw bad(path, "must hold at most " + RiskSettings.MAX_LINES + " lines, got " + node.size());
        }
        List<StoredLine> out = new ArrayList<>();
        for (int i = 0; i < node.size(); i++) {
            String p = path + "[" + i + "]";
            JsonNode line = object(node.get(i), p);
            double length = number(line, p, "length");
            if (!(length > 0) || length > RiskSettings.MAX_LINE_LENGTH) {
                throw bad(p + ".length", "must be above 0 and at most " + (long) RiskSettings.MAX_LINE_LENGTH
                        + " m, got " + length);
            }
            out.add(new StoredLine(choice(line, p, "installation", LineInstallation.class), length,
                    choice(line, p, "environment", LineEnvironment.class),
                    choice(line, p, "transformer", LineTransformer.class),
                    choice(line, p, "surgeProtection", EntrySurgeProtection.class),
                    choice(line, p, "shielding", LineShielding.class),
                    choice(line, p, "withstandVoltage", WithstandVoltage.class),
                    choice(line, p, "touchProtection", LineTouchProtection.class)));
        }
        return out;
    }

    /** A location class, "SUGGESTED" (the user chose the app's suggestion) or null (not chosen). */
    private static String locationFactor(JsonNode node, String path) {
        if (!node.hasNonNull("locationFactor")) {
            return null;
        }
        JsonNode value = node.get("locationFactor");
        if (value.isString() && RiskSettings.SUGGESTED_LOCATION.equals(value.stringValue())) {
            return value.stringValue();
        }
        return choice(node, path, "locationFactor", LocationFactor.class);
    }

    /** A choice that may be left empty (null or absent: not chosen yet). */
    private static <E extends Enum<E>> String optionalChoice(JsonNode node, String path, String name,
            Class<E> choices) {
        return node.hasNonNull(name) ? choice(node, path, name, choices) : null;
    }

    private static <E extends Enum<E>> String choice(JsonNode node, String path, String name, Class<E> choices) {
        String value = text(node, path, name, 40);
        try {
            return Enum.valueOf(choices, value).name();
        } catch (IllegalArgumentException e) {
            throw bad(path + "." + name, "must be one of " + java.util.Arrays.toString(choices.getEnumConstants())
                    + ", got \"" + value + "\"");
        }
    }

    private static String optionalText(JsonNode node, String path, String name, int maxLength) {
        JsonNode value = node.get(name);
        return value == null || value.isNull() ? null : text(node, path, name, maxLength);
    }

    private static String level(JsonNode node, String path) {
        String value = text(node, path, "level", 3);
        try {
            return ProtectionLevel.valueOf(value).name();
        } catch (IllegalArgumentException e) {
            throw bad(path + ".level", "must be one of I, II, III, IV, got \"" + value + "\"");
        }
    }
}
