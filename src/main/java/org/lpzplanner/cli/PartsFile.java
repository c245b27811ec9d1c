package org.lpzplanner.cli;

import java.util.Objects;
import org.lpzplanner.engine.io.Json;
import org.lpzplanner.engine.io.SiteDocument;
import org.lpzplanner.engine.io.SiteFormatException;
import org.lpzplanner.sites.SiteFiles;
import tools.jackson.core.JacksonException;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.node.ArrayNode;
import tools.jackson.databind.node.ObjectNode;

/**
 * A parts file for {@code --parts}: a GeoJSON FeatureCollection of rod and conductor features only,
 * in the site file's coordinates (the same {@code coordinates} member), written as in the site file
 * format. Its parts are added to the site file's, and the two are read as one site file, so the
 * result is exactly what one file with all the features would give.
 */
final class PartsFile {


    private PartsFile() {
    }

    /**
     * The site file's text with the parts file's features appended.
     *
     * @throws CliException naming the parts file (and feature) when it cannot be used
     */
    static String merge(String siteText, String siteName, String partsText, String partsName) {
        JsonNode site = parse(siteText, siteName, "the site file must be GeoJSON to take a parts file");
        JsonNode parts = parse(partsText, partsName, "not valid JSON");
        if (!"FeatureCollection".equals(parts.path("type").asString("")) || !parts.path("features").isArray()) {
            throw new CliException(partsName + ": must be a GeoJSON FeatureCollection of rod and conductor features");
        }
        if (!Objects.equals(site.path("coordinates").asString(""), parts.path("coordinates").asString(""))) {
            throw new CliException(partsName + ": field \"coordinates\": must match the site file's (\""
                    + site.path("coordinates").asString("longitude/latitude") + "\") so both are in the same"
                    + " coordinates");
        }
        ArrayNode features = (ArrayNode) site.path("features");
        int i = 0;
        for (JsonNode f : parts.path("features")) {
            String kind = f.path("properties").path("kind").asString("");
            if (!kind.equals("rod") && !kind.equals("conductor")) {
                throw new CliException(partsName + ": feature " + i + ", field \"kind\": must be \"rod\" or"
                        + " \"conductor\" in a parts file, got \"" + kind + "\"");
            }
            features.add(f);
            i++;
        }
        return Json.MAPPER.writeValueAsString(site);
    }

    /**
     * Reads the merged text; a problem in an appended feature is reported against the parts file with
     * its own feature number.
     */
    static SiteDocument read(String merged, String siteName, int siteFeatures, String partsName) {
        try {
            return SiteFiles.read(merged, siteName);
        } catch (SiteFormatException e) {
            Integer index = e.featureIndex();
            if (index != null && index >= siteFeatures) {
                String name = e.featureName() == null ? "" : " (\"" + e.featureName() + "\")";
                String field = e.field() == null ? "" : ", field \"" + e.field() + "\"";
                throw new CliException(partsName + ": feature " + (index - siteFeatures) + name + field + ": "
                        + e.problem(), e);
            }
            throw new CliException(e.getMessage(), e);
        }
    }

    /** Number of features in GeoJSON site text. */
    static int featureCount(String siteText) {
        return Json.MAPPER.readTree(siteText).path("features").size();
    }

    private static JsonNode parse(String text, String name, String problem) {
        try {
            JsonNode node = Json.MAPPER.readTree(text.startsWith("\uFEFF") ? text.substring(1) : text);
            if (!(node instanceof ObjectNode)) {
                throw new CliException(name + ": " + problem);
            }
            return node;
        } catch (JacksonException e) {
            throw new CliException(name + ": " + problem);
        }
    }
}
