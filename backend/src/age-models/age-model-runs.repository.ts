import { Injectable } from '@nestjs/common';
import { and, desc, eq, inArray, lt, sql } from 'drizzle-orm';
import { DatabaseService, Executor } from '../database/database.service';
import { ageModelRuns } from '../database/schema';

export type AgeModelRunRow = typeof ageModelRuns.$inferSelect;

@Injectable()
export class AgeModelRunsRepository {
  constructor(private readonly database: DatabaseService) {}

  async insert(values: typeof ageModelRuns.$inferInsert, executor: Executor = this.database.db): Promise<AgeModelRunRow> {
    const [row] = await executor.insert(ageModelRuns).values(values).returning();
    return row;
  }

  async findById(id: string, executor: Executor = this.database.db): Promise<AgeModelRunRow | undefined> {
    const [row] = await executor.select().from(ageModelRuns).where(eq(ageModelRuns.id, id)).limit(1);
    return row;
  }

  listForSite(siteId: string, executor: Executor = this.database.db): Promise<AgeModelRunRow[]> {
    return executor.select().from(ageModelRuns).where(eq(ageModelRuns.siteId, siteId)).orderBy(desc(ageModelRuns.createdAt)).limit(50);
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

  /** The newest successful run of each site. */
  async latestSucceededForSites(siteIds: string[], executor: Executor = this.database.db): Promise<AgeModelRunRow[]> {
    if (siteIds.length === 0) return [];
    return executor
      .selectDistinctOn([ageModelRuns.siteId])
      .from(ageModelRuns)
      .where(and(inArray(ageModelRuns.siteId, siteIds), eq(ageModelRuns.status, 'SUCCEEDED')))
      .orderBy(ageModelRuns.siteId, desc(ageModelRuns.createdAt));
  }

  /** Claim a queued run for a worker: QUEUED -> RUNNING, counting the attempt. */
  async claim(id: string): Promise<AgeModelRunRow | undefined> {
    const [row] = await this.database.db
      .update(ageModelRuns)
      .set({ status: 'RUNNING', attempts: sql`${ageModelRuns.attempts} + 1`, startedAt: new Date(), updatedAt: new Date(), progress: 0 })
      .where(and(eq(ageModelRuns.id, id), eq(ageModelRuns.status, 'QUEUED')))
      .returning();
    return row;
  }

  /** Progress doubles as the worker's heartbeat (updated_at). */
  async setProgress(id: string, progress: number): Promise<void> {
    await this.database.db
      .update(ageModelRuns)
      .set({ progress, updatedAt: new Date() })
      .where(and(eq(ageModelRuns.id, id), eq(ageModelRuns.status, 'RUNNING')));
  }

  async finish(id: string, values: Partial<typeof ageModelRuns.$inferInsert>): Promise<void> {
    await this.database.db
      .update(ageModelRuns)
      .set({ ...values, finishedAt: new Date(), updatedAt: new Date() })
      .where(and(eq(ageModelRuns.id, id), eq(ageModelRuns.status, 'RUNNING')));
  }

  async cancel(id: string): Promise<AgeModelRunRow | undefined> {
    const [row] = await this.database.db
      .update(ageModelRuns)
      .set({ status: 'CANCELLED', message: 'cancelled by a user', finishedAt: new Date(), updatedAt: new Date() })
      .where(and(eq(ageModelRuns.id, id), inArray(ageModelRuns.status, ['QUEUED', 'RUNNING'])))
      .returning();
    return row;
  }

  async statusOf(id: string): Promise<AgeModelRunRow['status'] | undefined> {
    const [row] = await this.database.db.select({ status: ageModelRuns.status }).from(ageModelRuns).where(eq(ageModelRuns.id, id));
    return row?.status;
  }

  /** Runs whose worker stopped sending heartbeats. */
  listAbandoned(heartbeatBefore: Date): Promise<AgeModelRunRow[]> {
    return this.database.db
      .select()
      .from(ageModelRuns)
      .where(and(eq(ageModelRuns.status, 'RUNNING'), lt(ageModelRuns.updatedAt, heartbeatBefore)));
  }

  async requeue(id: string): Promise<boolean> {
    const rows = await this.database.db
      .update(ageModelRuns)
      .set({ status: 'QUEUED', progress: 0, message: 'the worker stopped during the run; queued again', updatedAt: new Date() })
      .where(and(eq(ageModelRuns.id, id), eq(ageModelRuns.status, 'RUNNING')))
      .returning({ id: ageModelRuns.id });
    return rows.length > 0;
  }

  async fail(id: string, message: string): Promise<void> {
    await this.database.db
      .update(ageModelRuns)
      .set({ status: 'FAILED', message, finishedAt: new Date(), updatedAt: new Date() })
      .where(and(eq(ageModelRuns.id, id), inArray(ageModelRuns.status, ['RUNNING', 'QUEUED'])));
  }
}
