package org.lpzplanner.engine.envelope;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Random;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The fast ball erosion against the definition, evaluated by brute force: out(u) = min over lattice
 * points w with |u − w| ≤ R of [v(w) − √(R² − |u − w|²)] (grey-scale erosion by the lower half of a
 * ball). The lattices mix flat runs (open ground, flat roofs) with rough patches, the cases the
 * fast method treats differently.
 */
class BallErosionTest {

    @ParameterizedTest(name = "seed {0}")
    @ValueSource(longs = {1, 2, 3, 4, 5, 6})
    void matchesTheDefinitionOnMixedLattices(long seed) {
        Random rnd = new Random(seed);
        int nx = 60 + rnd.nextInt(90), ny = 40 + rnd.nextInt(60);
        double radius = 3 + rnd.nextDouble() * 12;
        double[] v = new double[nx * ny];
        for (int j = 0; j < ny; j++) {
            for (int i = 0; i < nx; i++) {
                boolean ground = (i / 17 + j / 13 + seed) % 3 == 0;
                boolean roof = (i / 23 + j / 11) % 4 == 1;
                v[j * nx + i] = ground ? radius : roof ? radius + 7.5 : radius + rnd.nextDouble() * 9;
            }
        }
        assertMatchesDefinition(v, nx, ny, radius);
    }

    @ParameterizedTest(name = "seed {0}")
    @ValueSource(longs = {7, 8, 9})
    void matchesTheDefinitionOnWideOpenGroundAroundOneBlock(long seed) {
        // wide stretches of exactly equal values: open ground all round, one flat-topped block
        Random rnd = new Random(seed);
        int nx = 220 + rnd.nextInt(60), ny = 90 + rnd.nextInt(30);
        double radius = 5 + rnd.nextDouble() * 10;
        double[] v = new double[nx * ny];
        int bx = 80 + rnd.nextInt(60), by = 30 + rnd.nextInt(30);
        for (int j = 0; j < ny; j++) {
            for (int i = 0; i < nx; i++) {
                boolean block = i >= bx && i < bx + 25 && j >= by && j < by + 18;
                v[j * nx + i] = block ? radius + 6 : radius;
            }
        }
        assertMatchesDefinition(v, nx, ny, radius);
    }

    private static void assertMatchesDefinition(double[] v, int nx, int ny, double radius) {
        double h = 0.5;
        double[] fast = BallErosion.erode(v, nx, ny, h, radius);
        double worst = 0;
        for (int j = 0; j < ny; j++) {
            for (int i = 0; i < nx; i++) {
                double best = bruteErosionAt(v, nx, ny, h, radius, i, j);
                worst = Math.max(worst, Math.abs(fast[j * nx + i] - best));
            }
        }
        // rounding only: the closed-form crossings of the circles are exact up to floating point
        assertThat(worst).isLessThan(1e-9);
    }

    /**
     * The erosion at vertex (i, j) by brute force: the least v(s) − √(R² − |s − p|²) over every
     * vertex s within R, the definition itself.
     */
    static double bruteErosionAt(double[] v, int nx, int ny, double h, double radius, int i, int j) {
        int reach = (int) Math.floor(radius / h);
        double best = Double.POSITIVE_INFINITY;
        for (int dj = -reach; dj <= reach; dj++) {
            for (int di = -reach; di <= reach; di++) {
                int si = i + di, sj = j + dj;
                double d2 = (di * di + dj * dj) * h * h;
                if (si >= 0 && sj >= 0 && si < nx && sj < ny && d2 <= radius * radius) {
                    best = Math.min(best, v[sj * nx + si] - Math.sqrt(radius * radius - d2));
                }
            }
        }
        return best;
    }
}
