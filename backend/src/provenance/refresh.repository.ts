import { Injectable } from '@nestjs/common';
import { and, desc, eq, inArray, isNull, sql } from 'drizzle-orm';
import { downstreamRunIds } from '../age-models/downstream-runs';
import { DatabaseService, Executor } from '../database/database.service';
import { ageModelRuns, recurrenceAnalyses, refreshPlans, refreshSettings, refreshSteps, sites, users } from '../database/schema';

export type RefreshPlanRow = typeof refreshPlans.$inferSelect;
export type RefreshStepRow = typeof refreshSteps.$inferSelect;

/** Refresh plans and steps, and the reads that find a project's current results. */
@Injectable()
export class RefreshRepository {
  constructor(private readonly database: DatabaseService) {}

  async insertPlan(values: typeof refreshPlans.$inferInsert, executor: Executor): Promise<RefreshPlanRow> {
    const [row] = await executor.insert(refreshPlans).values(values).returning();
    return row;
  }

  async insertSteps(values: (typeof refreshSteps.$inferInsert)[], executor: Executor): Promise<RefreshStepRow[]> {
    if (values.length === 0) return [];
    return executor.insert(refreshSteps).values(values).returning();
  }

  async findPlan(id: string): Promise<RefreshPlanRow | undefined> {
    const [row] = await this.database.db.select().from(refreshPlans).where(eq(refreshPlans.id, id));
    return row;
  }

  plansOfProject(projectId: string, limit: number): Promise<RefreshPlanRow[]> {
    return this.database.db.select().from(refreshPlans).where(eq(refreshPlans.projectId, projectId)).orderBy(desc(refreshPlans.createdAt)).limit(limit);
  }

  activePlans(): Promise<RefreshPlanRow[]> {
    return this.database.db.select().from(refreshPlans).where(eq(refreshPlans.status, 'ACTIVE')).limit(50);
  }

  stepsOf(planId: string): Promise<RefreshStepRow[]> {
    return this.database.db.select().from(refreshSteps).where(eq(refreshSteps.planId, planId)).orderBy(refreshSteps.stage, refreshSteps.label);
  }

  /** Move a step from one status to another; false when another process moved it first. */
  async moveStep(id: string, from: string, values: Partial<typeof refreshSteps.$inferInsert>): Promise<boolean> {
    const rows = await this.database.db
      .update(refreshSteps)
      .set({ ...values, updatedAt: new Date() })
      .where(and(eq(refreshSteps.id, id), eq(refreshSteps.status, from)))
      .returning({ id: refreshSteps.id });
    return rows.length > 0;
  }

  async finishPlan(id: string): Promise<void> {
    await this.database.db.update(refreshPlans).set({ status: 'FINISHED', updatedAt: new Date() }).where(and(eq(refreshPlans.id, id), eq(refreshPlans.status, 'ACTIVE')));
  }

  /** Each site's run used downstream (`downstreamRunIds`) in the project, with the site's current revision. */
  latestSiteRuns(projectId: string) {
    return this.database.db
      .select({
        id: ageModelRuns.id,
        siteId: ageModelRuns.siteId,
        siteName: sites.name,
        segmentId: sites.segmentId,
        columnRevision: ageModelRuns.columnRevision,
        siteRevision: sites.columnRevision,
      })
      .from(ageModelRuns)
      .innerJoin(sites, eq(sites.id, ageModelRuns.siteId))
      .where(inArray(ageModelRuns.id, downstreamRunIds(this.database.db, eq(sites.projectId, projectId))))
      .orderBy(ageModelRuns.siteId);
  }

  /** Sites that already have a queued or running run of their current column. */
  async sitesBeingRun(siteIds: readonly string[]): Promise<Set<string>> {
    if (siteIds.length === 0) return new Set();
    const rows = await this.database.db
      .select({ siteId: ageModelRuns.siteId })
      .from(ageModelRuns)
      .innerJoin(sites, eq(sites.id, ageModelRuns.siteId))
      .where(and(inArray(ageModelRuns.siteId, [...siteIds]), inArray(ageModelRuns.status, ['QUEUED', 'RUNNING']), eq(ageModelRuns.columnRevision, sites.columnRevision)));
    return new Set(rows.map((r) => r.siteId));
  }

  /**
   * The project's current analyses: the newest successful one of each subject (a segment under a
   * hypothesis, or a site), not pinned to a release.
   */
  latestAnalyses(projectId: string) {
    return this.database.db
      .selectDistinctOn([recurrenceAnalyses.segmentId, recurrenceAnalyses.hypothesisId, recurrenceAnalyses.siteId], {
        id: recurrenceAnalyses.id,
        segmentId: recurrenceAnalyses.segmentId,
        siteId: recurrenceAnalyses.siteId,
        hypothesisId: recurrenceAnalyses.hypothesisId,
      })
      .from(recurrenceAnalyses)
      .where(and(eq(recurrenceAnalyses.projectId, projectId), eq(recurrenceAnalyses.status, 'SUCCEEDED'), isNull(recurrenceAnalyses.releaseId)))
      .orderBy(recurrenceAnalyses.segmentId, recurrenceAnalyses.hypothesisId, recurrenceAnalyses.siteId, desc(recurrenceAnalyses.createdAt));
  }

  async siteIdsOfSegment(segmentId: string): Promise<string[]> {
    return (await this.database.db.select({ id: sites.id }).from(sites).where(eq(sites.segmentId, segmentId))).map((r) => r.id);
  }

  async ageModelRun(id: string) {
    const [row] = await this.database.db.select({ id: ageModelRuns.id, siteId: ageModelRuns.siteId, status: ageModelRuns.status, message: ageModelRuns.message, seed: ageModelRuns.seed, settings: ageModelRuns.settings }).from(ageModelRuns).where(eq(ageModelRuns.id, id));
    return row;
  }

  async recurrenceAnalysis(id: string) {
    const [row] = await this.database.db.select().from(recurrenceAnalyses).where(eq(recurrenceAnalyses.id, id));
    return row;
  }

  async user(id: string | null): Promise<{ id: string; email: string } | undefined> {
    if (!id) return undefined;
    const [row] = await this.database.db.select({ id: users.id, email: users.email }).from(users).where(eq(users.id, id));
    return row;
  }

  /** Statuses of results by id, for a step's fresh result. */
  async statuses(kind: 'ageModelRun' | 'recurrenceAnalysis', ids: readonly string[]): Promise<Map<string, { status: string; message: string | null }>> {
    if (ids.length === 0) return new Map();
    const table = kind === 'ageModelRun' ? ageModelRuns : recurrenceAnalyses;
    const rows = await this.database.db.select({ id: table.id, status: table.status, message: table.message }).from(table).where(inArray(table.id, [...ids]));
    return new Map(rows.map((r) => [r.id, { status: r.status, message: r.message }]));
  }

  /** When anything in the project was last written (its newest audit record), for the automatic refresh. */
  async lastChangeAt(projectId: string): Promise<Date | null> {
    const result = await this.database.db.execute(sql`select max(at) as at from audit_records where project_id = ${projectId} and object_type in ('unit','eventHorizon','sample','tie','site','hypothesis','downstreamRunChoice')`);
    const at = (result as unknown as { rows: { at: Date | string | null }[] }).rows[0]?.at;
    return at ? new Date(at) : null;
  }

  /**
   * Take the project's automatic-refresh lock for the rest of the transaction, or answer false
   * when another API replica holds it (PostgreSQL advisory lock, so every replica shares it).
   */
  async tryAutomaticRefreshLock(projectId: string, executor: Executor): Promise<boolean> {
    const result = await executor.execute(sql`select pg_try_advisory_xact_lock(hashtext(${`refresh:${projectId}`})) as locked`);
    return (result as unknown as { rows: { locked: boolean }[] }).rows[0]?.locked === true;
  }

  async settingsOf(projectId: string) {
    const [row] = await this.database.db.select().from(refreshSettings).where(eq(refreshSettings.projectId, projectId));
    return row;
  }

  async saveSettings(values: typeof refreshSettings.$inferInsert, executor: Executor) {
    const [row] = await executor
      .insert(refreshSettings)
      .values(values)
      .onConflictDoUpdate({ target: refreshSettings.projectId, set: { automatic: values.automatic, debounceSeconds: values.debounceSeconds, updatedById: values.updatedById, updatedAt: new Date() } })
      .returning();
    return row;
  }

  automaticProjects() {
    return this.database.db.select().from(refreshSettings).where(eq(refreshSettings.automatic, true)).limit(200);
  }

  async userRow(id: string) {
    const [row] = await this.database.db.select().from(users).where(eq(users.id, id));
    return row ?? null;
  }
}
