package org.lpzplanner.analysis;

import java.sql.Timestamp;
import java.time.Instant;
import java.util.LinkedHashMap;
import java.util.Map;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.stereotype.Repository;

/** Reads and writes the {@code accepted_items} table. */
@Repository
public class AcceptedItemRepository {

    private final JdbcClient jdbc;

    public AcceptedItemRepository(JdbcClient jdbc) {
        this.jdbc = jdbc;
    }

    /** The reason of every accepted item of a revision, by item key, in the order accepted. */
    public Map<String, String> reasons(long revisionId) {
        Map<String, String> out = new LinkedHashMap<>();
        jdbc.sql("SELECT item_key, reason FROM accepted_items WHERE revision_id = ? ORDER BY id").param(revisionId)
                .query((rs, n) -> Map.entry(rs.getString("item_key"), rs.getString("reason"))).list()
                .forEach(e -> out.put(e.getKey(), e.getValue()));
        return out;
    }

    /** Marks an item accepted, replacing the reason when it already was. */
    public void accept(long revisionId, String key, String reason, Instant at) {
        int changed = jdbc.sql("UPDATE accepted_items SET reason = ?, created_at = ? WHERE revision_id = ? AND item_key = ?")
                .params(reason, Timestamp.from(at), revisionId, key).update();
        if (changed == 0) {
            jdbc.sql("INSERT INTO accepted_items (revision_id, item_key, reason, created_at) VALUES (?, ?, ?, ?)")
                    .params(revisionId, key, reason, Timestamp.from(at)).update();
        }
    }

    /** Takes back the acceptance of an item; true when there was one. */
    public boolean remove(long revisionId, String key) {
        return jdbc.sql("DELETE FROM accepted_items WHERE revision_id = ? AND item_key = ?").params(revisionId, key)
                .update() > 0;
    }
}
