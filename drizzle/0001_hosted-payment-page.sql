ALTER TABLE "orders" ADD COLUMN "tax_cents" integer DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE "orders" ADD COLUMN "checkout_session_id" text;--> statement-breakpoint
ALTER TABLE "orders" ADD COLUMN "payment_url" text;--> statement-breakpoint
ALTER TABLE "orders" ADD CONSTRAINT "orders_checkout_session_id_unique" UNIQUE("checkout_session_id");--> statement-breakpoint
-- Backfill: attempts that ended unpaid were stored as 'cancelled'; they are 'abandoned' attempts now.
UPDATE "orders" SET "status" = 'abandoned' WHERE "status" = 'cancelled' AND "paid_at" IS NULL;
