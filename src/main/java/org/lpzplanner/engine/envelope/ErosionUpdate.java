package org.lpzplanner.engine.envelope;

import java.util.Arrays;
import java.util.stream.IntStream;

/**
 * The ball erosion of a lattice (see {@link BallErosion}) after some of its values changed, computed
 * only where the change can matter, and equal to eroding the new lattice afresh.
 *
 * <p>Let C be the lattice points whose value changed, and for an output point u let A(u) be the
 * least term over the unchanged sources and B(u) the least over C, so out(u) = min(A(u), B(u)).
 * Both B before and B after are cheap: only the sources in C take part. Then, per u within R of C:
 * <ul>
 * <li>if B<sub>old</sub>(u) &gt; out<sub>old</sub>(u), the old minimum came from an unchanged
 * source, so A(u) = out<sub>old</sub>(u) and out<sub>new</sub>(u) = min(out<sub>old</sub>(u),
 * B<sub>new</sub>(u)) (this covers every point where the values only fell);</li>
 * <li>else if B<sub>new</sub>(u) &lt; out<sub>old</sub>(u) ≤ A(u), out<sub>new</sub>(u) =
 * B<sub>new</sub>(u);</li>
 * <li>else (the old minimum came from C and C rose there) u is eroded again from all sources,
 * leaving out terms at or above B<sub>new</sub>(u), which is then taken as the minimum if none is lower.</li>
 * </ul>
 * Points farther than R from C keep their value. The comparisons keep a margin of
 * {@link #MARGIN}, far above rounding, so near ties are eroded again rather than guessed. Terms of
 * B at or above out<sub>old</sub>(u) plus that margin change none of these cases and are skipped
 * per chunk of columns (as {@link BallErosion} skips terms above an output's own value less R):
 * near a rod on a roof only the few rows of the ball nearly straight above count. Every term is
 * computed by the same formula as in {@link BallErosion}, so the result is the same bit for bit.
 */
final class ErosionUpdate {

    /** Comparisons closer than this (m) count as ties. */
    private static final double MARGIN = 1e-9;

    private ErosionUpdate() {
    }

    /**
     * The erosion of {@code newValues} (row-major, nx × ny, spacing h), given the erosion
     * {@code oldEroded} of {@code oldValues}, which differ from the new values only in the window
     * [i0, i1] × [j0, j1]. Returns {@code oldEroded} itself when nothing changed, else a new array.
     */
    static double[] erode(double[] oldValues, double[] newValues, double[] oldEroded, int nx, int ny, double h,
            double radius, int i0, int j0, int i1, int j1) {
        boolean[] changed = new boolean[nx * ny];
        int ci0 = nx, cj0 = ny, ci1 = -1, cj1 = -1;
        for (int j = Math.max(0, j0); j <= Math.min(ny - 1, j1); j++) {
            for (int i = Math.max(0, i0); i <= Math.min(nx - 1, i1); i++) {
                int k = j * nx + i;
                if (Double.compare(oldValues[k], newValues[k]) != 0) {
                    changed[k] = true;
                    ci0 = Math.min(ci0, i);
                    cj0 = Math.min(cj0, j);
                    ci1 = Math.max(ci1, i);
                    cj1 = Math.max(cj1, j);
                }
            }
        }
        if (ci1 < 0) {
            return oldEroded;
        }
        int reach = (int) Math.floor(radius / h);
        int ti0 = Math.max(0, ci0 - reach), ti1 = Math.min(nx - 1, ci1 + reach);
        int tj0 = Math.max(0, cj0 - reach), tj1 = Math.min(ny - 1, cj1 + reach);
        int tw = ti1 - ti0 + 1, th = tj1 - tj0 + 1;
        // Terms at or above the old value plus the margin change no case below (they are above the old
        // minimum, so they neither lower it nor could have been it), so they need not be computed.
        double[] ceiling = new double[tw * th];
        for (int t = 0; t < th; t++) {
            for (int i = ti0; i <= ti1; i++) {
                ceiling[t * tw + (i - ti0)] = oldEroded[(tj0 + t) * nx + i] + MARGIN;
            }
        }
        double[][] fromChanged = IntStream.range(0, 2).parallel()
                .mapToObj(k -> erodeTargets(k == 0 ? oldValues : newValues, nx, ny, h, radius, changed,
                        ti0, tj0, ti1, tj1, null, null, ceiling))
                .toArray(double[][]::new);
        double[] before = fromChanged[0], after = fromChanged[1];
        double[] out = oldEroded.clone();
        int[] againLo = new int[th], againHi = new int[th];
        boolean any = false;
        for (int t = 0; t < th; t++) {
            againLo[t] = nx;
            againHi[t] = -1;
            int row = (tj0 + t) * nx;
            for (int i = ti0; i <= ti1; i++) {
                int k = t * tw + (i - ti0);
                double old = oldEroded[row + i];
                if (before[k] > old + MARGIN) {
                    out[row + i] = Math.min(old, after[k]);
                } else if (after[k] < old - MARGIN) {
                    out[row + i] = after[k];
                } else {
                    againLo[t] = Math.min(againLo[t], i);
                    againHi[t] = Math.max(againHi[t], i);
                    any = true;
                }
            }
        }
        if (any) {
            // terms at or above B_new (or the output's own value less R) cannot lower the minimum
            for (int t = 0; t < th; t++) {
                int row = (tj0 + t) * nx;
                for (int i = againLo[t]; i <= againHi[t]; i++) {
                    int k = t * tw + (i - ti0);
                    ceiling[k] = Math.min(newValues[row + i] - radius, after[k]);
                }
            }
            double[] again = erodeTargets(newValues, nx, ny, h, radius, null, ti0, tj0, ti1, tj1, againLo, againHi,
                    ceiling);
            for (int t = 0; t < th; t++) {
                int row = (tj0 + t) * nx;
                for (int i = againLo[t]; i <= againHi[t]; i++) {
                    int k = t * tw + (i - ti0);
                    out[row + i] = Math.min(again[k], after[k]);
                }
            }
        }
        return out;
    }

    /** Columns per chunk for deciding which outputs a source row can still lower. */
    private static final int CHUNK = 32;

    /**
     * The erosion at the outputs of the rectangle [ti0, ti1] × [tj0, tj1] (only columns
     * rowLo[t]..rowHi[t] of its row t when those are given), from the sources marked in
     * {@code sources} (all when null); +∞ where no source reaches. Returned row-major over the
     * rectangle. Terms at or above {@code ceiling} (row-major over the rectangle; when null, each
     * output's own value less R, which it never exceeds) may be left out: outputs that only such
     * terms would reach keep a higher value.
     */
    static double[] erodeTargets(double[] v, int nx, int ny, double h, double radius, boolean[] sources,
            int ti0, int tj0, int ti1, int tj1, int[] rowLo, int[] rowHi, double[] ceiling) {
        int tw = ti1 - ti0 + 1, th = tj1 - tj0 + 1;
        int[] lo = rowLo, hi = rowHi;
        if (lo == null) {
            lo = new int[th];
            hi = new int[th];
            Arrays.fill(lo, ti0);
            Arrays.fill(hi, ti1);
        }
        double[] out = new double[tw * th];
        Arrays.fill(out, Double.POSITIVE_INFINITY);
        for (int t = 0; t < th; t++) {
            int row = (tj0 + t) * nx;
            for (int i = lo[t]; i <= hi[t]; i++) {
                if (sources == null || sources[row + i]) {
                    out[t * tw + (i - ti0)] = v[row + i] - radius; // the ball straight above, as BallErosion starts
                }
            }
        }
        // per target row and chunk of columns, the highest term that can still matter
        int c0 = ti0 / CHUNK, c1 = ti1 / CHUNK, chunks = c1 - c0 + 1;
        double[] chunkCeiling = new double[th * chunks];
        Arrays.fill(chunkCeiling, Double.NEGATIVE_INFINITY);
        double topCeiling = Double.NEGATIVE_INFINITY;
        for (int t = 0; t < th; t++) {
            for (int i = lo[t]; i <= hi[t]; i++) {
                double c = ceiling != null ? ceiling[t * tw + (i - ti0)] : v[(tj0 + t) * nx + i] - radius;
                int k = t * chunks + (i / CHUNK - c0);
                chunkCeiling[k] = Math.max(chunkCeiling[k], c);
                topCeiling = Math.max(topCeiling, c);
            }
        }
        int maxDj = (int) Math.floor(radius / h);
        int sourceChunks = (nx + CHUNK - 1) / CHUNK;
        double[] chunkMin = new double[sourceChunks];
        BallErosion.RowEroder eroder = new BallErosion.RowEroder(nx);
        double[] tmp = new double[nx];
        for (int js = Math.max(0, tj0 - maxDj); js <= Math.min(ny - 1, tj1 + maxDj); js++) {
            double rowMin = Double.POSITIVE_INFINITY;
            for (int sc = 0; sc < sourceChunks; sc++) {
                double m = Double.POSITIVE_INFINITY;
                for (int i = sc * CHUNK; i < Math.min(nx, (sc + 1) * CHUNK); i++) {
                    if (sources == null || sources[js * nx + i]) {
                        m = Math.min(m, v[js * nx + i]);
                    }
                }
                chunkMin[sc] = m;
                rowMin = Math.min(rowMin, m);
            }
            if (rowMin == Double.POSITIVE_INFINITY) {
                continue;
            }
            boolean loaded = false;
            for (int dj = 0; dj <= maxDj; dj++) {
                int up = js + dj, down = js - dj;
                if (up > tj1 && down < tj0) {
                    break;
                }
                // the same ρ as BallErosion, so every term is the same number
                double dy = dj * h;
                double rho = Math.sqrt(Math.max(0, radius * radius - dy * dy));
                if (rowMin - rho >= topCeiling) {
                    break; // ρ only shrinks from here
                }
                boolean rowUp = up >= tj0 && up <= tj1 && lo[up - tj0] <= hi[up - tj0];
                boolean rowDown = dj > 0 && down >= tj0 && down <= tj1 && lo[down - tj0] <= hi[down - tj0];
                if (!rowUp && !rowDown) {
                    continue;
                }
                double r = rho / h;
                int reachChunks = (int) Math.ceil(r / CHUNK) + 1;
                int from = nx, to = -1;
                boolean needUp = false, needDown = false;
                for (int c = 0; c < chunks; c++) {
                    double m = Double.POSITIVE_INFINITY;
                    for (int sc = Math.max(0, c + c0 - reachChunks); sc <= Math.min(sourceChunks - 1, c + c0 + reachChunks); sc++) {
                        m = Math.min(m, chunkMin[sc]);
                    }
                    m -= rho;
                    boolean u = rowUp && m < chunkCeiling[(up - tj0) * chunks + c];
                    boolean d = rowDown && m < chunkCeiling[(down - tj0) * chunks + c];
                    if (u || d) {
                        from = Math.min(from, (c + c0) * CHUNK);
                        to = Math.max(to, (c + c0 + 1) * CHUNK - 1);
                        needUp |= u;
                        needDown |= d;
                    }
                }
                if (to < from) {
                    continue;
                }
                int upLo = needUp ? Math.max(from, lo[up - tj0]) : 0, upHi = needUp ? Math.min(to, hi[up - tj0]) : -1;
                int downLo = needDown ? Math.max(from, lo[down - tj0]) : 0, downHi = needDown ? Math.min(to, hi[down - tj0]) : -1;
                int eLo = Math.min(upHi >= upLo ? upLo : nx, downHi >= downLo ? downLo : nx);
                int eHi = Math.max(upHi >= upLo ? upHi : -1, downHi >= downLo ? downHi : -1);
                if (eHi < eLo) {
                    continue;
                }
                if (!loaded) {
                    eroder.load(v, js * nx, h, sources, js * nx);
                    loaded = true;
                }
                eroder.erode(r, tmp, eLo, eHi);
                if (upHi >= upLo) {
                    minInto(out, (up - tj0) * tw - ti0, tmp, h, upLo, upHi);
                }
                if (downHi >= downLo) {
                    minInto(out, (down - tj0) * tw - ti0, tmp, h, downLo, downHi);
                }
            }
        }
        return out;
    }

    private static void minInto(double[] out, int offset, double[] row, double h, int lo, int hi) {
        for (int i = lo; i <= hi; i++) {
            double val = row[i] * h;
            if (val < out[offset + i]) {
                out[offset + i] = val;
            }
        }
    }
}
