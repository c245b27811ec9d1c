package org.lpzplanner.engine.envelope;

import java.util.Locale;

/**
 * An analysis refused before it starts because its grid would not fit the memory it may use. The
 * message says how large the grid would be and which resolution would fit.
 */
public class AnalysisTooLargeException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    private final double suggestedResolution;

    public AnalysisTooLargeException(long cells, double resolution, double suggestedResolution) {
        super(String.format(Locale.ROOT,
                "the site needs a grid of %,d cells at %.2f m resolution, more than the %,d cells an analysis may use; "
                        + "choose a resolution of %.2f m or coarser, or split the site into smaller parts",
                cells, resolution, EnvelopeOp.MAX_CELLS, suggestedResolution));
        this.suggestedResolution = suggestedResolution;
    }

    /** The finest resolution (metres) at which the grid fits. */
    public double suggestedResolution() {
        return suggestedResolution;
    }
}
