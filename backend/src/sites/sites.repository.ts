import { Injectable } from '@nestjs/common';
import { and, asc, eq, inArray, sql } from 'drizzle-orm';
import { DatabaseService, Executor } from '../database/database.service';
import { sites } from '../database/schema';

export type SiteRow = typeof sites.$inferSelect;

@Injectable()
export class SitesRepository {
  constructor(private readonly database: DatabaseService) {}

  async findById(id: string, executor: Executor = this.database.db): Promise<SiteRow | undefined> {
    const [row] = await executor.select().from(sites).where(eq(sites.id, id)).limit(1);
    return row;
  }

  findByIds(ids: readonly string[], executor: Executor = this.database.db): Promise<SiteRow[]> {
    if (ids.length === 0) return Promise.resolve([]);
    return executor.select().from(sites).where(inArray(sites.id, [...ids]));
  }

  listForProject(projectId: string, executor: Executor = this.database.db): Promise<SiteRow[]> {
    return executor.select().from(sites).where(eq(sites.projectId, projectId)).orderBy(asc(sites.alongStrikeKm), asc(sites.name));
  }

  listForSegment(segmentId: string, executor: Executor = this.database.db): Promise<SiteRow[]> {
    return executor.select().from(sites).where(eq(sites.segmentId, segmentId)).orderBy(asc(sites.alongStrikeKm));
  }

  async insert(values: typeof sites.$inferInsert, executor: Executor = this.database.db): Promise<SiteRow> {
    const [row] = await executor.insert(sites).values(values).returning();
    return row;
  }

  async update(id: string, version: number, values: Partial<typeof sites.$inferInsert>, executor: Executor) {
    const [row] = await executor
      .update(sites)
      .set({ ...values, version: sql`${sites.version} + 1`, updatedAt: new Date() })
      .where(and(eq(sites.id, id), eq(sites.version, version)))
      .returning();
    return row;
  }

  async delete(id: string, executor: Executor): Promise<void> {
    await executor.delete(sites).where(eq(sites.id, id));
  }
}
