package org.lpzplanner.drawing;

/** Round numbers of metres for a drawing: the length a scale bar shows, the step of an axis's ticks. */
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

    /**
     * The least of 1, 2 or 5 times a power of ten that is at least {@code target} metres: the step
     * between the ticks of a drawing's axis.
     */
    public static double step(double target) {
        double magnitude = Math.pow(10, Math.floor(Math.log10(target)));
        for (double step : new double[] {1, 2, 5}) {
            if (step * magnitude >= target) {
                return step * magnitude;
            }
        }
        return 10 * magnitude;
    }
}
