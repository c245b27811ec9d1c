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
 * @param cover         the address and designer the cover prints, and where they come from
 */
public record ReportSource(String siteName, String sourceName, String sourceText, SphereSpec sphere,
        double resolution, double tolerance, int revision, Instant analysedAt, String inputsSha256,
        String resultGeoJson, Map<String, String> accepted, List<Cut> savedCuts, Cover cover) {

    public ReportSource {
        accepted = Map.copyOf(accepted);
        savedCuts = List.copyOf(savedCuts);
        cover = cover == null ? Cover.NONE : cover;
    }

    /** A source without address and designer: the cover keeps lines to fill in by hand. */
    public ReportSource(String siteName, String sourceName, String sourceText, SphereSpec sphere,
            double resolution, double tolerance, int revision, Instant analysedAt, String inputsSha256,
            String resultGeoJson, Map<String, String> accepted, List<Cut> savedCuts) {
        this(siteName, sourceName, sourceText, sphere, resolution, tolerance, revision, analysedAt, inputsSha256,
                resultGeoJson, accepted, savedCuts, Cover.NONE);
    }

    /**
     * The site's address and the designer's name for the cover, empty when not known (the cover then
     * keeps a line to write on), and where they come from: {@code readAt} is when they were read from
     * the site's stored data (they belong to the site, not to the revision, so they print as stored
     * when printed); null when they were given on the command line or not at all.
     */
    public record Cover(String address, String designer, Instant readAt) {

        public static final Cover NONE = new Cover("", "", null);

        public Cover {
            address = address == null ? "" : address.strip();
            designer = designer == null ? "" : designer.strip();
        }
    }

    /** A straight section cut in local metres, with the name it was saved under. */
    public record Cut(String name, double x1, double y1, double x2, double y2) {
    }
}
