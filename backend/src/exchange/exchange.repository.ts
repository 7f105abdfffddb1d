import { Injectable } from '@nestjs/common';
import { asc, eq, inArray, sql } from 'drizzle-orm';
import { randomUUID } from 'node:crypto';
import { DatabaseService, Executor } from '../database/database.service';
import {
  eventHorizons,
  hypotheses,
  memberships,
  projects,
  samples,
  segments,
  sites,
  ties,
  units,
} from '../database/schema';
import { StoredCalibration } from '../database/schema/samples';
import { ProjectRecords } from './bundle-builder';
import { BundleSample, ProjectBundle } from './bundle-format';

export type ProjectRow = typeof projects.$inferSelect;

/** A sample's stored calibration or the reason it has none, as the import computes it. */
export type SampleCalibrationOutcome = { calibration: StoredCalibration | null; calibrationError: string | null };

const CHUNK = 500;

async function insertChunked<T>(rows: T[], write: (chunk: T[]) => Promise<unknown>): Promise<void> {
  for (let i = 0; i < rows.length; i += CHUNK) await write(rows.slice(i, i + CHUNK));
}

@Injectable()
export class ExchangeRepository {
  constructor(private readonly database: DatabaseService) {}

  /**
   * Make the open transaction read one snapshot of the database, so a bundle read in several
   * queries is consistent. Must be the transaction's first statement.
   */
  async useSnapshotIsolation(executor: Executor): Promise<void> {
    await executor.execute(sql`set transaction isolation level repeatable read`);
  }

  async findProject(id: string, executor: Executor = this.database.db): Promise<ProjectRow | undefined> {
    const [row] = await executor.select().from(projects).where(eq(projects.id, id)).limit(1);
    return row;
  }

  /** Every record of a project that a bundle carries. */
  async loadProjectRecords(projectId: string, executor: Executor = this.database.db): Promise<ProjectRecords | undefined> {
    const project = await this.findProject(projectId, executor);
    if (!project) return undefined;
    const siteRows = await executor.select().from(sites).where(eq(sites.projectId, projectId)).orderBy(asc(sites.id));
    const siteIds = siteRows.map((s) => s.id);
    const hypothesisRows = await executor.select().from(hypotheses).where(eq(hypotheses.projectId, projectId));
    const hypothesisIds = hypothesisRows.map((h) => h.id);
    return {
      project: { name: project.name, description: project.description, tectonicSetting: project.tectonicSetting },
      segments: await executor.select().from(segments).where(eq(segments.projectId, projectId)),
      sites: siteRows,
      units: siteIds.length ? await executor.select().from(units).where(inArray(units.siteId, siteIds)) : [],
      eventHorizons: siteIds.length ? await executor.select().from(eventHorizons).where(inArray(eventHorizons.siteId, siteIds)) : [],
      samples: await executor.select().from(samples).where(eq(samples.projectId, projectId)),
      hypotheses: hypothesisRows,
      ties: hypothesisIds.length ? await executor.select().from(ties).where(inArray(ties.hypothesisId, hypothesisIds)) : [],
    };
  }

  /**
   * Write a validated bundle as a new project with `adminId` as its ADMIN, every record under a
   * new id. Runs inside the caller's transaction.
   */
  async insertBundle(
    bundle: ProjectBundle,
    adminId: string,
    calibrate: (sample: BundleSample, latitude: number) => SampleCalibrationOutcome,
    executor: Executor,
  ): Promise<ProjectRow> {
    const ids = new Map<string, string>();
    const idOf = (table: string, ref: string) => {
      const key = `${table}:${ref}`;
      let id = ids.get(key);
      if (!id) ids.set(key, (id = randomUUID()));
      return id;
    };
    const optional = (table: string, ref: string | null) => (ref === null ? null : idOf(table, ref));

    const [project] = await executor.insert(projects).values({ ...bundle.project }).returning();
    await executor.insert(memberships).values({ projectId: project.id, userId: adminId, role: 'ADMIN' });
    const projectId = project.id;

    await insertChunked(bundle.segments, (chunk) =>
      executor.insert(segments).values(chunk.map(({ ref, ...s }) => ({ ...s, id: idOf('segments', ref), projectId }))),
    );
    await insertChunked(bundle.sites, (chunk) =>
      executor.insert(sites).values(
        chunk.map(({ ref, segmentRef, ...s }) => ({ ...s, id: idOf('sites', ref), projectId, segmentId: optional('segments', segmentRef) })),
      ),
    );
    await insertChunked(bundle.units, (chunk) =>
      executor.insert(units).values(chunk.map(({ ref, siteRef, ...u }) => ({ ...u, id: idOf('units', ref), siteId: idOf('sites', siteRef) }))),
    );
    await insertChunked(bundle.eventHorizons, (chunk) =>
      executor.insert(eventHorizons).values(
        chunk.map(({ ref, siteRef, unitBelowRef, unitAboveRef, ...h }) => ({
          ...h,
          id: idOf('eventHorizons', ref),
          siteId: idOf('sites', siteRef),
          unitBelowId: idOf('units', unitBelowRef),
          unitAboveId: idOf('units', unitAboveRef),
        })),
      ),
    );
    const latitude = new Map(bundle.sites.map((s) => [s.ref, s.latitude]));
    await insertChunked(bundle.samples, (chunk) =>
      executor.insert(samples).values(
        chunk.map((sample) => {
          const { ref, siteRef, unitRef, ...s } = sample;
          return {
            ...s,
            ...calibrate(sample, latitude.get(siteRef) ?? 0),
            id: idOf('samples', ref),
            projectId,
            siteId: idOf('sites', siteRef),
            unitId: idOf('units', unitRef),
          };
        }),
      ),
    );
    await insertChunked(bundle.hypotheses, (chunk) =>
      executor.insert(hypotheses).values(
        chunk.map(({ ref, copiedFromRef, ...h }) => ({
          ...h,
          id: idOf('hypotheses', ref),
          projectId,
          authorId: adminId,
          copiedFromId: optional('hypotheses', copiedFromRef),
        })),
      ),
    );
    await insertChunked(bundle.ties, (chunk) =>
      executor.insert(ties).values(
        chunk.map(({ ref, hypothesisRef, eventARef, eventBRef, ...t }) => ({
          ...t,
          id: idOf('ties', ref),
          hypothesisId: idOf('hypotheses', hypothesisRef),
          eventAId: idOf('eventHorizons', eventARef),
          eventBId: idOf('eventHorizons', eventBRef),
        })),
      ),
    );
    return project;
  }
}
