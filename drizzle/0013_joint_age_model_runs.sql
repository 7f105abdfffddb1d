CREATE TABLE "joint_age_model_chains" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"run_id" uuid NOT NULL,
	"chain_index" integer NOT NULL,
	"draws" jsonb,
	"status" "job_status" DEFAULT 'QUEUED' NOT NULL,
	"progress" double precision DEFAULT 0 NOT NULL,
	"message" text,
	"attempts" integer DEFAULT 0 NOT NULL,
	"started_at" timestamp with time zone,
	"finished_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "joint_age_model_runs" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"project_id" uuid NOT NULL,
	"hypothesis_id" uuid NOT NULL,
	"hypothesis_version" integer NOT NULL,
	"requested_by_id" uuid,
	"seed" integer NOT NULL,
	"settings" jsonb NOT NULL,
	"input_snapshot" jsonb NOT NULL,
	"diagnostics" jsonb,
	"results" jsonb,
	"status" "job_status" DEFAULT 'QUEUED' NOT NULL,
	"progress" double precision DEFAULT 0 NOT NULL,
	"message" text,
	"attempts" integer DEFAULT 0 NOT NULL,
	"started_at" timestamp with time zone,
	"finished_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "recurrence_analyses" ADD COLUMN "source" text;--> statement-breakpoint
ALTER TABLE "joint_age_model_chains" ADD CONSTRAINT "joint_age_model_chains_run_id_joint_age_model_runs_id_fk" FOREIGN KEY ("run_id") REFERENCES "public"."joint_age_model_runs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "joint_age_model_runs" ADD CONSTRAINT "joint_age_model_runs_project_id_projects_id_fk" FOREIGN KEY ("project_id") REFERENCES "public"."projects"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "joint_age_model_runs" ADD CONSTRAINT "joint_age_model_runs_hypothesis_id_hypotheses_id_fk" FOREIGN KEY ("hypothesis_id") REFERENCES "public"."hypotheses"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "joint_age_model_runs" ADD CONSTRAINT "joint_age_model_runs_requested_by_id_users_id_fk" FOREIGN KEY ("requested_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "joint_age_model_chains_run_idx" ON "joint_age_model_chains" USING btree ("run_id","chain_index");--> statement-breakpoint
CREATE INDEX "joint_age_model_runs_hypothesis_idx" ON "joint_age_model_runs" USING btree ("hypothesis_id","created_at");--> statement-breakpoint
CREATE INDEX "joint_age_model_runs_project_idx" ON "joint_age_model_runs" USING btree ("project_id");--> statement-breakpoint
-- Joint runs and their chains are project rows: their writes move the project revision (0010).
SELECT project_revision_track('joint_age_model_runs', 'SELECT project_id FROM changed');
--> statement-breakpoint
SELECT project_revision_track('joint_age_model_chains', 'SELECT r.project_id FROM changed c JOIN joint_age_model_runs r ON r.id = c.run_id');
