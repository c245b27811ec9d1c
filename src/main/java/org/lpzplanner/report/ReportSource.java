package org.lpzplanner.report;

import java.time.Instant;
import java.util.List;
import java.util.Map;
import org.lpzplanner.engine.model.SphereSpec;

/**
 * Everything one report is made from: a stored analysis revision with the exact inputs it read.
 * Two reports of the same source carry the same content; only the printing time differs.
 *
 * @param siteName      the site's name when it was analysed
 * @param sourceName    the site file's name
 * @param sourceText    the site file's text, verbatim
 * @param sphere        level and radius rolled
 * @param resolution    grid spacing the engine used, metres
 * @param tolerance     tolerance of exact envelope values, metres
 * @param revision      revision number; 0 for an analysis that was not stored (command line)
 * @param analysedAt    when the analysis ran
 * @param inputsSha256  SHA-256 (hex) of {@code sourceText}
 * @param resultGeoJson the stored result (see {@link org.lpzplanner.analysis.ResultGeoJson})
 * @param accepted      reasons of the accepted review items, by item key
 * @param savedCuts     section cuts the user saved, drawn before the automatic ones
 */
public record ReportSource(String siteName, String sourceName, String sourceText, SphereSpec sphere,
        double resolution, double tolerance, int revision, Instant analysedAt, String inputsSha256,
        String resultGeoJson, Map<String, String> accepted, List<Cut> savedCuts) {

    public ReportSource {
        accepted = Map.copyOf(accepted);
        savedCuts = List.copyOf(savedCuts);
    }

    /** A straight section cut in local metres, with the name it was saved under. */
    public record Cut(String name, double x1, double y1, double x2, double y2) {
    }
}
