package org.lpzplanner.engine.envelope;

import java.util.List;

/**
 * Combines supports into the lowest free sphere centre over a column, L(c), and its bounds.
 *
 * <p>Solid supports (everything solid down to the ground) each demand z ≥ D<sub>k</sub>(c); a
 * support with space below ({@link SpanSupport}) excludes only the open interval
 * (lo<sub>k</sub>(c), hi<sub>k</sub>(c)). So L(c) is the lowest z ≥ max(R, max of solid D<sub>k</sub>)
 * outside every excluded interval: start there and, while z lies inside an interval, move to its
 * top. A centre at exactly lo or hi touches the conductor, which is allowed. Without spans this is
 * the familiar D(c) = max(R, max<sub>k</sub> D<sub>k</sub>(c)).
 *
 * <p>Lower bound over a square: B = the solid supports' bound; a span whose lo is below B over the
 * whole square (lo's upper bound &lt; B) cannot leave a gap under L there, so L ≥ hi everywhere in it
 * and B rises to hi's lower bound; repeated until nothing changes. Spans whose gap cannot be ruled
 * out are left out of the bound, which stays valid (L ≥ the solid value always) and errs low, the
 * safe direction.
 *
 * <p>The whole centre column of a site is used as if reachable from the sky; a pocket of free
 * centres enclosed by spans would only add spheres, never remove one, so that too errs toward
 * "exposed". Stateless and thread-safe.
 */
public final class CentreHeights {

    private CentreHeights() {
    }

    /**
     * L at (x, y), given that L ≥ {@code floor} there (R, or any known lower bound of L: a known
     * bound may stand in for solid supports below it, which is what lets a caller pass only the
     * supports that can matter).
     */
    public static double lowest(List<Support> supports, double x, double y, double floor) {
        double z = floor;
        boolean spans = false;
        for (Support s : supports) {
            if (s.hasSpaceBelow()) {
                spans = true;
            } else {
                z = Math.max(z, s.centreHeight(x, y));
            }
        }
        return spans ? aboveSpans(supports, x, y, z) : z;
    }

    /** The lowest height ≥ z outside every span's excluded interval over (x, y). */
    static double aboveSpans(List<Support> supports, double x, double y, double z) {
        boolean moved = true;
        while (moved) {
            moved = false;
            for (Support s : supports) {
                if (s.hasSpaceBelow()) {
                    double hi = s.centreHeight(x, y);
                    if (hi > z && s.floorHeight(x, y) < z) {
                        z = hi;
                        moved = true;
                    }
                }
            }
        }
        return z;
    }

    /** A value ≤ L everywhere in the square of half-side {@code half} around (x, y), given L ≥ floor there. */
    public static double lowerBound(List<Support> supports, double x, double y, double half, double floor) {
        double b = floor;
        boolean spans = false;
        for (Support s : supports) {
            if (s.hasSpaceBelow()) {
                spans = true;
            } else {
                b = Math.max(b, s.lowerBound(x, y, half));
            }
        }
        return spans ? raiseOverSpans(supports, x, y, half, b) : b;
    }

    /** Raises a lower bound b of L over the square by the spans with no gap under b there. */
    static double raiseOverSpans(List<Support> supports, double x, double y, double half, double b) {
        boolean moved = true;
        while (moved) {
            moved = false;
            for (Support s : supports) {
                if (s.hasSpaceBelow()) {
                    double hiLow = s.lowerBound(x, y, half);
                    if (hiLow > b && s.floorUpperBound(x, y, half) < b) {
                        b = hiLow;
                        moved = true;
                    }
                }
            }
        }
        return b;
    }

    /**
     * True when a sphere centred at (x, y, z) is free of the supports: at or above every solid
     * support's D and outside every span's interval (touching allowed).
     */
    public static boolean isFree(List<Support> supports, double x, double y, double z, double slack) {
        for (Support s : supports) {
            double hi = s.centreHeight(x, y);
            if (hi - z > slack && (!s.hasSpaceBelow() || z - s.floorHeight(x, y) > slack)) {
                return false;
            }
        }
        return true;
    }
}
