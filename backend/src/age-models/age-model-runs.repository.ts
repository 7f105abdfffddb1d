import { Injectable } from '@nestjs/common';
import { and, desc, eq, inArray, sql } from 'drizzle-orm';
import { QueryResult } from 'pg';
import { DatabaseService, Executor } from '../database/database.service';
import { ageModelRuns, downstreamRunChoices, sites } from '../database/schema';
import { RunsRepository } from '../jobs/runs.repository';
import { downstreamRunIds } from './downstream-runs';

export type AgeModelRunRow = typeof ageModelRuns.$inferSelect;
export type DownstreamRunChoiceRow = typeof downstreamRunChoices.$inferSelect;

/** md5 of the empty string: the fingerprint of a column with nothing in it. */
export const EMPTY_COLUMN_FINGERPRINT = 'd41d8cd98f00b204e9800998ecf8427e';

/** Every column of a run but the input snapshot, with `results` without its joint event draws. */
const DISPLAY_COLUMNS = {
  id: ageModelRuns.id,
  siteId: ageModelRuns.siteId,
  requestedById: ageModelRuns.requestedById,
  status: ageModelRuns.status,
  progress: ageModelRuns.progress,
  message: ageModelRuns.message,
  seed: ageModelRuns.seed,
  settings: ageModelRuns.settings,
  inputFingerprint: ageModelRuns.inputFingerprint,
  columnRevision: ageModelRuns.columnRevision,
  diagnostics: ageModelRuns.diagnostics,
  results: sql<unknown>`${ageModelRuns.results} - 'eventDraws'`,
  attempts: ageModelRuns.attempts,
  startedAt: ageModelRuns.startedAt,
  finishedAt: ageModelRuns.finishedAt,
  createdAt: ageModelRuns.createdAt,
  updatedAt: ageModelRuns.updatedAt,
};

@Injectable()
export class AgeModelRunsRepository {
  constructor(
    private readonly database: DatabaseService,
    private readonly runs: RunsRepository,
  ) {}

  async insert(values: typeof ageModelRuns.$inferInsert, executor: Executor = this.database.db): Promise<AgeModelRunRow> {
    const [row] = await executor.insert(ageModelRuns).values(values).returning();
    return row;
  }

  async findById(id: string, executor: Executor = this.database.db): Promise<AgeModelRunRow | undefined> {
    const [row] = await executor.select().from(ageModelRuns).where(eq(ageModelRuns.id, id)).limit(1);
    return row;
  }

  /** A site's newest 50 runs, read as `runsForDisplay` reads them (no input snapshot, no joint draws). */
  async listForSite(siteId: string, executor: Executor = this.database.db): Promise<AgeModelRunRow[]> {
    const rows = await executor.select(DISPLAY_COLUMNS).from(ageModelRuns).where(eq(ageModelRuns.siteId, siteId)).orderBy(desc(ageModelRuns.createdAt)).limit(50);
    return rows.map((row) => ({ ...row, inputSnapshot: null }));
  }

  async latestForSite(siteId: string, executor: Executor = this.database.db): Promise<AgeModelRunRow | undefined> {
    const [row] = await executor
      .select()
      .from(ageModelRuns)
      .where(eq(ageModelRuns.siteId, siteId))
      .orderBy(desc(ageModelRuns.createdAt))
      .limit(1);
    return row;
  }

  /** The site's run used downstream (`downstreamRunIds`) with its whole results, joint event draws included (site recurrence). */
  async latestSucceededForSite(siteId: string, executor: Executor = this.database.db): Promise<AgeModelRunRow | undefined> {
    const [row] = await executor
      .select()
      .from(ageModelRuns)
      .where(inArray(ageModelRuns.id, downstreamRunIds(executor, eq(sites.id, siteId))))
      .limit(1);
    return row;
  }

  /** The site's newest successful run's id, whatever the site's choice. */
  async newestSucceededId(siteId: string, executor: Executor = this.database.db): Promise<string | undefined> {
    const [row] = await executor
      .select({ id: ageModelRuns.id })
      .from(ageModelRuns)
      .where(and(eq(ageModelRuns.siteId, siteId), eq(ageModelRuns.status, 'SUCCEEDED')))
      .orderBy(desc(ageModelRuns.createdAt))
      .limit(1);
    return row?.id;
  }

  /** A site's chosen run (`downstream_run_choices`); undefined when it follows its newest successful run. */
  async choiceOf(siteId: string, executor: Executor = this.database.db): Promise<DownstreamRunChoiceRow | undefined> {
    const [row] = await executor.select().from(downstreamRunChoices).where(eq(downstreamRunChoices.siteId, siteId));
    return row;
  }

  /** The choices of a project's sites. */
  choicesOfProject(projectId: string, executor: Executor = this.database.db): Promise<DownstreamRunChoiceRow[]> {
    return executor
      .select({ siteId: downstreamRunChoices.siteId, ageModelRunId: downstreamRunChoices.ageModelRunId, chosenById: downstreamRunChoices.chosenById, chosenAt: downstreamRunChoices.chosenAt })
      .from(downstreamRunChoices)
      .innerJoin(sites, eq(sites.id, downstreamRunChoices.siteId))
      .where(eq(sites.projectId, projectId))
      .orderBy(sites.alongStrikeKm, sites.name);
  }

  async saveChoice(values: typeof downstreamRunChoices.$inferInsert, executor: Executor): Promise<DownstreamRunChoiceRow> {
    const [row] = await executor
      .insert(downstreamRunChoices)
      .values(values)
      .onConflictDoUpdate({ target: downstreamRunChoices.siteId, set: { ageModelRunId: values.ageModelRunId, chosenById: values.chosenById, chosenAt: sql`now()` } })
      .returning();
    return row;
  }

  /** Remove a site's choice; the removed row, or undefined when there was none. */
  async deleteChoice(siteId: string, executor: Executor): Promise<DownstreamRunChoiceRow | undefined> {
    const [row] = await executor.delete(downstreamRunChoices).where(eq(downstreamRunChoices.siteId, siteId)).returning();
    return row;
  }

  /** Move a choice of `fromRunId` to `toRunId` (a refresh's fresh run of a chosen run); the moved row, if any. */
  async moveChoice(fromRunId: string, toRunId: string, executor: Executor): Promise<DownstreamRunChoiceRow | undefined> {
    const [row] = await executor
      .update(downstreamRunChoices)
      .set({ ageModelRunId: toRunId })
      .where(eq(downstreamRunChoices.ageModelRunId, fromRunId))
      .returning();
    return row;
  }

  /**
   * A fingerprint per site of everything a run depends on: every unit, event horizon and sample
   * with its version, stored with each run as a record of exactly which rows it was computed
   * from. (Freshness uses the cheaper sites.column_revision.) One query for any number of sites;
   * a site with an empty column has the fingerprint of ''.
   */
  async columnFingerprints(siteIds: readonly string[], executor: Executor = this.database.db): Promise<Map<string, string>> {
    // One PostgreSQL array literal (drizzle would spread a JS array into a row of parameters).
    const ids = `{${siteIds.join(',')}}`;
    const result = (await executor.execute(sql`
      select site_id::text as site_id, md5(string_agg(part, ';' order by part)) as fingerprint from (
        select site_id, 'unit:' || id || ':' || version as part from units where site_id = any(${ids}::uuid[])
        union all select site_id, 'event:' || id || ':' || version from event_horizons where site_id = any(${ids}::uuid[])
        union all select site_id, 'sample:' || id || ':' || version from samples where site_id = any(${ids}::uuid[])
      ) parts group by site_id`)) as unknown as QueryResult<{ site_id: string; fingerprint: string }>;
    const fingerprints = new Map(siteIds.map((id) => [id, EMPTY_COLUMN_FINGERPRINT]));
    for (const row of result.rows) fingerprints.set(row.site_id, row.fingerprint);
    return fingerprints;
  }

  /** A user's cancel; undefined when the run had already ended. */
  cancel(id: string): Promise<AgeModelRunRow | undefined> {
    return this.runs.cancel(ageModelRuns, id);
  }

  statusOf(id: string): Promise<AgeModelRunRow['status'] | undefined> {
    return this.runs.statusOf(ageModelRuns, id);
  }

  /** Id of each site's run used downstream (`downstreamRunIds`), without loading its results. */
  async latestSucceededRunIds(siteIds: string[], executor: Executor = this.database.db): Promise<{ id: string; siteId: string }[]> {
    if (siteIds.length === 0) return [];
    return executor
      .select({ id: ageModelRuns.id, siteId: ageModelRuns.siteId })
      .from(ageModelRuns)
      .where(inArray(ageModelRuns.id, downstreamRunIds(executor, inArray(sites.id, siteIds))));
  }

  /**
   * Runs by id with their results but without the bulky parts no field of `AgeModelRun` shows:
   * the input snapshot (null here) and the joint event draws (dropped from `results`).
   */
  async runsForDisplay(runIds: string[], executor: Executor = this.database.db): Promise<AgeModelRunRow[]> {
    if (runIds.length === 0) return [];
    const rows = await executor
      .select(DISPLAY_COLUMNS)
      .from(ageModelRuns)
      .where(inArray(ageModelRuns.id, runIds));
    return rows.map((row) => ({ ...row, inputSnapshot: null }));
  }
}
