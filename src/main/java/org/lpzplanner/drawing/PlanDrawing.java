package org.lpzplanner.drawing;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.EnumSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.lpzplanner.common.Formats;

/**
 * What a plan shows, whatever draws it: the frame, the items in drawing order (by {@link Layer},
 * then in the order they were added) and the labels. Built once per drawing by a {@link Builder};
 * immutable, and safe to draw from several threads.
 *
 * <p>Labels follow from the items: every structure is named with its top height ("Aldergate
 * Library (19.20 m)"); a numbered drawing (the report, whose schedules the numbers point into)
 * also writes each item's number (E…, A…, D…, K…) beside it, a drawing by names (the pages) writes
 * keep-out areas' names in their top left corner instead.
 */
public final class PlanDrawing {

    private final PlanFrame frame;
    private final List<PlanItem> items;
    private final List<PlanLabel> labels;
    private final Set<Layer> listed;
    private final double highest;

    private PlanDrawing(PlanFrame frame, List<PlanItem> items, List<PlanLabel> labels, Set<Layer> listed,
            double highest) {
        this.frame = frame;
        this.items = List.copyOf(items);
        this.labels = List.copyOf(labels);
        this.listed = Set.copyOf(listed);
        this.highest = highest;
    }

    public static Builder builder() {
        return new Builder();
    }

    public PlanFrame frame() {
        return frame;
    }

    /** Every item, bottom layer first. */
    public List<PlanItem> items() {
        return items;
    }

    /** The items on one layer, in the order they were added. */
    public List<PlanItem> items(Layer layer) {
        return items.stream().filter(i -> i.layer() == layer).toList();
    }

    public List<PlanLabel> labels() {
        return labels;
    }

    /** True when some item is on the layer. */
    public boolean has(Layer layer) {
        return items.stream().anyMatch(i -> i.layer() == layer);
    }

    /** The share of the highest structure's height a structure has: 0 (ground) to 1, for its shade. */
    public double shade(PlanItem.Structure s) {
        return Math.min(1, s.height() / highest);
    }

    /**
     * The legend: one row per distinct legend entry of the layers drawn or listed anyway, in the order
     * of {@link PlanStyle#legendOrder()}; each row named by the first of its layers.
     */
    public List<Layer> legend() {
        Map<String, Layer> rows = new LinkedHashMap<>();
        for (Layer layer : PlanStyle.legendOrder()) {
            if (listed.contains(layer) || has(layer)) {
                rows.putIfAbsent(PlanStyle.of(layer).legendKey(), layer);
            }
        }
        return List.copyOf(rows.values());
    }

    /** Collects the items of one drawing. Not thread-safe. */
    public static final class Builder {

        private final List<PlanItem> items = new ArrayList<>();
        private final Set<Layer> listed = EnumSet.noneOf(Layer.class);
        private boolean numbered;

        private Builder() {
        }

        public Builder add(PlanItem item) {
            items.add(item);
            return this;
        }

        public Builder addAll(List<? extends PlanItem> more) {
            items.addAll(more);
            return this;
        }

        /** The legend lists these layers even when nothing is drawn on them (what the drawing can show). */
        public Builder list(Layer... layers) {
            listed.addAll(List.of(layers));
            return this;
        }

        /** Writes items' numbers beside them (and keep-out areas' numbers instead of their names). */
        public Builder numbered() {
            numbered = true;
            return this;
        }

        public PlanDrawing build() {
            List<PlanItem> drawn = items.stream().filter(i -> !i.paths().isEmpty() && !i.paths().get(0).isEmpty())
                    .toList();
            List<PlanItem> sorted = new ArrayList<>(drawn);
            sorted.sort(Comparator.comparing(PlanItem::layer));
            List<List<double[]>> all = new ArrayList<>();
            sorted.forEach(i -> all.addAll(i.paths()));
            double highest = sorted.stream().filter(i -> i instanceof PlanItem.Structure)
                    .mapToDouble(i -> ((PlanItem.Structure) i).height()).max().orElse(1);
            // labels in the order the items came (review items by number, then parts, down-conductors,
            // areas): numbers placed earlier get the first choice of place
            List<PlanLabel> labels = new ArrayList<>();
            for (PlanItem item : drawn) {
                label(item, labels);
            }
            return new PlanDrawing(PlanFrame.around(all), sorted, labels, listed, highest > 0 ? highest : 1);
        }

        private void label(PlanItem item, List<PlanLabel> labels) {
            if (item instanceof PlanItem.Structure s) {
                PlanFrame box = PlanFrame.around(s.rings());
                String text = (s.name() == null || s.name().isBlank() ? "" : s.name() + " ") + "("
                        + Formats.height(s.height()) + " m)";
                labels.add(new PlanLabel(text, box.centreX(), box.centreY(), PlanLabel.Kind.NAME, s.layer()));
            } else if (item instanceof PlanItem.KeepOutArea k) {
                PlanFrame box = PlanFrame.around(k.paths());
                if (numbered && k.number() != null) {
                    labels.add(new PlanLabel(k.number(), box.centreX(), box.centreY(), PlanLabel.Kind.NUMBER,
                            k.layer()));
                } else if (!numbered) {
                    labels.add(new PlanLabel(k.name(), box.minX(), box.maxY(), PlanLabel.Kind.AREA_NAME, k.layer()));
                }
            } else {
                String number = numbered ? number(item) : null;
                if (number != null) {
                    double[] at = anchor(item);
                    labels.add(new PlanLabel(number, at[0], at[1], PlanLabel.Kind.NUMBER, item.layer()));
                }
            }
        }

        private static String number(PlanItem item) {
            PlanItem.Review review = null;
            if (item instanceof PlanItem.FacadeBand b) {
                review = b.review();
            } else if (item instanceof PlanItem.ExposedEdge e) {
                review = e.review();
            } else if (item instanceof PlanItem.ExposedCorner c) {
                review = c.review();
            } else if (item instanceof PlanItem.ModelWarningStretch w) {
                review = w.review();
            } else if (item instanceof PlanItem.Rod r) {
                return r.number();
            } else if (item instanceof PlanItem.Conductor c) {
                return c.number();
            } else if (item instanceof PlanItem.DownConductor d) {
                return d.number();
            }
            return review == null ? null : review.number();
        }

        /** Where a number goes: the middle of a line's first segment, else the first position. */
        private static double[] anchor(PlanItem item) {
            List<double[]> first = item.paths().get(0);
            double[] a = first.get(0);
            if (item instanceof PlanItem.Rod || item instanceof PlanItem.Conductor || first.size() < 2) {
                return a;
            }
            double[] b = first.get(1);
            return new double[] {(a[0] + b[0]) / 2, (a[1] + b[1]) / 2};
        }
    }
}
