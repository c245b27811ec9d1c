package org.lpzplanner.sites;

import java.util.Locale;
import org.lpzplanner.engine.io.SiteDocument;
import org.lpzplanner.engine.io.SiteFormatException;
import org.lpzplanner.engine.io.SiteReader;

/**
 * Turns stored or uploaded site text into a site, choosing the format as the command line does:
 * {@code .json}/{@code .geojson} are GeoJSON, {@code .wkt}/{@code .txt} are WKT, anything else is
 * GeoJSON when it starts with <code>{</code> and WKT otherwise.
 */
public final class SiteFiles {

    private SiteFiles() {
    }

    /** Whether the file is read as GeoJSON (else WKT), by the rule {@link #read} follows. */
    public static boolean isGeoJson(String text, String sourceName) {
        String lower = sourceName.toLowerCase(Locale.ROOT);
        if (lower.endsWith(".json") || lower.endsWith(".geojson")) {
            return true;
        }
        if (lower.endsWith(".wkt") || lower.endsWith(".txt")) {
            return false;
        }
        String body = text.startsWith("\uFEFF") ? text.substring(1) : text;
        return body.stripLeading().startsWith("{");
    }

    /**
     * Reads a site from its text.
     *
     * @param sourceName the file name, used to pick the format and in messages
     * @throws SiteFormatException naming file, feature and field when the text is not a valid site
     */
    public static SiteDocument read(String text, String sourceName) {
        String body = text.startsWith("\uFEFF") ? text.substring(1) : text;
        String lower = sourceName.toLowerCase(Locale.ROOT);
        if (lower.endsWith(".json") || lower.endsWith(".geojson")) {
            return SiteReader.readGeoJson(body, sourceName);
        }
        if (lower.endsWith(".wkt") || lower.endsWith(".txt")) {
            return SiteReader.readWkt(body, sourceName);
        }
        return body.stripLeading().startsWith("{") ? SiteReader.readGeoJson(body, sourceName)
                : SiteReader.readWkt(body, sourceName);
    }
}
