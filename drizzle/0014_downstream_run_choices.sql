CREATE TABLE "downstream_run_choices" (
	"site_id" uuid PRIMARY KEY NOT NULL,
	"age_model_run_id" uuid NOT NULL,
	"chosen_by_id" uuid,
	"chosen_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "downstream_run_choices" ADD CONSTRAINT "downstream_run_choices_site_id_sites_id_fk" FOREIGN KEY ("site_id") REFERENCES "public"."sites"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "downstream_run_choices" ADD CONSTRAINT "downstream_run_choices_age_model_run_id_age_model_runs_id_fk" FOREIGN KEY ("age_model_run_id") REFERENCES "public"."age_model_runs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "downstream_run_choices" ADD CONSTRAINT "downstream_run_choices_chosen_by_id_users_id_fk" FOREIGN KEY ("chosen_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
-- A choice of run changes what the ladder reads: it bumps the project revision like every table of project rows.
SELECT project_revision_track('downstream_run_choices', 'SELECT s.project_id FROM changed c JOIN sites s ON s.id = c.site_id');
