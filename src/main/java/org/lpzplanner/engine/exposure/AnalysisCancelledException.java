package org.lpzplanner.engine.exposure;

/** The caller stopped an analysis through its {@link AnalysisProgress}; nothing was returned. */
public final class AnalysisCancelledException extends RuntimeException {

    public AnalysisCancelledException() {
        super("the analysis was cancelled");
    }
}
