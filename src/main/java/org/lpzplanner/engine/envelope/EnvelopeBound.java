package org.lpzplanner.engine.envelope;

/**
 * Bounds on the least envelope height over a target (a point or a square): the true value lies in
 * [lower, upper]. Results report {@code lower}, which never claims protection that is not there.
 */
public record EnvelopeBound(double lower, double upper) {}
