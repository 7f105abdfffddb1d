import { sql } from 'drizzle-orm';
import { check, pgTable, primaryKey, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { projects } from './projects';
import { users } from './users';

/**
 * A project's remembered reading of lab-sheet headers its own field names do not give: which
 * sample field a column such as "Conventional age" holds, or that it is to be ignored
 * (`field` null). Written when an import that chose it is committed; applied to later sheets.
 */
export const labSheetColumnChoices = pgTable(
  'lab_sheet_column_choices',
  {
    projectId: uuid('project_id').notNull().references(() => projects.id, { onDelete: 'cascade' }),
    /** The header lower-cased with runs of spaces as one, trimmed (`headerKey` in lab-sheet.ts). */
    headerKey: text('header_key').notNull(),
    /** The header as last written in a sheet. */
    header: text('header').notNull(),
    /** A lab-sheet column name (LAB_SHEET_COLUMNS), or null: ignore this column. */
    field: text('field'),
    chosenBy: uuid('chosen_by').references(() => users.id, { onDelete: 'set null' }),
    updatedAt: timestamp('updated_at', { withTimezone: true, mode: 'date' }).notNull().defaultNow(),
  },
  (t) => [
    primaryKey({ columns: [t.projectId, t.headerKey] }),
    check('lab_sheet_column_choices_key_length', sql`length(${t.headerKey}) between 1 and 200`),
  ],
);
