package org.lpzplanner.report;

import java.util.List;

/**
 * What the plan drawing shows, in local metres (x east, y north): shapes by layer, drawn in the
 * order of {@link Layer}, and labels. The extent covers every shape.
 */
public record PlanDrawing(List<Shape> shapes, List<Label> labels, double minX, double minY, double maxX,
        double maxY) {

    public PlanDrawing {
        shapes = List.copyOf(shapes);
        labels = List.copyOf(labels);
    }

    /** Drawing layers, bottom to top. */
    public enum Layer {
        PROTECTED_GROUND, STRUCTURE, ROOFTOP_OBJECT, EXPOSED_ROOF, KEEP_OUT, FACADE_NEGLIGIBLE, FACADE_BAND,
        MODEL_WARNING,
        ACCEPTED_ITEM, EXPOSED_EDGE, EXPOSED_CORNER, CONDUCTOR, DOWN_CONDUCTOR, ROD
    }

    /**
     * One shape: polygons (paths are rings, the first outer), lines or points (one path of one
     * position each).
     *
     * @param shade 0 (lowest) to 1 (highest) for structures, 0 otherwise
     */
    public record Shape(Layer layer, List<List<double[]>> paths, double shade) {
        public Shape {
            paths = paths.stream().map(List::copyOf).toList();
        }
    }

    /** A label at a point; {@code small} labels mark numbered items. */
    public record Label(String text, double x, double y, boolean small) {
    }

    /** True when some shape is on the layer (the legend lists optional layers only then). */
    public boolean has(Layer layer) {
        return shapes.stream().anyMatch(s -> s.layer() == layer);
    }

    public double width() {
        return maxX - minX;
    }

    public double height() {
        return maxY - minY;
    }
}
