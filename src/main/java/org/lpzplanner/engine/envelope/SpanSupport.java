package org.lpzplanner.engine.envelope;

import org.locationtech.jts.geom.Coordinate;

/**
 * A straight conductor leg with free space beneath it (a wire, or a conductor held clear of the
 * surface): a sphere may rest on it from above or pass under it.
 *
 * <p>Over column c the sphere clears the leg iff its centre is at least R from every point of it,
 * so the excluded centre heights form one interval (the leg's R-neighbourhood is convex): from
 * {@link #floorHeight}, lo(c) = min over the leg's points q of z(q) − √(R² − |c − q|²), to
 * {@link #centreHeight}, hi(c) = max of z(q) + √(R² − |c − q|²) (the segment support's value).
 * lo is the segment formula applied to the leg mirrored in z = 0, negated, so both ends share one
 * exact, concave-in-s evaluation; its bounds over a square come from the mirrored leg's lower bound.
 *
 * <p>Immutable and thread-safe.
 */
public final class SpanSupport implements Support {

    private final SegmentSupport above;
    private final SegmentSupport mirrored;

    public SpanSupport(Coordinate p0, Coordinate p1, double radius) {
        this.above = new SegmentSupport(p0, p1, radius);
        this.mirrored = new SegmentSupport(new Coordinate(p0.x, p0.y, -p0.getZ()),
                new Coordinate(p1.x, p1.y, -p1.getZ()), radius);
    }

    @Override
    public double centreHeight(double x, double y) {
        return above.centreHeight(x, y);
    }

    @Override
    public double lowerBound(double x, double y, double half) {
        return above.lowerBound(x, y, half);
    }

    @Override
    public double upperBound(double x, double y, double half) {
        return above.upperBound(x, y, half);
    }

    @Override
    public double jointLowerBound(double x, double y, double half, double px, double py, double tx, double ty) {
        return above.jointLowerBound(x, y, half, px, py, tx, ty);
    }

    @Override
    public double[] reach() {
        return above.reach();
    }

    @Override
    public boolean hasSpaceBelow() {
        return true;
    }

    @Override
    public double floorHeight(double x, double y) {
        return -mirrored.centreHeight(x, y);
    }

    @Override
    public double floorUpperBound(double x, double y, double half) {
        return -mirrored.lowerBound(x, y, half);
    }
}
