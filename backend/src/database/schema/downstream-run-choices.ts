import { pgTable, timestamp, uuid } from 'drizzle-orm/pg-core';
import { ageModelRuns } from './age-model-runs';
import { sites } from './sites';
import { users } from './users';

/**
 * A site's chosen age model run: the successful run a researcher picked to feed the ladder,
 * regional events, site recurrence and the refresh plan in place of the newest successful one
 * (`age-models/downstream-runs.ts` reads it). No row: the site follows its newest successful run.
 * Deleting the run (or the site) removes the choice.
 */
export const downstreamRunChoices = pgTable('downstream_run_choices', {
  siteId: uuid('site_id').primaryKey().references(() => sites.id, { onDelete: 'cascade' }),
  ageModelRunId: uuid('age_model_run_id').notNull().references(() => ageModelRuns.id, { onDelete: 'cascade' }),
  chosenById: uuid('chosen_by_id').references(() => users.id, { onDelete: 'set null' }),
  chosenAt: timestamp('chosen_at', { withTimezone: true, mode: 'date' }).notNull().defaultNow(),
});
