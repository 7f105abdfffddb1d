CREATE TYPE "public"."age_relation" AS ENUM('DATES_DEPOSIT', 'OLDER_THAN_DEPOSIT', 'YOUNGER_THAN_DEPOSIT');--> statement-breakpoint
CREATE TYPE "public"."dating_method" AS ENUM('RADIOCARBON', 'LUMINESCENCE', 'HISTORICAL', 'TEPHRA');--> statement-breakpoint
CREATE TYPE "public"."facies" AS ENUM('SOIL', 'COLLUVIUM', 'PEAT', 'TIDAL_MUD', 'SAND_SHEET', 'TURBIDITE', 'HEMIPELAGIC_MUD', 'TEPHRA', 'OTHER');--> statement-breakpoint
CREATE TYPE "public"."job_status" AS ENUM('QUEUED', 'RUNNING', 'SUCCEEDED', 'FAILED', 'CANCELLED');--> statement-breakpoint
CREATE TYPE "public"."role" AS ENUM('ADMIN', 'RESEARCHER', 'CORRELATOR', 'ANALYST', 'VIEWER');--> statement-breakpoint
CREATE TYPE "public"."sample_material" AS ENUM('DETRITAL_CHARCOAL', 'IN_SITU_PLANT', 'PLANT_MACROFOSSIL', 'PLANKTIC_FORAMS', 'BENTHIC_FORAMS', 'SHELL', 'BULK_SEDIMENT', 'OTHER');--> statement-breakpoint
CREATE TYPE "public"."site_kind" AS ENUM('TRENCH', 'CORE', 'OUTCROP', 'MARSH', 'LAKE');--> statement-breakpoint
CREATE TYPE "public"."tectonic_setting" AS ENUM('SUBDUCTION_INTERFACE', 'CRUSTAL');--> statement-breakpoint
CREATE TABLE "users" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"email" text NOT NULL,
	"display_name" text NOT NULL,
	"password_hash" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "projects" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"name" text NOT NULL,
	"description" text,
	"tectonic_setting" "tectonic_setting" DEFAULT 'SUBDUCTION_INTERFACE' NOT NULL,
	"version" integer DEFAULT 1 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "memberships" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"project_id" uuid NOT NULL,
	"user_id" uuid NOT NULL,
	"role" "role" NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "segments" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"project_id" uuid NOT NULL,
	"name" text NOT NULL,
	"start_km" double precision NOT NULL,
	"end_km" double precision NOT NULL,
	"notes" text,
	"version" integer DEFAULT 1 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "segments_extent_ordered" CHECK ("segments"."end_km" > "segments"."start_km")
);
--> statement-breakpoint
CREATE TABLE "sites" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"project_id" uuid NOT NULL,
	"segment_id" uuid,
	"name" text NOT NULL,
	"kind" "site_kind" NOT NULL,
	"latitude" double precision NOT NULL,
	"longitude" double precision NOT NULL,
	"along_strike_km" double precision NOT NULL,
	"elevation_m" double precision,
	"water_depth_m" double precision,
	"notes" text,
	"version" integer DEFAULT 1 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "sites_latitude_range" CHECK ("sites"."latitude" between -90 and 90),
	CONSTRAINT "sites_longitude_range" CHECK ("sites"."longitude" between -180 and 180),
	CONSTRAINT "sites_water_depth_positive" CHECK ("sites"."water_depth_m" is null or "sites"."water_depth_m" >= 0)
);
--> statement-breakpoint
CREATE TABLE "units" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"site_id" uuid NOT NULL,
	"position" integer NOT NULL,
	"name" text NOT NULL,
	"top_depth_m" double precision NOT NULL,
	"base_depth_m" double precision NOT NULL,
	"facies" "facies" NOT NULL,
	"notes" text,
	"version" integer DEFAULT 1 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "units_site_position_unique" UNIQUE("site_id","position"),
	CONSTRAINT "units_depths_ordered" CHECK ("units"."base_depth_m" > "units"."top_depth_m"),
	CONSTRAINT "units_top_not_negative" CHECK ("units"."top_depth_m" >= 0),
	CONSTRAINT "units_position_positive" CHECK ("units"."position" >= 1)
);
--> statement-breakpoint
CREATE TABLE "event_horizons" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"site_id" uuid NOT NULL,
	"name" text NOT NULL,
	"unit_below_id" uuid NOT NULL,
	"unit_above_id" uuid NOT NULL,
	"quality" integer NOT NULL,
	"evidence" text[] DEFAULT '{}'::text[] NOT NULL,
	"notes" text,
	"version" integer DEFAULT 1 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "event_horizons_quality_range" CHECK ("event_horizons"."quality" between 1 and 4),
	CONSTRAINT "event_horizons_distinct_units" CHECK ("event_horizons"."unit_below_id" <> "event_horizons"."unit_above_id")
);
--> statement-breakpoint
CREATE TABLE "samples" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"project_id" uuid NOT NULL,
	"site_id" uuid NOT NULL,
	"unit_id" uuid NOT NULL,
	"lab_code" text NOT NULL,
	"method" "dating_method" NOT NULL,
	"material" "sample_material" NOT NULL,
	"depth_m" double precision,
	"age_relation" "age_relation" NOT NULL,
	"c14_age" double precision,
	"c14_error" double precision,
	"delta13c" double precision,
	"curve" text,
	"delta_r" double precision,
	"delta_r_error" double precision,
	"calendar_age_bp" double precision,
	"calendar_error_years" double precision,
	"measurement_year" integer,
	"excluded" boolean DEFAULT false NOT NULL,
	"exclusion_reason" text,
	"notes" text,
	"calibration" jsonb,
	"calibration_error" text,
	"version" integer DEFAULT 1 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "samples_c14_error_positive" CHECK ("samples"."c14_error" is null or "samples"."c14_error" > 0),
	CONSTRAINT "samples_c14_age_not_negative" CHECK ("samples"."c14_age" is null or "samples"."c14_age" >= 0),
	CONSTRAINT "samples_delta_r_error_not_negative" CHECK ("samples"."delta_r_error" is null or "samples"."delta_r_error" >= 0),
	CONSTRAINT "samples_calendar_error_positive" CHECK ("samples"."calendar_error_years" is null or "samples"."calendar_error_years" > 0),
	CONSTRAINT "samples_depth_not_negative" CHECK ("samples"."depth_m" is null or "samples"."depth_m" >= 0),
	CONSTRAINT "samples_radiocarbon_fields" CHECK ("samples"."method" <> 'RADIOCARBON' or ("samples"."c14_age" is not null and "samples"."c14_error" is not null and "samples"."curve" is not null)),
	CONSTRAINT "samples_calendar_fields" CHECK ("samples"."method" = 'RADIOCARBON' or ("samples"."calendar_age_bp" is not null and "samples"."calendar_error_years" is not null)),
	CONSTRAINT "samples_luminescence_year" CHECK ("samples"."method" <> 'LUMINESCENCE' or "samples"."measurement_year" is not null)
);
--> statement-breakpoint
CREATE TABLE "audit_records" (
	"seq" bigserial PRIMARY KEY NOT NULL,
	"project_id" uuid,
	"actor_id" uuid,
	"at" timestamp with time zone DEFAULT now() NOT NULL,
	"action" text NOT NULL,
	"object_type" text NOT NULL,
	"object_id" text NOT NULL,
	"before" jsonb,
	"after" jsonb
);
--> statement-breakpoint
CREATE TABLE "calibration_curves" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"code" text NOT NULL,
	"name" text NOT NULL,
	"marine" boolean NOT NULL,
	"source_text" text NOT NULL,
	"youngest_cal_bp" integer NOT NULL,
	"oldest_cal_bp" integer NOT NULL,
	"installed_by_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "calibration_curves_code_unique" UNIQUE("code")
);
--> statement-breakpoint
CREATE TABLE "age_model_runs" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"site_id" uuid NOT NULL,
	"requested_by_id" uuid,
	"status" "job_status" DEFAULT 'QUEUED' NOT NULL,
	"progress" double precision DEFAULT 0 NOT NULL,
	"message" text,
	"seed" integer NOT NULL,
	"settings" jsonb NOT NULL,
	"input_snapshot" jsonb NOT NULL,
	"input_fingerprint" text NOT NULL,
	"diagnostics" jsonb,
	"results" jsonb,
	"attempts" integer DEFAULT 0 NOT NULL,
	"started_at" timestamp with time zone,
	"finished_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "hypotheses" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"project_id" uuid NOT NULL,
	"name" text NOT NULL,
	"description" text,
	"author_id" uuid,
	"preferred" boolean DEFAULT false NOT NULL,
	"copied_from_id" uuid,
	"version" integer DEFAULT 1 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "ties" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"hypothesis_id" uuid NOT NULL,
	"event_a_id" uuid NOT NULL,
	"event_b_id" uuid NOT NULL,
	"confidence" integer NOT NULL,
	"evidence" text[] DEFAULT '{}'::text[] NOT NULL,
	"note" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "ties_confidence_range" CHECK ("ties"."confidence" between 1 and 4),
	CONSTRAINT "ties_distinct_events" CHECK ("ties"."event_a_id" <> "ties"."event_b_id")
);
--> statement-breakpoint
CREATE TABLE "releases" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"project_id" uuid NOT NULL,
	"number" integer NOT NULL,
	"note" text NOT NULL,
	"created_by_id" uuid,
	"snapshot" jsonb NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "recurrence_analyses" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"project_id" uuid NOT NULL,
	"segment_id" uuid,
	"site_id" uuid,
	"hypothesis_id" uuid,
	"hypothesis_version" integer,
	"release_id" uuid,
	"requested_by_id" uuid,
	"status" "job_status" DEFAULT 'QUEUED' NOT NULL,
	"progress" double precision DEFAULT 0 NOT NULL,
	"message" text,
	"seed" integer NOT NULL,
	"forecast_start_year" integer NOT NULL,
	"windows_years" double precision[] NOT NULL,
	"draws" integer NOT NULL,
	"settings" jsonb NOT NULL,
	"input_snapshot" jsonb NOT NULL,
	"results" jsonb,
	"attempts" integer DEFAULT 0 NOT NULL,
	"started_at" timestamp with time zone,
	"finished_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "invitations" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"project_id" uuid NOT NULL,
	"email" text NOT NULL,
	"role" "role" NOT NULL,
	"token_hash" text NOT NULL,
	"invited_by_id" uuid,
	"expires_at" timestamp with time zone NOT NULL,
	"accepted_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "password_resets" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"user_id" uuid NOT NULL,
	"token_hash" text NOT NULL,
	"expires_at" timestamp with time zone NOT NULL,
	"used_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "attachments" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"project_id" uuid NOT NULL,
	"site_id" uuid,
	"unit_id" uuid,
	"sample_id" uuid,
	"file_name" text NOT NULL,
	"content_type" text NOT NULL,
	"size_bytes" integer NOT NULL,
	"storage_key" text NOT NULL,
	"thumbnail_key" text,
	"uploaded_by_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "attachments_one_owner" CHECK (num_nonnulls("attachments"."site_id", "attachments"."unit_id", "attachments"."sample_id") = 1),
	CONSTRAINT "attachments_size_positive" CHECK ("attachments"."size_bytes" > 0)
);
--> statement-breakpoint
ALTER TABLE "memberships" ADD CONSTRAINT "memberships_project_id_projects_id_fk" FOREIGN KEY ("project_id") REFERENCES "public"."projects"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "memberships" ADD CONSTRAINT "memberships_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "segments" ADD CONSTRAINT "segments_project_id_projects_id_fk" FOREIGN KEY ("project_id") REFERENCES "public"."projects"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sites" ADD CONSTRAINT "sites_project_id_projects_id_fk" FOREIGN KEY ("project_id") REFERENCES "public"."projects"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sites" ADD CONSTRAINT "sites_segment_id_segments_id_fk" FOREIGN KEY ("segment_id") REFERENCES "public"."segments"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "units" ADD CONSTRAINT "units_site_id_sites_id_fk" FOREIGN KEY ("site_id") REFERENCES "public"."sites"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "event_horizons" ADD CONSTRAINT "event_horizons_site_id_sites_id_fk" FOREIGN KEY ("site_id") REFERENCES "public"."sites"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "event_horizons" ADD CONSTRAINT "event_horizons_unit_below_id_units_id_fk" FOREIGN KEY ("unit_below_id") REFERENCES "public"."units"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "event_horizons" ADD CONSTRAINT "event_horizons_unit_above_id_units_id_fk" FOREIGN KEY ("unit_above_id") REFERENCES "public"."units"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "samples" ADD CONSTRAINT "samples_project_id_projects_id_fk" FOREIGN KEY ("project_id") REFERENCES "public"."projects"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "samples" ADD CONSTRAINT "samples_site_id_sites_id_fk" FOREIGN KEY ("site_id") REFERENCES "public"."sites"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "samples" ADD CONSTRAINT "samples_unit_id_units_id_fk" FOREIGN KEY ("unit_id") REFERENCES "public"."units"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "audit_records" ADD CONSTRAINT "audit_records_project_id_projects_id_fk" FOREIGN KEY ("project_id") REFERENCES "public"."projects"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "audit_records" ADD CONSTRAINT "audit_records_actor_id_users_id_fk" FOREIGN KEY ("actor_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "calibration_curves" ADD CONSTRAINT "calibration_curves_installed_by_id_users_id_fk" FOREIGN KEY ("installed_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "age_model_runs" ADD CONSTRAINT "age_model_runs_site_id_sites_id_fk" FOREIGN KEY ("site_id") REFERENCES "public"."sites"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "age_model_runs" ADD CONSTRAINT "age_model_runs_requested_by_id_users_id_fk" FOREIGN KEY ("requested_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "hypotheses" ADD CONSTRAINT "hypotheses_project_id_projects_id_fk" FOREIGN KEY ("project_id") REFERENCES "public"."projects"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "hypotheses" ADD CONSTRAINT "hypotheses_author_id_users_id_fk" FOREIGN KEY ("author_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "hypotheses" ADD CONSTRAINT "hypotheses_copied_from_id_hypotheses_id_fk" FOREIGN KEY ("copied_from_id") REFERENCES "public"."hypotheses"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "ties" ADD CONSTRAINT "ties_hypothesis_id_hypotheses_id_fk" FOREIGN KEY ("hypothesis_id") REFERENCES "public"."hypotheses"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "ties" ADD CONSTRAINT "ties_event_a_id_event_horizons_id_fk" FOREIGN KEY ("event_a_id") REFERENCES "public"."event_horizons"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "ties" ADD CONSTRAINT "ties_event_b_id_event_horizons_id_fk" FOREIGN KEY ("event_b_id") REFERENCES "public"."event_horizons"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "releases" ADD CONSTRAINT "releases_project_id_projects_id_fk" FOREIGN KEY ("project_id") REFERENCES "public"."projects"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "releases" ADD CONSTRAINT "releases_created_by_id_users_id_fk" FOREIGN KEY ("created_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "recurrence_analyses" ADD CONSTRAINT "recurrence_analyses_project_id_projects_id_fk" FOREIGN KEY ("project_id") REFERENCES "public"."projects"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "recurrence_analyses" ADD CONSTRAINT "recurrence_analyses_segment_id_segments_id_fk" FOREIGN KEY ("segment_id") REFERENCES "public"."segments"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "recurrence_analyses" ADD CONSTRAINT "recurrence_analyses_site_id_sites_id_fk" FOREIGN KEY ("site_id") REFERENCES "public"."sites"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "recurrence_analyses" ADD CONSTRAINT "recurrence_analyses_hypothesis_id_hypotheses_id_fk" FOREIGN KEY ("hypothesis_id") REFERENCES "public"."hypotheses"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "recurrence_analyses" ADD CONSTRAINT "recurrence_analyses_release_id_releases_id_fk" FOREIGN KEY ("release_id") REFERENCES "public"."releases"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "recurrence_analyses" ADD CONSTRAINT "recurrence_analyses_requested_by_id_users_id_fk" FOREIGN KEY ("requested_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "invitations" ADD CONSTRAINT "invitations_project_id_projects_id_fk" FOREIGN KEY ("project_id") REFERENCES "public"."projects"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "invitations" ADD CONSTRAINT "invitations_invited_by_id_users_id_fk" FOREIGN KEY ("invited_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "password_resets" ADD CONSTRAINT "password_resets_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "attachments" ADD CONSTRAINT "attachments_project_id_projects_id_fk" FOREIGN KEY ("project_id") REFERENCES "public"."projects"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "attachments" ADD CONSTRAINT "attachments_site_id_sites_id_fk" FOREIGN KEY ("site_id") REFERENCES "public"."sites"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "attachments" ADD CONSTRAINT "attachments_unit_id_units_id_fk" FOREIGN KEY ("unit_id") REFERENCES "public"."units"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "attachments" ADD CONSTRAINT "attachments_sample_id_samples_id_fk" FOREIGN KEY ("sample_id") REFERENCES "public"."samples"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "attachments" ADD CONSTRAINT "attachments_uploaded_by_id_users_id_fk" FOREIGN KEY ("uploaded_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "users_email_unique" ON "users" USING btree ("email");--> statement-breakpoint
CREATE UNIQUE INDEX "memberships_project_user_unique" ON "memberships" USING btree ("project_id","user_id");--> statement-breakpoint
CREATE INDEX "segments_project_idx" ON "segments" USING btree ("project_id");--> statement-breakpoint
CREATE INDEX "sites_project_idx" ON "sites" USING btree ("project_id");--> statement-breakpoint
CREATE INDEX "event_horizons_site_idx" ON "event_horizons" USING btree ("site_id");--> statement-breakpoint
CREATE UNIQUE INDEX "samples_project_lab_code_unique" ON "samples" USING btree ("project_id","lab_code");--> statement-breakpoint
CREATE INDEX "samples_site_idx" ON "samples" USING btree ("site_id");--> statement-breakpoint
CREATE INDEX "samples_unit_idx" ON "samples" USING btree ("unit_id");--> statement-breakpoint
CREATE INDEX "audit_records_project_seq_idx" ON "audit_records" USING btree ("project_id","seq");--> statement-breakpoint
CREATE INDEX "audit_records_object_idx" ON "audit_records" USING btree ("object_type","object_id");--> statement-breakpoint
CREATE INDEX "age_model_runs_site_idx" ON "age_model_runs" USING btree ("site_id","created_at");--> statement-breakpoint
CREATE INDEX "hypotheses_project_idx" ON "hypotheses" USING btree ("project_id");--> statement-breakpoint
CREATE UNIQUE INDEX "hypotheses_one_preferred" ON "hypotheses" USING btree ("project_id") WHERE "hypotheses"."preferred";--> statement-breakpoint
CREATE INDEX "ties_hypothesis_idx" ON "ties" USING btree ("hypothesis_id");--> statement-breakpoint
CREATE UNIQUE INDEX "ties_pair_unique" ON "ties" USING btree ("hypothesis_id","event_a_id","event_b_id");--> statement-breakpoint
CREATE UNIQUE INDEX "releases_project_number_unique" ON "releases" USING btree ("project_id","number");--> statement-breakpoint
CREATE INDEX "releases_project_idx" ON "releases" USING btree ("project_id");--> statement-breakpoint
CREATE INDEX "recurrence_analyses_project_idx" ON "recurrence_analyses" USING btree ("project_id","created_at");--> statement-breakpoint
CREATE UNIQUE INDEX "invitations_token_hash_unique" ON "invitations" USING btree ("token_hash");--> statement-breakpoint
CREATE INDEX "invitations_project_idx" ON "invitations" USING btree ("project_id");--> statement-breakpoint
CREATE UNIQUE INDEX "password_resets_token_hash_unique" ON "password_resets" USING btree ("token_hash");--> statement-breakpoint
CREATE INDEX "attachments_project_idx" ON "attachments" USING btree ("project_id");