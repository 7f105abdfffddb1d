import { doublePrecision, index, integer, jsonb, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { id, runState, timestamps } from './columns';
import { hypotheses } from './hypotheses';
import { projects } from './projects';
import { releases } from './releases';
import { segments } from './segments';
import { sites } from './sites';
import { users } from './users';

/** A recurrence analysis with its inputs, so it can be re-run and cited. */
export const recurrenceAnalyses = pgTable(
  'recurrence_analyses',
  {
    id: id(),
    projectId: uuid('project_id').notNull().references(() => projects.id, { onDelete: 'cascade' }),
    segmentId: uuid('segment_id').references(() => segments.id, { onDelete: 'set null' }),
    siteId: uuid('site_id').references(() => sites.id, { onDelete: 'set null' }),
    hypothesisId: uuid('hypothesis_id').references(() => hypotheses.id, { onDelete: 'set null' }),
    hypothesisVersion: integer('hypothesis_version'),
    releaseId: uuid('release_id').references(() => releases.id, { onDelete: 'restrict' }),
    requestedById: uuid('requested_by_id').references(() => users.id, { onDelete: 'set null' }),
    seed: integer('seed').notNull(),
    forecastStartYear: integer('forecast_start_year').notNull(),
    windowsYears: doublePrecision('windows_years').array().notNull(),
    draws: integer('draws').notNull(),
    settings: jsonb('settings').notNull(),
    /**
     * Where the event ages came from: JOINT_RUN (a joint age model run's regional draws),
     * COMBINED_DENSITIES (each regional event's product of member posteriors) or SITE_RUN (a
     * site run's joint draws). Null in analyses made before it was recorded (read from the snapshot).
     */
    source: text('source'),
    inputSnapshot: jsonb('input_snapshot').notNull(),
    results: jsonb('results'),
    ...runState(),
    ...timestamps,
  },
  (t) => [index('recurrence_analyses_project_idx').on(t.projectId, t.createdAt)],
);
