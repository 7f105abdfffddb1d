-- Keep sites.column_revision moving whenever anything an age model depends on changes: every
-- insert, update or delete of a unit, event horizon or sample bumps its site's revision once per
-- statement (statement-level triggers with transition tables, so a 10,000-row import costs one
-- update, not 10,000). A run records the revision it was computed from; it is stale once they differ.
CREATE FUNCTION bump_site_column_revision() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF TG_OP IN ('INSERT', 'UPDATE') THEN
    UPDATE sites SET column_revision = column_revision + 1 WHERE id IN (SELECT DISTINCT site_id FROM changed_new);
  END IF;
  IF TG_OP IN ('UPDATE', 'DELETE') THEN
    UPDATE sites SET column_revision = column_revision + 1 WHERE id IN (SELECT DISTINCT site_id FROM changed_old);
  END IF;
  RETURN NULL;
END;
$$;--> statement-breakpoint
CREATE TRIGGER units_column_revision_insert AFTER INSERT ON units REFERENCING NEW TABLE AS changed_new FOR EACH STATEMENT EXECUTE FUNCTION bump_site_column_revision();--> statement-breakpoint
CREATE TRIGGER units_column_revision_update AFTER UPDATE ON units REFERENCING OLD TABLE AS changed_old NEW TABLE AS changed_new FOR EACH STATEMENT EXECUTE FUNCTION bump_site_column_revision();--> statement-breakpoint
CREATE TRIGGER units_column_revision_delete AFTER DELETE ON units REFERENCING OLD TABLE AS changed_old FOR EACH STATEMENT EXECUTE FUNCTION bump_site_column_revision();--> statement-breakpoint
CREATE TRIGGER event_horizons_column_revision_insert AFTER INSERT ON event_horizons REFERENCING NEW TABLE AS changed_new FOR EACH STATEMENT EXECUTE FUNCTION bump_site_column_revision();--> statement-breakpoint
CREATE TRIGGER event_horizons_column_revision_update AFTER UPDATE ON event_horizons REFERENCING OLD TABLE AS changed_old NEW TABLE AS changed_new FOR EACH STATEMENT EXECUTE FUNCTION bump_site_column_revision();--> statement-breakpoint
CREATE TRIGGER event_horizons_column_revision_delete AFTER DELETE ON event_horizons REFERENCING OLD TABLE AS changed_old FOR EACH STATEMENT EXECUTE FUNCTION bump_site_column_revision();--> statement-breakpoint
CREATE TRIGGER samples_column_revision_insert AFTER INSERT ON samples REFERENCING NEW TABLE AS changed_new FOR EACH STATEMENT EXECUTE FUNCTION bump_site_column_revision();--> statement-breakpoint
CREATE TRIGGER samples_column_revision_update AFTER UPDATE ON samples REFERENCING OLD TABLE AS changed_old NEW TABLE AS changed_new FOR EACH STATEMENT EXECUTE FUNCTION bump_site_column_revision();--> statement-breakpoint
CREATE TRIGGER samples_column_revision_delete AFTER DELETE ON samples REFERENCING OLD TABLE AS changed_old FOR EACH STATEMENT EXECUTE FUNCTION bump_site_column_revision();
