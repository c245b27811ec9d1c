package org.lpzplanner.engine.envelope;

/**
 * A single solid point (a rod or mast tip): D(c) = z + √(R² − d²) for plan distance d ≤ R.
 */
public final class PointSupport implements Support {

    private final double x;
    private final double y;
    private final double z;
    private final double r2;
    private final double radius;

    public PointSupport(double x, double y, double z, double radius) {
        this.x = x;
        this.y = y;
        this.z = z;
        this.radius = radius;
        this.r2 = radius * radius;
    }

    @Override
    public double centreHeight(double cx, double cy) {
        double dx = cx - x, dy = cy - y;
        return at(z, r2, dx * dx + dy * dy);
    }

    @Override
    public double lowerBound(double cx, double cy, double half) {
        double dx = Math.abs(cx - x) + half, dy = Math.abs(cy - y) + half;
        return at(z, r2, dx * dx + dy * dy);
    }

    @Override
    public double upperBound(double cx, double cy, double half) {
        double dx = Math.max(0, Math.abs(cx - x) - half), dy = Math.max(0, Math.abs(cy - y) - half);
        return at(z, r2, dx * dx + dy * dy);
    }

    @Override
    public double jointLowerBound(double cx, double cy, double half, double px, double py, double tx, double ty) {
        return joint(x, y, z, r2, cx, cy, half, px, py, tx, ty);
    }

    /**
     * Lower bound of z + √(R² − a²) − √(R² − b²) over the square, a = |c − q|, b the distance to the
     * target point or line. The difference equals (b² − a²) / (√(R² − a²) + √(R² − b²)); b² − a²
     * is bounded from its linear part (exact over the square) and its one quadratic term, the
     * denominator from the distance ranges.
     */
    static double joint(double qx, double qy, double z, double r2, double cx, double cy, double half,
            double px, double py, double tx, double ty) {
        double ax = Math.abs(cx - qx), ay = Math.abs(cy - qy);
        double aFar2 = (ax + half) * (ax + half) + (ay + half) * (ay + half);
        double outside = Double.POSITIVE_INFINITY;
        if (aFar2 > r2) {
            if (tx != 0 || ty != 0) {
                return Double.NEGATIVE_INFINITY;
            }
            // Part of the square lies beyond this piece's reach. There D ≥ R (the ground), and by the
            // triangle inequality the target is at least R − |p − q| away; the rest is bounded below
            // with a ≤ R.
            double r = Math.sqrt(r2);
            double bx = Math.max(0, Math.abs(cx - px) - half), by = Math.max(0, Math.abs(cy - py) - half);
            double b = Math.max(Math.sqrt(bx * bx + by * by), r - Math.sqrt((px - qx) * (px - qx) + (py - qy) * (py - qy)));
            outside = b >= r ? r : r - Math.sqrt(r2 - b * b);
            aFar2 = r2;
        }
        double anx = Math.max(0, ax - half), any = Math.max(0, ay - half);
        double aNear2 = anx * anx + any * any;
        double bNear2, bFar2, lMin;
        if (tx == 0 && ty == 0) {
            double bx = Math.abs(cx - px), by = Math.abs(cy - py);
            double bnx = Math.max(0, bx - half), bny = Math.max(0, by - half);
            bNear2 = bnx * bnx + bny * bny;
            bFar2 = (bx + half) * (bx + half) + (by + half) * (by + half);
            // |c − p|² − |c − q|² is linear in c
            double lc = (cx - px) * (cx - px) + (cy - py) * (cy - py) - (cx - qx) * (cx - qx) - (cy - qy) * (cy - qy);
            lMin = lc - 2 * half * (Math.abs(qx - px) + Math.abs(qy - py));
        } else {
            double nx = -ty, ny = tx;
            double spread = half * (Math.abs(nx) + Math.abs(ny));
            double bc = Math.abs(nx * (cx - px) + ny * (cy - py));
            double bNear = Math.max(0, bc - spread);
            bNear2 = bNear * bNear;
            bFar2 = (bc + spread) * (bc + spread);
            // (n·(c − p))² − (n·(c − q))² is linear in c; −(t·(c − q))² is bounded by its far corner
            double np = nx * px + ny * py, nq = nx * qx + ny * qy, k = nq - np;
            double lin = k * (2 * (nx * cx + ny * cy) - np - nq);
            double along = Math.abs(tx * (cx - qx) + ty * (cy - qy)) + half * (Math.abs(tx) + Math.abs(ty));
            lMin = lin - Math.abs(2 * k) * spread - along * along;
        }
        if (bNear2 > r2) {
            return Double.NEGATIVE_INFINITY;
        }
        bFar2 = Math.min(r2, bFar2);
        double denMin = Math.sqrt(r2 - aFar2) + Math.sqrt(r2 - bFar2);
        double denMax = Math.sqrt(r2 - aNear2) + Math.sqrt(r2 - bNear2);
        double inside;
        if (lMin >= 0) {
            inside = z + lMin / denMax;
        } else {
            inside = denMin > 0 ? z + lMin / denMin : Double.NEGATIVE_INFINITY;
        }
        // near the edge of reach the quotient loosens; D ≥ z there and the target is at least bNear away
        inside = Math.max(inside, z - Math.sqrt(r2 - bNear2));
        return Math.min(inside, outside);
    }

    @Override
    public double[] reach() {
        return new double[] {x - radius, y - radius, x + radius, y + radius};
    }

    static double at(double z, double r2, double d2) {
        return d2 > r2 ? Double.NEGATIVE_INFINITY : z + Math.sqrt(r2 - d2);
    }
}
