import { index, integer, jsonb, pgTable, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { id, runState, timestamps } from './columns';
import { hypotheses } from './hypotheses';
import { projects } from './projects';
import { users } from './users';

/**
 * One joint age model run of a correlation hypothesis (issue 13): every site the hypothesis ties,
 * each regional event one age shared by its members' columns. Its chains are rows of
 * `joint_age_model_chains`, each a job of its own; the run's status follows them (RUNNING when a
 * chain starts, SUCCEEDED once every chain has and the chains are summarised, FAILED with the
 * first failed chain's message, CANCELLED with them all). Inputs are snapshotted; results are JSON.
 */
export const jointAgeModelRuns = pgTable(
  'joint_age_model_runs',
  {
    id: id(),
    projectId: uuid('project_id').notNull().references(() => projects.id, { onDelete: 'cascade' }),
    hypothesisId: uuid('hypothesis_id').notNull().references(() => hypotheses.id, { onDelete: 'cascade' }),
    /** The hypothesis' version when the run was queued. */
    hypothesisVersion: integer('hypothesis_version').notNull(),
    requestedById: uuid('requested_by_id').references(() => users.id, { onDelete: 'set null' }),
    seed: integer('seed').notNull(),
    /** Chain settings shared by every chain (iterations, burn-in, thin, outlier and inheritance priors), and the chain count. */
    settings: jsonb('settings').notNull(),
    /** The joint model's input (sites' columns with their sample likelihoods, regional events). */
    inputSnapshot: jsonb('input_snapshot').notNull(),
    diagnostics: jsonb('diagnostics'),
    /** Regional, site-event and sample posteriors (as site runs store theirs) and the regional events' joint draws. */
    results: jsonb('results'),
    ...runState(),
    ...timestamps,
  },
  (t) => [index('joint_age_model_runs_hypothesis_idx').on(t.hypothesisId, t.createdAt), index('joint_age_model_runs_project_idx').on(t.projectId)],
);

/** One chain of a joint run: a job of its own, so several workers run a run's chains at once. */
export const jointAgeModelChains = pgTable(
  'joint_age_model_chains',
  {
    id: id(),
    runId: uuid('run_id').notNull().references(() => jointAgeModelRuns.id, { onDelete: 'cascade' }),
    /** 0-based; the chain's random stream is derived from the run's seed and this index. */
    chainIndex: integer('chain_index').notNull(),
    /** The chain's kept draws (`JointChainDraws`, typed arrays as number arrays). */
    draws: jsonb('draws'),
    ...runState(),
    ...timestamps,
  },
  (t) => [uniqueIndex('joint_age_model_chains_run_idx').on(t.runId, t.chainIndex)],
);
