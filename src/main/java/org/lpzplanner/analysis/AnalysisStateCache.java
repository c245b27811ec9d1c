package org.lpzplanner.analysis;

import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;
import org.lpzplanner.engine.exposure.AnalysisState;
import org.springframework.beans.factory.annotation.Value;
import org.springframework.stereotype.Component;

/**
 * The last few analyses with their decisions, kept in memory so the analysis after an edit only
 * redoes what the edit can change. A pure speed-up: the engine compares the kept site with the
 * edited one itself and analyses afresh whenever they differ in more than the air-termination, so
 * a state from any version of the site (or none, after a restart or on another app instance) gives
 * the same result. Bounded in number and in grid cells held (memory grows with them, roughly 100
 * bytes a cell): the least recently used states go first, and a state larger than the whole budget
 * is not kept.
 */
@Component
public class AnalysisStateCache {

    /** A site at one version. */
    record Key(long siteId, long version) {
    }

    private final int capacity;
    private final long cellBudget;
    private final LinkedHashMap<Key, AnalysisState> states = new LinkedHashMap<>(16, 0.75f, true);

    public AnalysisStateCache(@Value("${lpz.analysis.kept-states:8}") int capacity,
            @Value("${lpz.analysis.kept-cells:3000000}") long cellBudget) {
        this.capacity = Math.max(0, capacity);
        this.cellBudget = Math.max(0, cellBudget);
    }

    /** The state kept for this version of the site, else the one of its latest kept version. */
    public synchronized Optional<AnalysisState> closest(long siteId, long version) {
        AnalysisState exact = states.get(new Key(siteId, version));
        if (exact != null) {
            return Optional.of(exact);
        }
        Key best = null;
        for (Key k : states.keySet()) {
            if (k.siteId() == siteId && (best == null || k.version() > best.version())) {
                best = k;
            }
        }
        return best == null ? Optional.empty() : Optional.of(states.get(best));
    }

    public synchronized void keep(long siteId, long version, AnalysisState state) {
        // one state per site is enough to start the next edit from
        states.keySet().removeIf(k -> k.siteId() == siteId);
        if (capacity == 0 || state.gridCells() > cellBudget) {
            return;
        }
        states.put(new Key(siteId, version), state);
        long cells = states.values().stream().mapToLong(AnalysisState::gridCells).sum();
        Iterator<Map.Entry<Key, AnalysisState>> oldest = states.entrySet().iterator();
        while ((states.size() > capacity || cells > cellBudget) && oldest.hasNext()) {
            cells -= oldest.next().getValue().gridCells();
            oldest.remove();
        }
    }

    /** Drops what is kept for a site (e.g. when it is deleted). */
    public synchronized void forget(long siteId) {
        states.keySet().removeIf(k -> k.siteId() == siteId);
    }

    synchronized int size() {
        return states.size();
    }
}
