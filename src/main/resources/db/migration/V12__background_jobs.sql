-- Background jobs (analyses and air-termination proposals), shared by every app instance on the
-- database: any instance answers a poll, a cancel, an accept or its undo. The instance running a
-- job (instance_name) refreshes heartbeat_at while it works, so a job whose instance died reads as
-- interrupted instead of running for ever. Finished rows are pruned (the latest few per site, none
-- older than a day).
CREATE TABLE background_jobs (
    id               VARCHAR(40)  PRIMARY KEY,
    site_id          BIGINT       NOT NULL REFERENCES sites (id) ON DELETE CASCADE,
    team_id          BIGINT       NOT NULL,
    account          VARCHAR(254) NOT NULL,
    kind             VARCHAR(20)  NOT NULL,
    state            VARCHAR(20)  NOT NULL,
    stage            VARCHAR(200),
    fraction         DOUBLE PRECISION NOT NULL,
    site_version     BIGINT,
    settings_json    TEXT,
    revision         INTEGER,
    outcome_json     TEXT,
    accepted_json    TEXT,
    error            VARCHAR(2000),
    cancel_requested BOOLEAN      NOT NULL,
    instance_name    VARCHAR(200) NOT NULL,
    created_at       TIMESTAMP WITH TIME ZONE NOT NULL,
    heartbeat_at     TIMESTAMP WITH TIME ZONE NOT NULL,
    finished_at      TIMESTAMP WITH TIME ZONE
);
CREATE INDEX background_jobs_site ON background_jobs (site_id, kind, created_at);
CREATE INDEX background_jobs_instance ON background_jobs (instance_name, state);
