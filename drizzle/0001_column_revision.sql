ALTER TABLE "sites" ADD COLUMN "column_revision" bigint DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE "age_model_runs" ADD COLUMN "column_revision" bigint DEFAULT 0 NOT NULL;