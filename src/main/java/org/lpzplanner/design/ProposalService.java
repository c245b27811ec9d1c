package org.lpzplanner.design;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.TreeSet;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.Polygon;
import org.lpzplanner.airtermination.ConductorInput;
import org.lpzplanner.airtermination.PartBatchEdits;
import org.lpzplanner.airtermination.RodInput;
import org.lpzplanner.analysis.ReviewItems;
import org.lpzplanner.analysis.ReviewService;
import org.lpzplanner.common.Formats;
import org.lpzplanner.editing.AuditLine;
import org.lpzplanner.editing.Edit;
import org.lpzplanner.engine.design.proposal.ProposalOptions;
import org.lpzplanner.engine.design.quantities.BillOfQuantities;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.keepout.KeepOutAreaService;
import org.lpzplanner.keepout.KeepOutOutline;
import org.lpzplanner.sites.SiteNotFoundException;
import org.lpzplanner.sites.SiteService;
import org.lpzplanner.sites.StoredSite;
import org.lpzplanner.system.InvalidInputException;
import org.springframework.dao.OptimisticLockingFailureException;
import org.springframework.stereotype.Service;

/**
 * Air-termination proposals of a stored site: started in the background ({@link ProposalJobs}),
 * followed, cancelled, accepted into the site file in one change and taken back in one change
 * (both through the edit pipeline, {@link PartBatchEdits}, which analyses the site again).
 */
@Service
public class ProposalService {

    /** Largest number of keep-out areas a request may give, as many as a site may store. */
    static final int MAX_KEEP_OUT = KeepOutAreaService.MAX_AREAS;

    private final SiteService sites;
    private final PartBatchEdits parts;
    private final ReviewService reviews;
    private final ProposalJobs jobs;
    private final KeepOutAreaService storedKeepOut;

    public ProposalService(SiteService sites, PartBatchEdits parts, ReviewService reviews, ProposalJobs jobs,
            KeepOutAreaService storedKeepOut) {
        this.sites = sites;
        this.parts = parts;
        this.reviews = reviews;
        this.jobs = jobs;
        this.storedKeepOut = storedKeepOut;
    }

    /**
     * Starts a proposal for the site as it is now, avoiding its stored keep-out areas and the
     * request's own, and leaving out what the latest analysis's accepted items cover.
     *
     * @throws InvalidInputException when no part is allowed or a height or keep-out area cannot be used
     */
    public ProposalJobs.Job propose(long siteId, ProposeRequest request) {
        StoredSite stored = sites.get(siteId);
        Site site = sites.document(stored).site();
        List<Double> rodHeights = request.rodHeights() == null ? List.of() : request.rodHeights();
        List<Double> masts = request.mastHeights() == null ? List.of() : request.mastHeights();
        boolean conductors = request.edgeConductors() || request.ridgeConductors();
        if (rodHeights.isEmpty() && masts.isEmpty() && !conductors) {
            throw new InvalidInputException("rodHeights", "give at least one allowed rod height, e.g. [0.5, 1, 2]"
                    + " (or allow masts or conductors)");
        }
        for (Double h : rodHeights) {
            if (h == null || !(h >= 0.1 && h <= 10)) {
                throw new InvalidInputException("rodHeights", "rod heights must be between 0.1 m and 10 m, got " + h);
            }
        }
        for (Double h : masts) {
            if (h == null || !(h >= 1 && h <= 60)) {
                throw new InvalidInputException("mastHeights", "mast heights must be between 1 m and 60 m, got " + h);
            }
        }
        List<Polygon> keepOut = new ArrayList<>(storedKeepOut.polygons(siteId));
        keepOut.addAll(keepOut(request.keepOut()));
        List<Geometry> accepted = reviews.latest(siteId)
                .map(r -> ReviewItems.geometries(r.revision().resultGeoJson(), r.accepted().keySet()))
                .orElse(List.of());
        ProposalOptions options = new ProposalOptions(stored.sphere(), List.copyOf(new TreeSet<>(rodHeights)),
                request.edgeConductors(), request.ridgeConductors(), List.copyOf(new TreeSet<>(masts)), keepOut,
                accepted, null);
        return jobs.start(siteId, stored.version(), site, options);
    }

    /** The request's own keep-out areas, checked like stored ones ({@link KeepOutOutline}). */
    private static List<Polygon> keepOut(List<List<double[]>> areas) {
        List<Polygon> out = new ArrayList<>();
        if (areas == null) {
            return out;
        }
        if (areas.size() > MAX_KEEP_OUT) {
            throw new InvalidInputException("keepOut", "at most " + MAX_KEEP_OUT + " keep-out areas, got " + areas.size());
        }
        for (int i = 0; i < areas.size(); i++) {
            out.add(KeepOutOutline.polygon(KeepOutOutline.checked(areas.get(i), "keepOut[" + i + "]")));
        }
        return out;
    }

    /** @throws SiteNotFoundException when the site or the job is unknown */
    public ProposalJobs.Job job(long siteId, String jobId) {
        sites.get(siteId);
        ProposalJobs.Job job = jobs.get(siteId, jobId);
        if (job == null) {
            throw new SiteNotFoundException(siteId, "site " + siteId + " has no proposal \"" + jobId + "\" (finished"
                    + " proposals are kept for a day, the latest " + ProposalJobs.KEEP + " of a site)");
        }
        return job;
    }

    public ProposalJobs.Job cancel(long siteId, String jobId) {
        jobs.cancel(job(siteId, jobId));
        return job(siteId, jobId);
    }

    /**
     * Writes the proposal's rods and masts (as ordinary rods) and its roof-edge and ridge conductors
     * (with their elevations, as proposed) into the site file in one change, so one earlier file
     * keeps the site as it was, and analyses the site again; what it added is stored with the job
     * for {@link #undoAccept}, also when the analysis is pending.
     *
     * @return the edit, whose outcome is what accepting added and the site's version after it
     * @throws InvalidInputException when the proposal is not finished or proposes nothing
     * @throws OptimisticLockingFailureException when the site changed since the proposal started or since {@code version}
     */
    public Edit<AcceptedProposal> accept(long siteId, String jobId, long version) {
        ProposalJobs.Job job = job(siteId, jobId);
        if (job.state() != ProposalJobs.State.DONE) {
            throw new InvalidInputException("proposal", "the proposal is " + job.state().name().toLowerCase(Locale.ROOT)
                    + "; only a finished proposal can be accepted");
        }
        if (job.siteVersion() != version) {
            throw new OptimisticLockingFailureException("the proposal was made for version " + job.siteVersion());
        }
        List<RodInput> rods = new ArrayList<>();
        List<ConductorInput> conductors = new ArrayList<>();
        int masts = 0;
        double conductorLength = 0;
        // the parts as stored with the job, so that any instance can accept them
        for (StoredProposal.Part p : job.result().parts()) {
            if (p.isRod()) {
                rods.add(new RodInput(null, p.name(), p.x(), p.y(), BillOfQuantities.metresText(p.height())));
                masts += p.isMast() ? 1 : 0;
            } else {
                conductors.add(new ConductorInput(null, p.name(), p.path(), null));
                conductorLength += p.length() == null ? 0 : p.length();
            }
        }
        if (rods.isEmpty() && conductors.isEmpty()) {
            throw new InvalidInputException("proposal", "the proposal adds no parts; there is nothing to accept");
        }
        AuditLine audit = AuditLine.of("proposal-accepted", "accepted proposal " + job.id() + ": "
                + (rods.size() - masts) + " rods, " + masts + " masts, " + conductors.size() + " conductors ("
                + Formats.length(conductorLength) + " m)" + (job.result().complete() ? "" : ", not complete"));
        Edit<PartBatchEdits.AddedParts> added = parts.add(siteId, version, rods, conductors, audit);
        AcceptedProposal accepted = new AcceptedProposal(added.outcome().rodIds(), added.outcome().conductorIds(),
                added.version());
        jobs.accepted(job, accepted);
        return new Edit<>(siteId, added.version(), accepted, added.audit(), added.analysis());
    }

    /**
     * Takes an accepted proposal back: removes exactly the parts accepting added, in one change (the
     * file before it is kept as an earlier file), and analyses the site again. Only while nothing else
     * changed the site since ({@code version} is the version accepting answered).
     *
     * @return the edit; its version is the site's version afterwards
     * @throws InvalidInputException when the proposal was not accepted (or was already taken back)
     * @throws OptimisticLockingFailureException when the site changed since
     */
    public Edit<Void> undoAccept(long siteId, String jobId, long version) {
        ProposalJobs.Job job = job(siteId, jobId);
        AcceptedProposal accepted = job.accepted();
        if (accepted == null) {
            throw new InvalidInputException("proposal", "the proposal has not been accepted (or was already taken back);"
                    + " there is nothing to undo");
        }
        if (accepted.version() != version || sites.get(siteId).version() != version) {
            throw new OptimisticLockingFailureException("the site changed after the proposal was accepted; remove the"
                    + " parts on the plan instead");
        }
        Edit<Void> removed = parts.remove(siteId, version, accepted.rodIds(), accepted.conductorIds(),
                AuditLine.of("proposal-accept-undone", String.format(Locale.ROOT,
                        "took back proposal %s: removed %d rods or masts and %d conductors", job.id(),
                        accepted.rodIds().size(), accepted.conductorIds().size())));
        jobs.accepted(job, null);
        return removed;
    }
}
