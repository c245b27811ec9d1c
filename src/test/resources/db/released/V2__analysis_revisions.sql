-- One row per analysis run of a site; revisions count up from 1 per site.
CREATE TABLE analysis_revisions (
    id                    BIGINT AUTO_INCREMENT PRIMARY KEY,
    site_id               BIGINT NOT NULL REFERENCES sites (id) ON DELETE CASCADE,
    revision              INT NOT NULL,
    protection_level      VARCHAR(3) NOT NULL,
    sphere_radius         DOUBLE PRECISION NOT NULL,
    resolution            DOUBLE PRECISION NOT NULL,
    inputs_sha256         CHAR(64) NOT NULL,
    exposed_roof_area     DOUBLE PRECISION NOT NULL,
    exposed_edge_length   DOUBLE PRECISION NOT NULL,
    exposed_corners       INT NOT NULL,
    facade_bands          INT NOT NULL,
    protected_ground_area DOUBLE PRECISION NOT NULL,
    fully_protected       BOOLEAN NOT NULL,
    result_geojson        CLOB NOT NULL,
    engine_millis         BIGINT NOT NULL,
    created_at            TIMESTAMP WITH TIME ZONE NOT NULL,
    CONSTRAINT analysis_revision_per_site UNIQUE (site_id, revision)
);
CREATE INDEX analysis_revisions_site ON analysis_revisions (site_id, revision);
