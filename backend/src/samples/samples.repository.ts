import { Injectable } from '@nestjs/common';
import { and, asc, eq, getTableColumns, inArray, sql } from 'drizzle-orm';
import { DatabaseService, Executor } from '../database/database.service';
import { samples } from '../database/schema';

export type SampleRow = typeof samples.$inferSelect;
export type SampleInsert = typeof samples.$inferInsert;

@Injectable()
export class SamplesRepository {
  constructor(private readonly database: DatabaseService) {}

  async findById(id: string, executor: Executor = this.database.db): Promise<SampleRow | undefined> {
    const [row] = await executor.select().from(samples).where(eq(samples.id, id)).limit(1);
    return row;
  }

  listForSite(siteId: string, executor: Executor = this.database.db): Promise<SampleRow[]> {
    return executor.select().from(samples).where(eq(samples.siteId, siteId)).orderBy(asc(samples.depthM), asc(samples.labCode));
  }

  /** Lab codes of the project that are among `labCodes` (to report duplicates before writing). */
  async existingLabCodes(projectId: string, labCodes: string[], executor: Executor = this.database.db): Promise<Set<string>> {
    if (labCodes.length === 0) return new Set();
    const rows = await executor
      .select({ labCode: samples.labCode })
      .from(samples)
      .where(and(eq(samples.projectId, projectId), inArray(samples.labCode, labCodes)));
    return new Set(rows.map((r) => r.labCode));
  }

  async insert(values: SampleInsert, executor: Executor): Promise<SampleRow> {
    const [row] = await executor.insert(samples).values(values).returning();
    return row;
  }

  /** Bulk insert in chunks (PostgreSQL caps bind parameters at 65,535 per statement). */
  async insertMany(values: SampleInsert[], executor: Executor): Promise<SampleRow[]> {
    const rows: SampleRow[] = [];
    for (let i = 0; i < values.length; i += 1000) {
      rows.push(...(await executor.insert(samples).values(values.slice(i, i + 1000)).returning()));
    }
    return rows;
  }

  /**
   * Bulk insert for lab-sheet imports, returning only ids. Each chunk travels as one JSON
   * parameter that PostgreSQL unpacks with jsonb_to_recordset: binding every cell of thousands of
   * rows (each with a cached calibration of ~10 kB) through the query builder costs several times
   * more, and so does sending the rows back.
   */
  async insertManyReturningIds(values: SampleInsert[], executor: Executor): Promise<{ id: string; labCode: string }[]> {
    if (values.length === 0) return [];
    const columns = Object.entries(getTableColumns(samples)).filter(([key]) => values.some((v) => key in v));
    const names = sql.raw(columns.map(([, column]) => `"${column.name}"`).join(', '));
    const recordType = sql.raw(columns.map(([, column]) => `"${column.name}" ${column.getSQLType()}`).join(', '));
    const ids: { id: string; labCode: string }[] = [];
    for (let i = 0; i < values.length; i += 1000) {
      const records = values.slice(i, i + 1000).map((value) => {
        const record: Record<string, unknown> = {};
        for (const [key, column] of columns) record[column.name] = value[key as keyof SampleInsert] ?? null;
        return record;
      });
      const result = await executor.execute<{ id: string; lab_code: string }>(
        sql`insert into samples (${names}) select ${names} from jsonb_to_recordset(${JSON.stringify(records)}::jsonb) as r(${recordType}) returning id, lab_code`,
      );
      ids.push(...result.rows.map((row) => ({ id: row.id, labCode: row.lab_code })));
    }
    return ids;
  }

  async update(id: string, version: number, values: Partial<SampleInsert>, executor: Executor) {
    const [row] = await executor
      .update(samples)
      .set({ ...values, version: sql`${samples.version} + 1`, updatedAt: new Date() })
      .where(and(eq(samples.id, id), eq(samples.version, version)))
      .returning();
    return row;
  }

  async delete(id: string, executor: Executor): Promise<void> {
    await executor.delete(samples).where(eq(samples.id, id));
  }
}
