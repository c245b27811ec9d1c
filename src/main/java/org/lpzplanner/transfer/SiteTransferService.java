package org.lpzplanner.transfer;

import org.lpzplanner.accounts.CurrentAccount;
import org.lpzplanner.audit.AuditTrail;
import org.lpzplanner.engine.io.SiteFormatException;
import org.lpzplanner.sites.SiteNotFoundException;
import org.lpzplanner.system.InvalidInputException;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;
import org.springframework.transaction.support.TransactionTemplate;

/**
 * Exports a whole site as one file and imports such a file as a new site. An import checks the
 * whole file and computes every revision's results first, then stores in one transaction: a file
 * that fails any check, or a failure half-way, stores nothing.
 */
@Service
public class SiteTransferService {

    /** A site export ready to download. */
    public record ExportFile(String fileName, byte[] content) {
    }

    private final SiteArchiveRepository archives;
    private final AuditTrail audit;
    private final RevisionReanalysis reanalysis;
    private final TransactionTemplate transactions;

    public SiteTransferService(SiteArchiveRepository archives, AuditTrail audit, RevisionReanalysis reanalysis,
            TransactionTemplate transactions) {
        this.archives = archives;
        this.audit = audit;
        this.reanalysis = reanalysis;
        this.transactions = transactions;
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
     * returns the new site's id. Every revision's results are computed here from its own site file
     * and settings ({@link RevisionReanalysis}), before anything is stored and outside the
     * transaction; the file's own results are not stored. The exported audit trail is not
     * replayed: the new site's trail starts with one "import" event by the caller (the trail
     * records what happened here), which says how many revisions' results differed from the
     * file's and how many acceptances were dropped.
     *
     * @throws InvalidInputException when the file is not a usable site export, naming the member
     *         (and for a revision's file or settings, the revision)
     * @throws SiteFormatException   when the site file inside it is not a valid site
     * @throws org.lpzplanner.heavywork.HeavyWorkBusyException when no place for long computations came free in time
     */
    public long importSite(byte[] content) {
        RevisionReanalysis.Outcome checked = reanalysis.reanalyse(SiteArchiveCodec.read(content));
        SiteArchive archive = checked.archive();
        int revisions = archive.revisions().size();
        String detail = "imported \"" + archive.site().name() + "\" from a site export (" + revisions
                + " revision(s), " + archive.auditTrail().size() + " earlier audit event(s) kept in the file only)"
                + (revisions == 0 ? "" : "; results of " + revisions + " revision(s) computed again here, "
                        + checked.differing() + " of them unlike the file's")
                + (checked.droppedAcceptances() == 0 ? "" : "; " + checked.droppedAcceptances()
                        + " accepted item(s) dropped as not in the computed results");
        return transactions.execute(status -> {
            long id = archives.insert(archive, CurrentAccount.teamId());
            audit.record(id, "import", detail);
            return id;
        });
    }

    /** "harbour.geojson" gives "harbour.site-export.json". */
    static String exportName(String siteFileName) {
        int dot = siteFileName.lastIndexOf('.');
        String base = dot > 0 ? siteFileName.substring(0, dot) : siteFileName;
        return base + ".site-export.json";
    }
}
