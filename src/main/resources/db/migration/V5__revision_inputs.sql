-- What an analysis read, kept with its revision so that a past result can be printed again exactly:
-- the site's name and file (name and text, verbatim) at the time of the analysis and the envelope
-- tolerance. Revisions stored before this column existed have NULLs; their file is found again by
-- its SHA-256 among the site's current and earlier files when it is still there.
ALTER TABLE analysis_revisions ADD COLUMN site_name VARCHAR(200);
ALTER TABLE analysis_revisions ADD COLUMN source_name VARCHAR(255);
ALTER TABLE analysis_revisions ADD COLUMN source_text TEXT;
ALTER TABLE analysis_revisions ADD COLUMN tolerance DOUBLE PRECISION;
