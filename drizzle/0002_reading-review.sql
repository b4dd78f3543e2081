ALTER TABLE "moisture_readings" ADD COLUMN "review" text DEFAULT 'in-line' NOT NULL;--> statement-breakpoint
ALTER TABLE "moisture_readings" ADD CONSTRAINT "moisture_readings_review_values" CHECK ("moisture_readings"."review" in ('in-line', 'confirmed', 'unconfirmed'));--> statement-breakpoint
-- Backfill (appended by hand): readings no meter can give — e.g. the 0 % an empty field used to save — are kept for the yard but no longer shown to buyers.
UPDATE "moisture_readings" SET "review" = 'unconfirmed' WHERE ("meter_kind" = 'pin' AND ("mc_percent" < 6 OR "mc_percent" > 40)) OR ("meter_kind" = 'pinless' AND ("mc_percent" < 5 OR "mc_percent" > 30)) OR ("meter_kind" = 'oven-dry' AND "mc_percent" < 1);
