package org.lpzplanner.transfer;

import static org.lpzplanner.transfer.ArchiveFields.bad;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;
import org.lpzplanner.analysis.AnalysisService;
import org.lpzplanner.analysis.ReviewItems;
import org.lpzplanner.analysis.RevisionResult;
import org.lpzplanner.engine.envelope.AnalysisTooLargeException;
import org.lpzplanner.engine.model.ProtectionLevel;
import org.lpzplanner.engine.model.SettingRange;
import org.lpzplanner.engine.model.SphereSpec;
import org.lpzplanner.system.InvalidInputException;
import org.springframework.stereotype.Component;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * Computes the results of a site export's analysis revisions here, from what each revision read:
 * its own site file ({@link ArchiveSiteFiles}) and its protection level, sphere radius and grid
 * resolution. The results, totals and verdict the file carries are never stored; an imported
 * revision keeps its number, time, reviewed marks and the acceptances of items its computed result
 * has, and everything else comes from this app's engine. An honest export therefore imports with
 * the same results, and a changed one with the results its files really give.
 *
 * <p>Every revision is checked before any is analysed: its settings must be ones the analysis form
 * accepts and its grid must fit what an analysis may use ({@link AnalysisService#check}), so a bad
 * revision refuses the import by its number without waiting for the others.
 *
 * <p>Acceptances of items the computed result does not have are dropped, as an analysis here drops
 * them when it carries acceptances over to the next revision.
 *
 * <p>Cost: one fresh analysis for each distinct site file and settings (revisions that read the
 * same file with the same settings share one), one after another, each taking a place of the
 * instance's analysis capacity as any analysis does; see docs/reliability.md.
 */
@Component
class RevisionReanalysis {

    /**
     * The archive with every revision's results computed here.
     *
     * @param differing          revisions whose computed results are not the ones the file carried
     * @param droppedAcceptances acceptances dropped because their item is not in the computed result
     */
    record Outcome(SiteArchive archive, int differing, int droppedAcceptances) {
    }

    /** A revision ready to analyse. */
    private record Planned(ArchiveSiteFiles.RevisionFile file, SphereSpec sphere, double resolution) {

        String inputs() {
            return AnalysisService.sha256(file.text()) + " " + sphere + " " + resolution;
        }
    }

    private final AnalysisService analyses;
    private final JsonMapper json;

    RevisionReanalysis(AnalysisService analyses, JsonMapper json) {
        this.analyses = analyses;
        this.json = json;
    }

    /**
     * @throws org.lpzplanner.engine.io.SiteFormatException when the site's current file is not a valid site
     * @throws InvalidInputException naming the member and revision (or earlier file) at fault
     * @throws org.lpzplanner.heavywork.HeavyWorkBusyException when no place for long computations came free in time
     */
    Outcome reanalyse(SiteArchive archive) {
        List<ArchiveSiteFiles.RevisionFile> files = ArchiveSiteFiles.read(archive);
        List<Planned> plans = new ArrayList<>();
        for (int i = 0; i < archive.revisions().size(); i++) {
            plans.add(plan(archive.revisions().get(i), "revisions[" + i + "]", files.get(i)));
        }
        Map<String, RevisionResult> computed = new HashMap<>();
        List<SiteArchive.Revision> revisions = new ArrayList<>();
        int differing = 0;
        int dropped = 0;
        for (int i = 0; i < plans.size(); i++) {
            Planned plan = plans.get(i);
            SiteArchive.Revision r = archive.revisions().get(i);
            String member = "revisions[" + i + "]";
            RevisionResult result = computed.computeIfAbsent(plan.inputs(), k -> analyse(plan, r, member));
            Set<String> items = ReviewItems.of(result.resultGeoJson()).stream().map(ReviewItems.Item::key)
                    .collect(Collectors.toSet());
            List<SiteArchive.AcceptedItem> accepted = r.accepted().stream().filter(a -> items.contains(a.key()))
                    .toList();
            dropped += r.accepted().size() - accepted.size();
            if (!sameResults(r, result)) {
                differing++;
            }
            revisions.add(new SiteArchive.Revision(r.revision(), r.level(), r.sphereRadius(), r.resolution(),
                    r.inputsSha256(), result.exposedRoofArea(), result.exposedEdgeLength(), result.exposedCorners(),
                    result.facadeBands(), result.protectedGroundArea(), result.fullyProtected(),
                    result.resultGeoJson(), result.engineMillis(), r.createdAt(), accepted, r.siteName(),
                    r.sourceName(), r.sourceText(), tolerance(r, result), r.reviews()));
        }
        SiteArchive checked = new SiteArchive(archive.site(), archive.earlierFiles(), revisions,
                archive.riskInputs(), archive.downConductors(), archive.metalInstallations(), archive.savedCuts(),
                archive.keepOutAreas(), archive.comments(), archive.auditTrail());
        return new Outcome(checked, differing, dropped);
    }

    /**
     * The tolerance kept with the revision's inputs: the one its results were computed with, or
     * none for a revision stored before inputs were kept (a printed report takes the default then).
     */
    private static Double tolerance(SiteArchive.Revision r, RevisionResult result) {
        return r.sourceText() == null ? r.tolerance() : Double.valueOf(result.tolerance());
    }

    /** The revision's settings, checked as the analysis form checks them, and its grid's size. */
    private Planned plan(SiteArchive.Revision r, String p, ArchiveSiteFiles.RevisionFile file) {
        String which = "(revision " + r.revision() + ")";
        SphereSpec sphere;
        try {
            sphere = new SphereSpec(ProtectionLevel.valueOf(r.level()), r.sphereRadius());
        } catch (IllegalArgumentException e) {
            throw bad(p + ".sphereRadius", which + " cannot be used: " + e.getMessage());
        }
        if (!SettingRange.RESOLUTION.contains(r.resolution())) {
            throw bad(p + ".resolution", which + " must be " + SettingRange.RESOLUTION.rule() + ", got "
                    + r.resolution());
        }
        try {
            analyses.check(file.document(), sphere, r.resolution());
        } catch (AnalysisTooLargeException e) {
            throw bad(p + ".resolution", which + " cannot be analysed: " + e.getMessage());
        } catch (InvalidInputException e) {
            throw bad(p, which + " cannot be analysed: " + e.getMessage());
        }
        return new Planned(file, sphere, r.resolution());
    }

    private RevisionResult analyse(Planned plan, SiteArchive.Revision r, String member) {
        try {
            return analyses.analyse(plan.file().document(), plan.sphere(), plan.resolution());
        } catch (InvalidInputException e) {
            throw bad(member, "(revision " + r.revision() + ") cannot be analysed: " + e.getMessage());
        }
    }

    /**
     * Whether the file carried the results computed here: the same totals and verdict and the same
     * features (the engine's times aside, which differ from run to run).
     */
    private boolean sameResults(SiteArchive.Revision r, RevisionResult computed) {
        if (r.exposedRoofArea() != computed.exposedRoofArea() || r.exposedEdgeLength() != computed.exposedEdgeLength()
                || r.exposedCorners() != computed.exposedCorners() || r.facadeBands() != computed.facadeBands()
                || r.protectedGroundArea() != computed.protectedGroundArea()
                || r.fullyProtected() != computed.fullyProtected()) {
            return false;
        }
        JsonNode carried;
        try {
            carried = json.readTree(r.resultGeoJson());
        } catch (RuntimeException notJson) {
            return false;
        }
        JsonNode own = json.readTree(computed.resultGeoJson());
        return carried.path("features").equals(own.path("features"))
                && carried.path("analysis").path("summary").equals(own.path("analysis").path("summary"));
    }
}
