package org.lpzplanner.analysis;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.springframework.beans.factory.annotation.Value;
import org.springframework.stereotype.Component;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * The stored result GeoJSON of recent revisions read once, kept by revision id, so that the plan
 * page and the answer to an edit draw, list and word a revision without reading its result again
 * for each part. A revision's result never changes once stored, so an entry is never stale. The
 * least recently used go first beyond {@code lpz.analysis.parsed-results} (default 16; 0 keeps
 * none); a parsed result takes a few times the size of its text.
 *
 * <p>Thread safety: safe for concurrent use. The parsed trees are shared: callers only read them.
 */
@Component
public class ParsedResults {

    /**
     * One revision's result as read: the GeoJSON tree, its review items (numbered from 1) and how
     * many facade bands have flashes to the side negligible.
     */
    public record ParsedResult(JsonNode root, List<ReviewItems.Item> items, int negligibleBands) {
    }

    private final int capacity;
    private final JsonMapper json;
    private final LinkedHashMap<Long, ParsedResult> results;

    public ParsedResults(@Value("${lpz.analysis.parsed-results:16}") int capacity, JsonMapper json) {
        this.capacity = Math.max(0, capacity);
        this.json = json;
        this.results = new LinkedHashMap<>(16, 0.75f, true) {
            @Override
            protected boolean removeEldestEntry(Map.Entry<Long, ParsedResult> eldest) {
                return size() > ParsedResults.this.capacity;
            }
        };
    }

    /** The result of a revision read with its result GeoJSON. */
    public ParsedResult of(AnalysisRevision revision) {
        if (revision.resultGeoJson() == null) {
            throw new IllegalArgumentException("revision " + revision.id() + " was read without its result");
        }
        synchronized (this) {
            ParsedResult kept = results.get(revision.id());
            if (kept != null) {
                return kept;
            }
        }
        JsonNode root = json.readTree(revision.resultGeoJson());
        ParsedResult parsed = new ParsedResult(root, ReviewItems.of(root), ReviewItems.negligibleBands(root));
        synchronized (this) {
            if (capacity > 0 && revision.id() > 0) {
                results.put(revision.id(), parsed);
            }
        }
        return parsed;
    }

    /** The summary of a revision read with its result, as {@link AnalysisSummary#of} gives it. */
    public AnalysisSummary summary(AnalysisRevision revision) {
        return AnalysisSummary.of(revision, of(revision).negligibleBands());
    }
}
