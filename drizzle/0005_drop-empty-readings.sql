-- Backfill before the CHECK constraints of the next migration: a 0 % (or negative) "reading" was an
-- empty field saved as a number, not a measurement, and no wood holds more water than the ceiling
-- the next migration sets. Such rows are removed so the constraint can hold.
DELETE FROM "moisture_readings" WHERE "mc_percent" <= 0 OR "mc_percent" > 336;
