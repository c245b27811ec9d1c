-- Earlier site files: when a structure is corrected, the file it replaces is kept here verbatim,
-- numbered from 1 per site in the order they were replaced.
CREATE TABLE site_file_versions (
    id              BIGINT AUTO_INCREMENT PRIMARY KEY,
    site_id         BIGINT NOT NULL REFERENCES sites (id) ON DELETE CASCADE,
    file_number     INT NOT NULL,
    source_name     VARCHAR(255) NOT NULL,
    source_text     CLOB NOT NULL,
    replaced_at     TIMESTAMP WITH TIME ZONE NOT NULL,
    CONSTRAINT site_file_number_per_site UNIQUE (site_id, file_number)
);
