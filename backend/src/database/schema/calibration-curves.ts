import { boolean, integer, pgTable, text, uuid } from 'drizzle-orm/pg-core';
import { id, timestamps } from './columns';
import { users } from './users';

/** Curves installed by an administrator (e.g. SHCal20), stored as their published text. */
export const calibrationCurves = pgTable('calibration_curves', {
  id: id(),
  code: text('code').notNull().unique(),
  name: text('name').notNull(),
  marine: boolean('marine').notNull(),
  sourceText: text('source_text').notNull(),
  youngestCalBp: integer('youngest_cal_bp').notNull(),
  oldestCalBp: integer('oldest_cal_bp').notNull(),
  installedById: uuid('installed_by_id').references(() => users.id, { onDelete: 'set null' }),
  ...timestamps,
});
