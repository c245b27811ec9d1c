-- Team names are unique whatever their letter case: "North Office" and "north office" would be
-- two teams no one can tell apart in a list. name_key holds the lower-cased name and carries the
-- unique constraint. Teams stored before this whose names differ only by case keep their names;
-- every one after the first gets its id appended to its key, so the migration never fails and
-- an administrator can rename them.
ALTER TABLE teams ADD COLUMN name_key VARCHAR(240);
UPDATE teams SET name_key = LOWER(name) || CASE
    WHEN EXISTS (SELECT 1 FROM teams t2 WHERE LOWER(t2.name) = LOWER(teams.name) AND t2.id < teams.id)
    THEN ' #' || CAST(id AS VARCHAR(20)) ELSE '' END;
ALTER TABLE teams ALTER COLUMN name_key SET NOT NULL;
ALTER TABLE teams ADD CONSTRAINT team_name_key_unique UNIQUE (name_key);
