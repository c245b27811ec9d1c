package org.lpzplanner.drawing;

import java.util.ArrayList;
import java.util.List;

/**
 * Places the labels of a drawing, the same way on every renderer: names first, centred on their
 * point, then area names and numbers, each at the first of its candidate places that overlaps no
 * label already placed, else where it overlaps least (a label is never left out). So numbers at one
 * corner do not run together: a down-conductor D44 beside an exposed corner E120 once read "D440".
 *
 * <p>Works in the renderer's drawing units with y pointing up (a renderer whose y points down
 * passes −y and turns the baseline back); offsets are given in points and scaled by the renderer's
 * units per point. Not thread-safe: one instance places the labels of one sheet.
 */
public final class LabelPlacement {

    /** The space, in points, between a number and its point, and round a label's text. */
    private static final double GAP = 3;
    private static final double RISE = 2;
    private static final double HALO = 0.8;

    private final double unit;
    private final List<Box> taken = new ArrayList<>();

    /** @param unitsPerPoint drawing units per point of the paper's sizes */
    public LabelPlacement(double unitsPerPoint) {
        this.unit = unitsPerPoint;
    }

    /** The area a label's text covers with its halo, in drawing units, y up. */
    public record Box(double left, double bottom, double right, double top) {

        public boolean overlaps(Box other) {
            return left < other.right && other.left < right && bottom < other.top && other.bottom < top;
        }

        double overlapArea(Box other) {
            return Math.max(0, Math.min(right, other.right) - Math.max(left, other.left))
                    * Math.max(0, Math.min(top, other.top) - Math.max(bottom, other.bottom));
        }
    }

    /**
     * A label to place: its point, its text's width and its size, in drawing units with y up.
     */
    public record Wanted(PlanLabel label, double x, double y, double width, double size) {
    }

    /** A placed label: its text starts at {@code x} on the baseline {@code baseline} (y up). */
    public record Placed(PlanLabel label, double x, double baseline, double width, double size) {

        /** The middle of the text across, where a centred label's point is. */
        public double centreX() {
            return x + width / 2;
        }
    }

    /** Places every label, names first, the others in the order given. */
    public static List<Placed> placeAll(List<Wanted> wanted, double unitsPerPoint) {
        LabelPlacement placement = new LabelPlacement(unitsPerPoint);
        List<Placed> out = new ArrayList<>();
        for (Wanted w : wanted) {
            if (w.label().kind() == PlanLabel.Kind.NAME) {
                out.add(placement.place(w));
            }
        }
        for (Wanted w : wanted) {
            if (w.label().kind() != PlanLabel.Kind.NAME) {
                out.add(placement.place(w));
            }
        }
        return out;
    }

    /** Places one label against those placed before and keeps its box. */
    public Placed place(Wanted w) {
        double[] at;
        if (w.label().kind() == PlanLabel.Kind.NAME) {
            at = new double[] {w.x() - w.width() / 2, w.y() - w.size() / 3};
        } else if (w.label().kind() == PlanLabel.Kind.AREA_NAME) {
            // inside the area, under its top left corner, stepping down past what stands there
            at = best(new double[][] {{w.x() + 0.3 * w.size(), w.y() - 1.1 * w.size()},
                {w.x() + 0.3 * w.size(), w.y() - 2.3 * w.size()}, {w.x() + 0.3 * w.size(), w.y() - 3.5 * w.size()}},
                    w.width(), w.size());
        } else {
            at = beside(w.x(), w.y(), w.width(), w.size());
        }
        taken.add(box(at[0], at[1], w.width(), w.size(), unit));
        return new Placed(w.label(), at[0], at[1], w.width(), w.size());
    }

    /**
     * Where a number beside the point (x, y) goes: up and to the right of it, else the first of the
     * other corners, above or below that overlaps no label placed; when all overlap, the place that
     * overlaps least. Does not keep the box.
     *
     * @return the text's baseline start {x, y}
     */
    public double[] beside(double x, double y, double width, double size) {
        double gap = GAP * unit, rise = RISE * unit;
        return best(new double[][] {{x + gap, y + rise}, {x + gap, y - rise - size}, {x - gap - width, y + rise},
            {x - gap - width, y - rise - size}, {x - width / 2, y + 2 * rise}, {x - width / 2, y - 2 * rise - size}},
                width, size);
    }

    /** Counts a box as taken, as if a label stood there. */
    public void take(Box box) {
        taken.add(box);
    }

    private double[] best(double[][] places, double width, double size) {
        double[] best = places[0];
        double least = Double.MAX_VALUE;
        for (double[] place : places) {
            Box candidate = box(place[0], place[1], width, size, unit);
            double covered = taken.stream().mapToDouble(t -> t.overlapArea(candidate)).sum();
            if (covered == 0) {
                return place;
            }
            if (covered < least) {
                least = covered;
                best = place;
            }
        }
        return best;
    }

    /** The box a text starting at (x, baseline) covers with its halo. */
    public static Box box(double x, double baseline, double width, double size, double unitsPerPoint) {
        double halo = HALO * unitsPerPoint;
        return new Box(x - halo, baseline - size * 0.25, x + width + halo, baseline + size * 0.8);
    }
}
