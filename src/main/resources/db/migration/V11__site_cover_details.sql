-- The site's address and the designer's name, printed on the report's cover; empty until entered.
ALTER TABLE sites ADD COLUMN address VARCHAR(200) DEFAULT '' NOT NULL;
ALTER TABLE sites ADD COLUMN designer_name VARCHAR(200) DEFAULT '' NOT NULL;
