-- The risk of loss of human life counts flashes to the incoming lines (R_U, R_V), each line with
-- its own factors: line_details holds them as a JSON array (installation, length, environment,
-- transformer, surgeProtection, shielding, withstandVoltage, touchProtection), line_count their
-- number (null until the user says how many; 0 for none). Rows of earlier releases keep their count
-- and one length (line_length) and no details: they are read as that many lines of that length,
-- every other factor at its most conservative value. life_critical_systems answers whether a
-- failure of internal systems immediately endangers life ('YES', 'NO'; null until answered).
ALTER TABLE site_risk_inputs ADD COLUMN line_details TEXT;
ALTER TABLE site_risk_inputs ADD COLUMN life_critical_systems VARCHAR(3);
