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
ALTER TABLE "orders" ADD COLUMN "tax_exempt_certificate" text;--> statement-breakpoint
ALTER TABLE "resale_certificates" ADD CONSTRAINT "resale_certificates_buyer_id_user_id_fk" FOREIGN KEY ("buyer_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "resale_certificates_one_per_buyer" ON "resale_certificates" USING btree ("buyer_id");--> statement-breakpoint
CREATE INDEX "resale_certificates_status_idx" ON "resale_certificates" USING btree ("status");