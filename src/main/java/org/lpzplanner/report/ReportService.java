package org.lpzplanner.report;

import java.time.Clock;
import java.time.temporal.ChronoUnit;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.locationtech.jts.geom.Coordinate;
import org.lpzplanner.analysis.AcceptedItemRepository;
import org.lpzplanner.analysis.AnalysisRepository;
import org.lpzplanner.analysis.AnalysisRevision;
import org.lpzplanner.analysis.AnalysisService;
import org.lpzplanner.analysis.RevisionInputs;
import org.lpzplanner.design.DesignRepository;
import org.lpzplanner.engine.model.SphereSpec;
import org.lpzplanner.heavywork.HeavyWorkCapacity;
import org.lpzplanner.keepout.KeepOutAreaService;
import org.lpzplanner.risk.RiskService;
import org.lpzplanner.sections.SiteCutService;
import org.lpzplanner.sites.SiteFileVersion;
import org.lpzplanner.sites.SiteService;
import org.lpzplanner.sites.StoredSite;
import org.springframework.stereotype.Service;

/**
 * Prints a stored analysis revision. The report is made from what the revision kept: its site file
 * and name, sphere, resolution, tolerance and result, plus the acceptances of its review items, and
 * the site's saved section cuts, address and designer as stored when printed.
 * Revisions stored before inputs were kept find their file again by its SHA-256 among the site's
 * current and earlier files. A PDF is made within the instance's {@link HeavyWorkCapacity}: the
 * envelope for its sections, its separation survey and bill of quantities all run in one place.
 */
@Service
public class ReportService {

    private final SiteService sites;
    private final AnalysisRepository analyses;
    private final AcceptedItemRepository accepted;
    private final RiskService risk;
    private final DesignRepository design;
    private final SiteCutService cuts;
    private final Clock clock;
    private final KeepOutAreaService keepOut;
    private final HeavyWorkCapacity capacity;

    public ReportService(SiteService sites, AnalysisRepository analyses, AcceptedItemRepository accepted,
            RiskService risk, DesignRepository design, SiteCutService cuts, Clock clock, KeepOutAreaService keepOut,
            HeavyWorkCapacity capacity) {
        this.capacity = capacity;
        this.keepOut = keepOut;
        this.sites = sites;
        this.analyses = analyses;
        this.accepted = accepted;
        this.risk = risk;
        this.design = design;
        this.cuts = cuts;
        this.clock = clock;
    }

    /**
     * The source of a revision's report.
     *
     * @throws org.lpzplanner.sites.SiteNotFoundException when no site has this id
     * @throws RevisionNotFoundException when the site has no such revision
     * @throws RevisionInputsMissingException when the revision's file is no longer stored
     */
    public ReportSource source(long siteId, int revisionNumber) {
        StoredSite site = sites.get(siteId);
        AnalysisRevision revision = analyses.find(siteId, revisionNumber).orElseThrow(() ->
                new RevisionNotFoundException("site " + siteId + " has no analysis revision " + revisionNumber
                        + "; it has " + analyses.count(siteId) + " revision(s), numbered from 1"));
        RevisionInputs inputs = analyses.inputs(revision.id()).orElseGet(() -> recovered(site, revision));
        return new ReportSource(inputs.siteName(), inputs.sourceName(), inputs.sourceText(),
                new SphereSpec(revision.level(), revision.sphereRadius()), revision.resolution(), inputs.tolerance(),
                revision.revision(), revision.createdAt(), revision.inputsSha256(), revision.resultGeoJson(),
                accepted.reasons(revision.id()), savedCuts(siteId), new ReportSource.Cover(site.address(),
                        site.designer(), clock.instant().truncatedTo(ChronoUnit.SECONDS)));
    }

    /**
     * The PDF of a revision, with the site's edited down-conductors, metal installations and risk
     * estimate as they stand when printed (they belong to the site, not to the revision; the report
     * says so and when they were read). Same exceptions as {@link #source}, and
     *
     * @throws org.lpzplanner.heavywork.HeavyWorkBusyException when no place for long computations came
     *         free within the wait
     * @throws org.lpzplanner.heavywork.HeavyWorkOverBudgetException when the report was not done within
     *         its time budget (checked after the report's parts are computed and after it is drawn: the
     *         envelope and the surveys in it have no hook to stop them midway)
     */
    public byte[] pdf(long siteId, int revisionNumber) {
        ReportSource source = source(siteId, revisionNumber);
        StoredDesign design = storedDesign(siteId);
        List<org.lpzplanner.common.ReportSection> appendix = List.of(risk.reportSection(siteId, Locale.ENGLISH));
        return capacity.run("report", () -> {
            ReportContent content = ReportAssembler.assemble(source, null, design, appendix);
            capacity.checkBudget();
            byte[] pdf = PdfReportRenderer.render(content);
            capacity.checkBudget();
            return pdf;
        });
    }

    /** The site's saved section cuts as stored now (they belong to the site, not to the revision). */
    private List<ReportSource.Cut> savedCuts(long siteId) {
        return cuts.cuts(siteId).stream()
                .map(c -> new ReportSource.Cut(c.name(), c.x1(), c.y1(), c.x2(), c.y2())).toList();
    }

    /** The site's design data (edited down-conductors, installations, keep-out areas) as stored now. */
    StoredDesign storedDesign(long siteId) {
        Map<String, List<Coordinate>> downs = new LinkedHashMap<>();
        design.downConductors(siteId).forEach((structure, positions) -> downs.put(structure,
                positions.stream().map(p -> new Coordinate(p[0], p[1])).toList()));
        List<StoredDesign.Installation> metals = design.installations(siteId).stream()
                .map(i -> new StoredDesign.Installation(i.name(), i.x(), i.y(), i.z(), i.material())).toList();
        List<StoredDesign.KeepOutArea> areas = keepOut.areas(siteId).stream()
                .map(a -> new StoredDesign.KeepOutArea(a.name(), a.corners(), a.area())).toList();
        return new StoredDesign(downs, metals, clock.instant().truncatedTo(ChronoUnit.SECONDS), areas);
    }

    private RevisionInputs recovered(StoredSite site, AnalysisRevision revision) {
        double tolerance = org.lpzplanner.engine.exposure.AnalysisOptions.DEFAULT_TOLERANCE;
        if (AnalysisService.sha256(site.sourceText()).equals(revision.inputsSha256())) {
            return new RevisionInputs(site.name(), site.sourceName(), site.sourceText(), tolerance);
        }
        for (SiteFileVersion file : sites.fileVersions(site.id())) {
            if (AnalysisService.sha256(file.sourceText()).equals(revision.inputsSha256())) {
                return new RevisionInputs(site.name(), file.sourceName(), file.sourceText(), tolerance);
            }
        }
        throw new RevisionInputsMissingException("revision " + revision.revision() + " of site " + site.id()
                + " was analysed from a site file that is no longer stored, so it cannot be printed exactly;"
                + " analyse the site again and print the new revision");
    }

}
