package org.lpzplanner.engine.exposure;

/**
 * Lets a caller follow a long analysis and stop it. The engine reports each stage as it starts and
 * asks {@link #cancelled()} between items; a cancelled analysis ends with
 * {@link AnalysisCancelledException} and returns nothing, so no partial result can be mistaken for
 * a whole one. Implementations must be thread-safe: the stages run on several threads.
 */
public interface AnalysisProgress {

    /** Follows nothing and never cancels. */
    AnalysisProgress NONE = new AnalysisProgress() {
    };

    /**
     * A stage begins.
     *
     * @param stage        envelope, edges, roofs, corners, facades, parts or ground
     * @param fractionDone share of the whole analysis done before this stage, 0..1 (an estimate)
     */
    default void stage(String stage, double fractionDone) {
    }

    /** True when the caller wants the analysis stopped. */
    default boolean cancelled() {
        return false;
    }

    /** @throws AnalysisCancelledException when the caller asked to stop */
    default void checkCancelled() {
        if (cancelled()) {
            throw new AnalysisCancelledException();
        }
    }
}
