package org.lpzplanner.transfer;

import org.lpzplanner.accounts.CurrentAccount;
import org.lpzplanner.audit.AuditTrail;
import org.lpzplanner.engine.io.SiteFormatException;
import org.lpzplanner.sites.SiteFiles;
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
    private final AuditTrail audit;

    public SiteTransferService(SiteArchiveRepository archives, AuditTrail audit) {
        this.archives = archives;
        this.audit = audit;
    }

    /** @throws SiteNotFoundException when the caller's team has no site with this id */
    @Transactional(readOnly = true)
    public ExportFile export(long siteId) {
        SiteArchive archive = archives.read(siteId, CurrentAccount.teamId())
                .orElseThrow(() -> new SiteNotFoundException(siteId));
        return new ExportFile(exportName(archive.site().fileName()), SiteArchiveCodec.write(archive));
    }

    /**
     * Stores the site of an export file as a new site of the caller's team with all its earlier
     * files, revisions, accepted items, reviewed marks, risk inputs, design edits and comments, and
     * returns the new site's id. The exported audit trail is not replayed: the new site's trail
     * starts with one "import" event by the caller (the trail records what happened here).
     *
     * @throws InvalidInputException when the file is not a usable site export, naming the member
     * @throws SiteFormatException   when the site file inside it is not a valid site
     */
    @Transactional
    public long importSite(byte[] content) {
        SiteArchive archive = SiteArchiveCodec.read(content);
        SiteFiles.read(archive.site().fileText(), archive.site().fileName());
        long siteId = archives.insert(archive, CurrentAccount.teamId());
        audit.record(siteId, "import", "imported \"" + archive.site().name() + "\" from a site export ("
                + archive.revisions().size() + " revision(s), " + archive.auditTrail().size()
                + " earlier audit event(s) kept in the file only)");
        return siteId;
    }

    /** "harbour.geojson" gives "harbour.site-export.json". */
    static String exportName(String siteFileName) {
        int dot = siteFileName.lastIndexOf('.');
        String base = dot > 0 ? siteFileName.substring(0, dot) : siteFileName;
        return base + ".site-export.json";
    }
}
