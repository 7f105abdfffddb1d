import { Injectable } from '@nestjs/common';
import { and, eq, inArray, lt, sql } from 'drizzle-orm';
import type { PgColumn, PgTable, PgUpdateSetSource } from 'drizzle-orm/pg-core';
import { DatabaseService, Executor } from '../database/database.service';
import type { JobStatus } from '../database/schema/enums';

/** A table whose rows are runs: an `id`, the `runState` columns and `updated_at`. */
export type RunTable = PgTable & {
  id: PgColumn;
  status: PgColumn;
  progress: PgColumn;
  message: PgColumn;
  attempts: PgColumn;
  startedAt: PgColumn;
  finishedAt: PgColumn;
  updatedAt: PgColumn;
};

/** A row of a run table. */
export type RunRow<Table extends RunTable> = Table['$inferSelect'];
/** Values to write to a run row. */
export type RunValues<Table extends RunTable> = Partial<Table['$inferInsert']>;
export type RunStatus = JobStatus;

/**
 * The lifecycle every kind of run shares, for any run table: claim, progress (the heartbeat),
 * finish, cancel, the reaper's reads and writes. Every transition is conditional on the status it
 * leaves, so two workers (or a worker and a user cancelling) never both win.
 */
@Injectable()
export class RunsRepository {
  constructor(private readonly database: DatabaseService) {}

  /** Claim a queued run for a worker: QUEUED -> RUNNING, counting the attempt. */
  async claim<T extends RunTable>(table: T, id: string): Promise<RunRow<T> | undefined> {
    const rows = await this.database.db
      .update(table)
      .set(values<T>({ status: 'RUNNING', attempts: sql`${table.attempts} + 1`, startedAt: new Date(), updatedAt: new Date(), progress: 0 }))
      .where(and(eq(table.id, id), eq(table.status, 'QUEUED')))
      .returning();
    return (rows as RunRow<T>[])[0];
  }

  /** Progress doubles as the worker's heartbeat (updated_at). */
  async setProgress(table: RunTable, id: string, progress: number): Promise<void> {
    await this.database.db
      .update(table)
      .set(values({ progress, updatedAt: new Date() }))
      .where(and(eq(table.id, id), eq(table.status, 'RUNNING')));
  }

  /** End a running run with `status` and whatever else it stores. */
  async finish<T extends RunTable>(table: T, id: string, status: 'SUCCEEDED' | 'FAILED', stored: RunValues<T>): Promise<void> {
    await this.database.db
      .update(table)
      .set(values<T>({ ...stored, status, finishedAt: new Date(), updatedAt: new Date() }))
      .where(and(eq(table.id, id), eq(table.status, 'RUNNING')));
  }

  /** A user's cancel of a queued or running run; undefined when it had already ended. */
  async cancel<T extends RunTable>(table: T, id: string, executor: Executor = this.database.db): Promise<RunRow<T> | undefined> {
    const rows = await executor
      .update(table)
      .set(values<T>({ status: 'CANCELLED', message: 'cancelled by a user', finishedAt: new Date(), updatedAt: new Date() }))
      .where(and(eq(table.id, id), inArray(table.status, ['QUEUED', 'RUNNING'])))
      .returning();
    return (rows as RunRow<T>[])[0];
  }

  async statusOf(table: RunTable, id: string): Promise<RunStatus | undefined> {
    const [row] = await this.database.db.select({ status: table.status }).from(table).where(eq(table.id, id));
    return row?.status as RunStatus | undefined;
  }

  /** Runs whose worker stopped sending heartbeats. */
  async listAbandoned(table: RunTable, heartbeatBefore: Date): Promise<{ id: string; attempts: number }[]> {
    const rows = await this.database.db
      .select({ id: table.id, attempts: table.attempts })
      .from(table)
      .where(and(eq(table.status, 'RUNNING'), lt(table.updatedAt, heartbeatBefore)));
    return rows as { id: string; attempts: number }[];
  }

  /** A silent running run back to QUEUED; false when it is no longer running. */
  async requeue(table: RunTable, id: string, message: string): Promise<boolean> {
    const rows = await this.database.db
      .update(table)
      .set(values({ status: 'QUEUED', progress: 0, message, updatedAt: new Date() }))
      .where(and(eq(table.id, id), eq(table.status, 'RUNNING')))
      .returning({ id: table.id });
    return rows.length > 0;
  }

  /** Give a run up (attempts spent): FAILED with `message`. */
  async fail(table: RunTable, id: string, message: string): Promise<void> {
    await this.database.db
      .update(table)
      .set(values({ status: 'FAILED', message, finishedAt: new Date(), updatedAt: new Date() }))
      .where(and(eq(table.id, id), inArray(table.status, ['RUNNING', 'QUEUED'])));
  }
}

/** Run-state values as Drizzle's update type for a table only known as a `RunTable`. */
function values<T extends RunTable>(set: Record<string, unknown>): PgUpdateSetSource<T> {
  return set as PgUpdateSetSource<T>;
}
