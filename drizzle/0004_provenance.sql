CREATE TABLE "refresh_plans" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"project_id" uuid NOT NULL,
	"requested_by_id" uuid,
	"status" text DEFAULT 'ACTIVE' NOT NULL,
	"automatic" boolean DEFAULT false NOT NULL,
	"skipped" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "refresh_settings" (
	"project_id" uuid PRIMARY KEY NOT NULL,
	"automatic" boolean DEFAULT false NOT NULL,
	"debounce_seconds" integer DEFAULT 60 NOT NULL,
	"updated_by_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "refresh_steps" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"plan_id" uuid NOT NULL,
	"stage" integer NOT NULL,
	"result_kind" text NOT NULL,
	"stale_id" uuid NOT NULL,
	"label" text NOT NULL,
	"depends_on" uuid[] DEFAULT '{}' NOT NULL,
	"status" text DEFAULT 'WAITING' NOT NULL,
	"fresh_id" uuid,
	"message" text,
	"started_at" timestamp with time zone,
	"finished_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "result_inputs" (
	"project_id" uuid NOT NULL,
	"result_kind" text NOT NULL,
	"result_id" uuid NOT NULL,
	"input_kind" text NOT NULL,
	"input_id" uuid NOT NULL,
	"input_revision" bigint,
	"input_name" text NOT NULL,
	CONSTRAINT "result_inputs_result_kind_result_id_input_kind_input_id_pk" PRIMARY KEY("result_kind","result_id","input_kind","input_id")
);
--> statement-breakpoint
ALTER TABLE "refresh_plans" ADD CONSTRAINT "refresh_plans_project_id_projects_id_fk" FOREIGN KEY ("project_id") REFERENCES "public"."projects"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "refresh_plans" ADD CONSTRAINT "refresh_plans_requested_by_id_users_id_fk" FOREIGN KEY ("requested_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "refresh_settings" ADD CONSTRAINT "refresh_settings_project_id_projects_id_fk" FOREIGN KEY ("project_id") REFERENCES "public"."projects"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "refresh_settings" ADD CONSTRAINT "refresh_settings_updated_by_id_users_id_fk" FOREIGN KEY ("updated_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "refresh_steps" ADD CONSTRAINT "refresh_steps_plan_id_refresh_plans_id_fk" FOREIGN KEY ("plan_id") REFERENCES "public"."refresh_plans"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "result_inputs" ADD CONSTRAINT "result_inputs_project_id_projects_id_fk" FOREIGN KEY ("project_id") REFERENCES "public"."projects"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "refresh_plans_project_idx" ON "refresh_plans" USING btree ("project_id","created_at");--> statement-breakpoint
CREATE INDEX "refresh_steps_plan_idx" ON "refresh_steps" USING btree ("plan_id");--> statement-breakpoint
CREATE INDEX "result_inputs_input_idx" ON "result_inputs" USING btree ("input_kind","input_id");