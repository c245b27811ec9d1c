-- Review items (exposed edges, corners, facade bands) a designer accepted, with the reason, for
-- one analysis revision; the item key is the one the review list and the plan drawing show.
CREATE TABLE accepted_items (
    id              BIGINT AUTO_INCREMENT PRIMARY KEY,
    revision_id     BIGINT NOT NULL REFERENCES analysis_revisions (id) ON DELETE CASCADE,
    item_key        VARCHAR(80) NOT NULL,
    reason          VARCHAR(500) NOT NULL,
    created_at      TIMESTAMP WITH TIME ZONE NOT NULL,
    CONSTRAINT accepted_item_per_revision UNIQUE (revision_id, item_key)
);
