package org.lpzplanner.engine.io;

import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Refuses a feature that repeats an earlier one: the same kind with the same geometry (vertex order
 * and ring start do not matter). A repeated feature is a copy-and-paste or export mistake, and when
 * the copies disagree (two heights for one outline) no reading of the file is safe to guess.
 */
final class DuplicateFeatures {

    private DuplicateFeatures() {}

    static void reject(List<RawFeature> features) {
        Map<String, RawFeature> seen = new HashMap<>();
        for (RawFeature feature : features) {
            if (feature.geometry() == null || feature.kind() == null) {
                continue;
            }
            String key = feature.kind() + " " + feature.geometry().norm().toText();
            RawFeature earlier = seen.putIfAbsent(key, feature);
            if (earlier != null) {
                throw feature.place().fail("geometry", "repeats " + earlier.place().label() + ": the same "
                        + "kind (" + feature.kind().key() + ") and the same geometry; remove one of them");
            }
        }
    }
}
