package org.lpzplanner.editing;

import org.lpzplanner.analysis.AnalysisRevision;
import org.lpzplanner.analysis.AnalysisService;
import org.lpzplanner.analysis.ParsedResults;
import org.lpzplanner.audit.AuditTrail;
import org.lpzplanner.engine.envelope.AnalysisTooLargeException;
import org.lpzplanner.engine.io.SiteDocument;
import org.lpzplanner.sites.SiteFiles;
import org.lpzplanner.sites.SiteService;
import org.lpzplanner.sites.StoredSite;
import org.lpzplanner.system.BusyException;
import org.lpzplanner.system.OverBudgetException;
import org.lpzplanner.system.InvalidInputException;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.springframework.dao.OptimisticLockingFailureException;
import org.springframework.stereotype.Service;
import org.springframework.transaction.support.TransactionTemplate;

/**
 * Applies every change of a stored site, then analyses the site again: the one place a site's file
 * changes and the one place an analysis follows a change.
 *
 * <p>A change ({@link SiteChange}) goes through seven steps, in this order: load the site (another
 * team's site is not found), check that it is still at the version the change was asked for, read
 * its file (once per version, {@link SiteService#document}), apply the change to the text, read the
 * changed text back as an upload is read, store it (the file it replaces is kept as an earlier file)
 * and record it in the audit trail. An upload stores a new site checked the same way. A change that
 * fails any step stores nothing; a stale version fails with {@link OptimisticLockingFailureException}
 * before anything is read.
 *
 * <p>Transactions: the stored file and its audit line are committed together, on their own. The
 * analysis runs after that commit, at the site's own level and radius, starting from the last
 * analysis of the site kept in memory where there is one (so only what the change can reach is
 * decided again), and stores its revision in a transaction of its own. An analysis that cannot run
 * now (every analysis place taken, a grid too large, settings the engine refuses, the site changed
 * again meanwhile) or fails never undoes the change: the answer carries the new version and says the
 * analysis is pending and why ({@link AnalysisUpdate}), and the site's latest revision still shows
 * the site before the change until it is analysed again.
 *
 * <p>Thread safety: stateless; concurrent changes of one site are ordered by its version, the later
 * one failing as stale.
 */
@Service
public class EditPipeline {

    private static final Logger LOG = LoggerFactory.getLogger(EditPipeline.class);

    private final SiteService sites;
    private final AnalysisService analyses;
    private final ParsedResults results;
    private final AuditTrail audit;
    private final TransactionTemplate transactions;

    public EditPipeline(SiteService sites, AnalysisService analyses, ParsedResults results, AuditTrail audit,
            TransactionTemplate transactions) {
        this.sites = sites;
        this.analyses = analyses;
        this.results = results;
        this.audit = audit;
        this.transactions = transactions;
    }

    /**
     * Applies a change to the site's file, stores it, then analyses the site again.
     *
     * @throws org.lpzplanner.sites.SiteNotFoundException when the team has no site with this id
     * @throws OptimisticLockingFailureException when the site is no longer at {@code expectedVersion}
     *         (nothing is stored)
     * @throws InvalidInputException when the change cannot use a value, naming the field (nothing is
     *         stored)
     * @throws org.lpzplanner.engine.io.SiteFormatException when the changed file is not a valid site,
     *         naming the feature and field (nothing is stored)
     */
    public <T> Edit<T> apply(long siteId, long expectedVersion, SiteChange<T> change) {
        StoredSite site = sites.get(siteId);
        if (site.version() != expectedVersion) {
            throw new OptimisticLockingFailureException("site " + siteId + " is at version " + site.version()
                    + ", not " + expectedVersion);
        }
        SiteDocument document = sites.document(site);
        SiteChange.Changed<T> changed = change.apply(site, document);
        SiteDocument checked = SiteFiles.read(changed.text(), site.sourceName());
        Stored stored = transactions.execute(status -> {
            SiteService.ReplacedFile replaced = sites.replaceFile(site, changed.text(), checked);
            AuditLine line = changed.audit().recorded(replaced.kept().number());
            audit.record(siteId, line.action(), line.detail());
            return new Stored(replaced.site(), line);
        });
        return analysed(stored.site(), changed.outcome(), stored.line());
    }

    /**
     * Checks and stores an uploaded site file as a new site of the team
     * ({@link SiteService#create}), then analyses it.
     *
     * @return the edit whose outcome is the new site as stored
     * @throws org.lpzplanner.engine.io.SiteFormatException when the file is not a valid site (nothing
     *         is stored)
     * @throws InvalidInputException when the name, level or radius cannot be used (nothing is stored)
     */
    public Edit<StoredSite> upload(String fileName, byte[] content, String name, String levelText, String radiusText) {
        StoredSite site = sites.create(fileName, content, name, levelText, radiusText);
        return analysed(site, site, AuditLine.of(SiteService.UPLOAD, SiteService.uploadDetail(site)));
    }

    private record Stored(StoredSite site, AuditLine line) {
    }

    private <T> Edit<T> analysed(StoredSite site, T outcome, AuditLine line) {
        AnalysisUpdate update = analyse(site);
        // the analysis marks the site changed once more when it stores its revision
        long version = update.isPending() ? site.version() : site.version() + 1;
        return new Edit<>(site.id(), version, outcome, line, update);
    }

    private AnalysisUpdate analyse(StoredSite site) {
        try {
            AnalysisRevision revision = analyses.run(site);
            return AnalysisUpdate.done(revision, results.summary(revision));
        } catch (BusyException | OverBudgetException | AnalysisTooLargeException | InvalidInputException e) {
            return AnalysisUpdate.pending(e.getMessage());
        } catch (OptimisticLockingFailureException e) {
            return AnalysisUpdate.pending("the site changed again while it was analysed, so that analysis was not"
                    + " stored");
        } catch (RuntimeException e) {
            LOG.error("analysis of site {} after a change failed; the change is stored", site.id(), e);
            return AnalysisUpdate.pending("the analysis failed; the server log has the details");
        }
    }
}
