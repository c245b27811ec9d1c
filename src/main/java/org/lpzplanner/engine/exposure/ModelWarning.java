package org.lpzplanner.engine.exposure;

import org.locationtech.jts.geom.Geometry;

/**
 * Something an analysis found about its own model that a designer must know before relying on the
 * result. While any warning stands, {@link AnalysisResult#isFullyProtected()} is false: no verdict of
 * full protection is given.
 *
 * @param kind     what kind of finding
 * @param partId   the air-termination part it concerns (its id in the site file)
 * @param partName the part's name, or its id when it has none
 * @param where    plan geometry (local metres) of the stretch concerned
 * @param value    the measured quantity (for {@link Kind#FREE_SPAN}: the greatest height above the
 *                 surface beneath, metres)
 * @param limit    the limit it exceeds (for {@link Kind#FREE_SPAN}: the sphere radius, metres)
 * @param text     the finding in plain words: what, where, and what to do
 */
public record ModelWarning(Kind kind, String partId, String partName, Geometry where, double value, double limit,
        String text) {

    public enum Kind {
        /**
         * A conductor or wire more than R above the surface beneath it: a sphere can pass under it,
         * so it protects nothing directly beneath that stretch.
         */
        FREE_SPAN
    }
}
