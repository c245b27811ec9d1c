package org.lpzplanner.engine.geom;

/** The role of a straight edge of a top surface. */
public enum EdgeKind {
    /** Outer edge of a roof where it meets a wall (eave, verge, flat-roof edge). */
    ROOF_EDGE("roof edge"),
    /** Top of a parapet. */
    PARAPET("parapet"),
    /** Horizontal line where two roof planes meet at the top. */
    RIDGE("ridge"),
    /** Sloping line where two roof planes meet (hip roofs). */
    HIP("hip"),
    /** Top edge of a rooftop object. */
    OBJECT_EDGE("rooftop object edge");

    private final String label;

    EdgeKind(String label) {
        this.label = label;
    }

    public String label() {
        return label;
    }
}
