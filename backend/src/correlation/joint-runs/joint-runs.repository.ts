import { Injectable } from '@nestjs/common';
import { and, asc, desc, eq, inArray, sql } from 'drizzle-orm';
import { DatabaseService, Executor } from '../../database/database.service';
import { hypotheses, jointAgeModelChains, jointAgeModelRuns } from '../../database/schema';
import { RunsRepository } from '../../jobs/runs.repository';

export type JointRunRow = typeof jointAgeModelRuns.$inferSelect;
export type JointChainRow = typeof jointAgeModelChains.$inferSelect;
/** A chain without its draws (for progress and status). */
export type JointChainState = Omit<JointChainRow, 'draws'>;

const CHAIN_STATE = {
  id: jointAgeModelChains.id,
  runId: jointAgeModelChains.runId,
  chainIndex: jointAgeModelChains.chainIndex,
  status: jointAgeModelChains.status,
  progress: jointAgeModelChains.progress,
  message: jointAgeModelChains.message,
  attempts: jointAgeModelChains.attempts,
  startedAt: jointAgeModelChains.startedAt,
  finishedAt: jointAgeModelChains.finishedAt,
  createdAt: jointAgeModelChains.createdAt,
  updatedAt: jointAgeModelChains.updatedAt,
};

/** Joint age model runs and their chains: the only SQL of the feature. */
@Injectable()
export class JointRunsRepository {
  constructor(
    private readonly database: DatabaseService,
    private readonly runs: RunsRepository,
  ) {}

  async insertRun(values: typeof jointAgeModelRuns.$inferInsert, executor: Executor = this.database.db): Promise<JointRunRow> {
    const [row] = await executor.insert(jointAgeModelRuns).values(values).returning();
    return row;
  }

  async insertChains(runId: string, count: number, executor: Executor = this.database.db): Promise<JointChainState[]> {
    return executor
      .insert(jointAgeModelChains)
      .values(Array.from({ length: count }, (_, chainIndex) => ({ runId, chainIndex })))
      .returning(CHAIN_STATE);
  }

  async findRun(id: string, executor: Executor = this.database.db): Promise<JointRunRow | undefined> {
    const [row] = await executor.select().from(jointAgeModelRuns).where(eq(jointAgeModelRuns.id, id)).limit(1);
    return row;
  }

  /** The run row locked for this transaction (the settling of its chains takes turns on it). */
  async lockRun(id: string, executor: Executor): Promise<JointRunRow | undefined> {
    const [row] = await executor.select().from(jointAgeModelRuns).where(eq(jointAgeModelRuns.id, id)).for('update');
    return row;
  }

  /** The run a chain belongs to. */
  async runIdOfChain(id: string, executor: Executor = this.database.db): Promise<string | undefined> {
    const [row] = await executor.select({ runId: jointAgeModelChains.runId }).from(jointAgeModelChains).where(eq(jointAgeModelChains.id, id)).limit(1);
    return row?.runId;
  }

  /** A run's chains by index, without their draws. */
  chainStates(runId: string, executor: Executor = this.database.db): Promise<JointChainState[]> {
    return executor.select(CHAIN_STATE).from(jointAgeModelChains).where(eq(jointAgeModelChains.runId, runId)).orderBy(asc(jointAgeModelChains.chainIndex));
  }

  /** Chain states of many runs (one request's runs). */
  chainStatesOf(runIds: readonly string[], executor: Executor = this.database.db): Promise<JointChainState[]> {
    if (runIds.length === 0) return Promise.resolve([]);
    return executor
      .select(CHAIN_STATE)
      .from(jointAgeModelChains)
      .where(inArray(jointAgeModelChains.runId, [...runIds]))
      .orderBy(asc(jointAgeModelChains.chainIndex));
  }

  /** A run's chains with their draws, by index. */
  chainsWithDraws(runId: string, executor: Executor = this.database.db): Promise<JointChainRow[]> {
    return executor.select().from(jointAgeModelChains).where(eq(jointAgeModelChains.runId, runId)).orderBy(asc(jointAgeModelChains.chainIndex));
  }

  /** QUEUED -> RUNNING when its first chain starts. */
  async markRunning(id: string, executor: Executor = this.database.db): Promise<void> {
    await executor
      .update(jointAgeModelRuns)
      .set({ status: 'RUNNING', startedAt: new Date(), updatedAt: new Date() })
      .where(and(eq(jointAgeModelRuns.id, id), eq(jointAgeModelRuns.status, 'QUEUED')));
  }

  async setRunProgress(id: string, progress: number, executor: Executor): Promise<void> {
    await executor
      .update(jointAgeModelRuns)
      .set({ progress, updatedAt: new Date() })
      .where(and(eq(jointAgeModelRuns.id, id), inArray(jointAgeModelRuns.status, ['QUEUED', 'RUNNING'])));
  }

  /** End an open run with `status` and what it stores; false when it had already ended. */
  async endRun(
    id: string,
    status: 'SUCCEEDED' | 'FAILED',
    stored: Partial<typeof jointAgeModelRuns.$inferInsert>,
    executor: Executor,
  ): Promise<boolean> {
    const rows = await executor
      .update(jointAgeModelRuns)
      .set({ ...stored, status, finishedAt: new Date(), updatedAt: new Date() })
      .where(and(eq(jointAgeModelRuns.id, id), inArray(jointAgeModelRuns.status, ['QUEUED', 'RUNNING'])))
      .returning({ id: jointAgeModelRuns.id });
    return rows.length > 0;
  }

  /** A user's cancel of a run; undefined when it had already ended. Its chains are stopped with it. */
  async cancelRun(id: string, executor: Executor): Promise<JointRunRow | undefined> {
    const run = await this.runs.cancel(jointAgeModelRuns, id, executor);
    if (run) await this.stopChains(id, 'cancelled by a user', executor);
    return run;
  }

  /** Every chain of a run still queued or running, CANCELLED with `message` (their workers stop at the next poll). */
  async stopChains(runId: string, message: string, executor: Executor = this.database.db): Promise<void> {
    await executor
      .update(jointAgeModelChains)
      .set({ status: 'CANCELLED', message, finishedAt: new Date(), updatedAt: new Date() })
      .where(and(eq(jointAgeModelChains.runId, runId), inArray(jointAgeModelChains.status, ['QUEUED', 'RUNNING'])));
  }

  /** A hypothesis' runs, newest first (the newest 20). */
  listForHypothesis(hypothesisId: string, executor: Executor = this.database.db): Promise<JointRunRow[]> {
    return executor
      .select()
      .from(jointAgeModelRuns)
      .where(eq(jointAgeModelRuns.hypothesisId, hypothesisId))
      .orderBy(desc(jointAgeModelRuns.createdAt))
      .limit(20);
  }

  async latestForHypothesis(hypothesisId: string, executor: Executor = this.database.db): Promise<JointRunRow | undefined> {
    const [row] = await this.latestOf(hypothesisId, false, executor);
    return row;
  }

  async latestSucceededForHypothesis(hypothesisId: string, executor: Executor = this.database.db): Promise<JointRunRow | undefined> {
    const [row] = await this.latestOf(hypothesisId, true, executor);
    return row;
  }

  /** Id of the hypothesis' newest successful run, without reading its results. */
  async latestSucceededIdOf(hypothesisId: string, executor: Executor = this.database.db): Promise<string | undefined> {
    const [row] = await executor
      .select({ id: jointAgeModelRuns.id })
      .from(jointAgeModelRuns)
      .where(and(eq(jointAgeModelRuns.hypothesisId, hypothesisId), eq(jointAgeModelRuns.status, 'SUCCEEDED')))
      .orderBy(desc(jointAgeModelRuns.createdAt))
      .limit(1);
    return row?.id;
  }

  private latestOf(hypothesisId: string, succeeded: boolean, executor: Executor) {
    return executor
      .select()
      .from(jointAgeModelRuns)
      .where(and(eq(jointAgeModelRuns.hypothesisId, hypothesisId), ...(succeeded ? [eq(jointAgeModelRuns.status, 'SUCCEEDED')] : [])))
      .orderBy(desc(jointAgeModelRuns.createdAt))
      .limit(1);
  }

  /** Each hypothesis' newest successful run of a project, without its input snapshot (the refresh's candidates). */
  async latestSucceededOfProject(projectId: string, executor: Executor = this.database.db): Promise<{ id: string; hypothesisId: string; hypothesisName: string }[]> {
    return executor
      .selectDistinctOn([jointAgeModelRuns.hypothesisId], { id: jointAgeModelRuns.id, hypothesisId: jointAgeModelRuns.hypothesisId, hypothesisName: hypotheses.name })
      .from(jointAgeModelRuns)
      .innerJoin(hypotheses, eq(hypotheses.id, jointAgeModelRuns.hypothesisId))
      .where(and(eq(jointAgeModelRuns.projectId, projectId), eq(jointAgeModelRuns.status, 'SUCCEEDED')))
      .orderBy(jointAgeModelRuns.hypothesisId, desc(jointAgeModelRuns.createdAt));
  }

  /** Hypotheses (of these) with a run queued or running. */
  async hypothesesBeingRun(hypothesisIds: readonly string[], executor: Executor = this.database.db): Promise<Set<string>> {
    if (hypothesisIds.length === 0) return new Set();
    const rows = await executor
      .select({ hypothesisId: jointAgeModelRuns.hypothesisId })
      .from(jointAgeModelRuns)
      .where(and(inArray(jointAgeModelRuns.hypothesisId, [...hypothesisIds]), inArray(jointAgeModelRuns.status, ['QUEUED', 'RUNNING'])));
    return new Set(rows.map((r) => r.hypothesisId));
  }

  async statuses(ids: readonly string[], executor: Executor = this.database.db): Promise<Map<string, { status: string; message: string | null }>> {
    if (ids.length === 0) return new Map();
    const rows = await executor
      .select({ id: jointAgeModelRuns.id, status: jointAgeModelRuns.status, message: jointAgeModelRuns.message })
      .from(jointAgeModelRuns)
      .where(inArray(jointAgeModelRuns.id, [...ids]));
    return new Map(rows.map((r) => [r.id, { status: r.status, message: r.message }]));
  }

  /** The regional-event draws of a run's results only (what a recurrence analysis reads). */
  async regionalDraws(id: string, executor: Executor = this.database.db): Promise<unknown> {
    const [row] = await executor
      .select({ draws: sql<unknown>`${jointAgeModelRuns.results} -> 'regionalEventDraws'` })
      .from(jointAgeModelRuns)
      .where(eq(jointAgeModelRuns.id, id));
    return row?.draws ?? null;
  }
}
