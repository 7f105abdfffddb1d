import { bigint, pgTable, uuid } from 'drizzle-orm/pg-core';
import { projects } from './projects';

/**
 * One row per project: a counter that triggers in the database bump whenever any row of the
 * project changes (every table holding a project's rows, the users its members are and the
 * installed calibration curves; see migration 0010_project_revisions.sql). The event-ladder answer
 * cache compares it to the revision an answer was computed from. Written only by those triggers.
 */
export const projectRevisions = pgTable('project_revisions', {
  projectId: uuid('project_id').primaryKey().references(() => projects.id, { onDelete: 'cascade' }),
  revision: bigint('revision', { mode: 'number' }).notNull().default(1),
});
