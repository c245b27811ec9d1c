package org.lpzplanner.engine.envelope;

import org.locationtech.jts.geom.Coordinate;

/**
 * A straight 3D segment p0→p1 (roof edge, ridge, conductor, wire).
 *
 * <p>With v the plan direction, w its length, s0 the plan projection of c on the line, e the plan
 * distance to the line, m = (z1 − z0)/w and ρ² = R² − e²: the best contact is
 * s* = s0 + m·ρ/√(1 + m²), clamped to [max(0, s0 − ρ), min(w, s0 + ρ)], and
 * D = z0 + m·s* + √(ρ² − (s* − s0)²). The maximised function is concave in s, so clamping is exact.
 */
public final class SegmentSupport implements Support {

    private final double x0, y0, z0, x1, y1, z1;
    private final double ux, uy, w, m, zMax;
    private final double radius, r2;

    public SegmentSupport(Coordinate p0, Coordinate p1, double radius) {
        this.x0 = p0.x;
        this.y0 = p0.y;
        this.z0 = p0.getZ();
        this.x1 = p1.x;
        this.y1 = p1.y;
        this.z1 = p1.getZ();
        double len = Math.hypot(x1 - x0, y1 - y0);
        this.w = len;
        this.ux = len > 0 ? (x1 - x0) / len : 0;
        this.uy = len > 0 ? (y1 - y0) / len : 0;
        this.m = len > 0 ? (z1 - z0) / len : 0;
        this.zMax = Math.max(z0, z1);
        this.radius = radius;
        this.r2 = radius * radius;
    }

    @Override
    public double centreHeight(double cx, double cy) {
        if (w == 0) {
            double dx = cx - x0, dy = cy - y0;
            return PointSupport.at(zMax, r2, dx * dx + dy * dy);
        }
        double px = cx - x0, py = cy - y0;
        double s0 = px * ux + py * uy;
        double e2 = px * px + py * py - s0 * s0;
        double rho2 = r2 - e2;
        if (rho2 < 0) {
            return Double.NEGATIVE_INFINITY;
        }
        double rho = Math.sqrt(rho2);
        double lo = Math.max(0, s0 - rho), hi = Math.min(w, s0 + rho);
        if (lo > hi) {
            return Double.NEGATIVE_INFINITY;
        }
        double s = s0 + m * rho / Math.sqrt(1 + m * m);
        s = s < lo ? lo : (s > hi ? hi : s);
        double ds = s - s0;
        return z0 + m * s + Math.sqrt(Math.max(0, rho2 - ds * ds));
    }

    @Override
    public double lowerBound(double cx, double cy, double half) {
        // any fixed point q of the segment gives D(c) ≥ z(q) + √(R² − |c − q|²); take the best
        // contact for the square's centre and the far corner of the square from it
        double s = bestContact(cx, cy);
        double qx = x0 + ux * s, qy = y0 + uy * s, qz = z0 + m * s;
        double dx = Math.abs(cx - qx) + half, dy = Math.abs(cy - qy) + half;
        return PointSupport.at(qz, r2, dx * dx + dy * dy);
    }

    @Override
    public double jointLowerBound(double cx, double cy, double half, double px, double py, double tx, double ty) {
        double s = bestContact(cx, cy);
        return PointSupport.joint(x0 + ux * s, y0 + uy * s, z0 + m * s, r2, cx, cy, half, px, py, tx, ty);
    }

    @Override
    public double upperBound(double cx, double cy, double half) {
        double d = Math.sqrt(distanceSq(cx, cy)) - half * Math.sqrt(2);
        d = Math.max(0, d);
        return PointSupport.at(zMax, r2, d * d);
    }

    @Override
    public double[] reach() {
        return new double[] {Math.min(x0, x1) - radius, Math.min(y0, y1) - radius,
            Math.max(x0, x1) + radius, Math.max(y0, y1) + radius};
    }

    /** Arc position of the contact maximising z(q) + √(R² − |c − q|²), or the nearest point when out of reach. */
    private double bestContact(double cx, double cy) {
        if (w == 0) {
            return 0;
        }
        double px = cx - x0, py = cy - y0;
        double s0 = px * ux + py * uy;
        double e2 = px * px + py * py - s0 * s0;
        double rho2 = r2 - e2;
        double sNear = s0 < 0 ? 0 : (s0 > w ? w : s0);
        if (rho2 < 0) {
            return sNear;
        }
        double rho = Math.sqrt(rho2);
        double lo = Math.max(0, s0 - rho), hi = Math.min(w, s0 + rho);
        if (lo > hi) {
            return sNear;
        }
        double s = s0 + m * rho / Math.sqrt(1 + m * m);
        return s < lo ? lo : (s > hi ? hi : s);
    }

    private double distanceSq(double cx, double cy) {
        double px = cx - x0, py = cy - y0;
        double s = w == 0 ? 0 : px * ux + py * uy;
        s = s < 0 ? 0 : (s > w ? w : s);
        double dx = px - ux * s, dy = py - uy * s;
        return dx * dx + dy * dy;
    }
}
