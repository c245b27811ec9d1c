package org.lpzplanner.engine.design.proposal;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.stream.IntStream;

/**
 * Which targets each candidate covers on its own: it blocks every free sphere of the target with a
 * margin of {@value #MARGIN} m. Adding parts never exposes a point (the envelope only rises), so
 * what one part covers alone stays covered whatever else is chosen; a set of parts whose coverage
 * sets together hold every target covers all the sampled points.
 */
final class CoverageSets {

    /** How far inside a sphere a part must reach to count as blocking it, metres. */
    static final double MARGIN = 0.05;

    private CoverageSets() {
    }

    /** Covered target indices per candidate (parallel over candidates). */
    static int[][] compute(List<Candidate> candidates, List<CoverageTarget> targets, double radius,
            ProposalMonitor monitor, double from, double to) {
        double cell = Math.max(1, radius / 2);
        Map<Long, List<Integer>> buckets = new HashMap<>();
        for (int t = 0; t < targets.size(); t++) {
            CoverageTarget target = targets.get(t);
            buckets.computeIfAbsent(key((long) Math.floor(target.x() / cell), (long) Math.floor(target.y() / cell)),
                    k -> new ArrayList<>()).add(t);
        }
        int[][] out = new int[candidates.size()][];
        AtomicInteger done = new AtomicInteger();
        int total = candidates.size();
        IntStream.range(0, total).parallel().forEach(c -> {
            if (monitor.isCancelled()) {
                return;
            }
            Candidate cand = candidates.get(c);
            double[] b = cand.bounds();
            long i0 = (long) Math.floor((b[0] - radius) / cell), i1 = (long) Math.floor((b[2] + radius) / cell);
            long j0 = (long) Math.floor((b[1] - radius) / cell), j1 = (long) Math.floor((b[3] + radius) / cell);
            int[] hits = new int[16];
            int n = 0;
            for (long i = i0; i <= i1; i++) {
                for (long j = j0; j <= j1; j++) {
                    List<Integer> bucket = buckets.get(key(i, j));
                    if (bucket == null) {
                        continue;
                    }
                    for (int t : bucket) {
                        if (covers(cand, targets.get(t))) {
                            if (n == hits.length) {
                                hits = java.util.Arrays.copyOf(hits, n * 2);
                            }
                            hits[n++] = t;
                        }
                    }
                }
            }
            out[c] = java.util.Arrays.copyOf(hits, n);
            int k = done.incrementAndGet();
            if (k % 256 == 0) {
                synchronized (monitor) {
                    monitor.progress("coverage of candidate parts", from + (to - from) * k / total);
                }
            }
        });
        if (monitor.isCancelled()) {
            throw new ProposalCancelledException();
        }
        return out;
    }

    static boolean covers(Candidate cand, CoverageTarget target) {
        double[] cs = target.centres();
        for (int i = 0; i < cs.length; i += 3) {
            if (!cand.blocks(cs[i], cs[i + 1], cs[i + 2], MARGIN)) {
                return false;
            }
        }
        return true;
    }

    private static long key(long i, long j) {
        return (i << 32) ^ (j & 0xffffffffL);
    }
}
