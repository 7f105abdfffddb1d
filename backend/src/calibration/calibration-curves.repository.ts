import { Injectable } from '@nestjs/common';
import { asc } from 'drizzle-orm';
import { DatabaseService, Executor } from '../database/database.service';
import { calibrationCurves } from '../database/schema';

export type CalibrationCurveRow = typeof calibrationCurves.$inferSelect;

@Injectable()
export class CalibrationCurvesRepository {
  constructor(private readonly database: DatabaseService) {}

  list(executor: Executor = this.database.db): Promise<CalibrationCurveRow[]> {
    return executor.select().from(calibrationCurves).orderBy(asc(calibrationCurves.code));
  }

  async upsert(values: typeof calibrationCurves.$inferInsert, executor: Executor): Promise<CalibrationCurveRow> {
    const [row] = await executor
      .insert(calibrationCurves)
      .values(values)
      .onConflictDoUpdate({ target: calibrationCurves.code, set: { ...values, updatedAt: new Date() } })
      .returning();
    return row;
  }
}
