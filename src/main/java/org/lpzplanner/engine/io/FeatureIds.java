package org.lpzplanner.engine.io;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Gives every feature a unique id: the one written in the file, or a generated one made of the
 * kind's prefix and a counter ({@code S1, S2, …}, {@code O1, …}, {@code R1, …}, {@code C1, …})
 * that counts, in file order, the features of that kind without an id and skips ids already
 * written in the file.
 */
final class FeatureIds {

    private FeatureIds() {}

    /**
     * @return ids in the order of {@code features}
     * @throws SiteFormatException when two features are given the same id
     */
    static List<String> assign(List<RawFeature> features) {
        Map<String, RawFeature> written = new HashMap<>();
        for (RawFeature feature : features) {
            if (feature.explicitId() == null) {
                continue;
            }
            RawFeature earlier = written.putIfAbsent(feature.explicitId(), feature);
            if (earlier != null) {
                throw feature.place().fail("id", Texts.quoted(feature.explicitId()) + " is already used by "
                        + earlier.place().label() + "; ids must be unique within the file");
            }
        }
        Map<FeatureKind, Integer> counters = new EnumMap<>(FeatureKind.class);
        List<String> ids = new ArrayList<>(features.size());
        for (RawFeature feature : features) {
            if (feature.explicitId() != null) {
                ids.add(feature.explicitId());
                continue;
            }
            int n = counters.getOrDefault(feature.kind(), 0);
            String id;
            do {
                n++;
                id = feature.kind().idPrefix() + n;
            } while (written.containsKey(id));
            counters.put(feature.kind(), n);
            ids.add(id);
        }
        return ids;
    }
}
