package org.lpzplanner.engine.io;

import java.io.IOException;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;

/**
 * Reads site files into {@link SiteDocument}s. Two formats are understood, both described in
 * docs/site-format.md:
 *
 * <ul>
 *   <li>GeoJSON: a FeatureCollection of structures, rooftop objects, rods and conductors, in WGS84
 *       lon/lat (projected onto a local plane) or, when declared, local metres;</li>
 *   <li>WKT: one flat-roofed structure per line in local metres.</li>
 * </ul>
 *
 * <p>Every problem is reported as a {@link SiteFormatException} whose message names the file, the
 * feature or line, the field and what is wrong. Nothing is silently repaired.
 */
public final class SiteReader {

    private SiteReader() {}

    /**
     * Reads a site file as UTF-8. The format follows the extension: {@code .json} and
     * {@code .geojson} are GeoJSON, {@code .wkt} and {@code .txt} are WKT; any other file is GeoJSON
     * if its first non-blank character is <code>{</code>, WKT otherwise.
     *
     * @throws SiteFormatException when the file is missing or unreadable, or its content is invalid;
     *                             the source named is the file name without its directory
     */
    public static SiteDocument read(Path file) {
        Path fileName = file.getFileName();
        String source = fileName == null ? file.toString() : fileName.toString();
        String text = text(file, source);
        String lower = source.toLowerCase(Locale.ROOT);
        if (lower.endsWith(".json") || lower.endsWith(".geojson")) {
            return readGeoJson(text, source);
        }
        if (lower.endsWith(".wkt") || lower.endsWith(".txt")) {
            return readWkt(text, source);
        }
        return text.stripLeading().startsWith("{") ? readGeoJson(text, source) : readWkt(text, source);
    }

    /**
     * Reads GeoJSON site text.
     *
     * @param sourceName the name used in messages and, without its extension, as the site name
     *                   when the file gives none
     * @throws SiteFormatException when the text is not a valid site
     */
    public static SiteDocument readGeoJson(String text, String sourceName) {
        return new GeoJsonSiteParser(sourceOrDefault(sourceName)).parse(text);
    }

    /**
     * Reads WKT site text (one structure per line, local metres).
     *
     * @param sourceName the name used in messages and, without its extension, as the site name
     * @throws SiteFormatException when the text is not a valid site
     */
    public static SiteDocument readWkt(String text, String sourceName) {
        return new WktSiteParser(sourceOrDefault(sourceName)).parse(text);
    }

    /** A file name without its last extension: "north-yard.geojson" gives "north-yard". */
    static String baseName(String source) {
        int dot = source.lastIndexOf('.');
        return dot > 0 ? source.substring(0, dot) : source;
    }

    private static String sourceOrDefault(String sourceName) {
        return sourceName == null || sourceName.isBlank() ? "input" : sourceName;
    }

    private static String text(Path file, String source) {
        if (!Files.exists(file)) {
            throw new SiteFormatException(source, "the file does not exist (looked for " + file + ")");
        }
        if (Files.isDirectory(file)) {
            throw new SiteFormatException(source, "is a folder, not a site file");
        }
        try {
            String text = Files.readString(file, StandardCharsets.UTF_8);
            // A byte-order mark is legal in UTF-8 files from some editors but not in JSON.
            return text.startsWith("\uFEFF") ? text.substring(1) : text;
        } catch (CharacterCodingException e) {
            throw new SiteFormatException(source, "the file is not UTF-8 text; save it as UTF-8 and try again", e);
        } catch (IOException e) {
            throw new SiteFormatException(source, "the file cannot be read: " + e.getMessage(), e);
        }
    }
}
