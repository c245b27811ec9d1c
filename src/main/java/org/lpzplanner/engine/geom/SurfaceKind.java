package org.lpzplanner.engine.geom;

/** What a top surface belongs to. */
public enum SurfaceKind {
    ROOF, ROOFTOP_OBJECT
}
