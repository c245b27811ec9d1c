package org.lpzplanner.engine.design.proposal;

import java.util.ArrayList;
import java.util.Collection;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * The fallback for exposed points the sampled spheres could not settle (the free spheres fell
 * between the samples, or the covering estimate proved too hopeful): the tallest allowed rod at the
 * nearest candidate place, within {@value #MAX_DISTANCE} m, for each such point, skipping points
 * that a rod chosen this way already stands near (within half the rod’s protected radius on
 * open ground, √(h(2R − h))). Points higher than the sphere radius above the ground are left alone:
 * a sphere reaches them from the side whatever stands on the roof.
 */
final class NearestFix {

    static final double MAX_DISTANCE = 3.0;

    private NearestFix() {
    }

    static List<Integer> choose(List<Candidate> candidates, Set<Integer> chosen, Collection<Integer> picked,
            List<ExposedPoints.Point> points, List<CoverageTarget> targets, boolean[] covered, double radius) {
        Set<String> settled = new HashSet<>();
        for (int t = 0; t < targets.size(); t++) {
            if (covered[t]) {
                CoverageTarget c = targets.get(t);
                settled.add(c.x() + ":" + c.y() + ":" + c.z());
            }
        }
        List<Integer> out = new ArrayList<>();
        List<double[]> placed = new ArrayList<>();
        for (ExposedPoints.Point p : points) {
            if (p.z() >= radius || settled.contains(p.x() + ":" + p.y() + ":" + p.z()) || near(placed, p)) {
                continue;
            }
            int best = -1;
            double bestScore = Double.POSITIVE_INFINITY;
            for (int c = 0; c < candidates.size(); c++) {
                Candidate cand = candidates.get(c);
                if (cand.kind() != ProposedPart.Kind.ROD || chosen.contains(c) || picked.contains(c) || out.contains(c)) {
                    continue;
                }
                var foot = cand.path().get(0);
                double d = Math.hypot(foot.x - p.x(), foot.y - p.y());
                if (d > MAX_DISTANCE || foot.getZ() + cand.height() <= p.z()) {
                    continue;
                }
                double score = d - cand.height();
                if (score < bestScore) {
                    bestScore = score;
                    best = c;
                }
            }
            if (best >= 0) {
                out.add(best);
                Candidate cand = candidates.get(best);
                double h = cand.height();
                placed.add(new double[] {cand.path().get(0).x, cand.path().get(0).y, Math.sqrt(h * (2 * radius - h)) / 2});
            }
        }
        return out;
    }

    private static boolean near(List<double[]> placed, ExposedPoints.Point p) {
        for (double[] q : placed) {
            if (Math.hypot(q[0] - p.x(), q[1] - p.y()) <= q[2]) {
                return true;
            }
        }
        return false;
    }
}
