package org.lpzplanner.engine.exposure;

/**
 * The plan box outside which an edit cannot change any decision: the box of what changed, grown by
 * 2R (the envelope changes only within 2R of a change of the centre surface, which changes only
 * within R of the change) and by four grid cells more (cell bounds read the vertices at their
 * corners, and the update recomputes whole cells). {@link #ALL} covers everything.
 */
record ChangeWindow(double minX, double minY, double maxX, double maxY) {

    static final ChangeWindow ALL = new ChangeWindow(Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY,
            Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY);

    /** Nothing changed: every decision can be kept. */
    static final ChangeWindow NONE = new ChangeWindow(Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY,
            Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY);

    static ChangeWindow around(double[] changed, double radius, double h) {
        double pad = 2 * radius + 4 * h;
        return new ChangeWindow(changed[0] - pad, changed[1] - pad, changed[2] + pad, changed[3] + pad);
    }

    boolean intersects(double x0, double y0, double x1, double y1) {
        return x1 >= minX && x0 <= maxX && y1 >= minY && y0 <= maxY;
    }

    /** True for a grid cell with centre (x, y) and half side {@code half}. */
    boolean touchesCell(double x, double y, double half) {
        return intersects(x - half, y - half, x + half, y + half);
    }
}
