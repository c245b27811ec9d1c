package org.lpzplanner.engine.design;

import java.util.PriorityQueue;

/**
 * The least value of a function along straight stretches, found to a stated tolerance by branch
 * and bound: the separation margin (distance − s) along the whole protection system.
 *
 * <p><b>Bound.</b> On stretch i the function changes by at most {@code slope[i]} per unit of the
 * parameter t ∈ [0, 1] (a Lipschitz bound). Between two evaluated points a and b, h apart in t,
 * every value is then at least (m(a) + m(b) − slope·h) / 2, where the two cones from a and b meet.
 * For the separation margin m = d − k·l along a stretch of length L: the distance d to the
 * installation changes by at most the distance moved, and so does l (a route from one point can run
 * along the stretch to the other and on along its route), so slope = (1 + k)·L with k = k<sub>i</sub>
 * · k<sub>c</sub> / k<sub>m</sub> ≤ 0.16 [IEC 62305-3:2010 Tables 10 to 12] held constant along the
 * stretch.
 *
 * <p><b>Search.</b> Intervals wait in order of their bound; the lowest is halved (one more
 * evaluation) until no interval's bound is more than {@code tolerance} below the least value
 * found. So the reported least value is at most {@code tolerance} above the true least, and
 * {@link Least#lowerBound()} is a bound the true least never goes below. Every evaluation is at an
 * exact point, so the reported point and value are real. A search stopped by its budget reports the
 * weaker bound it reached. Stateless and thread-safe; cost about the number of stretches plus
 * log₂(slope / tolerance) evaluations per place where the function comes near its least.
 */
final class LeastMarginSearch {

    /** Evaluations at most per search; far more than a site needs, a guard against a degenerate one. */
    static final int BUDGET = 400_000;

    private LeastMarginSearch() {
    }

    /** The function: its value at parameter t ∈ [0, 1] of stretch i. */
    interface Margin {
        double at(int stretch, double t);
    }

    /**
     * @param stretch    where the least value found lies
     * @param t          its parameter there
     * @param value      the least value found (exact at that point)
     * @param lowerBound no point of any stretch has a value below this
     */
    record Least(int stretch, double t, double value, double lowerBound) {
    }

    private record Interval(int stretch, double t0, double m0, double t1, double m1, double bound) {
    }

    /**
     * @param slope     per stretch, the most the function changes per unit of t (see class comment)
     * @param tolerance how far the reported least may lie above the true least
     * @return the least value, or null when there are no stretches
     */
    static Least minimise(double[] slope, Margin margin, double tolerance) {
        if (!(tolerance > 0)) {
            throw new IllegalArgumentException("tolerance must be positive, got " + tolerance);
        }
        PriorityQueue<Interval> queue = new PriorityQueue<>((a, b) -> Double.compare(a.bound(), b.bound()));
        Least best = null;
        int evaluations = 0;
        for (int i = 0; i < slope.length; i++) {
            if (!(slope[i] >= 0) || Double.isInfinite(slope[i])) {
                throw new IllegalArgumentException("slope of stretch " + i + " must be finite and not negative, got " + slope[i]);
            }
            double m0 = margin.at(i, 0), m1 = margin.at(i, 1);
            evaluations += 2;
            best = better(best, new Least(i, 0, m0, m0));
            best = better(best, new Least(i, 1, m1, m1));
            queue.add(interval(i, 0, m0, 1, m1, slope[i]));
        }
        if (best == null) {
            return null;
        }
        while (!queue.isEmpty()) {
            Interval next = queue.peek();
            if (next.bound() >= best.value() - tolerance || evaluations >= BUDGET) {
                break;
            }
            queue.poll();
            double tm = (next.t0() + next.t1()) / 2;
            double mm = margin.at(next.stretch(), tm);
            evaluations++;
            best = better(best, new Least(next.stretch(), tm, mm, mm));
            queue.add(interval(next.stretch(), next.t0(), next.m0(), tm, mm, slope[next.stretch()]));
            queue.add(interval(next.stretch(), tm, mm, next.t1(), next.m1(), slope[next.stretch()]));
        }
        double floor = queue.isEmpty() ? best.value() : Math.min(best.value(), queue.peek().bound());
        return new Least(best.stretch(), best.t(), best.value(), floor);
    }

    private static Interval interval(int stretch, double t0, double m0, double t1, double m1, double slope) {
        return new Interval(stretch, t0, m0, t1, m1, (m0 + m1 - slope * (t1 - t0)) / 2);
    }

    private static Least better(Least best, Least candidate) {
        return best == null || candidate.value() < best.value() ? candidate : best;
    }
}
