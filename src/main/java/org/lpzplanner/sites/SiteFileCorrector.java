package org.lpzplanner.sites;

import java.math.BigDecimal;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.lpzplanner.engine.io.Json;
import org.lpzplanner.system.InvalidInputException;
import tools.jackson.core.JacksonException;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.node.ObjectNode;

/**
 * Writes a corrected site file in the format of the original: a GeoJSON file gets new values in
 * the structure feature's {@code properties} (everything else, including member order, is kept),
 * a WKT file gets a new height at the end of the structure's line (every other line, comment and
 * line ending is kept). The result is not checked here; the caller reads it back through the
 * engine's reader before storing it.
 */
final class SiteFileCorrector {

    private static final List<String> ROOF_FORMS = List.of("flat", "gable", "hip", "shed");
    /** Roof fields and the one or more roof forms each belongs to (as the site-format guide lists them). */
    private static final Map<String, List<String>> ROOF_FIELDS = Map.of(
            "parapet", List.of("flat"),
            "ridgeHeight", List.of("gable", "hip", "shed"),
            "ridgeBearing", List.of("gable"),
            "highSideBearing", List.of("shed"));
    private static final Pattern LINE_END = Pattern.compile("\\R");
    private static final Pattern WKT_HEIGHT = Pattern.compile("^(\\s*;?\\s*)(\\S+)(\\s*)$");

    private SiteFileCorrector() {
    }

    /**
     * The file text with the correction applied.
     *
     * @throws InvalidInputException when a value is not a number, names no roof form, does not fit
     *         the format (WKT holds heights only) or the structure does not exist
     */
    static String correct(String text, String sourceName, StructureCorrection correction) {
        if (correction.isEmpty()) {
            throw new InvalidInputException("height", "enter at least one value to correct");
        }
        return SiteFiles.isGeoJson(text, sourceName) ? correctGeoJson(text, correction) : correctWkt(text, correction);
    }

    private static String correctGeoJson(String text, StructureCorrection c) {
        String body = text.startsWith("\uFEFF") ? text.substring(1) : text;
        JsonNode root;
        try {
            root = Json.MAPPER.readTree(body);
        } catch (JacksonException e) {
            throw new InvalidInputException("file", "the stored site file cannot be read as JSON");
        }
        ObjectNode properties = structureProperties(root, c.index());
        if (StructureCorrection.given(c.height())) {
            properties.put("height", number("height", c.height()));
        }
        String current = properties.path("roof").isString() ? properties.path("roof").stringValue() : "flat";
        String form = current;
        if (StructureCorrection.given(c.roof())) {
            form = c.roof().strip().toLowerCase(Locale.ROOT);
            if (!ROOF_FORMS.contains(form)) {
                throw new InvalidInputException("roof", "roof must be one of " + String.join(", ", ROOF_FORMS)
                        + ", got \"" + c.roof().strip() + "\"");
            }
            properties.put("roof", form);
            if (!form.equals(current)) {
                for (Map.Entry<String, List<String>> field : ROOF_FIELDS.entrySet()) {
                    if (!field.getValue().contains(form)) {
                        properties.remove(field.getKey());
                    }
                }
            }
        }
        if (StructureCorrection.given(c.ridgeHeight())) {
            properties.put("ridgeHeight", number("ridgeHeight", c.ridgeHeight()));
        }
        if (StructureCorrection.given(c.parapet())) {
            properties.put("parapet", number("parapet", c.parapet()));
        }
        if (StructureCorrection.given(c.bearing())) {
            BigDecimal bearing = number("bearing", c.bearing());
            switch (form) {
                case "gable" -> properties.put("ridgeBearing", bearing);
                case "shed" -> properties.put("highSideBearing", bearing);
                default -> throw new InvalidInputException("bearing",
                        "a bearing applies to gable roofs (ridge) and shed roofs (high side) only, not to a "
                                + form + " roof");
            }
        }
        return Json.MAPPER.writerWithDefaultPrettyPrinter().writeValueAsString(root) + "\n";
    }

    private static ObjectNode structureProperties(JsonNode root, int index) {
        int seen = -1;
        for (JsonNode feature : root.path("features")) {
            JsonNode properties = feature.path("properties");
            if (properties instanceof ObjectNode object && "structure".equals(properties.path("kind").stringValue())) {
                seen++;
                if (seen == index) {
                    return object;
                }
            }
        }
        throw noStructure(index);
    }

    private static String correctWkt(String text, StructureCorrection c) {
        if (c.changesRoof()) {
            throw new InvalidInputException(StructureCorrection.given(c.roof()) ? "roof" : StructureCorrection.given(c.ridgeHeight()) ? "ridgeHeight"
                    : StructureCorrection.given(c.bearing()) ? "bearing" : "parapet",
                    "a WKT site file holds flat-roofed structures without parapets; only the height can be corrected");
        }
        String height = number("height", c.height()).toString();
        StringBuilder out = new StringBuilder(text.length() + 8);
        Matcher ends = LINE_END.matcher(text);
        int start = 0;
        int seen = -1;
        boolean done = false;
        while (start <= text.length()) {
            boolean found = ends.find(start);
            int end = found ? ends.start() : text.length();
            String line = text.substring(start, end);
            String content = start == 0 && line.startsWith("\uFEFF") ? line.substring(1) : line;
            if (!done && !content.isBlank() && !content.strip().startsWith("#") && ++seen == c.index()) {
                int close = line.lastIndexOf(')');
                Matcher rest = WKT_HEIGHT.matcher(close < 0 ? "" : line.substring(close + 1));
                if (!rest.matches()) {
                    throw new InvalidInputException("height", "the structure's line in the stored file has no height");
                }
                line = line.substring(0, close + 1) + rest.group(1) + height + rest.group(3);
                done = true;
            }
            out.append(line);
            if (!found) {
                break;
            }
            out.append(ends.group());
            start = ends.end();
        }
        if (!done) {
            throw noStructure(c.index());
        }
        return out.toString();
    }

    private static BigDecimal number(String field, String text) {
        try {
            return new BigDecimal(text.strip());
        } catch (NumberFormatException e) {
            throw new InvalidInputException(field, field + " must be a number, got \"" + text.strip() + "\"");
        }
    }

    private static InvalidInputException noStructure(int index) {
        return new InvalidInputException("structure", "the site has no structure number " + (index + 1));
    }
}
