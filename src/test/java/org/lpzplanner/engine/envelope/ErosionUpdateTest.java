package org.lpzplanner.engine.envelope;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Random;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Eroding only where changed lattice values can matter gives exactly the erosion of the new lattice
 * computed afresh, for values that only rise (a part added), only fall (a part removed) or both (a
 * part moved), on lattices with flat runs and rough patches. The fresh erosion is itself checked
 * against the definition (the brute-force minimum over the ball) in {@link BallErosionTest}; here it
 * is checked again against that definition near the change.
 */
class ErosionUpdateTest {

    @ParameterizedTest(name = "seed {0}")
    @ValueSource(longs = {11, 12, 13, 14, 15, 16, 17, 18, 19})
    void updatedErosionEqualsTheFreshErosion(long seed) {
        Random rnd = new Random(seed);
        int nx = 90 + rnd.nextInt(60), ny = 70 + rnd.nextInt(50);
        double h = 0.5, radius = 4 + rnd.nextDouble() * 10;
        double[] before = lattice(rnd, nx, ny, radius);
        double[] eroded = BallErosion.erode(before, nx, ny, h, radius);
        int kind = (int) (seed % 3); // 0: rise only, 1: fall only, 2: both
        for (int step = 0; step < 3; step++) {
            double[] after = before.clone();
            int i0 = rnd.nextInt(nx - 20), j0 = rnd.nextInt(ny - 20);
            int i1 = i0 + 3 + rnd.nextInt(15), j1 = j0 + 3 + rnd.nextInt(15);
            double cx = (i0 + i1) / 2.0, cy = (j0 + j1) / 2.0;
            for (int j = j0; j <= j1; j++) {
                for (int i = i0; i <= i1; i++) {
                    // a cone like a rod's, or a dip like its removal
                    double bump = Math.max(0, 6 - Math.hypot(i - cx, j - cy) * h);
                    boolean rise = kind == 0 || (kind == 2 && i < cx);
                    after[j * nx + i] = rise ? Math.max(before[j * nx + i], radius + bump)
                            : Math.max(radius, before[j * nx + i] - bump);
                }
            }
            double[] updated = ErosionUpdate.erode(before, after, eroded, nx, ny, h, radius, i0, j0, i1, j1);
            double[] fresh = BallErosion.erode(after, nx, ny, h, radius);
            assertThat(updated).as("step %d", step).containsExactly(fresh);
            assertNearChangeMatchesDefinition(after, updated, nx, ny, h, radius, i0, j0, i1, j1);
            before = after;
            eroded = updated;
        }
    }

    @ParameterizedTest(name = "seed {0}")
    @ValueSource(longs = {21, 22})
    void nothingChangedGivesTheSameErosion(long seed) {
        Random rnd = new Random(seed);
        int nx = 60, ny = 50;
        double[] v = lattice(rnd, nx, ny, 8);
        double[] eroded = BallErosion.erode(v, nx, ny, 0.5, 8);
        assertThat(ErosionUpdate.erode(v, v.clone(), eroded, nx, ny, 0.5, 8, 0, 0, nx - 1, ny - 1)).containsExactly(eroded);
    }

    /** Open ground at R, flat roofs and rough patches, like the vertex values of a site. */
    private static double[] lattice(Random rnd, int nx, int ny, double radius) {
        double[] v = new double[nx * ny];
        for (int j = 0; j < ny; j++) {
            for (int i = 0; i < nx; i++) {
                boolean ground = (i / 19 + j / 13) % 3 == 0;
                boolean roof = (i / 23 + j / 11) % 4 == 1;
                v[j * nx + i] = ground ? radius : roof ? radius + 7.5 : radius + rnd.nextDouble() * 9;
            }
        }
        return v;
    }

    /** The definition, brute force, at the changed points and up to R around them. */
    private static void assertNearChangeMatchesDefinition(double[] v, double[] out, int nx, int ny, double h,
            double radius, int i0, int j0, int i1, int j1) {
        int reach = (int) Math.floor(radius / h);
        double worst = 0;
        for (int j = Math.max(0, j0 - reach); j <= Math.min(ny - 1, j1 + reach); j += 3) {
            for (int i = Math.max(0, i0 - reach); i <= Math.min(nx - 1, i1 + reach); i += 3) {
                double best = BallErosionTest.bruteErosionAt(v, nx, ny, h, radius, i, j);
                worst = Math.max(worst, Math.abs(out[j * nx + i] - best));
            }
        }
        assertThat(worst).isLessThan(1e-9); // rounding only
    }
}
