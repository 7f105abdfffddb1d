import { Injectable } from '@nestjs/common';
import { and, eq, inArray, sql } from 'drizzle-orm';
import { DatabaseService, Executor } from '../database/database.service';
import { downstreamRunIds } from '../age-models/downstream-runs';
import { ageModelRuns, downstreamRunChoices, eventHorizons, hypotheses, projects, recurrenceAnalyses, releases, resultInputs, samples, segments, sites, ties, units, users } from '../database/schema';
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

  /** The run each site uses downstream (`downstreamRunIds`), and whether it is the site's chosen run. */
  downstreamRuns(siteIds: readonly string[], executor: Executor = this.database.db) {
    if (siteIds.length === 0) return Promise.resolve([]);
    return executor
      .select({ id: ageModelRuns.id, siteId: ageModelRuns.siteId, chosen: sql<boolean>`${downstreamRunChoices.siteId} is not null` })
      .from(ageModelRuns)
      .leftJoin(downstreamRunChoices, and(eq(downstreamRunChoices.siteId, ageModelRuns.siteId), eq(downstreamRunChoices.ageModelRunId, ageModelRuns.id)))
      .where(inArray(ageModelRuns.id, downstreamRunIds(executor, inArray(sites.id, [...siteIds]))));
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

  /** Event horizons with their site's name, for naming rows. */
  eventHorizonNames(ids: readonly string[], executor: Executor = this.database.db) {
    if (ids.length === 0) return Promise.resolve([]);
    return executor
      .select({ id: eventHorizons.id, name: eventHorizons.name, siteId: sites.id, siteName: sites.name })
      .from(eventHorizons)
      .innerJoin(sites, eq(sites.id, eventHorizons.siteId))
      .where(inArray(eventHorizons.id, [...ids]));
  }

  tiesOf(hypothesisId: string, executor: Executor = this.database.db) {
    return executor.select({ id: ties.id, eventAId: ties.eventAId, eventBId: ties.eventBId }).from(ties).where(eq(ties.hypothesisId, hypothesisId));
  }

  async projectOf(projectId: string, executor: Executor = this.database.db) {
    const [row] = await executor.select({ id: projects.id, name: projects.name, tectonicSetting: projects.tectonicSetting }).from(projects).where(eq(projects.id, projectId));
    return row;
  }

  /** Analyses pinned to a release, oldest first. */
  analysesOfRelease(releaseId: string, executor: Executor = this.database.db) {
    return executor.select({ id: recurrenceAnalyses.id, status: recurrenceAnalyses.status }).from(recurrenceAnalyses).where(eq(recurrenceAnalyses.releaseId, releaseId)).orderBy(recurrenceAnalyses.createdAt);
  }

  segmentName(id: string | null, executor: Executor = this.database.db): Promise<string | null> {
    if (!id) return Promise.resolve(null);
    return executor.select({ name: segments.name }).from(segments).where(eq(segments.id, id)).then((rows) => rows[0]?.name ?? null);
  }

  /**
   * A person's name for each id that is a site, unit, event horizon, sample, segment, hypothesis,
   * release, member, age model run or recurrence analysis (runs and analyses by what they are of).
   */
  async namesOf(ids: readonly string[], executor: Executor = this.database.db): Promise<Map<string, string>> {
    const names = new Map<string, string>();
    if (ids.length === 0) return names;
    const list = [...ids];
    const add = (rows: { id: string; name: string | null }[]) => rows.forEach((r) => r.name && names.set(r.id, r.name));
    add(await executor.select({ id: sites.id, name: sites.name }).from(sites).where(inArray(sites.id, list)));
    add(await executor.select({ id: units.id, name: sql<string>`${sites.name} || ': ' || ${units.name}` }).from(units).innerJoin(sites, eq(sites.id, units.siteId)).where(inArray(units.id, list)));
    add(await executor.select({ id: eventHorizons.id, name: sql<string>`${sites.name} || ': ' || ${eventHorizons.name}` }).from(eventHorizons).innerJoin(sites, eq(sites.id, eventHorizons.siteId)).where(inArray(eventHorizons.id, list)));
    add(await executor.select({ id: samples.id, name: samples.labCode }).from(samples).where(inArray(samples.id, list)));
    add(await executor.select({ id: segments.id, name: segments.name }).from(segments).where(inArray(segments.id, list)));
    add(await executor.select({ id: hypotheses.id, name: hypotheses.name }).from(hypotheses).where(inArray(hypotheses.id, list)));
    add(await executor.select({ id: releases.id, name: sql<string>`'release ' || ${releases.number}` }).from(releases).where(inArray(releases.id, list)));
    add(await executor.select({ id: users.id, name: users.displayName }).from(users).where(inArray(users.id, list)));
    add(await executor.select({ id: ageModelRuns.id, name: sql<string>`'age model run of ' || ${sites.name}` }).from(ageModelRuns).innerJoin(sites, eq(sites.id, ageModelRuns.siteId)).where(inArray(ageModelRuns.id, list)));
    add(
      await executor
        .select({ id: recurrenceAnalyses.id, name: sql<string>`'recurrence analysis of ' || coalesce(${segments.name}, ${sites.name}, 'a deleted subject')` })
        .from(recurrenceAnalyses)
        .leftJoin(segments, eq(segments.id, recurrenceAnalyses.segmentId))
        .leftJoin(sites, eq(sites.id, recurrenceAnalyses.siteId))
        .where(inArray(recurrenceAnalyses.id, list)),
    );
    return names;
  }
}
