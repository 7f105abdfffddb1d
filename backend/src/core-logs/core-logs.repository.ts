import { Injectable } from '@nestjs/common';
import { asc, eq, inArray } from 'drizzle-orm';
import { DatabaseService, Executor } from '../database/database.service';
import { coreLogs } from '../database/schema';

export type CoreLogRow = typeof coreLogs.$inferSelect;

@Injectable()
export class CoreLogsRepository {
  constructor(private readonly database: DatabaseService) {}

  async findById(id: string, executor: Executor = this.database.db): Promise<CoreLogRow | undefined> {
    const [row] = await executor.select().from(coreLogs).where(eq(coreLogs.id, id)).limit(1);
    return row;
  }

  /** A site's logs by name. */
  listForSite(siteId: string, executor: Executor = this.database.db): Promise<CoreLogRow[]> {
    return executor.select().from(coreLogs).where(eq(coreLogs.siteId, siteId)).orderBy(asc(coreLogs.name));
  }

  /** The logs of several sites (tie suggestions read two cores at once). */
  listForSites(siteIds: readonly string[], executor: Executor = this.database.db): Promise<CoreLogRow[]> {
    if (siteIds.length === 0) return Promise.resolve([]);
    return executor.select().from(coreLogs).where(inArray(coreLogs.siteId, [...siteIds])).orderBy(asc(coreLogs.name));
  }

  async insert(values: typeof coreLogs.$inferInsert, executor: Executor): Promise<CoreLogRow> {
    const [row] = await executor.insert(coreLogs).values(values).returning();
    return row;
  }

  async delete(id: string, executor: Executor): Promise<void> {
    await executor.delete(coreLogs).where(eq(coreLogs.id, id));
  }
}
