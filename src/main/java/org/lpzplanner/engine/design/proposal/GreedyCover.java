package org.lpzplanner.engine.design.proposal;

import java.util.ArrayList;
import java.util.List;
import java.util.PriorityQueue;

/**
 * Weighted set cover by the greedy rule (take the part covering the most still-uncovered targets
 * per unit of cost, lazily re-evaluated), then pruning: a chosen part whose every target is also
 * covered by another chosen part is dropped, the costliest and least useful first. The greedy rule
 * is within a factor ln(n) of the least cost (Chvátal 1979); pruning only removes.
 */
final class GreedyCover {

    private GreedyCover() {
    }

    /**
     * Indices of the chosen candidates. {@code covered} marks targets already covered (by parts
     * chosen earlier); it is updated.
     */
    static List<Integer> choose(int[][] sets, double[] costs, boolean[] covered, ProposalMonitor monitor) {
        PriorityQueue<double[]> queue = new PriorityQueue<>((a, b) -> Double.compare(b[0], a[0]) != 0
                ? Double.compare(b[0], a[0]) : Double.compare(a[1], b[1]));
        for (int c = 0; c < sets.length; c++) {
            int gain = gain(sets[c], covered);
            if (gain > 0) {
                queue.add(new double[] {gain / costs[c], c});
            }
        }
        List<Integer> chosen = new ArrayList<>();
        while (!queue.isEmpty()) {
            if (monitor.isCancelled()) {
                throw new ProposalCancelledException();
            }
            double[] top = queue.poll();
            int c = (int) top[1];
            int gain = gain(sets[c], covered);
            if (gain == 0) {
                continue;
            }
            double score = gain / costs[c];
            if (!queue.isEmpty() && score < queue.peek()[0] - 1e-12) {
                queue.add(new double[] {score, c});
                continue;
            }
            chosen.add(c);
            for (int t : sets[c]) {
                covered[t] = true;
            }
        }
        return prune(sets, costs, chosen, covered.length);
    }

    /** Drops chosen parts whose targets the others cover too. */
    static List<Integer> prune(int[][] sets, double[] costs, List<Integer> chosen, int targetCount) {
        int[] count = new int[targetCount];
        for (int c : chosen) {
            for (int t : sets[c]) {
                count[t]++;
            }
        }
        List<Integer> order = new ArrayList<>(chosen);
        order.sort((a, b) -> {
            int byCost = Double.compare(costs[b] / Math.max(1, sets[b].length), costs[a] / Math.max(1, sets[a].length));
            return byCost != 0 ? byCost : Integer.compare(b, a);
        });
        List<Integer> kept = new ArrayList<>(chosen);
        for (int c : order) {
            boolean redundant = true;
            for (int t : sets[c]) {
                if (count[t] < 2) {
                    redundant = false;
                    break;
                }
            }
            if (redundant) {
                kept.remove(Integer.valueOf(c));
                for (int t : sets[c]) {
                    count[t]--;
                }
            }
        }
        return kept;
    }

    private static int gain(int[] set, boolean[] covered) {
        int g = 0;
        for (int t : set) {
            if (!covered[t]) {
                g++;
            }
        }
        return g;
    }
}
