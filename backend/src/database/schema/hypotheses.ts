import { boolean, index, integer, pgTable, text, uniqueIndex, uuid, type AnyPgColumn } from 'drizzle-orm/pg-core';
import { sql } from 'drizzle-orm';
import { id, timestamps } from './columns';
import { projects } from './projects';
import { users } from './users';

/** A named, versioned correlation hypothesis: a set of ties. */
export const hypotheses = pgTable(
  'hypotheses',
  {
    id: id(),
    projectId: uuid('project_id').notNull().references(() => projects.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    description: text('description'),
    authorId: uuid('author_id').references(() => users.id, { onDelete: 'set null' }),
    preferred: boolean('preferred').notNull().default(false),
    copiedFromId: uuid('copied_from_id').references((): AnyPgColumn => hypotheses.id, { onDelete: 'set null' }),
    /** Bumped on every change of its ties, so analyses can cite the version they used. */
    version: integer('version').notNull().default(1),
    ...timestamps,
  },
  (t) => [
    index('hypotheses_project_idx').on(t.projectId),
    uniqueIndex('hypotheses_one_preferred').on(t.projectId).where(sql`${t.preferred}`),
  ],
);
