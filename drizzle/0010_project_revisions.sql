CREATE TABLE "project_revisions" (
	"project_id" uuid PRIMARY KEY NOT NULL,
	"revision" bigint DEFAULT 1 NOT NULL
);
--> statement-breakpoint
ALTER TABLE "project_revisions" ADD CONSTRAINT "project_revisions_project_id_projects_id_fk" FOREIGN KEY ("project_id") REFERENCES "public"."projects"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
-- The project revision: one counter per project, bumped in the writing transaction by
-- statement-level triggers on every table that holds a project's rows (and on users and
-- calibration curves, which a project's answers show). Nothing else writes it.
INSERT INTO "project_revisions" ("project_id") SELECT "id" FROM "projects";
--> statement-breakpoint
-- TG_ARGV[0]: a query over the statement's transition table "changed" naming the projects touched.
CREATE FUNCTION project_revision_bump() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  EXECUTE format('UPDATE project_revisions SET revision = revision + 1 WHERE project_id IN (%s)', TG_ARGV[0]);
  RETURN NULL;
END
$$;
--> statement-breakpoint
CREATE FUNCTION project_revision_create() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  INSERT INTO project_revisions (project_id) SELECT id FROM changed ON CONFLICT (project_id) DO NOTHING;
  RETURN NULL;
END
$$;
--> statement-breakpoint
-- Installs the three triggers (insert, update, delete) that bump the revision of the projects a
-- statement on `target` touched; `projects_of` selects their ids from the transition table
-- "changed". A later migration adding a table of project rows calls it once for that table.
CREATE FUNCTION project_revision_track(target regclass, projects_of text) RETURNS void LANGUAGE plpgsql AS $$
BEGIN
  EXECUTE format('CREATE TRIGGER project_revision_insert AFTER INSERT ON %s REFERENCING NEW TABLE AS changed FOR EACH STATEMENT EXECUTE FUNCTION project_revision_bump(%L)', target, projects_of);
  EXECUTE format('CREATE TRIGGER project_revision_update AFTER UPDATE ON %s REFERENCING NEW TABLE AS changed FOR EACH STATEMENT EXECUTE FUNCTION project_revision_bump(%L)', target, projects_of);
  EXECUTE format('CREATE TRIGGER project_revision_delete AFTER DELETE ON %s REFERENCING OLD TABLE AS changed FOR EACH STATEMENT EXECUTE FUNCTION project_revision_bump(%L)', target, projects_of);
END
$$;
--> statement-breakpoint
CREATE TRIGGER project_revision_create AFTER INSERT ON "projects" REFERENCING NEW TABLE AS changed FOR EACH STATEMENT EXECUTE FUNCTION project_revision_create();
--> statement-breakpoint
CREATE TRIGGER project_revision_update AFTER UPDATE ON "projects" REFERENCING NEW TABLE AS changed FOR EACH STATEMENT EXECUTE FUNCTION project_revision_bump('SELECT id FROM changed');
--> statement-breakpoint
SELECT project_revision_track('segments', 'SELECT project_id FROM changed');
--> statement-breakpoint
SELECT project_revision_track('sites', 'SELECT project_id FROM changed');
--> statement-breakpoint
SELECT project_revision_track('samples', 'SELECT project_id FROM changed');
--> statement-breakpoint
SELECT project_revision_track('hypotheses', 'SELECT project_id FROM changed');
--> statement-breakpoint
SELECT project_revision_track('memberships', 'SELECT project_id FROM changed');
--> statement-breakpoint
SELECT project_revision_track('invitations', 'SELECT project_id FROM changed');
--> statement-breakpoint
SELECT project_revision_track('releases', 'SELECT project_id FROM changed');
--> statement-breakpoint
SELECT project_revision_track('recurrence_analyses', 'SELECT project_id FROM changed');
--> statement-breakpoint
SELECT project_revision_track('attachments', 'SELECT project_id FROM changed');
--> statement-breakpoint
SELECT project_revision_track('audit_records', 'SELECT project_id FROM changed');
--> statement-breakpoint
SELECT project_revision_track('result_inputs', 'SELECT project_id FROM changed');
--> statement-breakpoint
SELECT project_revision_track('refresh_plans', 'SELECT project_id FROM changed');
--> statement-breakpoint
SELECT project_revision_track('refresh_settings', 'SELECT project_id FROM changed');
--> statement-breakpoint
SELECT project_revision_track('units', 'SELECT s.project_id FROM changed c JOIN sites s ON s.id = c.site_id');
--> statement-breakpoint
SELECT project_revision_track('event_horizons', 'SELECT s.project_id FROM changed c JOIN sites s ON s.id = c.site_id');
--> statement-breakpoint
SELECT project_revision_track('age_model_runs', 'SELECT s.project_id FROM changed c JOIN sites s ON s.id = c.site_id');
--> statement-breakpoint
SELECT project_revision_track('core_logs', 'SELECT s.project_id FROM changed c JOIN sites s ON s.id = c.site_id');
--> statement-breakpoint
SELECT project_revision_track('ties', 'SELECT h.project_id FROM changed c JOIN hypotheses h ON h.id = c.hypothesis_id');
--> statement-breakpoint
SELECT project_revision_track('refresh_steps', 'SELECT p.project_id FROM changed c JOIN refresh_plans p ON p.id = c.plan_id');
--> statement-breakpoint
SELECT project_revision_track('users', 'SELECT m.project_id FROM changed c JOIN memberships m ON m.user_id = c.id');
--> statement-breakpoint
SELECT project_revision_track('calibration_curves', 'SELECT project_id FROM project_revisions WHERE EXISTS (SELECT 1 FROM changed)');
