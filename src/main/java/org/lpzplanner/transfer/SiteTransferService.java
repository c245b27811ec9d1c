package org.lpzplanner.transfer;

import org.lpzplanner.engine.io.SiteFormatException;
import org.lpzplanner.accounts.CurrentAccount;
import org.lpzplanner.audit.AuditTrail;
import org.lpzplanner.sites.SiteFiles;
import org.lpzplanner.sites.SiteService;
import org.lpzplanner.sites.SiteNotFoundException;
import org.lpzplanner.system.InvalidInputException;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;

/**
 * Exports a whole site as one file and imports such a file as a new site. An import is one
 * transaction: a file that fails any check, or a failure half-way, stores nothing.
 */
@Service
public class SiteTransferService {

    /** A site export ready to download. */
    public record ExportFile(String fileName, byte[] content) {
    }

    private final SiteArchiveRepository archives;

    private final SiteService sites;
    private final AuditTrail audit;

    public SiteTransferService(SiteArchiveRepository archives, SiteService sites, AuditTrail audit) {
        this.archives = archives;
        this.sites = sites;
        this.audit = audit;
    }

    /** @throws SiteNotFoundException when no site of the caller's team has this id */
    @Transactional(readOnly = true)
    public ExportFile export(long siteId) {
        sites.get(siteId); // another team's site is not found, as everywhere
        SiteArchive archive = archives.read(siteId).orElseThrow(() -> new SiteNotFoundException(siteId));
        return new ExportFile(exportName(archive.site().fileName()), SiteArchiveCodec.write(archive));
    }

    /**
     * Stores the site of an export file as a new site with all its earlier files, revisions and
     * accepted items, and returns the new site's id.
     *
     * @throws InvalidInputException when the file is not a usable site export, naming the member
     * @throws SiteFormatException   when the site file inside it is not a valid site
     */
    @Transactional
    public long importSite(byte[] content) {
        SiteArchive archive = SiteArchiveCodec.read(content);
        SiteFiles.read(archive.site().fileText(), archive.site().fileName());
        long id = archives.insert(archive, CurrentAccount.teamId());
        audit.record(id, "import", "imported \"" + archive.site().name() + "\" from a site export");
        return id;
    }

    /** "harbour.geojson" gives "harbour.site-export.json". */
    static String exportName(String siteFileName) {
        int dot = siteFileName.lastIndexOf('.');
        String base = dot > 0 ? siteFileName.substring(0, dot) : siteFileName;
        return base + ".site-export.json";
    }
}
