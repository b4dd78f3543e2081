CREATE TABLE "saved_slabs" (
	"user_id" text NOT NULL,
	"slab_id" integer NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "saved_slabs_user_id_slab_id_pk" PRIMARY KEY("user_id","slab_id")
);
--> statement-breakpoint
CREATE TABLE "slab_watches" (
	"id" serial PRIMARY KEY NOT NULL,
	"user_id" text NOT NULL,
	"slab_id" integer NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"notified_at" timestamp with time zone
);
--> statement-breakpoint
ALTER TABLE "slab_photos" ADD COLUMN "view" text;--> statement-breakpoint
ALTER TABLE "saved_slabs" ADD CONSTRAINT "saved_slabs_user_id_user_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "saved_slabs" ADD CONSTRAINT "saved_slabs_slab_id_slabs_id_fk" FOREIGN KEY ("slab_id") REFERENCES "public"."slabs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "slab_watches" ADD CONSTRAINT "slab_watches_user_id_user_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "slab_watches" ADD CONSTRAINT "slab_watches_slab_id_slabs_id_fk" FOREIGN KEY ("slab_id") REFERENCES "public"."slabs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "saved_slabs_slab_idx" ON "saved_slabs" USING btree ("slab_id");--> statement-breakpoint
CREATE UNIQUE INDEX "slab_watches_one_open" ON "slab_watches" USING btree ("user_id","slab_id") WHERE "slab_watches"."notified_at" is null;--> statement-breakpoint
CREATE INDEX "slab_watches_open_idx" ON "slab_watches" USING btree ("slab_id") WHERE "slab_watches"."notified_at" is null;--> statement-breakpoint
ALTER TABLE "slab_photos" ADD CONSTRAINT "slab_photos_view_known" CHECK ("slab_photos"."view" is null or "slab_photos"."view" in ('top-face', 'bottom-face', 'end-grain', 'edge', 'defect'));