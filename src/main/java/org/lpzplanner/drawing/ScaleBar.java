package org.lpzplanner.drawing;

/** The length a scale bar shows: a round number of metres. */
public final class ScaleBar {

    private ScaleBar() {
    }

    /** The greatest of 1, 2 or 5 times a power of ten that is at most {@code target} metres. */
    public static double length(double target) {
        double magnitude = Math.pow(10, Math.floor(Math.log10(target)));
        double length = magnitude;
        for (double step : new double[] {1, 2, 5, 10}) {
            if (step * magnitude <= target) {
                length = step * magnitude;
            }
        }
        return length;
    }
}
