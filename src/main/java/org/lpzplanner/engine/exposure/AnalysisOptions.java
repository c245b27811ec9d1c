package org.lpzplanner.engine.exposure;

import org.lpzplanner.engine.model.SettingRange;
import org.lpzplanner.engine.model.SphereSpec;

/**
 * What to analyse with: the sphere, the grid resolution (null: chosen from the site's size) and the
 * tolerance of exact envelope queries.
 */
public record AnalysisOptions(SphereSpec sphere, Double resolution, double tolerance) {

    /** Default tolerance of exact envelope values, metres. */
    public static final double DEFAULT_TOLERANCE = 0.001;

    public AnalysisOptions {
        if (resolution != null && !SettingRange.RESOLUTION.contains(resolution)) {
            throw new IllegalArgumentException("resolution must be " + SettingRange.RESOLUTION.rule() + ", got "
                    + resolution);
        }
        if (!(tolerance > 0 && tolerance <= 0.1)) {
            throw new IllegalArgumentException("tolerance must be above 0 and at most 0.1 m, got " + tolerance);
        }
    }

    public static AnalysisOptions of(SphereSpec sphere) {
        return new AnalysisOptions(sphere, null, DEFAULT_TOLERANCE);
    }

    public AnalysisOptions withResolution(Double h) {
        return new AnalysisOptions(sphere, h, tolerance);
    }
}
