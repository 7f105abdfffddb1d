import { Injectable } from '@nestjs/common';
import { and, asc, eq, inArray, sql } from 'drizzle-orm';
import { DatabaseService, Executor } from '../database/database.service';
import { segments } from '../database/schema';

export type SegmentRow = typeof segments.$inferSelect;

@Injectable()
export class SegmentsRepository {
  constructor(private readonly database: DatabaseService) {}

  async findById(id: string, executor: Executor = this.database.db): Promise<SegmentRow | undefined> {
    const [row] = await executor.select().from(segments).where(eq(segments.id, id)).limit(1);
    return row;
  }

  findByIds(ids: readonly string[], executor: Executor = this.database.db): Promise<SegmentRow[]> {
    if (ids.length === 0) return Promise.resolve([]);
    return executor.select().from(segments).where(inArray(segments.id, [...ids]));
  }

  listForProject(projectId: string, executor: Executor = this.database.db): Promise<SegmentRow[]> {
    return executor.select().from(segments).where(eq(segments.projectId, projectId)).orderBy(asc(segments.startKm));
  }

  async insert(values: typeof segments.$inferInsert, executor: Executor = this.database.db): Promise<SegmentRow> {
    const [row] = await executor.insert(segments).values(values).returning();
    return row;
  }

  async update(id: string, version: number, values: Partial<typeof segments.$inferInsert>, executor: Executor) {
    const [row] = await executor
      .update(segments)
      .set({ ...values, version: sql`${segments.version} + 1`, updatedAt: new Date() })
      .where(and(eq(segments.id, id), eq(segments.version, version)))
      .returning();
    return row;
  }

  async delete(id: string, executor: Executor): Promise<void> {
    await executor.delete(segments).where(eq(segments.id, id));
  }
}
