import { bigint, doublePrecision, index, integer, jsonb, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { id, runState, timestamps } from './columns';
import { sites } from './sites';
import { users } from './users';

/** One computation of a site's chronology. Inputs are snapshotted; results are JSON. */
export const ageModelRuns = pgTable(
  'age_model_runs',
  {
    id: id(),
    siteId: uuid('site_id').notNull().references(() => sites.id, { onDelete: 'cascade' }),
    requestedById: uuid('requested_by_id').references(() => users.id, { onDelete: 'set null' }),
    seed: integer('seed').notNull(),
    settings: jsonb('settings').notNull(),
    inputSnapshot: jsonb('input_snapshot').notNull(),
    /** Fingerprint of the column and samples the run was computed from; stale when the site's differs. */
    inputFingerprint: text('input_fingerprint').notNull(),
    /** The site's column revision when the run was queued; the run is stale once the site's moves on. */
    columnRevision: bigint('column_revision', { mode: 'number' }).notNull().default(0),
    diagnostics: jsonb('diagnostics'),
    results: jsonb('results'),
    ...runState(),
    ...timestamps,
  },
  (t) => [index('age_model_runs_site_idx').on(t.siteId, t.createdAt)],
);
