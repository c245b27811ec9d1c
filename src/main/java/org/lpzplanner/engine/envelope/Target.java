package org.lpzplanner.engine.envelope;

/**
 * Where an envelope minimum is wanted: a point, an axis-aligned square, or a plan segment.
 * Supplies exact and lower-bound plan distances for the branch and bound.
 */
public sealed interface Target {

    /** Several squares taken together (e.g. the parts of a grid cell lying inside a face). */
    static Target union(java.util.List<Square> squares) {
        return new Union(java.util.List.copyOf(squares));
    }

    /** Union of squares: distances are the least over its members. */
    record Union(java.util.List<Square> squares, double[] box) implements Target {
        public Union {
            if (squares.isEmpty()) {
                throw new IllegalArgumentException("a union target needs at least one square");
            }
        }

        Union(java.util.List<Square> squares) {
            this(squares, boxOf(squares));
        }

        private static double[] boxOf(java.util.List<Square> squares) {
            double[] b = squares.get(0).bounds();
            for (Square s : squares) {
                double[] o = s.bounds();
                b = new double[] {Math.min(b[0], o[0]), Math.min(b[1], o[1]), Math.max(b[2], o[2]), Math.max(b[3], o[3])};
            }
            return b;
        }

        @Override
        public double distance(double x, double y) {
            double d = Double.POSITIVE_INFINITY;
            for (Square s : squares) {
                d = Math.min(d, s.distance(x, y));
            }
            return d;
        }

        @Override
        public double lowerDistance(double x, double y, double half) {
            double d = Double.POSITIVE_INFINITY;
            for (Square s : squares) {
                d = Math.min(d, s.lowerDistance(x, y, half));
            }
            return d;
        }

        @Override
        public double distanceToOutside(double x0, double y0, double x1, double y1) {
            double d = Double.POSITIVE_INFINITY;
            for (Square s : squares) {
                d = Math.min(d, s.distanceToOutside(x0, y0, x1, y1));
            }
            return d;
        }

        @Override
        public double[] bounds() {
            return box.clone();
        }

        @Override
        public double[] anchor() {
            return squares.get(0).anchor();
        }
    }

    /** Exact plan distance from (x, y) to the target. */
    double distance(double x, double y);

    /** A value ≤ the plan distance from any point of the square (half-side {@code half}) around (x, y) to the target. */
    double lowerDistance(double x, double y, double half);

    /** Least distance from the target to the outside of the rectangle [x0, x1] × [y0, y1] (0 if it reaches out). */
    double distanceToOutside(double x0, double y0, double x1, double y1);

    /** Plan bounding box [minX, minY, maxX, maxY]. */
    double[] bounds();

    /** A representative point (x, y). */
    double[] anchor();

    static Target point(double x, double y) {
        return new Square(x, y, 0);
    }

    static Target square(double x, double y, double half) {
        return new Square(x, y, half);
    }

    static Target segment(double x0, double y0, double x1, double y1) {
        return new Segment(x0, y0, x1, y1);
    }

    /** Axis-aligned square (half 0: a point). */
    record Square(double x, double y, double half) implements Target {
        @Override
        public double distance(double cx, double cy) {
            double dx = Math.max(0, Math.abs(cx - x) - half), dy = Math.max(0, Math.abs(cy - y) - half);
            return Math.sqrt(dx * dx + dy * dy);
        }

        @Override
        public double lowerDistance(double cx, double cy, double h) {
            double dx = Math.max(0, Math.abs(cx - x) - half - h), dy = Math.max(0, Math.abs(cy - y) - half - h);
            return Math.sqrt(dx * dx + dy * dy);
        }

        @Override
        public double distanceToOutside(double x0, double y0, double x1, double y1) {
            return Math.max(0, Math.min(Math.min(x - x0, x1 - x), Math.min(y - y0, y1 - y)) - half);
        }

        @Override
        public double[] bounds() {
            return new double[] {x - half, y - half, x + half, y + half};
        }

        @Override
        public double[] anchor() {
            return new double[] {x, y};
        }
    }

    /** Plan segment from (x0, y0) to (x1, y1). */
    record Segment(double x0, double y0, double x1, double y1) implements Target {
        @Override
        public double distance(double cx, double cy) {
            double vx = x1 - x0, vy = y1 - y0;
            double len2 = vx * vx + vy * vy;
            double t = len2 == 0 ? 0 : ((cx - x0) * vx + (cy - y0) * vy) / len2;
            t = t < 0 ? 0 : (t > 1 ? 1 : t);
            double dx = cx - (x0 + t * vx), dy = cy - (y0 + t * vy);
            return Math.sqrt(dx * dx + dy * dy); // Math.hypot's overflow care is slow in this hot path
        }

        @Override
        public double lowerDistance(double cx, double cy, double h) {
            // two convex shapes: zero if they meet, else the least of vertex-to-shape distances
            if (crossesSquare(cx - h, cy - h, cx + h, cy + h)) {
                return 0;
            }
            double d = Math.min(squareDistance(x0, y0, cx, cy, h), squareDistance(x1, y1, cx, cy, h));
            for (int sy = -1; sy <= 1; sy += 2) {
                for (int sx = -1; sx <= 1; sx += 2) {
                    d = Math.min(d, distance(cx + sx * h, cy + sy * h));
                }
            }
            return d;
        }

        private static double squareDistance(double px, double py, double cx, double cy, double h) {
            double dx = Math.max(0, Math.abs(px - cx) - h), dy = Math.max(0, Math.abs(py - cy) - h);
            return Math.sqrt(dx * dx + dy * dy);
        }

        /** Liang–Barsky: does the segment meet the box [ax, bx] × [ay, by]? */
        private boolean crossesSquare(double ax, double ay, double bx, double by) {
            double t0 = 0, t1 = 1, dx = x1 - x0, dy = y1 - y0;
            double[] p = {-dx, dx, -dy, dy};
            double[] q = {x0 - ax, bx - x0, y0 - ay, by - y0};
            for (int i = 0; i < 4; i++) {
                if (p[i] == 0) {
                    if (q[i] < 0) {
                        return false;
                    }
                } else {
                    double t = q[i] / p[i];
                    if (p[i] < 0) {
                        t0 = Math.max(t0, t);
                    } else {
                        t1 = Math.min(t1, t);
                    }
                    if (t0 > t1) {
                        return false;
                    }
                }
            }
            return true;
        }

        @Override
        public double distanceToOutside(double ax, double ay, double bx, double by) {
            // the distance to the rectangle's outside is concave inside it: least at an end point
            return Math.min(end(x0, y0, ax, ay, bx, by), end(x1, y1, ax, ay, bx, by));
        }

        private static double end(double x, double y, double ax, double ay, double bx, double by) {
            return Math.max(0, Math.min(Math.min(x - ax, bx - x), Math.min(y - ay, by - y)));
        }

        @Override
        public double[] bounds() {
            return new double[] {Math.min(x0, x1), Math.min(y0, y1), Math.max(x0, x1), Math.max(y0, y1)};
        }

        @Override
        public double[] anchor() {
            return new double[] {(x0 + x1) / 2, (y0 + y1) / 2};
        }
    }
}
