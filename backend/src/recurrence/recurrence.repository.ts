import { Injectable } from '@nestjs/common';
import { and, desc, eq } from 'drizzle-orm';
import { DatabaseService, Executor } from '../database/database.service';
import { eventHorizons, hypotheses, projects, recurrenceAnalyses, releases, sites, ties, units } from '../database/schema';
import type { TectonicSetting } from '../database/schema/enums';
import { RunsRepository } from '../jobs/runs.repository';

export type RecurrenceAnalysisRow = typeof recurrenceAnalyses.$inferSelect;
export type HypothesisRow = typeof hypotheses.$inferSelect;
export type ReleaseRow = typeof releases.$inferSelect;

/** An event horizon with what the correlation checks need of its site and column. */
export interface ProjectEventRow {
  id: string;
  name: string;
  siteId: string;
  siteName: string;
  alongStrikeKm: number;
  /** Position of the unit below the horizon, counted from the base (larger is younger). */
  unitBelowPosition: number;
  /** Horizon quality, 1 (certain) to 4 (possible). */
  quality: number;
  /** The segment the site lies in, if any. */
  segmentId: string | null;
}

/**
 * Recurrence analyses, and the few reads of hypotheses, ties, releases and event horizons an
 * analysis needs (kept here so this module does not depend on the correlation feature module).
 */
@Injectable()
export class RecurrenceRepository {
  constructor(
    private readonly database: DatabaseService,
    private readonly runs: RunsRepository,
  ) {}

  async insert(values: typeof recurrenceAnalyses.$inferInsert, executor: Executor = this.database.db): Promise<RecurrenceAnalysisRow> {
    const [row] = await executor.insert(recurrenceAnalyses).values(values).returning();
    return row;
  }

  async findById(id: string, executor: Executor = this.database.db): Promise<RecurrenceAnalysisRow | undefined> {
    const [row] = await executor.select().from(recurrenceAnalyses).where(eq(recurrenceAnalyses.id, id)).limit(1);
    return row;
  }

  listForProject(projectId: string, executor: Executor = this.database.db): Promise<RecurrenceAnalysisRow[]> {
    return executor
      .select()
      .from(recurrenceAnalyses)
      .where(eq(recurrenceAnalyses.projectId, projectId))
      .orderBy(desc(recurrenceAnalyses.createdAt))
      .limit(100);
  }

  /** A user's cancel; undefined when the analysis had already ended. */
  cancel(id: string, executor: Executor = this.database.db): Promise<RecurrenceAnalysisRow | undefined> {
    return this.runs.cancel(recurrenceAnalyses, id, executor);
  }

  async findHypothesis(id: string, executor: Executor = this.database.db): Promise<HypothesisRow | undefined> {
    const [row] = await executor.select().from(hypotheses).where(eq(hypotheses.id, id)).limit(1);
    return row;
  }

  async preferredHypothesis(projectId: string, executor: Executor = this.database.db): Promise<HypothesisRow | undefined> {
    const [row] = await executor
      .select()
      .from(hypotheses)
      .where(and(eq(hypotheses.projectId, projectId), eq(hypotheses.preferred, true)))
      .limit(1);
    return row;
  }

  tiesOf(hypothesisId: string, executor: Executor = this.database.db): Promise<{ id: string; eventAId: string; eventBId: string; confidence: number }[]> {
    return executor
      .select({ id: ties.id, eventAId: ties.eventAId, eventBId: ties.eventBId, confidence: ties.confidence })
      .from(ties)
      .where(eq(ties.hypothesisId, hypothesisId));
  }

  async findRelease(id: string, executor: Executor = this.database.db): Promise<ReleaseRow | undefined> {
    const [row] = await executor.select().from(releases).where(eq(releases.id, id)).limit(1);
    return row;
  }

  async tectonicSetting(projectId: string, executor: Executor = this.database.db): Promise<TectonicSetting> {
    const [row] = await executor.select({ setting: projects.tectonicSetting }).from(projects).where(eq(projects.id, projectId));
    return row?.setting ?? 'SUBDUCTION_INTERFACE';
  }

  /** Every event horizon of a project's sites, with its site and the position of the unit below it. */
  eventsOfProject(projectId: string, executor: Executor = this.database.db): Promise<ProjectEventRow[]> {
    return executor
      .select({
        id: eventHorizons.id,
        name: eventHorizons.name,
        siteId: sites.id,
        siteName: sites.name,
        alongStrikeKm: sites.alongStrikeKm,
        unitBelowPosition: units.position,
        quality: eventHorizons.quality,
        segmentId: sites.segmentId,
      })
      .from(eventHorizons)
      .innerJoin(sites, eq(sites.id, eventHorizons.siteId))
      .innerJoin(units, eq(units.id, eventHorizons.unitBelowId))
      .where(eq(sites.projectId, projectId));
  }
}
