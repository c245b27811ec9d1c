package org.lpzplanner.drawing;

import java.util.List;

/**
 * One thing a plan shows, in local metres (x east, y north): areas as rings (the first of each
 * polygon its outer ring), lines as lists of positions, marks as one position. Items keep what the
 * renderers write beside the geometry: names, ids the plan editor needs, review keys and numbers.
 */
public sealed interface PlanItem {

    /** The layer the item is drawn on. */
    Layer layer();

    /** Rings, lines, or one path of one position. */
    List<List<double[]>> paths();

    /**
     * What a review item carries: its key (review list, acceptances), its number as the review list
     * gives it ("E5") and the designer's reason when accepted, else null.
     */
    record Review(String key, String number, String acceptedReason) {
        public boolean accepted() {
            return acceptedReason != null;
        }
    }

    /** A structure's footprint, shaded by its top height, named with that height. */
    record Structure(String name, double height, List<List<double[]>> rings) implements PlanItem {
        public Structure {
            rings = copy(rings);
        }

        @Override
        public Layer layer() {
            return Layer.STRUCTURE;
        }

        @Override
        public List<List<double[]>> paths() {
            return rings;
        }
    }

    record RooftopObject(String name, List<List<double[]>> rings) implements PlanItem {
        public RooftopObject {
            rings = copy(rings);
        }

        @Override
        public Layer layer() {
            return Layer.ROOFTOP_OBJECT;
        }

        @Override
        public List<List<double[]>> paths() {
            return rings;
        }
    }

    /** Open ground no sphere reaches (LPZ 0B). */
    record ProtectedGround(List<List<double[]>> rings) implements PlanItem {
        public ProtectedGround {
            rings = copy(rings);
        }

        @Override
        public Layer layer() {
            return Layer.PROTECTED_GROUND;
        }

        @Override
        public List<List<double[]>> paths() {
            return rings;
        }
    }

    /** The part of a roof face or rooftop-object top a sphere reaches (LPZ 0A). */
    record ExposedRoof(List<List<double[]>> rings) implements PlanItem {
        public ExposedRoof {
            rings = copy(rings);
        }

        @Override
        public Layer layer() {
            return Layer.EXPOSED_ROOF;
        }

        @Override
        public List<List<double[]>> paths() {
            return rings;
        }
    }

    /** The risk estimate's collection area A_D. */
    record CollectionArea(List<List<double[]>> rings) implements PlanItem {
        public CollectionArea {
            rings = copy(rings);
        }

        @Override
        public Layer layer() {
            return Layer.COLLECTION_AREA;
        }

        @Override
        public List<List<double[]>> paths() {
            return rings;
        }
    }

    /**
     * A facade band along the wall foot, from {@code bottom} to {@code top} metres above ground,
     * classified by the tall-structure rule (IEC 62305-3:2010 5.2.3): a band needing lateral
     * air-termination is a review item; one where flashes to the side are negligible is not
     * ({@code review} null).
     */
    record FacadeBand(List<double[]> line, boolean negligible, double bottom, double top, Review review)
            implements PlanItem {
        public FacadeBand {
            line = List.copyOf(line);
        }

        @Override
        public Layer layer() {
            return negligible ? Layer.FACADE_NEGLIGIBLE : accepted(review) ? Layer.ACCEPTED_ITEM : Layer.FACADE_BAND;
        }

        @Override
        public List<List<double[]>> paths() {
            return List.of(line);
        }
    }

    record ExposedEdge(List<double[]> line, Review review) implements PlanItem {
        public ExposedEdge {
            line = List.copyOf(line);
        }

        @Override
        public Layer layer() {
            return accepted(review) ? Layer.ACCEPTED_ITEM : Layer.EXPOSED_EDGE;
        }

        @Override
        public List<List<double[]>> paths() {
            return List.of(line);
        }
    }

    record ExposedCorner(double x, double y, Review review) implements PlanItem {
        @Override
        public Layer layer() {
            return accepted(review) ? Layer.ACCEPTED_ITEM : Layer.EXPOSED_CORNER;
        }

        @Override
        public List<List<double[]>> paths() {
            return List.of(List.of(new double[] {x, y}));
        }
    }

    /**
     * The stretch of a part a model warning is about, with the warning's words. Accepted or not it
     * stays on its own layer: an acceptance records the designer's answer, the warning stands.
     */
    record ModelWarningStretch(List<List<double[]>> lines, String text, Review review) implements PlanItem {
        public ModelWarningStretch {
            lines = copy(lines);
        }

        @Override
        public Layer layer() {
            return Layer.MODEL_WARNING;
        }

        @Override
        public List<List<double[]>> paths() {
            return lines;
        }
    }

    /** An air-termination rod at its plan position; {@code number} ("A1") or null. */
    record Rod(String id, String name, double x, double y, String number) implements PlanItem {
        @Override
        public Layer layer() {
            return Layer.ROD;
        }

        @Override
        public List<List<double[]>> paths() {
            return List.of(List.of(new double[] {x, y}));
        }
    }

    /** An air-termination conductor's plan path; {@code number} ("A4") or null. */
    record Conductor(String id, String name, List<double[]> line, String number) implements PlanItem {
        public Conductor {
            line = List.copyOf(line);
        }

        @Override
        public Layer layer() {
            return Layer.CONDUCTOR;
        }

        @Override
        public List<List<double[]>> paths() {
            return List.of(line);
        }
    }

    /** A planned or edited down-conductor position; {@code number} ("D1") or null. */
    record DownConductor(double x, double y, String number) implements PlanItem {
        @Override
        public Layer layer() {
            return Layer.DOWN_CONDUCTOR;
        }

        @Override
        public List<List<double[]>> paths() {
            return List.of(List.of(new double[] {x, y}));
        }
    }

    /** A keep-out area the site stores: its name, outline (ring not closed) and number ("K1") or null. */
    record KeepOutArea(String name, List<double[]> corners, String number) implements PlanItem {
        public KeepOutArea {
            corners = List.copyOf(corners);
        }

        /** An area as the pages draw it: named, not numbered. */
        public KeepOutArea(String name, List<double[]> corners) {
            this(name, corners, null);
        }

        @Override
        public Layer layer() {
            return Layer.KEEP_OUT;
        }

        @Override
        public List<List<double[]>> paths() {
            return List.of(corners);
        }
    }

    private static boolean accepted(Review review) {
        return review != null && review.accepted();
    }

    private static List<List<double[]>> copy(List<List<double[]>> paths) {
        return paths.stream().map(List::copyOf).toList();
    }
}
