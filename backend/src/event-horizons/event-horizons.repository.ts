import { Injectable } from '@nestjs/common';
import { and, asc, eq, inArray, sql } from 'drizzle-orm';
import { DatabaseService, Executor } from '../database/database.service';
import { eventHorizons, sites, units } from '../database/schema';

export type EventHorizonRow = typeof eventHorizons.$inferSelect;

@Injectable()
export class EventHorizonsRepository {
  constructor(private readonly database: DatabaseService) {}

  async findWithProject(id: string, executor: Executor = this.database.db) {
    const [row] = await executor
      .select({ eventHorizon: eventHorizons, projectId: sites.projectId })
      .from(eventHorizons)
      .innerJoin(sites, eq(sites.id, eventHorizons.siteId))
      .where(eq(eventHorizons.id, id))
      .limit(1);
    return row;
  }

  async findById(id: string, executor: Executor = this.database.db): Promise<EventHorizonRow | undefined> {
    const [row] = await executor.select().from(eventHorizons).where(eq(eventHorizons.id, id)).limit(1);
    return row;
  }

  findByIds(ids: string[], executor: Executor = this.database.db): Promise<EventHorizonRow[]> {
    if (ids.length === 0) return Promise.resolve([]);
    return executor.select().from(eventHorizons).where(inArray(eventHorizons.id, ids));
  }

  /** Oldest first: by the position of the unit below. */
  async listForSite(siteId: string, executor: Executor = this.database.db): Promise<EventHorizonRow[]> {
    const rows = await executor
      .select({ eventHorizon: eventHorizons })
      .from(eventHorizons)
      .innerJoin(units, eq(units.id, eventHorizons.unitBelowId))
      .where(eq(eventHorizons.siteId, siteId))
      .orderBy(asc(units.position), asc(eventHorizons.name));
    return rows.map((r) => r.eventHorizon);
  }

  async insert(values: typeof eventHorizons.$inferInsert, executor: Executor): Promise<EventHorizonRow> {
    const [row] = await executor.insert(eventHorizons).values(values).returning();
    return row;
  }

  async update(id: string, version: number, values: Partial<typeof eventHorizons.$inferInsert>, executor: Executor) {
    const [row] = await executor
      .update(eventHorizons)
      .set({ ...values, version: sql`${eventHorizons.version} + 1`, updatedAt: new Date() })
      .where(and(eq(eventHorizons.id, id), eq(eventHorizons.version, version)))
      .returning();
    return row;
  }

  async delete(id: string, executor: Executor): Promise<void> {
    await executor.delete(eventHorizons).where(eq(eventHorizons.id, id));
  }
}
