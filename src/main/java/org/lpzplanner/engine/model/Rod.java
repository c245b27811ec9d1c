package org.lpzplanner.engine.model;

/**
 * A vertical air-termination rod at plan position (x, y), rising {@code height} metres above
 * whatever it stands on (a roof, a rooftop object, or the ground, where it is a free-standing mast).
 */
public record Rod(String id, String name, double x, double y, double height) {}
