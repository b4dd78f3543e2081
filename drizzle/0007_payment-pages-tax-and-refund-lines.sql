CREATE TABLE "refund_lines" (
	"id" serial PRIMARY KEY NOT NULL,
	"payment_id" integer NOT NULL,
	"order_line_id" integer NOT NULL,
	"wood_cents" integer NOT NULL,
	"services_cents" integer NOT NULL,
	"tax_cents" integer NOT NULL,
	CONSTRAINT "refund_lines_amounts_not_negative" CHECK ("refund_lines"."wood_cents" >= 0 and "refund_lines"."services_cents" >= 0 and "refund_lines"."tax_cents" >= 0)
);
--> statement-breakpoint
CREATE TABLE "resale_certificates" (
	"id" serial PRIMARY KEY NOT NULL,
	"buyer_id" text NOT NULL,
	"number" text NOT NULL,
	"status" text DEFAULT 'submitted' NOT NULL,
	"submitted_at" timestamp with time zone DEFAULT now() NOT NULL,
	"reviewed_by" text,
	"reviewed_at" timestamp with time zone,
	CONSTRAINT "resale_certificates_status" CHECK ("resale_certificates"."status" in ('submitted', 'approved', 'refused'))
);
--> statement-breakpoint
CREATE TABLE "sales_terms" (
	"id" integer PRIMARY KEY DEFAULT 1 NOT NULL,
	"sales_tax_milli_percent" integer DEFAULT 0 NOT NULL,
	"tax_wood" boolean DEFAULT true NOT NULL,
	"tax_flattening" boolean DEFAULT true NOT NULL,
	"policy" text DEFAULT '' NOT NULL,
	"phone" text DEFAULT '' NOT NULL,
	"yard_hours" text DEFAULT '' NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "sales_terms_one_row" CHECK ("sales_terms"."id" = 1),
	CONSTRAINT "sales_terms_tax_range" CHECK ("sales_terms"."sales_tax_milli_percent" between 0 and 25000)
);
--> statement-breakpoint
ALTER TABLE "order_lines" DROP CONSTRAINT "order_lines_total_adds_up";--> statement-breakpoint
ALTER TABLE "orders" DROP CONSTRAINT "orders_status_known";--> statement-breakpoint
ALTER TABLE "orders" DROP CONSTRAINT "orders_total_adds_up";--> statement-breakpoint
ALTER TABLE "order_lines" ADD COLUMN "tax_cents" integer DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE "orders" ADD COLUMN "tax_cents" integer DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE "orders" ADD COLUMN "tax_exempt_certificate" text;--> statement-breakpoint
ALTER TABLE "orders" ADD COLUMN "checkout_session_id" text;--> statement-breakpoint
ALTER TABLE "orders" ADD COLUMN "payment_url" text;--> statement-breakpoint
ALTER TABLE "refund_lines" ADD CONSTRAINT "refund_lines_payment_id_payments_id_fk" FOREIGN KEY ("payment_id") REFERENCES "public"."payments"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "refund_lines" ADD CONSTRAINT "refund_lines_order_line_id_order_lines_id_fk" FOREIGN KEY ("order_line_id") REFERENCES "public"."order_lines"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "resale_certificates" ADD CONSTRAINT "resale_certificates_buyer_id_user_id_fk" FOREIGN KEY ("buyer_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "refund_lines_payment_idx" ON "refund_lines" USING btree ("payment_id");--> statement-breakpoint
CREATE INDEX "refund_lines_line_idx" ON "refund_lines" USING btree ("order_line_id");--> statement-breakpoint
CREATE UNIQUE INDEX "resale_certificates_one_per_buyer" ON "resale_certificates" USING btree ("buyer_id");--> statement-breakpoint
CREATE INDEX "resale_certificates_status_idx" ON "resale_certificates" USING btree ("status");--> statement-breakpoint
ALTER TABLE "orders" ADD CONSTRAINT "orders_checkout_session_id_unique" UNIQUE("checkout_session_id");--> statement-breakpoint
ALTER TABLE "order_lines" ADD CONSTRAINT "order_lines_total_adds_up" CHECK ("order_lines"."total_cents" = "order_lines"."slab_cents" + "order_lines"."services_cents" + "order_lines"."tax_cents");--> statement-breakpoint
ALTER TABLE "orders" ADD CONSTRAINT "orders_status_known" CHECK ("orders"."status" in ('pending-payment', 'abandoned', 'paid', 'picked-up', 'no-show', 'refunded', 'cancelled'));--> statement-breakpoint
ALTER TABLE "orders" ADD CONSTRAINT "orders_total_adds_up" CHECK ("orders"."total_cents" = "orders"."slabs_cents" + "orders"."services_cents" + "orders"."tax_cents");--> statement-breakpoint
-- Backfill: attempts that ended unpaid were stored as 'cancelled'; they are 'abandoned' attempts now.
UPDATE "orders" SET "status" = 'abandoned' WHERE "status" = 'cancelled' AND "paid_at" IS NULL;
--> statement-breakpoint
-- Backfill: lines refunded before allocations existed give back their full wood and services, against the order's first refund.
INSERT INTO "refund_lines" ("payment_id", "order_line_id", "wood_cents", "services_cents", "tax_cents")
SELECT (SELECT p."id" FROM "payments" p WHERE p."order_id" = l."order_id" AND p."kind" = 'refund' AND p."status" = 'succeeded' ORDER BY p."id" LIMIT 1),
       l."id", l."slab_cents", l."services_cents", 0
  FROM "order_lines" l
 WHERE l."status" = 'refunded'
   AND EXISTS (SELECT 1 FROM "payments" p WHERE p."order_id" = l."order_id" AND p."kind" = 'refund' AND p."status" = 'succeeded');
