ALTER TABLE "user" ADD COLUMN "units" text;--> statement-breakpoint
ALTER TABLE "user" ADD CONSTRAINT "user_units_known" CHECK ("user"."units" is null or "user"."units" in ('imperial', 'metric'));