package org.lpzplanner.engine.envelope;

import java.util.ArrayList;
import java.util.List;

/**
 * Supports bucketed on a coarse uniform grid by their reach, to find the few that can constrain a
 * sphere centre in a given square. Immutable after construction; thread-safe.
 */
public final class SupportIndex {

    private final List<Support> supports;
    private final double x0;
    private final double y0;
    private final double size;
    private final int bx;
    private final int by;
    private final Support[][] buckets;

    public SupportIndex(List<Support> supports, Grid grid, double bucketSize) {
        this.supports = List.copyOf(supports);
        this.x0 = grid.x0();
        this.y0 = grid.y0();
        this.size = bucketSize;
        this.bx = Math.max(1, (int) Math.ceil((grid.x1() - x0) / size));
        this.by = Math.max(1, (int) Math.ceil((grid.y1() - y0) / size));
        List<List<Support>> lists = new ArrayList<>(bx * by);
        for (int i = 0; i < bx * by; i++) {
            lists.add(new ArrayList<>());
        }
        for (Support s : supports) {
            double[] r = s.reach();
            int i0 = clampX(r[0]), i1 = clampX(r[2]), j0 = clampY(r[1]), j1 = clampY(r[3]);
            for (int j = j0; j <= j1; j++) {
                for (int i = i0; i <= i1; i++) {
                    lists.get(j * bx + i).add(s);
                }
            }
        }
        buckets = new Support[bx * by][];
        for (int i = 0; i < buckets.length; i++) {
            buckets[i] = lists.get(i).toArray(new Support[0]);
        }
    }

    public List<Support> all() {
        return supports;
    }

    /** Supports whose reach may touch the square of half-side {@code half} around (x, y). */
    public List<Support> near(double x, double y, double half) {
        int i0 = clampX(x - half), i1 = clampX(x + half), j0 = clampY(y - half), j1 = clampY(y + half);
        if (i0 == i1 && j0 == j1) {
            return List.of(buckets[j0 * bx + i0]);
        }
        java.util.LinkedHashSet<Support> out = new java.util.LinkedHashSet<>();
        for (int j = j0; j <= j1; j++) {
            for (int i = i0; i <= i1; i++) {
                out.addAll(List.of(buckets[j * bx + i]));
            }
        }
        return new ArrayList<>(out);
    }

    private int clampX(double x) {
        return Math.max(0, Math.min(bx - 1, (int) Math.floor((x - x0) / size)));
    }

    private int clampY(double y) {
        return Math.max(0, Math.min(by - 1, (int) Math.floor((y - y0) / size)));
    }
}
