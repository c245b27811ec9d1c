package org.lpzplanner.engine.envelope;

import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;

/**
 * Grey-scale erosion of a lattice of values by the lower half of a ball of radius R:
 * out(u) = min over lattice points w with |u − w| ≤ R of [v(w) − √(R² − |u − w|²)].
 *
 * <p>Method: the ball splits into rows. For a row offset Δj the ball's section is a circle of radius
 * ρ = √(R² − (Δj·h)²), and the 1-D erosion of one lattice row by a circle is the lower envelope of
 * translated "bowls" v_k − √(ρ² − (x − k)²). Any two translates of one convex function cross at
 * most once, so that envelope is built in O(n) with a stack (as in Felzenszwalb and Huttenlocher's
 * distance transform), with the crossing of two equal circles in closed form. Runs of equal values
 * (free ground, flat roofs) keep only their end bowls. Total cost O(cells · R/h).
 *
 * <p>Exact over the lattice up to floating-point rounding (&lt; 1e-9 m): at each position the
 * envelope bowl and its left neighbour are both evaluated, so a crossing computed a rounding error
 * off never yields a value above the true minimum. Uses every available core; thread-safe.
 */
public final class BallErosion {

    private BallErosion() {
    }

    /** Erodes v (row-major, nx × ny, spacing h) by a ball of radius R; returns a new array. */
    public static double[] erode(double[] v, int nx, int ny, double h, double radius) {
        int threads = Math.max(1, Math.min(Runtime.getRuntime().availableProcessors(), ny / 8));
        if (threads == 1) {
            double[] out = selfTerms(v, radius);
            erodeRows(v, nx, ny, h, radius, 0, ny, out);
            return out;
        }
        ExecutorService pool = Executors.newFixedThreadPool(threads);
        try {
            @SuppressWarnings("unchecked")
            Future<double[]>[] parts = new Future[threads];
            for (int t = 0; t < threads; t++) {
                int from = (int) ((long) ny * t / threads), to = (int) ((long) ny * (t + 1) / threads);
                parts[t] = pool.submit(() -> {
                    double[] out = selfTerms(v, radius);
                    erodeRows(v, nx, ny, h, radius, from, to, out);
                    return out;
                });
            }
            double[] out = parts[0].get();
            for (int t = 1; t < threads; t++) {
                double[] o = parts[t].get();
                for (int i = 0; i < out.length; i++) {
                    if (o[i] < out[i]) {
                        out[i] = o[i];
                    }
                }
            }
            return out;
        } catch (Exception e) {
            throw new IllegalStateException("erosion failed", e);
        } finally {
            pool.shutdownNow();
        }
    }

    /**
     * Every output starts at its own value less R: the ball straight above (distance 0). No later
     * term can be needed unless it is lower, which is what lets whole chunks of rows be skipped.
     */
    private static double[] selfTerms(double[] v, double radius) {
        double[] out = new double[v.length];
        for (int i = 0; i < v.length; i++) {
            out[i] = v[i] - radius;
        }
        return out;
    }

    /** Columns per chunk for deciding which parts of a row a source row can still lower. */
    private static final int CHUNK = 64;

    private static void erodeRows(double[] v, int nx, int ny, double h, double radius, int from, int to, double[] out) {
        int maxDj = (int) Math.floor(radius / h);
        RowEroder eroder = new RowEroder(nx);
        double[] tmp = new double[nx];
        // Every output is at most its own value less R (the ball straight above). A source chunk whose
        // least value less ρ is not below that ceiling anywhere in a target chunk within reach cannot
        // lower it, so only the target columns some source can still lower are computed.
        int chunks = (nx + CHUNK - 1) / CHUNK;
        double[] chunkMin = new double[ny * chunks];
        double[] chunkCeiling = new double[ny * chunks];
        double topCeiling = Double.NEGATIVE_INFINITY;
        for (int j = 0; j < ny; j++) {
            for (int c = 0; c < chunks; c++) {
                double lo = Double.POSITIVE_INFINITY, hi = Double.NEGATIVE_INFINITY;
                for (int i = c * CHUNK; i < Math.min(nx, (c + 1) * CHUNK); i++) {
                    lo = Math.min(lo, v[j * nx + i]);
                    hi = Math.max(hi, v[j * nx + i]);
                }
                chunkMin[j * chunks + c] = lo;
                chunkCeiling[j * chunks + c] = hi - radius;
                topCeiling = Math.max(topCeiling, hi - radius);
            }
        }
        double[] reachMin = new double[chunks];
        for (int js = from; js < to; js++) {
            boolean loaded = false;
            double rowMin = Double.POSITIVE_INFINITY;
            for (int c = 0; c < chunks; c++) {
                rowMin = Math.min(rowMin, chunkMin[js * chunks + c]);
            }
            for (int dj = 0; dj <= maxDj; dj++) {
                int up = js + dj, down = js - dj;
                if (up >= ny && down < 0) {
                    break;
                }
                double dy = dj * h;
                double rho = Math.sqrt(Math.max(0, radius * radius - dy * dy));
                if (rowMin - rho >= topCeiling) {
                    break; // ρ only shrinks from here
                }
                double r = rho / h;
                int reach = (int) Math.ceil(r / CHUNK) + 1;
                for (int c = 0; c < chunks; c++) {
                    double m = Double.POSITIVE_INFINITY;
                    for (int sc = Math.max(0, c - reach); sc <= Math.min(chunks - 1, c + reach); sc++) {
                        m = Math.min(m, chunkMin[js * chunks + sc]);
                    }
                    reachMin[c] = m - rho;
                }
                int lo = nx, hi = -1;
                boolean needUp = false, needDown = false;
                for (int c = 0; c < chunks; c++) {
                    boolean u = up < ny && reachMin[c] < chunkCeiling[up * chunks + c];
                    boolean d = dj > 0 && down >= 0 && reachMin[c] < chunkCeiling[down * chunks + c];
                    if (u || d) {
                        lo = Math.min(lo, c * CHUNK);
                        hi = Math.max(hi, Math.min(nx, (c + 1) * CHUNK) - 1);
                        needUp |= u;
                        needDown |= d;
                    }
                }
                if (hi < lo) {
                    continue;
                }
                if (!loaded) {
                    eroder.load(v, js * nx, h);
                    loaded = true;
                }
                eroder.erode(r, tmp, lo, hi);
                if (needUp) {
                    minInto(out, up * nx, tmp, h, lo, hi);
                }
                if (needDown) {
                    minInto(out, down * nx, tmp, h, lo, hi);
                }
            }
        }
    }

    private static void minInto(double[] out, int offset, double[] row, double h, int lo, int hi) {
        for (int i = lo; i <= hi; i++) {
            double val = row[i] * h;
            if (val < out[offset + i]) {
                out[offset + i] = val;
            }
        }
    }

    /** One lattice row in units of the spacing: erodes it by circles of any radius. Not thread-safe. */
    static final class RowEroder {
        private static final double NEAR = 1e-6;
        private final int n;
        private final double[] w;
        private final double[] bowlPos;
        private final double[] bowlVal;
        private int bowls;
        private final int[] stack;
        private final double[] from;

        RowEroder(int n) {
            this.n = n;
            this.w = new double[n];
            this.bowlPos = new double[n];
            this.bowlVal = new double[n];
            this.stack = new int[n];
            this.from = new double[n];
        }

        /** Loads row values divided by h, and keeps only the end points of runs of equal values. */
        void load(double[] v, int offset, double h) {
            load(v, offset, h, null, 0);
        }

        /**
         * Loads row values divided by h, only where {@code sources} is set (every position when it is
         * null; the others take no part), and keeps only the end points of runs of equal values.
         */
        void load(double[] v, int offset, double h, boolean[] sources, int sourceOffset) {
            bowls = 0;
            for (int i = 0; i < n; i++) {
                w[i] = sources == null || sources[sourceOffset + i] ? v[offset + i] / h : Double.POSITIVE_INFINITY;
            }
            int start = 0;
            for (int i = 1; i <= n; i++) {
                if (i == n || w[i] != w[start]) {
                    if (w[start] != Double.POSITIVE_INFINITY) {
                        bowlPos[bowls] = start;
                        bowlVal[bowls++] = w[start];
                        if (i - 1 > start) {
                            bowlPos[bowls] = i - 1;
                            bowlVal[bowls++] = w[start];
                        }
                    }
                    start = i;
                }
            }
        }

        /**
         * out[x] = min over k of [w_k − √(r² − (x − k)²)] for x in [lo, hi]; only bowls within r of
         * that range can reach it.
         */
        void erode(double r, double[] out, int lo, int hi) {
            double reachLo = lo - r, reachHi = hi + r;
            int first = firstAtOrAbove(reachLo), last = firstAtOrAbove(Math.nextUp(reachHi)) - 1;
            int top = -1;
            for (int q = first; q <= last; q++) {
                if (top < 0) {
                    stack[++top] = q;
                    from[top] = Double.NEGATIVE_INFINITY;
                    continue;
                }
                double s;
                while (true) {
                    s = switchPoint(bowlPos[stack[top]], bowlVal[stack[top]], bowlPos[q], bowlVal[q], r);
                    if (s <= from[top] && top > 0) {
                        top--;
                    } else {
                        break;
                    }
                }
                if (s <= from[top]) {
                    stack[0] = q; // top == 0 and q is never worse than the only bowl
                    from[0] = Double.NEGATIVE_INFINITY;
                    continue;
                }
                stack[++top] = q;
                from[top] = s;
            }
            int k = 0;
            double r2 = r * r;
            for (int x = lo; x <= hi; x++) {
                double best = Double.POSITIVE_INFINITY;
                if (top >= 0) {
                    while (k < top && from[k + 1] <= x) {
                        k++;
                    }
                    best = bowl(stack[k], x, r2);
                    // near a crossing, rounding may pick the wrong side: look at both neighbours there
                    if (k > 0 && x - from[k] < NEAR) {
                        best = Math.min(best, bowl(stack[k - 1], x, r2));
                    }
                    if (k < top && from[k + 1] - x < NEAR) {
                        best = Math.min(best, bowl(stack[k + 1], x, r2));
                    }
                }
                double self = w[x] - r;
                out[x] = self < best ? self : best;
            }
        }

        /** Index of the first bowl at or right of {@code x} (bowls are sorted by position). */
        private int firstAtOrAbove(double x) {
            int a = 0, b = bowls;
            while (a < b) {
                int m = (a + b) >>> 1;
                if (bowlPos[m] < x) {
                    a = m + 1;
                } else {
                    b = m;
                }
            }
            return a;
        }

        private double bowl(int b, int x, double r2) {
            double d = x - bowlPos[b];
            double s = r2 - d * d;
            return s < 0 ? Double.POSITIVE_INFINITY : bowlVal[b] - Math.sqrt(s);
        }

        /**
         * First position from which bowl b (right) is no worse than bowl a (left). The difference
         * a − b increases along their common domain [b − r, a + r].
         */
        static double switchPoint(double a, double wa, double b, double wb, double r) {
            double lo = b - r, hi = a + r;
            if (lo > hi) {
                return hi;
            }
            double r2 = r * r;
            double dx = b - a, dw = wb - wa;
            double dist2 = dx * dx + dw * dw;
            double t2 = r2 - dist2 / 4;
            if (t2 > 0) {
                // the two circles cross; their lower crossing is the switch when it lies on both lower arcs
                double dist = Math.sqrt(dist2);
                double t = Math.sqrt(t2);
                double y = (wa + wb) / 2 - t * dx / dist;
                if (y <= Math.min(wa, wb)) {
                    double x = (a + b) / 2 + t * dw / dist;
                    return x < lo ? lo : (x > hi ? hi : x);
                }
            }
            // no crossing of the lower arcs: one bowl is lower over the whole common domain
            double dLo = wa - Math.sqrt(Math.max(0, r2 - (lo - a) * (lo - a))) - wb;
            return dLo >= 0 ? lo : hi;
        }
    }
}
