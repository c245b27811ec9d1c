package org.lpzplanner.design;

import java.time.Clock;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.Polygon;
import org.lpzplanner.airtermination.AirTerminationService;
import org.lpzplanner.analysis.AnalysisService;
import org.lpzplanner.analysis.ReviewItems;
import org.lpzplanner.analysis.ReviewService;
import org.lpzplanner.common.Formats;
import org.lpzplanner.engine.design.AngleCoverage;
import org.lpzplanner.engine.design.AngleMethodCheck;
import org.lpzplanner.engine.design.BondingRoutes;
import org.lpzplanner.engine.design.MeshFaceResult;
import org.lpzplanner.engine.design.MeshMethodCheck;
import org.lpzplanner.engine.design.SeparationDistance;
import org.lpzplanner.engine.design.SeparationSurvey;
import org.lpzplanner.engine.design.proposal.ProposalOptions;
import org.lpzplanner.engine.design.proposal.ProposedPart;
import org.lpzplanner.engine.design.quantities.BillOfQuantities;
import org.lpzplanner.engine.design.quantities.QuantityTable;
import org.lpzplanner.engine.exposure.AnalysisOptions;
import org.lpzplanner.engine.exposure.AnalysisResult;
import org.lpzplanner.engine.exposure.ExposureAnalysis;
import org.lpzplanner.engine.geom.SiteSurface;
import org.lpzplanner.engine.geom.SiteSurfaceBuilder;
import org.lpzplanner.engine.model.Site;
import org.lpzplanner.engine.model.SphereSpec;
import org.lpzplanner.engine.model.Structure;
import org.lpzplanner.keepout.KeepOutAreaService;
import org.lpzplanner.keepout.KeepOutOutline;
import org.lpzplanner.sites.SiteNotFoundException;
import org.lpzplanner.sites.SiteService;
import org.lpzplanner.sites.StoredSite;
import org.lpzplanner.system.InvalidInputException;
import org.springframework.dao.OptimisticLockingFailureException;
import org.springframework.stereotype.Service;
import tools.jackson.databind.JsonNode;

/**
 * The design of a stored site: proposals (run by {@link ProposalJobs}) and their acceptance into
 * the site file, the angle and mesh method cross-checks, separation distances and the bill of
 * quantities, both over the site's down-conductors ({@link DownConductorService}).
 */
@Service
public class DesignService {

    /** Largest number of keep-out areas a request may give, as many as a site may store. */
    static final int MAX_KEEP_OUT = KeepOutAreaService.MAX_AREAS;

    private final SiteService sites;
    private final AirTerminationService parts;
    private final AnalysisService analyses;
    private final ReviewService reviews;
    private final DesignRepository store;
    private final ProposalJobs jobs;
    private final Clock clock;
    private final KeepOutAreaService storedKeepOut;
    private final DownConductorService downConductors;

    public DesignService(SiteService sites, AirTerminationService parts, AnalysisService analyses, ReviewService reviews,
            DesignRepository store, ProposalJobs jobs, Clock clock, KeepOutAreaService storedKeepOut,
            DownConductorService downConductors) {
        this.storedKeepOut = storedKeepOut;
        this.downConductors = downConductors;
        this.sites = sites;
        this.parts = parts;
        this.analyses = analyses;
        this.reviews = reviews;
        this.store = store;
        this.jobs = jobs;
        this.clock = clock;
    }

    /**
     * What a designer asks for: allowed rod heights, mast heights (may be empty), whether roof-edge
     * and ridge conductors may be proposed, keep-out polygons in local metres. The site's stored
     * keep-out areas always apply as well; these add to them for this proposal only.
     */
    public record ProposeRequest(List<Double> rodHeights, List<Double> mastHeights, boolean edgeConductors,
            boolean ridgeConductors, List<List<double[]>> keepOut) {

        public ProposeRequest(List<Double> rodHeights, List<Double> mastHeights, List<List<double[]>> keepOut) {
            this(rodHeights, mastHeights, false, false, keepOut);
        }
    }

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
        ProposalOptions options = new ProposalOptions(stored.sphere(), List.copyOf(new java.util.TreeSet<>(rodHeights)),
                request.edgeConductors(), request.ridgeConductors(), List.copyOf(new java.util.TreeSet<>(masts)), keepOut,
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

    /** Ids of the parts an accepted proposal added to the site, and the site's version after accepting. */
    public record Accepted(List<String> rodIds, List<String> conductorIds, long version) {
    }

    /**
     * Writes the proposal's rods and masts (as ordinary rods) and its roof-edge and ridge conductors
     * (with their elevations, as proposed) into the site file in one change, so one earlier file
     * keeps the site as it was; records the change in the audit trail, then analyses the site again.
     *
     * @throws InvalidInputException when the proposal is not finished or proposes nothing
     * @throws OptimisticLockingFailureException when the site changed since the proposal started or since {@code version}
     */
    public Accepted accept(long siteId, String jobId, long version) {
        ProposalJobs.Job job = job(siteId, jobId);
        if (job.state() != ProposalJobs.State.DONE) {
            throw new InvalidInputException("proposal", "the proposal is " + job.state().name().toLowerCase(Locale.ROOT)
                    + "; only a finished proposal can be accepted");
        }
        if (job.siteVersion() != version) {
            throw new OptimisticLockingFailureException("the proposal was made for version " + job.siteVersion());
        }
        List<AirTerminationService.RodInput> rods = new ArrayList<>();
        List<AirTerminationService.ConductorInput> conductors = new ArrayList<>();
        int masts = 0;
        double conductorLength = 0;
        // the parts as stored with the job (ProposalResultJson), so that any instance can accept them
        for (JsonNode p : job.result().path("parts")) {
            if (p.has("x")) {
                rods.add(new AirTerminationService.RodInput(null, p.path("name").asString(), p.path("x").asDouble(),
                        p.path("y").asDouble(), BillOfQuantities.metresText(p.path("height").asDouble())));
                masts += "mast".equals(p.path("kind").asString()) ? 1 : 0;
            } else {
                List<double[]> points = new ArrayList<>();
                for (JsonNode c : p.path("path")) {
                    points.add(new double[] {c.path(0).asDouble(), c.path(1).asDouble(), c.path(2).asDouble()});
                }
                conductors.add(new AirTerminationService.ConductorInput(null, p.path("name").asString(), points, null));
                conductorLength += p.path("length").asDouble();
            }
        }
        if (rods.isEmpty() && conductors.isEmpty()) {
            throw new InvalidInputException("proposal", "the proposal adds no parts; there is nothing to accept");
        }
        String text = "accepted proposal " + job.id() + ": " + (rods.size() - masts) + " rods, " + masts + " masts, "
                + conductors.size() + " conductors (" + Formats.length(conductorLength) + " m)"
                + (job.result().path("complete").asBoolean() ? "" : ", not complete");
        AirTerminationService.AddedParts added = parts.addParts(siteId, version, rods, conductors, "proposal-accepted", text);
        analyses.run(siteId, null, null, null);
        Accepted accepted = new Accepted(added.rodIds(), added.conductorIds(), sites.get(siteId).version());
        jobs.accepted(job, accepted);
        return accepted;
    }

    /**
     * Takes an accepted proposal back: removes exactly the parts accepting added, in one change
     * (the file before it is kept as an earlier file), records it in the audit trail and analyses
     * the site again. Only while nothing else changed the site since ({@code version} is the version
     * accepting answered).
     *
     * @return the site's version afterwards
     * @throws InvalidInputException when the proposal was not accepted (or was already taken back)
     * @throws OptimisticLockingFailureException when the site changed since
     */
    public long undoAccept(long siteId, String jobId, long version) {
        ProposalJobs.Job job = job(siteId, jobId);
        Accepted accepted = job.accepted();
        if (accepted == null) {
            throw new InvalidInputException("proposal", "the proposal has not been accepted (or was already taken back);"
                    + " there is nothing to undo");
        }
        if (accepted.version() != version || sites.get(siteId).version() != version) {
            throw new OptimisticLockingFailureException("the site changed after the proposal was accepted; remove the"
                    + " parts on the plan instead");
        }
        parts.removeParts(siteId, version, accepted.rodIds(), accepted.conductorIds(), "proposal-accept-undone",
                String.format(Locale.ROOT, "took back proposal %s: removed %d rods or masts and %d conductors", job.id(),
                        accepted.rodIds().size(), accepted.conductorIds().size()));
        jobs.accepted(job, null);
        analyses.run(siteId, null, null, null);
        return sites.get(siteId).version();
    }

    /** One structure's cross-check of the rolling sphere against the angle and mesh methods. */
    public record MethodCheck(String structureId, String name, int sphereExposedItems, double sphereExposedRoofArea,
            boolean angleCovered, double angleUncoveredArea, int meshFacesPassing, int meshFacesFailing,
            int meshFacesNotApplicable, String agreement, List<String> notes) {

        /** The exposed roof area as pages and report write an area. */
        public String sphereExposedRoofAreaText() {
            return Formats.area(sphereExposedRoofArea);
        }

        /** The roof area the angle method leaves uncovered, written as an area. */
        public String angleUncoveredAreaText() {
            return Formats.area(angleUncoveredArea);
        }
    }

    public List<MethodCheck> methodChecks(long siteId) {
        StoredSite stored = sites.get(siteId);
        Site site = sites.document(stored).site();
        SphereSpec sphere = stored.sphere();
        AnalysisResult result = ExposureAnalysis.analyze(site, AnalysisOptions.of(sphere));
        SiteSurface surface = SiteSurfaceBuilder.build(site);
        List<MeshFaceResult> mesh = MeshMethodCheck.check(surface, sphere.level().meshSize());
        List<MethodCheck> out = new ArrayList<>();
        for (Structure s : site.structures()) {
            int items = (int) (result.edges().stream().filter(e -> e.ownerId().equals(s.id())).count()
                    + result.corners().stream().filter(c -> c.ownerId().equals(s.id())).count()
                    + result.facadePartsNeedingLateral().stream().filter(f -> f.band().ownerId().equals(s.id()))
                            .count());
            double roof = result.roofs().stream().filter(r -> r.ownerId().equals(s.id())).mapToDouble(r -> r.exposedPlanArea()).sum();
            AngleCoverage angle = AngleMethodCheck.check(surface, s.id(), sphere.radius());
            int pass = 0, fail = 0, na = 0;
            for (MeshFaceResult m : mesh) {
                if (m.ownerId().equals(s.id())) {
                    switch (m.status()) {
                        case PASS -> pass++;
                        case FAIL -> fail++;
                        default -> na++;
                    }
                }
            }
            boolean sphereProtected = items == 0 && roof == 0;
            String agreement;
            if (sphereProtected == angle.isCovered()) {
                agreement = sphereProtected ? "agree: protected" : "agree: not protected";
            } else if (angle.isCovered()) {
                agreement = "disagree: the angle method covers the roof, the rolling sphere still reaches parts of the structure";
            } else {
                agreement = "disagree: the rolling sphere finds the structure protected, the angle method leaves roof uncovered";
            }
            out.add(new MethodCheck(s.id(), s.name() == null ? s.id() : s.name(), items, round(roof), angle.isCovered(),
                    round(angle.uncoveredArea()), pass, fail, na, agreement, angle.notes()));
        }
        return out;
    }

    /**
     * One separation distance check, at the worst point of the system ({@code lpsPoint}, on part
     * {@code partId}: a rod, conductor or down-conductor; where distance − s is least), with the
     * installation's point nearest it. {@code length} is l there, {@code route} says how it was found
     * ({@code routeBasis}: drawn, assumed-links, grounded-part or none), {@code straightAcross} the
     * metres of it assumed straight across the roof where no conductor is drawn; {@code downConductors}
     * the number the current shares between and {@code sharedBy} which (labels as in the
     * down-conductor list; parts standing on the ground by id), giving {@code kc}; {@code status} is
     * "passes", "fails", "not confirmed" (it clears, but l is only a lower bound somewhere: at the worst
     * point, or on the part {@code unconfirmedPartId} that has no drawn route) or "connected" (a part
     * touches the object).
     */
    public record Separation(String kind, String name, double[] installation, double[] lpsPoint, String partId,
            double actual, double length, String routeBasis, String route, double straightAcross, int downConductors,
            List<String> sharedBy, double kc, String material, double required, boolean passes, String status,
            String unconfirmedPartId, String note) {

        /** "0.66 (D1, D2)": k<sub>c</sub> and the down-conductors behind it. */
        public String kcText() {
            return String.format(Locale.ROOT, "%.2f", kc) + (sharedBy.isEmpty() ? "" : " (" + String.join(", ", sharedBy) + ")");
        }
    }

    /** Height of the equipotential bonding the separation distances run to: ground level (sites store no other). */
    static final double BONDING_LEVEL = 0;

    public List<Separation> separations(long siteId) {
        StoredSite stored = sites.get(siteId);
        Site site = sites.document(stored).site();
        List<DesignRepository.Installation> stores = store.installations(siteId);
        List<SeparationSurvey.Installation> metals = new ArrayList<>();
        for (DesignRepository.Installation i : stores) {
            metals.add(new SeparationSurvey.Installation(i.name(), new Coordinate(i.x(), i.y(), i.z()),
                    SeparationDistance.Material.valueOf(i.material())));
        }
        List<SeparationSurvey.Check> checks = SeparationSurvey.survey(site, SiteSurfaceBuilder.build(site),
                stored.sphere().level(), DownConductorService.forRoutes(downConductors.list(site, stored)), metals,
                BONDING_LEVEL);
        List<Separation> out = new ArrayList<>();
        int metal = 0;
        for (SeparationSurvey.Check c : checks) {
            String kind = c.kind();
            if (kind.equals("metal installation")) {
                kind = "metal installation #" + stores.get(metal++).id();
            }
            out.add(separation(kind, c));
        }
        return out;
    }

    private static Separation separation(String kind, SeparationSurvey.Check c) {
        BondingRoutes.Route route = c.route();
        SeparationSurvey.Point u = c.unconfirmed();
        String note;
        if (c.connected()) {
            note = "a part touches it: it is connected to the air-termination, so it must be fit to carry lightning"
                    + " current; no clearance to check";
        } else if (route.basis() == BondingRoutes.Basis.ASSUMED_LINKS) {
            note = "part of l is assumed straight across the roof where no conductor is drawn, the shortest a"
                    + " route can be: l is a lower bound, so the check can fail but not pass until the route is drawn";
        } else if (route.basis() == BondingRoutes.Basis.NONE) {
            note = "no down-conductor reached: l is only a lower bound, so the check cannot pass";
        } else if (c.status() == SeparationSurvey.Status.NOT_CONFIRMED) {
            note = "it clears s at every point, but " + u.partId() + " has no drawn route to a down-conductor (there l is"
                    + " at least " + Formats.length(u.result().length()) + " m): not confirmed until its route is drawn";
        } else {
            note = "l along the drawn air-termination and down the down-conductor";
        }
        if (c.status() == SeparationSurvey.Status.FAILS && c.result().actual() >= c.result().required()) {
            note += String.format(Locale.ROOT, "; within %.0f mm of s, which counts as failing",
                    SeparationSurvey.TOLERANCE * 1000);
        }
        if (!c.connected()) {
            note = "worst point of the system (on " + c.partId() + "): " + note;
        }
        String status = c.status().name().toLowerCase(Locale.ROOT).replace('_', ' ');
        Coordinate p = c.installation(), q = c.lpsPoint();
        return new Separation(kind, c.name(), new double[] {round(p.x), round(p.y), round(p.getZ())},
                new double[] {round(q.x), round(q.y), round(q.getZ())}, c.partId(), round(c.result().actual()),
                round(c.result().length()), route.basis().name().toLowerCase(Locale.ROOT).replace('_', '-'),
                route.describe(), round(route.assumedStraight()), route.downConductors(), route.sharedBy(),
                SeparationDistance.kc(route.downConductors()), c.material().name(),
                Math.round(c.result().required() * 1000) / 1000.0, c.passes(), status,
                u == null ? null : u.partId(), note);
    }

    public DesignRepository.Installation addInstallation(long siteId, String name, Double x, Double y, Double z,
            String material) {
        sites.get(siteId);
        if (name == null || name.isBlank() || name.strip().length() > 200) {
            throw new InvalidInputException("name", "give the installation a name of 1 to 200 characters");
        }
        for (Object[] f : new Object[][] {{"x", x}, {"y", y}, {"z", z}}) {
            Double v = (Double) f[1];
            if (v == null || !Double.isFinite(v)) {
                throw new InvalidInputException((String) f[0], f[0] + " is required, in metres");
            }
        }
        if (z < 0) {
            throw new InvalidInputException("z", "z is the height above ground and cannot be negative");
        }
        String m = material == null ? "AIR" : material.strip().toUpperCase(Locale.ROOT);
        if (!m.equals("AIR") && !m.equals("CONCRETE_OR_BRICK")) {
            throw new InvalidInputException("material", "material must be AIR or CONCRETE_OR_BRICK, got \"" + material + "\"");
        }
        long id = store.addInstallation(siteId, name.strip(), x, y, z, m, clock.instant());
        return new DesignRepository.Installation(id, name.strip(), x, y, z, m);
    }

    public void removeInstallation(long siteId, long id) {
        sites.get(siteId);
        if (!store.removeInstallation(siteId, id)) {
            throw new SiteNotFoundException(siteId, "site " + siteId + " has no metal installation " + id);
        }
    }

    public List<DesignRepository.Installation> installations(long siteId) {
        sites.get(siteId);
        return store.installations(siteId);
    }

    /** The bill of quantities of the site as it is (its parts and down-conductors). */
    public QuantityTable quantities(long siteId, double fixingsPerMetre) {
        if (!(fixingsPerMetre >= 0 && fixingsPerMetre <= 20)) {
            throw new InvalidInputException("fixingsPerMetre", "fixings per metre must be between 0 and 20, got " + fixingsPerMetre);
        }
        StoredSite stored = sites.get(siteId);
        Site site = sites.document(stored).site();
        List<Coordinate> positions = new ArrayList<>();
        for (DownConductorService.DownConductors d : downConductors.list(site, stored)) {
            d.positions().forEach(p -> positions.add(new Coordinate(p[0], p[1])));
        }
        return BillOfQuantities.table(BillOfQuantities.compute(site, positions, fixingsPerMetre));
    }

    /**
     * The bill of quantities as a report section (the table as on the page, the basis of the
     * counts as notes), for any report writer.
     */
    public org.lpzplanner.common.ReportSection quantitiesSection(long siteId, double fixingsPerMetre) {
        QuantityTable table = quantities(siteId, fixingsPerMetre);
        return new org.lpzplanner.common.ReportSection(table.title(), table.columns(), table.rows(), List.of(
                "Down-conductor lengths run from the air-termination level at the top of the wall (parapet, eaves or verge)"
                        + " straight down to ground level; the installed route may be longer, and the connection to the"
                        + " earth termination is not included.",
                "Test joints and earth terminations: one per down-conductor (common practice)."));
    }

    static double round(double v) {
        return Math.round(v * 100) / 100.0;
    }

    /** Counts of the parts of a proposal by kind and height, e.g. {"rod 1 m": 4}. */
    public static Map<String, Integer> partCounts(List<ProposedPart> parts) {
        Map<String, Integer> out = new LinkedHashMap<>();
        for (ProposedPart p : parts) {
            String key = p.rod() != null ? (p.kind() == ProposedPart.Kind.MAST ? "mast " : "rod ")
                    + BillOfQuantities.metresText(p.rod().height()) + " m"
                    : p.kind() == ProposedPart.Kind.RIDGE_CONDUCTOR ? "ridge conductor" : "roof-edge conductor";
            out.merge(key, 1, Integer::sum);
        }
        return out;
    }

}
