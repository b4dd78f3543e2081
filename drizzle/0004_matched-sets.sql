CREATE TABLE "matched_set_slabs" (
	"set_id" integer NOT NULL,
	"slab_id" integer PRIMARY KEY NOT NULL
);
--> statement-breakpoint
CREATE TABLE "matched_sets" (
	"id" serial PRIMARY KEY NOT NULL,
	"log_id" integer NOT NULL,
	"marked_by" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "matched_set_slabs" ADD CONSTRAINT "matched_set_slabs_set_id_matched_sets_id_fk" FOREIGN KEY ("set_id") REFERENCES "public"."matched_sets"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "matched_set_slabs" ADD CONSTRAINT "matched_set_slabs_slab_id_slabs_id_fk" FOREIGN KEY ("slab_id") REFERENCES "public"."slabs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "matched_sets" ADD CONSTRAINT "matched_sets_log_id_logs_id_fk" FOREIGN KEY ("log_id") REFERENCES "public"."logs"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "matched_sets" ADD CONSTRAINT "matched_sets_marked_by_user_id_fk" FOREIGN KEY ("marked_by") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "matched_set_slabs_set_idx" ON "matched_set_slabs" USING btree ("set_id");--> statement-breakpoint
CREATE INDEX "matched_sets_log_idx" ON "matched_sets" USING btree ("log_id");