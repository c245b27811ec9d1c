package org.lpzplanner.plan;

import org.lpzplanner.editing.AuditLine;
import org.lpzplanner.editing.Edit;
import org.lpzplanner.editing.EditPipeline;
import org.lpzplanner.editing.SiteChange;
import org.lpzplanner.sites.StructureCorrection;
import org.springframework.stereotype.Service;

/**
 * Corrects one structure of a stored site: a change given to the {@link EditPipeline} that writes a
 * corrected site file in the same format (WKT files: heights only; see {@link StructureCorrection}),
 * read back like an upload; the file it replaces is kept as an earlier file, and the site is
 * analysed again.
 */
@Service
public class StructureCorrections {

    private final EditPipeline edits;

    public StructureCorrections(EditPipeline edits) {
        this.edits = edits;
    }

    /**
     * @throws org.lpzplanner.sites.SiteNotFoundException when no site has this id
     * @throws org.lpzplanner.system.InvalidInputException when a typed value cannot be used, naming
     *         the field (nothing changes)
     * @throws org.lpzplanner.engine.io.SiteFormatException when the corrected file is not a valid site,
     *         naming the field (nothing changes)
     * @throws org.springframework.dao.OptimisticLockingFailureException when the site is no longer at
     *         {@code expectedVersion} (nothing changes)
     */
    public Edit<Void> correct(long siteId, long expectedVersion, StructureCorrection correction) {
        return edits.apply(siteId, expectedVersion, (site, document) -> new SiteChange.Changed<>(
                correction.applyTo(site, document), AuditLine.namingEarlierFile("correction",
                        "structure " + (correction.index() + 1) + ": " + correction.describe()), null));
    }
}
