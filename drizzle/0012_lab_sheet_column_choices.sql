CREATE TABLE "lab_sheet_column_choices" (
	"project_id" uuid NOT NULL,
	"header_key" text NOT NULL,
	"header" text NOT NULL,
	"field" text,
	"chosen_by" uuid,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "lab_sheet_column_choices_project_id_header_key_pk" PRIMARY KEY("project_id","header_key"),
	CONSTRAINT "lab_sheet_column_choices_key_length" CHECK (length("lab_sheet_column_choices"."header_key") between 1 and 200)
);
--> statement-breakpoint
ALTER TABLE "lab_sheet_column_choices" ADD CONSTRAINT "lab_sheet_column_choices_project_id_projects_id_fk" FOREIGN KEY ("project_id") REFERENCES "public"."projects"("id") ON DELETE cascade ON UPDATE no action;
--> statement-breakpoint
ALTER TABLE "lab_sheet_column_choices" ADD CONSTRAINT "lab_sheet_column_choices_chosen_by_users_id_fk" FOREIGN KEY ("chosen_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;
--> statement-breakpoint
-- Remembered header choices are project rows: they bump its revision like every such table.
SELECT project_revision_track('lab_sheet_column_choices', 'SELECT project_id FROM changed');
