-- The risk inputs of a site (one row per site, absent until they are first saved). Choices are
-- stored by name; the ground flash density is either measured (flash_density) or estimated from
-- thunderstorm days (thunderstorm_days), as flash_density_source says. A null location factor
-- means the app's suggestion is used.
CREATE TABLE site_risk_inputs (
    site_id               BIGINT NOT NULL PRIMARY KEY REFERENCES sites (id) ON DELETE CASCADE,
    flash_density_source  VARCHAR(20) NOT NULL,
    flash_density         DOUBLE PRECISION,
    thunderstorm_days     DOUBLE PRECISION,
    location_factor       VARCHAR(40),
    surface_type          VARCHAR(40) NOT NULL,
    fire_risk             VARCHAR(40) NOT NULL,
    fire_provisions       VARCHAR(40) NOT NULL,
    special_hazard        VARCHAR(40) NOT NULL,
    structure_use         VARCHAR(40) NOT NULL,
    touch_step            VARCHAR(40) NOT NULL,
    persons_in_zone       DOUBLE PRECISION NOT NULL,
    persons_total         DOUBLE PRECISION NOT NULL,
    hours_per_year        DOUBLE PRECISION NOT NULL,
    line_count            INT,
    line_length           DOUBLE PRECISION,
    updated_at            TIMESTAMP WITH TIME ZONE NOT NULL
);
