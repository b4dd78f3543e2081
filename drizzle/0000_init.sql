CREATE TABLE "account" (
	"id" text PRIMARY KEY NOT NULL,
	"account_id" text NOT NULL,
	"provider_id" text NOT NULL,
	"user_id" text NOT NULL,
	"access_token" text,
	"refresh_token" text,
	"id_token" text,
	"access_token_expires_at" timestamp,
	"refresh_token_expires_at" timestamp,
	"scope" text,
	"password" text,
	"created_at" timestamp DEFAULT now() NOT NULL,
	"updated_at" timestamp NOT NULL
);
--> statement-breakpoint
CREATE TABLE "session" (
	"id" text PRIMARY KEY NOT NULL,
	"expires_at" timestamp NOT NULL,
	"token" text NOT NULL,
	"created_at" timestamp DEFAULT now() NOT NULL,
	"updated_at" timestamp NOT NULL,
	"ip_address" text,
	"user_agent" text,
	"user_id" text NOT NULL,
	"impersonated_by" text,
	CONSTRAINT "session_token_unique" UNIQUE("token")
);
--> statement-breakpoint
CREATE TABLE "user" (
	"id" text PRIMARY KEY NOT NULL,
	"name" text NOT NULL,
	"email" text NOT NULL,
	"email_verified" boolean DEFAULT false NOT NULL,
	"image" text,
	"created_at" timestamp DEFAULT now() NOT NULL,
	"updated_at" timestamp DEFAULT now() NOT NULL,
	"role" text DEFAULT 'buyer',
	"banned" boolean DEFAULT false,
	"ban_reason" text,
	"ban_expires" timestamp,
	CONSTRAINT "user_email_unique" UNIQUE("email")
);
--> statement-breakpoint
CREATE TABLE "verification" (
	"id" text PRIMARY KEY NOT NULL,
	"identifier" text NOT NULL,
	"value" text NOT NULL,
	"expires_at" timestamp NOT NULL,
	"created_at" timestamp DEFAULT now() NOT NULL,
	"updated_at" timestamp DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "species" (
	"id" serial PRIMARY KEY NOT NULL,
	"slug" text NOT NULL,
	"name" text NOT NULL,
	"botanical_name" text NOT NULL,
	"rate_per_board_foot_cents" integer NOT NULL,
	"radial_coefficient" double precision NOT NULL,
	"tangential_coefficient" double precision NOT NULL,
	"basic_specific_gravity" double precision NOT NULL,
	"specific_gravity_12" double precision NOT NULL,
	CONSTRAINT "species_slug_unique" UNIQUE("slug")
);
--> statement-breakpoint
CREATE TABLE "logs" (
	"id" serial PRIMARY KEY NOT NULL,
	"code" text NOT NULL,
	"species_id" integer NOT NULL,
	"origin_note" text DEFAULT '' NOT NULL,
	"felled_on" date,
	"milled_on" date,
	"length_in" double precision NOT NULL,
	"butt_diameter_in" double precision NOT NULL,
	"top_diameter_in" double precision NOT NULL,
	"sawing_method" text NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "logs_code_unique" UNIQUE("code")
);
--> statement-breakpoint
CREATE TABLE "slabs" (
	"id" serial PRIMARY KEY NOT NULL,
	"code" text NOT NULL,
	"log_id" integer NOT NULL,
	"species_id" integer NOT NULL,
	"sequence_in_log" integer NOT NULL,
	"thickness_in" double precision NOT NULL,
	"widths_in" jsonb NOT NULL,
	"width_in" double precision NOT NULL,
	"length_in" double precision NOT NULL,
	"board_feet" double precision NOT NULL,
	"price_cents" integer NOT NULL,
	"price_override_cents" integer,
	"price_override_reason" text,
	"live_edge" text DEFAULT 'none' NOT NULL,
	"figures" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"figure_notes" text DEFAULT '' NOT NULL,
	"defects" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"drying_state" text NOT NULL,
	"status" text NOT NULL,
	"yard_stack" text DEFAULT '' NOT NULL,
	"yard_position" text DEFAULT '' NOT NULL,
	"description" text DEFAULT '' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	"listed_at" timestamp with time zone,
	CONSTRAINT "slabs_code_unique" UNIQUE("code")
);
--> statement-breakpoint
CREATE TABLE "slab_photos" (
	"id" serial PRIMARY KEY NOT NULL,
	"slab_id" integer NOT NULL,
	"file_key" text NOT NULL,
	"width" integer NOT NULL,
	"height" integer NOT NULL,
	"position" integer DEFAULT 0 NOT NULL,
	"is_cover" boolean DEFAULT false NOT NULL,
	"is_illustration" boolean DEFAULT false NOT NULL,
	"alt_text" text DEFAULT '' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "slab_photos_file_key_unique" UNIQUE("file_key")
);
--> statement-breakpoint
CREATE TABLE "moisture_readings" (
	"id" serial PRIMARY KEY NOT NULL,
	"slab_id" integer NOT NULL,
	"measured_on" date NOT NULL,
	"mc_percent" double precision NOT NULL,
	"meter_kind" text NOT NULL,
	"location" text DEFAULT '' NOT NULL,
	"depth_in" double precision,
	"ambient_temp_f" double precision,
	"ambient_rh_percent" double precision,
	"recorded_by" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "figure_kinds" (
	"slug" text PRIMARY KEY NOT NULL,
	"label" text NOT NULL,
	"premium_multiplier" double precision DEFAULT 1 NOT NULL
);
--> statement-breakpoint
CREATE TABLE "mill_settings" (
	"id" integer PRIMARY KEY DEFAULT 1 NOT NULL,
	"mill_name" text NOT NULL,
	"yard_address" text NOT NULL,
	"contact_email" text NOT NULL,
	"hold_hours" integer DEFAULT 48 NOT NULL,
	"target_mc_percent" double precision DEFAULT 8 NOT NULL,
	"minimum_charge_cents" integer DEFAULT 0 NOT NULL,
	"thick_premium_min_in" double precision DEFAULT 3 NOT NULL,
	"thick_premium_multiplier" double precision DEFAULT 1 NOT NULL,
	"flattening_cents_per_sq_ft" integer DEFAULT 0 NOT NULL,
	"no_show_rule" text DEFAULT 'keep' NOT NULL,
	"max_reading_age_days" integer DEFAULT 60 NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "holds" (
	"id" serial PRIMARY KEY NOT NULL,
	"slab_id" integer NOT NULL,
	"buyer_id" text NOT NULL,
	"group_id" text,
	"status" text DEFAULT 'active' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"expires_at" timestamp with time zone NOT NULL,
	"closed_at" timestamp with time zone,
	"closed_by" text
);
--> statement-breakpoint
CREATE TABLE "closed_days" (
	"day" date PRIMARY KEY NOT NULL,
	"note" text DEFAULT '' NOT NULL
);
--> statement-breakpoint
CREATE TABLE "pickup_windows" (
	"id" serial PRIMARY KEY NOT NULL,
	"weekday" integer NOT NULL,
	"starts_at" text NOT NULL,
	"ends_at" text NOT NULL,
	"capacity" integer NOT NULL,
	"active" boolean DEFAULT true NOT NULL
);
--> statement-breakpoint
CREATE TABLE "order_lines" (
	"id" serial PRIMARY KEY NOT NULL,
	"order_id" integer NOT NULL,
	"slab_id" integer NOT NULL,
	"status" text DEFAULT 'sold' NOT NULL,
	"slab_code" text NOT NULL,
	"species_name" text NOT NULL,
	"board_feet" double precision NOT NULL,
	"weight_lb" double precision NOT NULL,
	"length_in" double precision NOT NULL,
	"price_breakdown" jsonb NOT NULL,
	"with_flattening" boolean DEFAULT false NOT NULL,
	"slab_cents" integer NOT NULL,
	"services_cents" integer DEFAULT 0 NOT NULL,
	"total_cents" integer NOT NULL
);
--> statement-breakpoint
CREATE TABLE "orders" (
	"id" serial PRIMARY KEY NOT NULL,
	"code" text NOT NULL,
	"buyer_id" text NOT NULL,
	"status" text NOT NULL,
	"slabs_cents" integer NOT NULL,
	"services_cents" integer DEFAULT 0 NOT NULL,
	"total_cents" integer NOT NULL,
	"refunded_cents" integer DEFAULT 0 NOT NULL,
	"total_weight_lb" double precision NOT NULL,
	"longest_slab_in" double precision NOT NULL,
	"loading_help" boolean DEFAULT false NOT NULL,
	"pickup_window_id" integer,
	"pickup_on" date,
	"idempotency_key" text NOT NULL,
	"charge_id" text,
	"disputed" boolean DEFAULT false NOT NULL,
	"reminder_sent_at" timestamp with time zone,
	"picked_up_at" timestamp with time zone,
	"picked_up_by" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"paid_at" timestamp with time zone,
	CONSTRAINT "orders_code_unique" UNIQUE("code"),
	CONSTRAINT "orders_idempotency_key_unique" UNIQUE("idempotency_key")
);
--> statement-breakpoint
CREATE TABLE "payments" (
	"id" serial PRIMARY KEY NOT NULL,
	"order_id" integer NOT NULL,
	"kind" text NOT NULL,
	"provider_id" text,
	"amount_cents" integer NOT NULL,
	"status" text NOT NULL,
	"reason" text DEFAULT '' NOT NULL,
	"idempotency_key" text,
	"created_by" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "payments_idempotency_key_unique" UNIQUE("idempotency_key")
);
--> statement-breakpoint
CREATE TABLE "audit_log" (
	"id" serial PRIMARY KEY NOT NULL,
	"actor_id" text,
	"actor_email" text,
	"action" text NOT NULL,
	"entity_type" text NOT NULL,
	"entity_id" text NOT NULL,
	"before" jsonb,
	"after" jsonb,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "email_outbox" (
	"id" serial PRIMARY KEY NOT NULL,
	"to_address" text NOT NULL,
	"subject" text NOT NULL,
	"html" text NOT NULL,
	"text" text NOT NULL,
	"kind" text NOT NULL,
	"status" text DEFAULT 'pending' NOT NULL,
	"attempts" integer DEFAULT 0 NOT NULL,
	"last_error" text,
	"send_after" timestamp with time zone DEFAULT now() NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"sent_at" timestamp with time zone
);
--> statement-breakpoint
ALTER TABLE "account" ADD CONSTRAINT "account_user_id_user_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "session" ADD CONSTRAINT "session_user_id_user_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "logs" ADD CONSTRAINT "logs_species_id_species_id_fk" FOREIGN KEY ("species_id") REFERENCES "public"."species"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "slabs" ADD CONSTRAINT "slabs_log_id_logs_id_fk" FOREIGN KEY ("log_id") REFERENCES "public"."logs"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "slabs" ADD CONSTRAINT "slabs_species_id_species_id_fk" FOREIGN KEY ("species_id") REFERENCES "public"."species"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "slab_photos" ADD CONSTRAINT "slab_photos_slab_id_slabs_id_fk" FOREIGN KEY ("slab_id") REFERENCES "public"."slabs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "moisture_readings" ADD CONSTRAINT "moisture_readings_slab_id_slabs_id_fk" FOREIGN KEY ("slab_id") REFERENCES "public"."slabs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "moisture_readings" ADD CONSTRAINT "moisture_readings_recorded_by_user_id_fk" FOREIGN KEY ("recorded_by") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "holds" ADD CONSTRAINT "holds_slab_id_slabs_id_fk" FOREIGN KEY ("slab_id") REFERENCES "public"."slabs"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "holds" ADD CONSTRAINT "holds_buyer_id_user_id_fk" FOREIGN KEY ("buyer_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "order_lines" ADD CONSTRAINT "order_lines_order_id_orders_id_fk" FOREIGN KEY ("order_id") REFERENCES "public"."orders"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "order_lines" ADD CONSTRAINT "order_lines_slab_id_slabs_id_fk" FOREIGN KEY ("slab_id") REFERENCES "public"."slabs"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "orders" ADD CONSTRAINT "orders_buyer_id_user_id_fk" FOREIGN KEY ("buyer_id") REFERENCES "public"."user"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "orders" ADD CONSTRAINT "orders_pickup_window_id_pickup_windows_id_fk" FOREIGN KEY ("pickup_window_id") REFERENCES "public"."pickup_windows"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "payments" ADD CONSTRAINT "payments_order_id_orders_id_fk" FOREIGN KEY ("order_id") REFERENCES "public"."orders"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "account_userId_idx" ON "account" USING btree ("user_id");--> statement-breakpoint
CREATE INDEX "session_userId_idx" ON "session" USING btree ("user_id");--> statement-breakpoint
CREATE INDEX "verification_identifier_idx" ON "verification" USING btree ("identifier");--> statement-breakpoint
CREATE UNIQUE INDEX "slabs_log_sequence_uq" ON "slabs" USING btree ("log_id","sequence_in_log");--> statement-breakpoint
CREATE INDEX "slabs_status_idx" ON "slabs" USING btree ("status");--> statement-breakpoint
CREATE INDEX "slabs_species_idx" ON "slabs" USING btree ("species_id");--> statement-breakpoint
CREATE INDEX "slabs_price_idx" ON "slabs" USING btree ("price_cents");--> statement-breakpoint
CREATE INDEX "slab_photos_slab_idx" ON "slab_photos" USING btree ("slab_id");--> statement-breakpoint
CREATE INDEX "moisture_slab_idx" ON "moisture_readings" USING btree ("slab_id","measured_on");--> statement-breakpoint
CREATE UNIQUE INDEX "holds_one_active_per_slab" ON "holds" USING btree ("slab_id") WHERE "holds"."status" = 'active';--> statement-breakpoint
CREATE INDEX "holds_buyer_idx" ON "holds" USING btree ("buyer_id","status");--> statement-breakpoint
CREATE INDEX "holds_expiry_idx" ON "holds" USING btree ("status","expires_at");--> statement-breakpoint
CREATE UNIQUE INDEX "order_lines_one_sale_per_slab" ON "order_lines" USING btree ("slab_id") WHERE "order_lines"."status" = 'sold';--> statement-breakpoint
CREATE INDEX "order_lines_order_idx" ON "order_lines" USING btree ("order_id");--> statement-breakpoint
CREATE INDEX "orders_buyer_idx" ON "orders" USING btree ("buyer_id");--> statement-breakpoint
CREATE INDEX "orders_pickup_idx" ON "orders" USING btree ("pickup_on","pickup_window_id");--> statement-breakpoint
CREATE INDEX "payments_order_idx" ON "payments" USING btree ("order_id");--> statement-breakpoint
CREATE INDEX "audit_created_idx" ON "audit_log" USING btree ("created_at");--> statement-breakpoint
CREATE INDEX "audit_entity_idx" ON "audit_log" USING btree ("entity_type","entity_id");--> statement-breakpoint
CREATE INDEX "email_outbox_pending_idx" ON "email_outbox" USING btree ("status","send_after");