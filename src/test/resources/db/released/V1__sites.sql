-- Sites: the uploaded site file is kept verbatim, with its original file name.
CREATE TABLE sites (
    id              BIGINT AUTO_INCREMENT PRIMARY KEY,
    name            VARCHAR(200)  NOT NULL,
    protection_level VARCHAR(3)   NOT NULL,
    custom_radius   DOUBLE PRECISION,
    source_name     VARCHAR(255)  NOT NULL,
    source_text     CLOB          NOT NULL,
    created_at      TIMESTAMP WITH TIME ZONE NOT NULL,
    updated_at      TIMESTAMP WITH TIME ZONE NOT NULL,
    version         BIGINT        NOT NULL DEFAULT 0
);
