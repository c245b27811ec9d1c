package org.lpzplanner.engine.design.proposal;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.locationtech.jts.geom.Coordinate;
import org.lpzplanner.engine.exposure.AnalysisOptions;
import org.lpzplanner.engine.exposure.AnalysisResult;
import org.lpzplanner.engine.exposure.ExposureAnalysis;
import org.lpzplanner.engine.exposure.ResolutionChoice;
import org.lpzplanner.engine.geom.SiteSurface;
import org.lpzplanner.engine.geom.SiteSurfaceBuilder;
import org.lpzplanner.engine.model.Conductor;
import org.lpzplanner.engine.model.Rod;
import org.lpzplanner.engine.model.Site;

/**
 * Proposes air-termination for a site: parts that leave no roof, edge, corner or facade band
 * exposed to the rolling sphere (except what the designer accepted), with as few parts as it can.
 *
 * <p><b>Method.</b>
 * <ol>
 * <li>The full analysis of the site as it is (its own parts stay) gives the exposed items; points
 *     are sampled on them ({@link ExposedPoints}) and, for each, the free spheres touching it
 *     ({@link FreeSpheres}).</li>
 * <li>Candidate parts at corners, along edges and ridges, on a grid over the roof, optionally masts
 *     and conductors ({@link CandidateGenerator}); each covers the points whose every free sphere
 *     it holds off on its own ({@link CoverageSets}).</li>
 * <li>Greedy weighted set cover, then pruning of redundant parts ({@link GreedyCover}).</li>
 * <li>The full analysis of the site with the chosen parts. What it still finds exposed (between
 *     sampled points or spheres) is sampled again against the new envelope and covered by further
 *     parts, up to {@value #MAX_ROUNDS} rounds; from the second round on, points the sampling
 *     cannot settle get the tallest rod next to them ({@link NearestFix}). A round that leaves no
 *     less exposed than before is taken back; the next round then places rods next to the points
 *     alone, and if that fails too the search ends. These guiding analyses run on a grid of at least
 *     {@value #GUIDE_RESOLUTION} m; the last one always runs at the site's own resolution (the one
 *     a plain analysis would use, or the one given), and only it decides whether the proposal is complete.</li>
 * </ol>
 * The result is complete only when the last full analysis finds nothing exposed outside the accepted
 * items; otherwise it says what is left and how much of it no candidate can reach at all.
 *
 * <p>Thread-safe (no shared state); uses all cores for the coverage sets and the analyses.
 */
public final class AirTerminationProposer {

    static final int MAX_ROUNDS = 8;

    /**
     * Grid spacing of the analyses that guide the choice, metres. The grid spacing never changes
     * the safety of a result (only its speed), and the last check runs at the site's own spacing.
     */
    static final double GUIDE_RESOLUTION = 1.0;

    private AirTerminationProposer() {
    }

    /**
     * @throws ProposalCancelledException when the monitor asks to stop
     * @throws org.lpzplanner.engine.envelope.AnalysisTooLargeException when the site's grid would not fit
     */
    public static Proposal propose(Site site, ProposalOptions options, ProposalMonitor listener) {
        long start = System.nanoTime();
        ProposalMonitor monitor = new RisingMonitor(listener);
        AnalysisOptions analysis = AnalysisOptions.of(options.sphere()).withResolution(options.resolution());
        double radius = options.sphere().radius();
        SiteSurface surface = SiteSurfaceBuilder.build(site);
        double finest = options.resolution() != null ? options.resolution() : ResolutionChoice.choose(surface, radius);
        AnalysisOptions guide = analysis.withResolution(Math.max(finest, GUIDE_RESOLUTION));
        monitor.progress("analysing the site as it is", 0.0);
        AnalysisResult current = ExposureAnalysis.analyze(site, guide);
        boolean finalCheck = guide.resolution() <= finest;
        checkCancelled(monitor);
        ExposedPoints sampler = new ExposedPoints(options.accepted());
        monitor.progress("placing candidate parts", 0.1);
        List<Candidate> candidates = new CandidateGenerator().generate(site, surface, options);
        double[] costs = candidates.stream().mapToDouble(Candidate::cost).toArray();
        Set<Integer> chosen = new HashSet<>();
        List<ProposedPart> parts = new ArrayList<>();
        Site proposed = site;
        SiteSurface proposedSurface = surface;
        int rounds = 0;
        int beyondReach = 0;
        boolean fixOnly = false;
        while (rounds < MAX_ROUNDS) {
            List<ExposedPoints.Point> points = sampler.of(current, proposedSurface);
            if (points.isEmpty() && !finalCheck) {
                monitor.progress("checking the proposal at the full resolution", 0.7);
                current = ExposureAnalysis.analyze(proposed, analysis);
                finalCheck = true;
                checkCancelled(monitor);
                points = sampler.of(current, proposedSurface);
            }
            if (points.isEmpty()) {
                break;
            }
            rounds++;
            double from = rounds == 1 ? 0.12 : 0.8 + 0.03 * (rounds - 2);
            double to = rounds == 1 ? 0.6 : from + 0.015;
            monitor.progress("finding what each candidate part covers (round " + rounds + ")", from);
            FreeSpheres spheres = new FreeSpheres(current.envelope(),
                    rounds == 1 ? FreeSpheres.RINGS : 3 * FreeSpheres.RINGS);
            List<CoverageTarget> targets = new ArrayList<>(points.size());
            List<ExposedPoints.Point> guiding = new ArrayList<>(points.size());
            double cell = finalCheck ? finest : guide.resolution();
            for (ExposedPoints.Point p : points) {
                double[] free = spheres.at(p);
                if (free == null && p.rise() > 0) {
                    free = raisedSpheres(spheres, p, cell);
                }
                if (free != null) {
                    targets.add(new CoverageTarget(p.x(), p.y(), p.z(), p.ownerId(), free));
                    guiding.add(p);
                }
            }
            int[][] sets = CoverageSets.compute(candidates, targets, radius, monitor, from, to);
            for (int c : chosen) {
                sets[c] = new int[0];
            }
            boolean[] reachable = new boolean[targets.size()];
            for (int[] set : sets) {
                for (int t : set) {
                    reachable[t] = true;
                }
            }
            beyondReach = 0;
            for (boolean r : reachable) {
                beyondReach += r ? 0 : 1;
            }
            monitor.progress("choosing parts (round " + rounds + ")", to);
            boolean[] coveredNow = new boolean[targets.size()];
            List<Integer> picked = new ArrayList<>(fixOnly ? List.of() : GreedyCover.choose(sets, costs, coveredNow, monitor));
            if (rounds > 1) {
                picked.addAll(NearestFix.choose(candidates, chosen, picked, points, targets, coveredNow, radius));
            }
            if (picked.isEmpty()) {
                break;
            }
            List<ProposedPart> before = List.copyOf(parts);
            List<Integer> chosenBefore = List.copyOf(chosen);
            AnalysisResult beforeResult = current;
            for (int c : picked) {
                chosen.add(c);
                parts.add(part(candidates.get(c), parts.size() + 1));
            }
            proposed = withParts(site, parts);
            monitor.progress("checking the proposal with the full analysis (round " + rounds + ")",
                    rounds == 1 ? 0.65 : to);
            current = ExposureAnalysis.analyze(proposed, finalCheck ? analysis : guide);
            proposedSurface = SiteSurfaceBuilder.build(proposed);
            checkCancelled(monitor);
            if (rounds > 1 && sampler.of(current, proposedSurface).size() >= points.size()) {
                // the new parts did not reduce what is left: take them back; try once more with
                // rods next to the points alone, then stop
                parts.clear();
                parts.addAll(before);
                chosen.retainAll(java.util.Set.copyOf(chosenBefore));
                proposed = withParts(site, parts);
                proposedSurface = SiteSurfaceBuilder.build(proposed);
                current = beforeResult;
                if (fixOnly) {
                    break;
                }
                fixOnly = true;
            }
        }
        if (!finalCheck) {
            current = ExposureAnalysis.analyze(proposed, analysis);
            checkCancelled(monitor);
        }
        List<ExposedPoints.Point> left = sampler.of(current, proposedSurface);
        Map<String, Integer> byKind = new LinkedHashMap<>();
        for (ExposedPoints.Point p : left) {
            byKind.merge(p.what(), 1, Integer::sum);
        }
        if (left.isEmpty()) {
            beyondReach = 0;
        }
        int regular = RegularLayout.count(site, options.sphere().level().meshSize());
        monitor.progress("done", 1.0);
        return new Proposal(parts, left.isEmpty(), current, byKind, beyondReach, regular, rounds, candidates.size(),
                (System.nanoTime() - start) / 1_000_000);
    }

    /**
     * Free spheres of a point on a sloped face or edge that none touch at its own height: the
     * analysis decides a cell (or edge piece) by the highest point of the surface in it, so the
     * exposure it reports may lie up to rise·h above the point, anywhere in the cell. The point
     * raised by that much, at itself and at the cell's corners (or the piece's ends), stands in for it.
     */
    private static double[] raisedSpheres(FreeSpheres spheres, ExposedPoints.Point p, double cell) {
        double half = cell / 2;
        double[][] offsets = p.dx() != 0 || p.dy() != 0
                ? new double[][] {{0, 0}, {half * p.dx(), half * p.dy()}, {-half * p.dx(), -half * p.dy()}}
                : new double[][] {{0, 0}, {half, half}, {half, -half}, {-half, half}, {-half, -half}};
        for (double[] o : offsets) {
            double[] free = spheres.at(p.raised(cell, o[0], o[1]));
            if (free != null) {
                return free;
            }
        }
        return null;
    }

    /** Passes progress on only when it rises (coverage is reported from several threads). */
    private static final class RisingMonitor implements ProposalMonitor {
        private final ProposalMonitor target;
        private double last = -1;

        RisingMonitor(ProposalMonitor target) {
            this.target = target;
        }

        @Override
        public synchronized void progress(String stage, double fraction) {
            if (fraction >= last) {
                last = fraction;
                target.progress(stage, fraction);
            }
        }

        @Override
        public boolean isCancelled() {
            return target.isCancelled();
        }
    }

    /** The site with its own parts and the proposed ones. */
    public static Site withParts(Site site, List<ProposedPart> parts) {
        List<Rod> rods = new ArrayList<>(site.rods());
        List<Conductor> conductors = new ArrayList<>(site.conductors());
        for (ProposedPart p : parts) {
            if (p.rod() != null) {
                rods.add(p.rod());
            } else {
                conductors.add(p.conductor());
            }
        }
        return site.withAirTermination(rods, conductors);
    }

    private static ProposedPart part(Candidate c, int number) {
        String id = "proposed-" + number;
        if (c.kind() == ProposedPart.Kind.ROD || c.kind() == ProposedPart.Kind.MAST) {
            Coordinate foot = c.path().get(0);
            String name = String.format(Locale.ROOT, "proposed %s %d (%s m)",
                    c.kind() == ProposedPart.Kind.MAST ? "mast" : "rod", number, trim(c.height()));
            Rod rod = new Rod(id, name, round(foot.x), round(foot.y), c.height());
            return new ProposedPart(c.kind(), c.place(), c.ownerId(), rod, null);
        }
        List<Coordinate> path = new ArrayList<>();
        for (Coordinate p : c.path()) {
            path.add(new Coordinate(round(p.x), round(p.y), round(p.getZ())));
        }
        String name = "proposed " + (c.kind() == ProposedPart.Kind.RIDGE_CONDUCTOR ? "ridge" : "roof-edge")
                + " conductor " + number;
        return new ProposedPart(c.kind(), c.place(), c.ownerId(), null, new Conductor(id, name, path, null));
    }

    /** Rounds to the millimetre, as the stored file will hold it. */
    private static double round(double v) {
        return Math.round(v * 1000) / 1000.0;
    }

    private static String trim(double v) {
        return v == Math.rint(v) ? String.valueOf((long) v) : String.valueOf(v);
    }


    private static void checkCancelled(ProposalMonitor monitor) {
        if (monitor.isCancelled()) {
            throw new ProposalCancelledException();
        }
    }
}
