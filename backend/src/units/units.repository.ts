import { Injectable } from '@nestjs/common';
import { and, asc, eq, gte, sql } from 'drizzle-orm';
import { DatabaseService, Executor } from '../database/database.service';
import { sites, units } from '../database/schema';

export type UnitRow = typeof units.$inferSelect;

@Injectable()
export class UnitsRepository {
  constructor(private readonly database: DatabaseService) {}

  /** A unit with its site's project id, for access checks. */
  async findWithProject(id: string, executor: Executor = this.database.db) {
    const [row] = await executor
      .select({ unit: units, projectId: sites.projectId })
      .from(units)
      .innerJoin(sites, eq(sites.id, units.siteId))
      .where(eq(units.id, id))
      .limit(1);
    return row;
  }

  async findById(id: string, executor: Executor = this.database.db): Promise<UnitRow | undefined> {
    const [row] = await executor.select().from(units).where(eq(units.id, id)).limit(1);
    return row;
  }

  listForSite(siteId: string, executor: Executor = this.database.db): Promise<UnitRow[]> {
    return executor.select().from(units).where(eq(units.siteId, siteId)).orderBy(asc(units.position));
  }

  async insert(values: typeof units.$inferInsert, executor: Executor): Promise<UnitRow> {
    const [row] = await executor.insert(units).values(values).returning();
    return row;
  }

  async update(id: string, version: number, values: Partial<typeof units.$inferInsert>, executor: Executor) {
    const [row] = await executor
      .update(units)
      .set({ ...values, version: sql`${units.version} + 1`, updatedAt: new Date() })
      .where(and(eq(units.id, id), eq(units.version, version)))
      .returning();
    return row;
  }

  /**
   * Move every unit of a site at `fromPosition` or above up by one, bumping their versions. Two
   * statements, because PostgreSQL checks the (site, position) unique constraint row by row: the
   * first lifts the rows clear of every used position, the second sets them down one higher.
   */
  async shiftUp(siteId: string, fromPosition: number, executor: Executor): Promise<UnitRow[]> {
    const lift = 1_000_000;
    await executor
      .update(units)
      .set({ position: sql`${units.position} + ${lift}` })
      .where(and(eq(units.siteId, siteId), gte(units.position, fromPosition)));
    return executor
      .update(units)
      .set({ position: sql`${units.position} - ${lift - 1}`, version: sql`${units.version} + 1`, updatedAt: new Date() })
      .where(and(eq(units.siteId, siteId), gte(units.position, fromPosition + lift)))
      .returning();
  }

  async delete(id: string, executor: Executor): Promise<void> {
    await executor.delete(units).where(eq(units.id, id));
  }
}
