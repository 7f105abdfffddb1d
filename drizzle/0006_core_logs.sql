CREATE TABLE "core_logs" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"site_id" uuid NOT NULL,
	"name" text NOT NULL,
	"channels" jsonb NOT NULL,
	"depths_m" jsonb NOT NULL,
	"readings" jsonb NOT NULL,
	"row_count" integer NOT NULL,
	"top_depth_m" double precision NOT NULL,
	"base_depth_m" double precision NOT NULL,
	"uploaded_by_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "core_logs_site_name_unique" UNIQUE("site_id","name"),
	CONSTRAINT "core_logs_depths_ordered" CHECK ("core_logs"."base_depth_m" > "core_logs"."top_depth_m" and "core_logs"."top_depth_m" >= 0),
	CONSTRAINT "core_logs_rows_positive" CHECK ("core_logs"."row_count" >= 2)
);
--> statement-breakpoint
ALTER TABLE "core_logs" ADD CONSTRAINT "core_logs_site_id_sites_id_fk" FOREIGN KEY ("site_id") REFERENCES "public"."sites"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "core_logs" ADD CONSTRAINT "core_logs_uploaded_by_id_users_id_fk" FOREIGN KEY ("uploaded_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "core_logs_site_idx" ON "core_logs" USING btree ("site_id");