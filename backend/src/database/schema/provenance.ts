import { bigint, boolean, index, integer, jsonb, pgTable, primaryKey, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { id, timestamps } from './columns';
import { projects } from './projects';
import { users } from './users';

/**
 * Provenance: one row per input a derived result was computed from. A result is named by its kind
 * (`recurrenceAnalysis`, `jointRun`, ...) and id; an input is a site column (with the column
 * revision read), a hypothesis (with its version), or another result (an age model run or a joint
 * run). Kinds are text, not a foreign key, so a new kind of result plugs in without a migration;
 * rows go with their project. Age model runs keep their one input in their own row
 * (`age_model_runs.site_id`, `column_revision`).
 */
export const resultInputs = pgTable(
  'result_inputs',
  {
    projectId: uuid('project_id').notNull().references(() => projects.id, { onDelete: 'cascade' }),
    resultKind: text('result_kind').notNull(),
    resultId: uuid('result_id').notNull(),
    inputKind: text('input_kind').notNull(),
    inputId: uuid('input_id').notNull(),
    /** The site's column revision or the hypothesis' version when the result was queued; null for results. */
    inputRevision: bigint('input_revision', { mode: 'number' }),
    /** The input's name when it was used, kept for when it is deleted. */
    inputName: text('input_name').notNull(),
  },
  (t) => [
    primaryKey({ columns: [t.resultKind, t.resultId, t.inputKind, t.inputId] }),
    index('result_inputs_input_idx').on(t.inputKind, t.inputId),
  ],
);

/** One "bring everything up to date" action of a project: the stale results it found and what it queued. */
export const refreshPlans = pgTable(
  'refresh_plans',
  {
    id: id(),
    projectId: uuid('project_id').notNull().references(() => projects.id, { onDelete: 'cascade' }),
    requestedById: uuid('requested_by_id').references(() => users.id, { onDelete: 'set null' }),
    /** `ACTIVE` while a step waits or runs, then `FINISHED`. */
    status: text('status').notNull().default('ACTIVE'),
    /** True when the project's automatic refresh started it. */
    automatic: boolean('automatic').notNull().default(false),
    /** Stale results the requester's role may not re-run: `{ kind, id, name, reason }[]`. */
    skipped: jsonb('skipped').notNull().default([]),
    ...timestamps,
  },
  (t) => [index('refresh_plans_project_idx').on(t.projectId, t.createdAt)],
);

/**
 * One stale result of a plan and the fresh result queued for it. A step waits until every step it
 * depends on has succeeded; when one of those fails, it is `BLOCKED` and never starts.
 */
export const refreshSteps = pgTable(
  'refresh_steps',
  {
    id: id(),
    planId: uuid('plan_id').notNull().references(() => refreshPlans.id, { onDelete: 'cascade' }),
    /** 1 site age model runs, 2 joint runs, 3 recurrence analyses. */
    stage: integer('stage').notNull(),
    resultKind: text('result_kind').notNull(),
    /** The stale result re-run with its settings and seed. */
    staleId: uuid('stale_id').notNull(),
    /** What the step refreshes, in words (a site, a hypothesis, a segment). */
    label: text('label').notNull(),
    /** Steps (ids) whose fresh results this one needs. */
    dependsOn: uuid('depends_on').array().notNull().default([]),
    /** `WAITING`, `QUEUED` (fresh result queued), `SUCCEEDED`, `FAILED`, `BLOCKED`. */
    status: text('status').notNull().default('WAITING'),
    /** The fresh result once queued. */
    freshId: uuid('fresh_id'),
    message: text('message'),
    startedAt: timestamp('started_at', { withTimezone: true, mode: 'date' }),
    finishedAt: timestamp('finished_at', { withTimezone: true, mode: 'date' }),
    ...timestamps,
  },
  (t) => [index('refresh_steps_plan_idx').on(t.planId)],
);

/** A project's choice to refresh stale results by itself after each change, debounced. */
export const refreshSettings = pgTable('refresh_settings', {
  projectId: uuid('project_id').primaryKey().references(() => projects.id, { onDelete: 'cascade' }),
  automatic: boolean('automatic').notNull().default(false),
  /** Seconds without a further change before the automatic refresh starts. */
  debounceSeconds: integer('debounce_seconds').notNull().default(60),
  updatedById: uuid('updated_by_id').references(() => users.id, { onDelete: 'set null' }),
  ...timestamps,
});
