import { Injectable } from '@nestjs/common';
import { asc, eq, sql } from 'drizzle-orm';
import { DatabaseService, Executor } from '../database/database.service';
import { labSheetColumnChoices } from '../database/schema';

export type ColumnChoiceRow = typeof labSheetColumnChoices.$inferSelect;

/** A project's remembered lab-sheet header choices (the only SQL on that table). */
@Injectable()
export class ColumnChoicesRepository {
  constructor(private readonly database: DatabaseService) {}

  listForProject(projectId: string, executor: Executor = this.database.db): Promise<ColumnChoiceRow[]> {
    return executor
      .select()
      .from(labSheetColumnChoices)
      .where(eq(labSheetColumnChoices.projectId, projectId))
      .orderBy(asc(labSheetColumnChoices.headerKey));
  }

  /** Remember these choices, replacing earlier ones for the same headers. */
  async upsert(rows: (typeof labSheetColumnChoices.$inferInsert)[], executor: Executor): Promise<void> {
    if (rows.length === 0) return;
    await executor
      .insert(labSheetColumnChoices)
      .values(rows)
      .onConflictDoUpdate({
        target: [labSheetColumnChoices.projectId, labSheetColumnChoices.headerKey],
        set: {
          header: sql`excluded.header`,
          field: sql`excluded.field`,
          chosenBy: sql`excluded.chosen_by`,
          updatedAt: sql`now()`,
        },
      });
  }
}
