import { Injectable } from '@nestjs/common';
import { and, eq, inArray } from 'drizzle-orm';
import { DatabaseService, Executor } from '../database/database.service';
import { ageModelRuns, hypotheses, resultInputs, sites } from '../database/schema';
import type { InputKind, ResultKind } from './staleness';

export type ResultInputRow = typeof resultInputs.$inferSelect;

/** Reads and writes of recorded inputs, and the few current revisions staleness compares them with. */
@Injectable()
export class ProvenanceRepository {
  constructor(private readonly database: DatabaseService) {}

  async insertInputs(rows: (typeof resultInputs.$inferInsert)[], executor: Executor = this.database.db): Promise<void> {
    if (rows.length === 0) return;
    await executor.insert(resultInputs).values(rows).onConflictDoNothing();
  }

  /** Recorded inputs of results of one kind. */
  inputsOf(kind: ResultKind, ids: readonly string[], executor: Executor = this.database.db): Promise<ResultInputRow[]> {
    if (ids.length === 0) return Promise.resolve([]);
    return executor
      .select()
      .from(resultInputs)
      .where(and(eq(resultInputs.resultKind, kind), inArray(resultInputs.resultId, [...ids])));
  }

  /** Results of one kind that recorded any of the given inputs (the way downstream). */
  resultsUsing(resultKind: ResultKind, inputKind: InputKind, inputIds: readonly string[], executor: Executor = this.database.db) {
    if (inputIds.length === 0) return Promise.resolve([]);
    return executor
      .selectDistinct({ resultId: resultInputs.resultId })
      .from(resultInputs)
      .where(and(eq(resultInputs.resultKind, resultKind), eq(resultInputs.inputKind, inputKind), inArray(resultInputs.inputId, [...inputIds])));
  }

  /** Age model runs' own recorded input: their site and its column revision when queued. */
  runInputs(runIds: readonly string[], executor: Executor = this.database.db) {
    if (runIds.length === 0) return Promise.resolve([]);
    return executor
      .select({ id: ageModelRuns.id, siteId: ageModelRuns.siteId, columnRevision: ageModelRuns.columnRevision, siteName: sites.name, createdAt: ageModelRuns.createdAt })
      .from(ageModelRuns)
      .innerJoin(sites, eq(sites.id, ageModelRuns.siteId))
      .where(inArray(ageModelRuns.id, [...runIds]));
  }

  sitesByIds(ids: readonly string[], executor: Executor = this.database.db) {
    if (ids.length === 0) return Promise.resolve([]);
    return executor
      .select({ id: sites.id, name: sites.name, columnRevision: sites.columnRevision, projectId: sites.projectId })
      .from(sites)
      .where(inArray(sites.id, [...ids]));
  }

  hypothesesByIds(ids: readonly string[], executor: Executor = this.database.db) {
    if (ids.length === 0) return Promise.resolve([]);
    return executor
      .select({ id: hypotheses.id, name: hypotheses.name, version: hypotheses.version })
      .from(hypotheses)
      .where(inArray(hypotheses.id, [...ids]));
  }

  /** Whole hypothesis rows (for `RecurrenceInputs.hypothesis`). */
  hypothesisRows(ids: readonly string[], executor: Executor = this.database.db) {
    if (ids.length === 0) return Promise.resolve([]);
    return executor.select().from(hypotheses).where(inArray(hypotheses.id, [...ids]));
  }
}
