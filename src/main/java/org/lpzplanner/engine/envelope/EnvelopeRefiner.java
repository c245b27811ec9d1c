package org.lpzplanner.engine.envelope;

import java.util.ArrayList;
import java.util.List;
import java.util.PriorityQueue;

/**
 * Branch and bound for the least envelope height over a target square (half-side 0: a point):
 * min over x in the target and centre columns c with |c − x| ≤ R of [D(c) − √(R² − |c − x|²)].
 *
 * <p>Regions of centre columns are bounded below by a lower bound of D over the region minus the
 * sphere term at the region's nearest distance to the target; they start as blocks of a min-pyramid
 * over the grid's cell bounds and are subdivided below cell size using the supports themselves.
 * Exact values of D at region centres give the upper bound. Stops when the gap is within the
 * tolerance, or as soon as a threshold question is settled. Columns outside the grid are open
 * ground (D = R), which is exact there.
 *
 * <p>Thread-safe: each call keeps its own state.
 */
public final class EnvelopeRefiner {

    /** Sub-cell splitting stops here, relative to the cell size; the region's bound then stands. */
    private static final int MAX_SPLIT_DEPTH = 16;

    /**
     * Work cap per query: near a continuum of equally good centres (a wall of a structure taller
     * than R, queried exactly on its line) the bounds tighten only slowly; the query then returns
     * its current lower bound, which is still safe.
     */
    private static final int MAX_REGIONS = 200_000;

    /** Joint bounds are tried on regions up to this half-size, as a share of R: larger ones rarely gain. */
    private static final double JOINT_MAX_HALF = 0.125;

    private final CentreSurface surface;
    private final SupportIndex index;
    private final Grid grid;
    private final double radius;
    private final double r2;
    private final double[][] pyramid;
    private final int[] pnx;
    private final int[] pny;
    private final int topLevel;
    /** Per top-level block, the supports that can be the highest somewhere in it. */
    private final List<Support>[] topSupports;

    @SuppressWarnings("unchecked")
    public EnvelopeRefiner(CentreSurface surface, SupportIndex index) {
        this.surface = surface;
        this.index = index;
        this.grid = surface.grid();
        this.radius = surface.radius();
        this.r2 = radius * radius;
        List<double[]> levels = new ArrayList<>();
        List<int[]> dims = new ArrayList<>();
        levels.add(surface.cellLowers());
        dims.add(new int[] {grid.nx(), grid.ny()});
        double blockTarget = Math.max(grid.h(), radius / 3);
        while (grid.h() * (1 << (levels.size() - 1)) < blockTarget) {
            double[] prev = levels.get(levels.size() - 1);
            int px = dims.get(dims.size() - 1)[0], py = dims.get(dims.size() - 1)[1];
            int qx = (px + 1) / 2, qy = (py + 1) / 2;
            double[] next = new double[qx * qy];
            for (int j = 0; j < qy; j++) {
                for (int i = 0; i < qx; i++) {
                    double m = Double.POSITIVE_INFINITY;
                    for (int dj = 0; dj < 2; dj++) {
                        for (int di = 0; di < 2; di++) {
                            int ci = 2 * i + di, cj = 2 * j + dj;
                            if (ci < px && cj < py) {
                                m = Math.min(m, prev[cj * px + ci]);
                            }
                        }
                    }
                    next[j * qx + i] = m;
                }
            }
            levels.add(next);
            dims.add(new int[] {qx, qy});
        }
        this.pyramid = levels.toArray(new double[0][]);
        this.pnx = dims.stream().mapToInt(d -> d[0]).toArray();
        this.pny = dims.stream().mapToInt(d -> d[1]).toArray();
        this.topLevel = pyramid.length - 1;
        this.topSupports = new List[pnx[topLevel] * pny[topLevel]];
        for (int j = 0; j < pny[topLevel]; j++) {
            for (int i = 0; i < pnx[topLevel]; i++) {
                Region root = block(topLevel, i, j);
                topSupports[j * pnx[topLevel] + i] = relevant(index.near(root.cx, root.cy, root.half), root);
            }
        }
    }

    /** A region of centre columns with a lower bound of D over it. */
    private static final class Region implements Comparable<Region> {
        final int level;        // ≥ 0: pyramid block (i, j); −1: sub-cell square
        final int i;
        final int j;
        final double cx;
        final double cy;
        final double half;
        final double lowD;
        final int depth;
        List<Support> supports;
        double bound;

        Region(int level, int i, int j, double cx, double cy, double half, double lowD, int depth, List<Support> supports) {
            this.level = level;
            this.i = i;
            this.j = j;
            this.cx = cx;
            this.cy = cy;
            this.half = half;
            this.lowD = lowD;
            this.depth = depth;
            this.supports = supports == null ? List.of() : supports;
        }

        @Override
        public int compareTo(Region o) {
            return Double.compare(bound, o.bound);
        }
    }

    /** Least envelope height at a point, to within {@code tolerance}. */
    public EnvelopeBound atPoint(double x, double y, double tolerance) {
        return lowest(Target.point(x, y), tolerance, Double.NaN);
    }

    /**
     * Bounds on the least envelope height over the target. With a threshold θ (not NaN) it may
     * stop early once "least height ≤ θ" is proven (upper ≤ θ) or refuted (lower &gt; θ).
     */
    public EnvelopeBound lowest(Target target, double tolerance, double threshold) {
        boolean decide = !Double.isNaN(threshold);
        double[] line = jointLine(target);
        double upper = Double.POSITIVE_INFINITY;
        // open ground beyond the grid: D = R exactly
        double dOut = target.distanceToOutside(grid.x0(), grid.y0(), grid.x1(), grid.y1());
        if (dOut <= radius) {
            upper = radius - Math.sqrt(r2 - dOut * dOut);
        }
        PriorityQueue<Region> queue = new PriorityQueue<>();
        double blockSize = grid.h() * (1 << topLevel);
        double[] b = target.bounds();
        int i0 = (int) Math.floor((b[0] - radius - grid.x0()) / blockSize);
        int i1 = (int) Math.floor((b[2] + radius - grid.x0()) / blockSize);
        int j0 = (int) Math.floor((b[1] - radius - grid.y0()) / blockSize);
        int j1 = (int) Math.floor((b[3] + radius - grid.y0()) / blockSize);
        for (int j = Math.max(0, j0); j <= Math.min(pny[topLevel] - 1, j1); j++) {
            for (int i = Math.max(0, i0); i <= Math.min(pnx[topLevel] - 1, i1); i++) {
                Region root = block(topLevel, i, j);
                root.supports = topSupports[j * pnx[topLevel] + i];
                upper = Math.min(upper, offer(queue, root, target, line));
            }
        }
        int popped = 0;
        while (!queue.isEmpty()) {
            Region r = queue.poll();
            if (++popped > MAX_REGIONS) {
                return new EnvelopeBound(Math.min(r.bound, upper), upper);
            }
            if (decide && (upper <= threshold || r.bound > threshold)) {
                return new EnvelopeBound(Math.min(r.bound, upper), upper);
            }
            if (r.bound >= upper - tolerance) {
                return new EnvelopeBound(Math.min(r.bound, upper), upper);
            }
            if (r.level > 0) {
                for (int dj = 0; dj < 2; dj++) {
                    for (int di = 0; di < 2; di++) {
                        int ci = 2 * r.i + di, cj = 2 * r.j + dj;
                        if (ci < pnx[r.level - 1] && cj < pny[r.level - 1]) {
                            Region child = block(r.level - 1, ci, cj);
                            child.supports = relevant(r.supports, child);
                            upper = Math.min(upper, offer(queue, child, target, line));
                        }
                    }
                }
            } else if (r.depth >= MAX_SPLIT_DEPTH) {
                return new EnvelopeBound(Math.min(r.bound, upper), upper);
            } else {
                double q = r.half / 2;
                for (int dj = -1; dj <= 1; dj += 2) {
                    for (int di = -1; di <= 1; di += 2) {
                        double sx = r.cx + di * q, sy = r.cy + dj * q;
                        // the region's bound stands in for the supports left out as irrelevant
                        double low = CentreHeights.lowerBound(r.supports, sx, sy, q, r.lowD);
                        double exact = CentreHeights.lowest(r.supports, sx, sy, Math.max(radius, r.lowD));
                        Region sub = new Region(-1, 0, 0, sx, sy, q, low, r.depth + 1, null);
                        sub.supports = relevant(r.supports, sub);
                        upper = Math.min(upper, evaluate(sx, sy, exact, target));
                        if (bound(sub, target, line)) {
                            queue.add(sub);
                        }
                    }
                }
            }
        }
        return new EnvelopeBound(upper, upper);
    }

    /** The supports of {@code from} that can be the highest somewhere in the region (upper bound ≥ its lower bound of D). */
    private static List<Support> relevant(List<Support> from, Region r) {
        List<Support> out = new ArrayList<>(Math.min(from.size(), 16));
        for (Support s : from) {
            if (s.upperBound(r.cx, r.cy, r.half) >= r.lowD) {
                out.add(s);
            }
        }
        return out;
    }

    /** Supports that may constrain centres in the square of half-side {@code half} around (x, y). */
    public List<Support> supportsNear(double x, double y, double half) {
        return index.near(x, y, half);
    }

    /** The lowest free centre height over column (x, y), exact (D, or L under spans: {@link CentreHeights}). */
    public double centreHeight(double x, double y) {
        return CentreHeights.lowest(index.near(x, y, 0), x, y, radius);
    }

    /** True when the sphere centred at (x, y, z) enters no part of the solid (by more than {@code slack}). */
    public boolean isFree(double x, double y, double z, double slack) {
        return z >= radius - slack && CentreHeights.isFree(index.near(x, y, 0), x, y, z, slack);
    }

    /**
     * The point (zero tangent) or line whose distance bounds the distance from every centre of the
     * region to the target from below, for the joint bounds; null when the region overlaps the
     * target's bounding box in both axes (the distance may be zero there).
     */
    private static double[] jointReference(Region r, Target target, double[] line) {
        if (target instanceof Target.Square || target instanceof Target.Union) {
            double[] b = target.bounds();
            if (b[0] == b[2] && b[1] == b[3]) {
                return line;
            }
            boolean right = r.cx - r.half >= b[2], left = r.cx + r.half <= b[0];
            boolean up = r.cy - r.half >= b[3], down = r.cy + r.half <= b[1];
            double ex = right ? b[2] : b[0], ey = up ? b[3] : b[1];
            if ((right || left) && (up || down)) {
                return new double[] {ex, ey, 0, 0};
            } else if (right || left) {
                return new double[] {ex, b[1], 0, 1};
            } else if (up || down) {
                return new double[] {b[0], ey, 1, 0};
            }
            return null;
        }
        double px = line[0], py = line[1], tx = line[2], ty = line[3];
        if (tx != 0 || ty != 0) {
            // beyond an end of the segment, the nearest target point is that end for the whole region
            double along = tx * (r.cx - px) + ty * (r.cy - py), spread = r.half * (Math.abs(tx) + Math.abs(ty));
            if (along + spread <= 0) {
                return new double[] {px, py, 0, 0};
            } else if (along - spread >= line[4]) {
                return new double[] {px + tx * line[4], py + ty * line[4], 0, 0};
            }
        }
        return line;
    }

    /**
     * For a point, square or union target (its centre, zero tangent) or a segment target (its start,
     * unit tangent and length), the reference for joint bounds; areas are refined per region by the
     * side or corner of their bounding box that faces it.
     */
    private static double[] jointLine(Target target) {
        if (target instanceof Target.Square || target instanceof Target.Union) {
            double[] b = target.bounds();
            return new double[] {(b[0] + b[2]) / 2, (b[1] + b[3]) / 2, 0, 0, 0};
        }
        if (target instanceof Target.Segment seg) {
            double len = Math.hypot(seg.x1() - seg.x0(), seg.y1() - seg.y0());
            return len == 0 ? new double[] {seg.x0(), seg.y0(), 0, 0, 0}
                    : new double[] {seg.x0(), seg.y0(), (seg.x1() - seg.x0()) / len, (seg.y1() - seg.y0()) / len, len};
        }
        return null;
    }

    private Region block(int level, int i, int j) {
        double size = grid.h() * (1 << level);
        double cx = grid.x0() + (i + 0.5) * size, cy = grid.y0() + (j + 0.5) * size;
        return new Region(level, i, j, cx, cy, size / 2, pyramid[level][j * pnx[level] + i], 0, null);
    }

    /** Queues the region if it can reach the target; returns the upper bound from its best node. */
    private double offer(PriorityQueue<Region> queue, Region r, Target target, double[] line) {
        if (!bound(r, target, line)) {
            return Double.POSITIVE_INFINITY;
        }
        queue.add(r);
        // the block's cell nearest the target gives an attained value
        int span = 1 << r.level;
        double tx = target.anchor()[0], ty = target.anchor()[1];
        int ci = Math.max(r.i * span, Math.min(Math.min(grid.nx(), (r.i + 1) * span) - 1, (int) Math.floor((tx - grid.x0()) / grid.h())));
        int cj = Math.max(r.j * span, Math.min(Math.min(grid.ny(), (r.j + 1) * span) - 1, (int) Math.floor((ty - grid.y0()) / grid.h())));
        return evaluate(grid.nodeX(ci), grid.nodeY(cj), surface.nodeHeight(ci, cj), target);
    }

    /**
     * Sets the region's bound: its lower bound of D less the sphere term at its nearest distance to
     * the target, raised by the supports' joint bounds where the target allows them. False when no
     * centre of the region can reach the target.
     */
    private boolean bound(Region r, Target target, double[] line) {
        double d = target.lowerDistance(r.cx, r.cy, r.half);
        double d2 = d * d;
        if (d2 > r2) {
            return false;
        }
        r.bound = r.lowD - Math.sqrt(r2 - d2);
        double[] ref = line == null || r.half > JOINT_MAX_HALF * radius ? null : jointReference(r, target, line);
        if (ref != null) {
            for (Support s : r.supports) {
                // a span bounds L only where no gap under it is possible (see CentreHeights)
                if (!s.hasSpaceBelow() || s.floorUpperBound(r.cx, r.cy, r.half) < r.lowD) {
                    r.bound = Math.max(r.bound, s.jointLowerBound(r.cx, r.cy, r.half, ref[0], ref[1], ref[2], ref[3]));
                }
            }
        }
        return true;
    }

    private double evaluate(double cx, double cy, double d, Target target) {
        double dist = target.distance(cx, cy);
        double d2 = dist * dist;
        return d2 > r2 ? Double.POSITIVE_INFINITY : d - Math.sqrt(r2 - d2);
    }
}
