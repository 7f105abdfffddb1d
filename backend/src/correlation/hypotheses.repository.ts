import { Injectable } from '@nestjs/common';
import { aliasedTable, and, asc, desc, eq, inArray, ne, or, sql } from 'drizzle-orm';
import type { AgeModelRunRow } from '../age-models/age-model-runs.repository';
import { DatabaseService, Executor } from '../database/database.service';
import { ageModelRuns, eventHorizons, hypotheses, sites, ties, units } from '../database/schema';
import type { EventHorizonRow } from '../event-horizons/event-horizons.repository';
import type { SiteRow } from '../sites/sites.repository';

export type HypothesisRow = typeof hypotheses.$inferSelect;
export type TieRow = typeof ties.$inferSelect;

/** A tie with both of its event horizons, as the API shows it. */
export interface TieView extends TieRow {
  eventA: EventHorizonRow;
  eventB: EventHorizonRow;
}

/** An event horizon of a project with what correlation needs of its column and site. */
export interface ProjectEventRow {
  eventHorizon: EventHorizonRow;
  /** Position of the unit below (1 = base), the event's order in its column. */
  unitBelowPosition: number;
  /** Only what the checks and their messages use: a 600-event project would otherwise map 600 full site rows. */
  site: Pick<SiteRow, 'id' | 'name' | 'alongStrikeKm'>;
}

const eventA = aliasedTable(eventHorizons, 'event_a');
const eventB = aliasedTable(eventHorizons, 'event_b');

@Injectable()
export class HypothesesRepository {
  constructor(private readonly database: DatabaseService) {}

  async findById(id: string, executor: Executor = this.database.db): Promise<HypothesisRow | undefined> {
    const [row] = await executor.select().from(hypotheses).where(eq(hypotheses.id, id)).limit(1);
    return row;
  }

  /** Lock a hypothesis row for the rest of the transaction (ties are checked against each other). */
  async lock(id: string, executor: Executor): Promise<HypothesisRow | undefined> {
    const [row] = await executor.select().from(hypotheses).where(eq(hypotheses.id, id)).for('update');
    return row;
  }

  /** Lock every hypothesis of a project, so two "set preferred" calls run one after the other. */
  async lockProject(projectId: string, executor: Executor): Promise<HypothesisRow[]> {
    return executor.select().from(hypotheses).where(eq(hypotheses.projectId, projectId)).orderBy(asc(hypotheses.id)).for('update');
  }

  listForProject(projectId: string, executor: Executor = this.database.db): Promise<HypothesisRow[]> {
    return executor.select().from(hypotheses).where(eq(hypotheses.projectId, projectId)).orderBy(asc(hypotheses.createdAt), asc(hypotheses.name));
  }

  async preferredForProject(projectId: string, executor: Executor = this.database.db): Promise<HypothesisRow | undefined> {
    const [row] = await executor
      .select()
      .from(hypotheses)
      .where(and(eq(hypotheses.projectId, projectId), eq(hypotheses.preferred, true)))
      .limit(1);
    return row;
  }

  async insert(values: typeof hypotheses.$inferInsert, executor: Executor): Promise<HypothesisRow> {
    const [row] = await executor.insert(hypotheses).values(values).returning();
    return row;
  }

  async update(id: string, values: Partial<typeof hypotheses.$inferInsert>, executor: Executor): Promise<HypothesisRow> {
    const [row] = await executor.update(hypotheses).set({ ...values, updatedAt: new Date() }).where(eq(hypotheses.id, id)).returning();
    return row;
  }

  /** Every change of ties makes a new version of the hypothesis. */
  async bumpVersion(id: string, executor: Executor): Promise<HypothesisRow> {
    const [row] = await executor
      .update(hypotheses)
      .set({ version: sql`${hypotheses.version} + 1`, updatedAt: new Date() })
      .where(eq(hypotheses.id, id))
      .returning();
    return row;
  }

  /** Unset "preferred" on the project's other hypotheses; the rows changed. */
  unsetOtherPreferred(projectId: string, keepId: string, executor: Executor): Promise<HypothesisRow[]> {
    return executor
      .update(hypotheses)
      .set({ preferred: false, updatedAt: new Date() })
      .where(and(eq(hypotheses.projectId, projectId), ne(hypotheses.id, keepId), eq(hypotheses.preferred, true)))
      .returning();
  }

  async delete(id: string, executor: Executor): Promise<void> {
    await executor.delete(hypotheses).where(eq(hypotheses.id, id));
  }

  async findTie(id: string, executor: Executor = this.database.db): Promise<TieRow | undefined> {
    const [row] = await executor.select().from(ties).where(eq(ties.id, id)).limit(1);
    return row;
  }

  listTies(hypothesisId: string, executor: Executor = this.database.db): Promise<TieRow[]> {
    return executor.select().from(ties).where(eq(ties.hypothesisId, hypothesisId)).orderBy(asc(ties.createdAt), asc(ties.id));
  }

  /** Ties with both event horizons, in one query. */
  async listTieViews(hypothesisId: string, executor: Executor = this.database.db): Promise<TieView[]> {
    const rows = await executor
      .select({ tie: ties, eventA, eventB })
      .from(ties)
      .innerJoin(eventA, eq(eventA.id, ties.eventAId))
      .innerJoin(eventB, eq(eventB.id, ties.eventBId))
      .where(eq(ties.hypothesisId, hypothesisId))
      .orderBy(asc(ties.createdAt), asc(ties.id));
    return rows.map((row) => ({ ...row.tie, eventA: row.eventA, eventB: row.eventB }));
  }

  /** A tie between the two events in either direction, if the hypothesis has one. */
  async findTieBetween(hypothesisId: string, eventAId: string, eventBId: string, executor: Executor): Promise<TieRow | undefined> {
    const [row] = await executor
      .select()
      .from(ties)
      .where(
        and(
          eq(ties.hypothesisId, hypothesisId),
          or(and(eq(ties.eventAId, eventAId), eq(ties.eventBId, eventBId)), and(eq(ties.eventAId, eventBId), eq(ties.eventBId, eventAId))),
        ),
      )
      .limit(1);
    return row;
  }

  async insertTie(values: typeof ties.$inferInsert, executor: Executor): Promise<TieRow> {
    const [row] = await executor.insert(ties).values(values).returning();
    return row;
  }

  /** Copy every tie of `fromId` into `toId`; the new rows. */
  async copyTies(fromId: string, toId: string, executor: Executor): Promise<TieRow[]> {
    const source = await this.listTies(fromId, executor);
    if (source.length === 0) return [];
    return executor
      .insert(ties)
      .values(source.map(({ eventAId, eventBId, confidence, evidence, note }) => ({ hypothesisId: toId, eventAId, eventBId, confidence, evidence, note })))
      .returning();
  }

  async deleteTie(id: string, executor: Executor): Promise<void> {
    await executor.delete(ties).where(eq(ties.id, id));
  }

  /** Every event horizon of a project with its site and the position of its unit below. */
  async listProjectEvents(projectId: string, executor: Executor = this.database.db): Promise<ProjectEventRow[]> {
    return executor
      .select({ eventHorizon: eventHorizons, unitBelowPosition: units.position, site: { id: sites.id, name: sites.name, alongStrikeKm: sites.alongStrikeKm } })
      .from(eventHorizons)
      .innerJoin(sites, eq(sites.id, eventHorizons.siteId))
      .innerJoin(units, eq(units.id, eventHorizons.unitBelowId))
      .where(eq(sites.projectId, projectId))
      .orderBy(asc(sites.alongStrikeKm), asc(sites.name), asc(sites.id), asc(units.position), asc(eventHorizons.name));
  }
}
