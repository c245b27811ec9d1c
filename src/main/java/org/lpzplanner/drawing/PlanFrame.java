package org.lpzplanner.drawing;

import java.util.List;

/**
 * The frame of a plan: the extent of everything drawn, in local metres of the site (x east, y north;
 * north is up on every renderer). A renderer chooses its scale and origin from it: the pages fit the
 * extent into their drawing ({@link #scaleToFit}, origin at the top left corner {@code (minX, maxY)}),
 * the report prints it at a standard scale centred on {@link #centreX()}, {@link #centreY()}.
 */
public record PlanFrame(double minX, double minY, double maxX, double maxY) {

    /** The frame of a drawing with nothing in it: one metre square at the origin. */
    public static final PlanFrame EMPTY = new PlanFrame(0, 0, 1, 1);

    /** The smallest frame holding every position of the paths, or {@link #EMPTY}. */
    public static PlanFrame around(List<List<double[]>> paths) {
        double minX = Double.POSITIVE_INFINITY, minY = Double.POSITIVE_INFINITY;
        double maxX = Double.NEGATIVE_INFINITY, maxY = Double.NEGATIVE_INFINITY;
        for (List<double[]> path : paths) {
            for (double[] p : path) {
                minX = Math.min(minX, p[0]);
                minY = Math.min(minY, p[1]);
                maxX = Math.max(maxX, p[0]);
                maxY = Math.max(maxY, p[1]);
            }
        }
        return minX > maxX ? EMPTY : new PlanFrame(minX, minY, maxX, maxY);
    }

    public double width() {
        return maxX - minX;
    }

    public double height() {
        return maxY - minY;
    }

    public double centreX() {
        return (minX + maxX) / 2;
    }

    public double centreY() {
        return (minY + maxY) / 2;
    }

    /**
     * Drawing units per metre that fit the extent, at least one metre each way, into
     * {@code width} × {@code height} units.
     */
    public double scaleToFit(double width, double height) {
        return Math.min(width / Math.max(width(), 1), height / Math.max(height(), 1));
    }
}
