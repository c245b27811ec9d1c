package org.lpzplanner.sites;

import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.time.Clock;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.List;
import org.lpzplanner.engine.io.SiteDocument;
import org.lpzplanner.engine.io.SiteFormatException;
import org.lpzplanner.engine.model.ProtectionLevel;
import org.lpzplanner.system.InvalidInputException;
import org.lpzplanner.system.Settings;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;

/**
 * Stores, lists and removes sites. A site is stored only when its file reads without error, so
 * every stored site can be analysed; the file is kept byte for byte.
 */
@Service
public class SiteService {

    /** Longest site name kept. */
    public static final int MAX_NAME_LENGTH = 200;

    private final SiteRepository sites;
    private final Clock clock;

    public SiteService(SiteRepository sites, Clock clock) {
        this.sites = sites;
        this.clock = clock;
    }

    /**
     * Checks and stores an uploaded site file.
     *
     * @param fileName  the uploaded file's name (any folder part is dropped); picks the format
     * @param content   the file's bytes, UTF-8
     * @param name      the site's name, or blank to use the name in the file (or the file name)
     * @param levelText protection level "I".."IV", or blank for level II
     * @param radiusText custom sphere radius in metres, or blank for the level's own
     * @return the stored site
     * @throws SiteFormatException   when the file is not a valid site (nothing is stored)
     * @throws InvalidInputException when the name, level or radius cannot be used (nothing is stored)
     */
    @Transactional
    public StoredSite create(String fileName, byte[] content, String name, String levelText, String radiusText) {
        ProtectionLevel level = Settings.level(levelText, ProtectionLevel.II);
        Double radius = Settings.radius(radiusText);
        String sourceName = cleanFileName(fileName);
        String text = utf8(content, sourceName);
        SiteDocument document = SiteFiles.read(text, sourceName);
        String siteName = name == null || name.isBlank() ? document.site().name() : name.strip();
        if (siteName == null || siteName.isBlank()) {
            siteName = sourceName;
        }
        if (siteName.length() > MAX_NAME_LENGTH) {
            throw new InvalidInputException("name", "name must be at most " + MAX_NAME_LENGTH
                    + " characters, got " + siteName.length());
        }
        Instant now = clock.instant().truncatedTo(ChronoUnit.MILLIS);
        return sites.insert(siteName, level, radius, sourceName, text, now);
    }

    /** All stored sites, most recently changed first. */
    @Transactional(readOnly = true)
    public List<StoredSite> list() {
        return sites.findAll();
    }

    /** @throws SiteNotFoundException when no site has this id */
    @Transactional(readOnly = true)
    public StoredSite get(long id) {
        return sites.findById(id).orElseThrow(() -> new SiteNotFoundException(id));
    }

    /** Removes a site with all its analyses. @throws SiteNotFoundException when no site has this id */
    @Transactional
    public void delete(long id) {
        if (!sites.delete(id)) {
            throw new SiteNotFoundException(id);
        }
    }

    public long count() {
        return sites.count();
    }

    /** The stored site read back into the engine's model. */
    public SiteDocument document(StoredSite site) {
        return SiteFiles.read(site.sourceText(), site.sourceName());
    }

    /** The file's own name without any folder part; "site.geojson" when there is none. */
    static String cleanFileName(String fileName) {
        if (fileName == null || fileName.isBlank()) {
            return "site.geojson";
        }
        String name = fileName.replace('\\', '/');
        name = name.substring(name.lastIndexOf('/') + 1).strip();
        name = name.replaceAll("[\\p{Cntrl}\"]", "_");
        if (name.isEmpty()) {
            return "site.geojson";
        }
        return name.length() > 255 ? name.substring(name.length() - 255) : name;
    }

    private static String utf8(byte[] content, String sourceName) {
        if (content == null || content.length == 0) {
            throw new SiteFormatException(sourceName, "the file is empty");
        }
        try {
            return StandardCharsets.UTF_8.newDecoder()
                    .onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT)
                    .decode(ByteBuffer.wrap(content)).toString();
        } catch (CharacterCodingException e) {
            throw new SiteFormatException(sourceName, "the file is not UTF-8 text; save it as UTF-8 and try again", e);
        }
    }
}
