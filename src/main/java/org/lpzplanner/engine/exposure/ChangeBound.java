package org.lpzplanner.engine.exposure;

import java.util.Arrays;
import org.lpzplanner.engine.envelope.BallErosion;
import org.lpzplanner.engine.envelope.CentreSurface;
import org.lpzplanner.engine.envelope.EnvelopeField;
import org.lpzplanner.engine.envelope.Grid;

/**
 * What an edit of the air-termination can do to the envelope, bounded from below. The centre
 * surface D changes only at columns within R of the changed parts (the zone Z), so
 * E(p) = min(A(p), B(p)) where A is the least term D(c) − √(R² − |c − p|²) over the unchanged
 * columns and B the least over Z. This holds a lower bound of B over any plan box, taken over
 * both the analysis before and after the edit.
 *
 * <p>Where that bound lies above a decision's threshold θ ("is the envelope at or below θ
 * somewhere here?"), B cannot reach θ before or after the edit, so the answer is A's alone and the
 * same as before: the decision can be taken over. Every decision of the roofs, edges and corners
 * is such a question (the grid bounds and resting spheres they try first only settle it sooner).
 *
 * <p>The bound is computed on a coarse lattice of blocks of {@link #BLOCK} × {@link #BLOCK}
 * cells: each block takes the least cell bound of D over its cells in Z (before and after), and
 * those are eroded by the ball on the block corners; the distance between two blocks is the
 * distance between a corner of each, so the least eroded value at a block's corners bounds B
 * over the block (the argument of the engine's own cell bounds, docs/engine.md).
 */
final class ChangeBound {

    /** Grid cells per side of a coarse block. */
    private static final int BLOCK = 4;

    private final double x0;
    private final double y0;
    private final double size;
    private final int bi0;
    private final int bj0;
    private final int nbx;
    private final int nby;
    /** Per block, a lower bound of B over it (+∞: no changed column within R). */
    private final double[] blockBound;

    private ChangeBound(double x0, double y0, double size, int bi0, int bj0, int nbx, int nby, double[] blockBound) {
        this.x0 = x0;
        this.y0 = y0;
        this.size = size;
        this.bi0 = bi0;
        this.bj0 = bj0;
        this.nbx = nbx;
        this.nby = nby;
        this.blockBound = blockBound;
    }

    /**
     * The bound for a change of the parts within the plan box {@code changed} ([minX, minY, maxX,
     * maxY]) between the envelopes {@code before} and {@code after} (same grid and radius).
     */
    static ChangeBound of(EnvelopeField before, EnvelopeField after, double[] changed) {
        Grid g = after.grid();
        double radius = after.radius(), h = g.h();
        // the cells the envelope update recomputes: every column within R of the changed parts
        int reach = (int) Math.ceil(radius / h) + 1;
        int ci0 = Math.max(0, g.column(changed[0]) - reach), ci1 = Math.min(g.nx() - 1, g.column(changed[2]) + reach);
        int cj0 = Math.max(0, g.row(changed[1]) - reach), cj1 = Math.min(g.ny() - 1, g.row(changed[3]) + reach);
        double size = BLOCK * h;
        int blocksInR = (int) Math.ceil(radius / size) + 1;
        int bi0 = ci0 / BLOCK - blocksInR, bj0 = cj0 / BLOCK - blocksInR;
        int nbx = ci1 / BLOCK + blocksInR - bi0 + 1, nby = cj1 / BLOCK + blocksInR - bj0 + 1;
        double[] source = new double[nbx * nby];
        Arrays.fill(source, Double.POSITIVE_INFINITY);
        CentreSurface old = before.centres(), now = after.centres();
        for (int j = cj0; j <= cj1; j++) {
            for (int i = ci0; i <= ci1; i++) {
                int b = (j / BLOCK - bj0) * nbx + (i / BLOCK - bi0);
                source[b] = Math.min(source[b], Math.min(old.cellLower(i, j), now.cellLower(i, j)));
            }
        }
        int vx = nbx + 1, vy = nby + 1;
        double[] vertex = new double[vx * vy];
        for (int j = 0; j < vy; j++) {
            for (int i = 0; i < vx; i++) {
                double m = Double.POSITIVE_INFINITY;
                for (int dj = -1; dj <= 0; dj++) {
                    for (int di = -1; di <= 0; di++) {
                        int bi = i + di, bj = j + dj;
                        if (bi >= 0 && bj >= 0 && bi < nbx && bj < nby) {
                            m = Math.min(m, source[bj * nbx + bi]);
                        }
                    }
                }
                vertex[j * vx + i] = m; // +∞ where no block of Z meets the corner: no source there
            }
        }
        double[] eroded = BallErosion.erode(vertex, vx, vy, size, radius);
        double[] blockBound = new double[nbx * nby];
        for (int j = 0; j < nby; j++) {
            for (int i = 0; i < nbx; i++) {
                int k = j * vx + i;
                blockBound[j * nbx + i] = Math.min(Math.min(eroded[k], eroded[k + 1]),
                        Math.min(eroded[k + vx], eroded[k + vx + 1]));
            }
        }
        return new ChangeBound(g.x0(), g.y0(), size, bi0, bj0, nbx, nby, blockBound);
    }

    /** A value ≤ B everywhere in the box, before and after the edit; +∞ when no changed column is within R. */
    double lowerOver(double minX, double minY, double maxX, double maxY) {
        // blocks beyond the lattice are farther than R from every changed column
        int i0 = Math.max(0, (int) Math.floor((minX - x0) / size) - bi0);
        int i1 = Math.min(nbx - 1, (int) Math.floor((maxX - x0) / size) - bi0);
        int j0 = Math.max(0, (int) Math.floor((minY - y0) / size) - bj0);
        int j1 = Math.min(nby - 1, (int) Math.floor((maxY - y0) / size) - bj0);
        double m = Double.POSITIVE_INFINITY;
        for (int j = j0; j <= j1; j++) {
            for (int i = i0; i <= i1; i++) {
                m = Math.min(m, blockBound[j * nbx + i]);
            }
        }
        return m;
    }

    /** True when the changed columns cannot bring the envelope to {@code threshold} anywhere in the box. */
    boolean cannotReach(double minX, double minY, double maxX, double maxY, double threshold) {
        return lowerOver(minX, minY, maxX, maxY) > threshold;
    }
}
