package org.lpzplanner.drawing;

/**
 * A word on the drawing: its text, the point in local metres it belongs to, how it is placed there
 * and the layer of the item it names (which gives its colour).
 */
public record PlanLabel(String text, double x, double y, Kind kind, Layer layer) {

    /** How a label is placed against its point, and its size in points. */
    public enum Kind {
        /** A structure's name: centred on the point (the middle of the structure). */
        NAME(PlanStyle.NAME_SIZE),
        /** An area's name: inside the area below its top left corner (the point). */
        AREA_NAME(PlanStyle.AREA_NAME_SIZE),
        /** An item's, part's or down-conductor's number: beside the point, where it overlaps no other label. */
        NUMBER(PlanStyle.NUMBER_SIZE);

        private final double size;

        Kind(double size) {
            this.size = size;
        }

        /** The text size in points. */
        public double size() {
            return size;
        }
    }
}
