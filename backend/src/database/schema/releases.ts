import { index, integer, jsonb, pgTable, text, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { id, timestamps } from './columns';
import { projects } from './projects';
import { users } from './users';

/** A frozen, numbered snapshot of a project's data (the export bundle) for citation. */
export const releases = pgTable(
  'releases',
  {
    id: id(),
    projectId: uuid('project_id').notNull().references(() => projects.id, { onDelete: 'cascade' }),
    number: integer('number').notNull(),
    note: text('note').notNull(),
    createdById: uuid('created_by_id').references(() => users.id, { onDelete: 'set null' }),
    snapshot: jsonb('snapshot').notNull(),
    ...timestamps,
  },
  (t) => [
    uniqueIndex('releases_project_number_unique').on(t.projectId, t.number),
    index('releases_project_idx').on(t.projectId),
  ],
);
