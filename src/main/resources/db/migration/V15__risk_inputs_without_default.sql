-- Risk inputs without a safe default: the ground flash density, the location factor, the fire risk,
-- the special hazard and the type of structure are now chosen by the user, and stay empty (null)
-- until then; the estimate gives no result while any is empty. Earlier releases pre-filled them in
-- the form (thunderstorm days 25, the suggested location factor, ordinary fire risk, no special
-- hazard, "other" structure), so a stored value equal to that former default may never have been
-- chosen: it is cleared and must be chosen again. A value that differs was chosen and is kept. The
-- location factor is now stored as 'SUGGESTED' when the user chooses the suggestion; the null of
-- earlier rows (the pre-filled suggestion) thus reads as not chosen.
ALTER TABLE site_risk_inputs ALTER COLUMN flash_density_source DROP NOT NULL;
ALTER TABLE site_risk_inputs ALTER COLUMN fire_risk DROP NOT NULL;
ALTER TABLE site_risk_inputs ALTER COLUMN special_hazard DROP NOT NULL;
ALTER TABLE site_risk_inputs ALTER COLUMN structure_use DROP NOT NULL;
UPDATE site_risk_inputs SET thunderstorm_days = NULL
    WHERE flash_density_source = 'THUNDERSTORM_DAYS' AND thunderstorm_days = 25;
UPDATE site_risk_inputs SET fire_risk = NULL WHERE fire_risk = 'ORDINARY';
UPDATE site_risk_inputs SET special_hazard = NULL WHERE special_hazard = 'NONE';
UPDATE site_risk_inputs SET structure_use = NULL WHERE structure_use = 'OTHER';
