package org.lpzplanner.sites;

import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.time.Clock;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.List;
import org.lpzplanner.accounts.CurrentAccount;
import org.lpzplanner.audit.AuditTrail;
import org.lpzplanner.engine.io.SiteDocument;
import org.lpzplanner.engine.io.SiteFormatException;
import org.lpzplanner.engine.model.ProtectionLevel;
import org.lpzplanner.system.InvalidInputException;
import org.lpzplanner.system.Settings;
import org.springframework.context.ApplicationEventPublisher;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;

/**
 * Stores, lists and removes sites. A site is stored only when its file reads without error, so
 * every stored site can be analysed; the file is kept byte for byte.
 *
 * <p>Every site belongs to a team, and every method works only on the sites of the team acting on
 * this thread ({@link CurrentAccount#teamId()}): another team's site is reported as not found,
 * exactly like a missing one. Every change is recorded in the site's {@link AuditTrail}.
 */
@Service
public class SiteService {

    /** Longest site name kept. */
    public static final int MAX_NAME_LENGTH = 200;

    private final SiteRepository sites;
    private final AuditTrail audit;
    private final Clock clock;
    private final ApplicationEventPublisher events;
    private final ParsedSites parsed;

    public SiteService(SiteRepository sites, AuditTrail audit, Clock clock, ApplicationEventPublisher events,
            ParsedSites parsed) {
        this.sites = sites;
        this.audit = audit;
        this.clock = clock;
        this.events = events;
        this.parsed = parsed;
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
        checkName(siteName);
        Instant now = clock.instant().truncatedTo(ChronoUnit.MILLIS);
        StoredSite site = sites.insert(CurrentAccount.teamId(), siteName, level, radius, sourceName, text, now);
        parsed.keepAfterCommit(site.id(), site.version(), text, document);
        audit.record(site.id(), UPLOAD, uploadDetail(site));
        return site;
    }

    /** The audit trail's action for an upload. */
    public static final String UPLOAD = "upload";

    /** What the audit trail says of an upload, e.g. {@code uploaded yard.wkt as "Yard", level II}. */
    public static String uploadDetail(StoredSite site) {
        return "uploaded " + site.sourceName() + " as \"" + site.name() + "\", level " + site.level().name()
                + (site.customRadius() == null ? "" : ", radius " + site.customRadius() + " m");
    }

    /** The team's stored sites, most recently changed first. */
    @Transactional(readOnly = true)
    public List<StoredSite> list() {
        return sites.findAll(CurrentAccount.teamId());
    }

    /** @throws SiteNotFoundException when the team has no site with this id */
    @Transactional(readOnly = true)
    public StoredSite get(long id) {
        return sites.findById(id, CurrentAccount.teamId()).orElseThrow(() -> new SiteNotFoundException(id));
    }

    /** Removes a site with all its analyses. @throws SiteNotFoundException when no site has this id */
    @Transactional
    public void delete(long id) {
        StoredSite site = get(id);
        if (!sites.delete(id)) {
            throw new SiteNotFoundException(id);
        }
        parsed.forget(id);
        audit.record(id, "delete", "deleted \"" + site.name() + "\"");
    }

    /**
     * Removes a site with all its analyses, provided it is still at {@code expectedVersion}.
     *
     * @throws SiteNotFoundException when no site has this id
     * @throws org.springframework.dao.OptimisticLockingFailureException when it changed meanwhile
     */
    @Transactional
    public void delete(long id, long expectedVersion) {
        StoredSite site = get(id);
        if (!sites.delete(id, expectedVersion)) {
            throw new SiteNotFoundException(id);
        }
        parsed.forget(id);
        audit.record(id, "delete", "deleted \"" + site.name() + "\"");
    }

    /**
     * Changes a site's name, protection level or custom radius; a null value keeps the stored one,
     * a blank radius goes back to the level's own radius.
     *
     * @throws SiteNotFoundException     when no site has this id
     * @throws InvalidInputException     when a value cannot be used (nothing changes)
     * @throws org.springframework.dao.OptimisticLockingFailureException when the site is no longer
     *         at {@code expectedVersion} (nothing changes)
     */
    @Transactional
    public StoredSite update(long id, long expectedVersion, String name, String levelText, String radiusText) {
        StoredSite site = get(id);
        String newName = site.name();
        if (name != null) {
            newName = name.strip();
            if (newName.isEmpty()) {
                throw new InvalidInputException("name", "name must not be empty");
            }
            checkName(newName);
        }
        ProtectionLevel level = levelText == null ? site.level() : Settings.level(levelText, site.level());
        Double radius = radiusText == null ? site.customRadius() : Settings.radius(radiusText);
        sites.updateSettings(id, expectedVersion, newName, level, radius, now());
        List<String> changes = new java.util.ArrayList<>();
        if (!newName.equals(site.name())) {
            changes.add("renamed \"" + site.name() + "\" to \"" + newName + "\"");
        }
        if (level != site.level()) {
            changes.add("level " + site.level().name() + " to " + level.name());
        }
        if (!java.util.Objects.equals(radius, site.customRadius())) {
            changes.add("custom radius " + (site.customRadius() == null ? "none" : site.customRadius() + " m")
                    + " to " + (radius == null ? "none" : radius + " m"));
        }
        if (!changes.isEmpty()) {
            audit.record(id, changes.size() == 1 && changes.get(0).startsWith("renamed") ? "rename" : "settings",
                    String.join("; ", changes));
        }
        return get(id);
    }

    /**
     * Changes the site's settings and the details its report's cover prints in one change: any of
     * name, level, radius (as {@link #update(long, long, String, String, String)}) and any of address
     * and designer (as {@link #updateCoverDetails}); null keeps the stored value. Every value is
     * checked before anything is written.
     */
    @Transactional
    public StoredSite update(long id, long expectedVersion, String name, String levelText, String radiusText,
            String address, String designer) {
        CoverDetails.check("address", address);
        CoverDetails.check("designer", designer);
        boolean cover = address != null || designer != null;
        long version = expectedVersion;
        if (name != null || levelText != null || radiusText != null || !cover) {
            update(id, version, name, levelText, radiusText);
            version++;
        }
        return cover ? updateCoverDetails(id, version, address, designer) : get(id);
    }

    /**
     * Changes the address and the designer's name that the site's report prints on its cover; null
     * keeps the stored value, blank clears it.
     *
     * @throws SiteNotFoundException when no site has this id
     * @throws InvalidInputException when a value is too long or holds a control character, naming
     *         {@code address} or {@code designer} (nothing changes)
     * @throws org.springframework.dao.OptimisticLockingFailureException when the site is no longer
     *         at {@code expectedVersion} (nothing changes)
     */
    @Transactional
    public StoredSite updateCoverDetails(long id, long expectedVersion, String address, String designer) {
        String newAddress = CoverDetails.check("address", address);
        String newDesigner = CoverDetails.check("designer", designer);
        StoredSite site = get(id);
        newAddress = newAddress == null ? site.address() : newAddress;
        newDesigner = newDesigner == null ? site.designer() : newDesigner;
        sites.updateCoverDetails(id, expectedVersion, newAddress, newDesigner, now());
        List<String> changes = new java.util.ArrayList<>();
        if (!newAddress.equals(site.address())) {
            changes.add("address \"" + site.address() + "\" to \"" + newAddress + "\"");
        }
        if (!newDesigner.equals(site.designer())) {
            changes.add("designer \"" + site.designer() + "\" to \"" + newDesigner + "\"");
        }
        if (!changes.isEmpty()) {
            audit.record(id, "cover details", String.join("; ", changes));
        }
        return get(id);
    }

    /**
     * Stores a copy of a site: the same file, byte for byte, and the same settings, named
     * "&lt;name&gt; (copy)", with the data the designer keeps for the site beside its file (risk
     * inputs, edited down-conductors, metal installations, saved cuts, keep-out areas: each feature
     * copies its own on {@link SiteDuplicated}); its analyses, reviews and comments are not copied.
     *
     * @throws SiteNotFoundException when no site has this id
     */
    @Transactional
    public StoredSite duplicate(long id) {
        StoredSite site = get(id);
        String suffix = " (copy)";
        String base = site.name();
        if (base.length() + suffix.length() > MAX_NAME_LENGTH) {
            base = base.substring(0, MAX_NAME_LENGTH - suffix.length()).strip();
        }
        StoredSite copy = sites.insert(CurrentAccount.teamId(), base + suffix, site.level(), site.customRadius(),
                site.sourceName(), site.sourceText(), site.address(), site.designer(), now());
        audit.record(copy.id(), "duplicate", "copied from site " + site.id() + " \"" + site.name() + "\"");
        events.publishEvent(new SiteDuplicated(site.id(), copy.id()));
        return copy;
    }

    /**
     * Replaces the site's file with {@code text}, provided the site is still at the version
     * {@code site} was read at, and keeps the file it replaces as an earlier file of the site. The
     * caller has read {@code text} back as {@code document} (checked like an upload) and records the
     * change in the audit trail; the document serves later reads of the new version.
     *
     * @return the site as now stored, and the earlier file kept
     * @throws org.springframework.dao.OptimisticLockingFailureException when the site changed meanwhile
     *         (nothing changes)
     */
    @Transactional
    public ReplacedFile replaceFile(StoredSite site, String text, SiteDocument document) {
        Instant now = now();
        sites.replaceFile(site.id(), site.version(), text, now);
        SiteFileVersion kept = sites.insertFileVersion(site.id(), site.sourceName(), site.sourceText(), now);
        StoredSite changed = site.withFile(text, now);
        parsed.keepAfterCommit(changed.id(), changed.version(), text, document);
        return new ReplacedFile(changed, kept);
    }

    /** A site after its file was replaced, and the file it replaced, kept as an earlier file. */
    public record ReplacedFile(StoredSite site, SiteFileVersion kept) {
    }

    /**
     * Marks the site as changed by an analysis of its file as stored (its file stays as it is),
     * provided the site is still at the version {@code site} was read at.
     *
     * @throws org.springframework.dao.OptimisticLockingFailureException when the site changed or was
     *         deleted meanwhile
     */
    @Transactional
    public void markAnalysed(StoredSite site, Instant now) {
        sites.touch(site.id(), site.version(), now);
        parsed.carryAfterCommit(site.id(), site.version(), site.version() + 1, site.sourceText());
    }

    /** The structures of the stored site file, in file order. */
    public List<StructureRow> structures(StoredSite site) {
        return StructureRow.of(document(site).site().structures());
    }

    /** Whether the site's file is GeoJSON (all fields can be corrected) rather than WKT (heights only). */
    public boolean isGeoJson(StoredSite site) {
        return SiteFiles.isGeoJson(site.sourceText(), site.sourceName());
    }

    /** The files corrections replaced, oldest first. @throws SiteNotFoundException for an unknown site */
    @Transactional(readOnly = true)
    public List<SiteFileVersion> fileVersions(long id) {
        get(id);
        return sites.findFileVersions(id);
    }

    /** One earlier file. @throws SiteNotFoundException for an unknown site or file number */
    @Transactional(readOnly = true)
    public SiteFileVersion fileVersion(long id, int number) {
        get(id);
        return sites.findFileVersion(id, number).orElseThrow(() -> new SiteNotFoundException(id,
                "site " + id + " has no earlier file number " + number));
    }

    private Instant now() {
        return clock.instant().truncatedTo(ChronoUnit.MILLIS);
    }

    private static void checkName(String name) {
        if (name.length() > MAX_NAME_LENGTH) {
            throw new InvalidInputException("name", "name must be at most " + MAX_NAME_LENGTH
                    + " characters, got " + name.length());
        }
    }

    /** How many sites are stored, of all teams (for first-start checks, not for display). */
    public long count() {
        return sites.count();
    }

    /**
     * The stored site read back into the engine's model; read once per version of the site and then
     * kept for a while ({@link ParsedSites}). The document is shared: read it, never change it.
     */
    public SiteDocument document(StoredSite site) {
        return parsed.document(site);
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
