import { Injectable } from '@nestjs/common';
import type { AgeModelRunRow } from '../age-models/age-model-runs.repository';
import type { StoredAgeModelResults } from '../age-models/age-model-results';
import type { SiteRow } from '../sites/sites.repository';
import { SitesService } from '../sites/sites.service';
import { displayPosteriors, type DisplayPosterior, type ProjectEvent } from './correlation-adapter';
import { HypothesesRepository, type ProjectEventRow } from './hypotheses.repository';
import { RunCache } from './run-cache';

/** A successful run as the ladder shows it, with its posteriors decoded once. */
export interface DisplayRun {
  readonly row: AgeModelRunRow;
  readonly posteriors: ReadonlyMap<string, DisplayPosterior>;
}

/** Everything correlation and the ladder need of a project, loaded in a few queries. */
export interface ProjectCorrelationData {
  /** Ordered along strike, then by name. */
  readonly sites: readonly SiteRow[];
  /** Ordered by site along strike, then oldest first within a site. */
  readonly events: readonly ProjectEventRow[];
  /** Each site's newest successful run, by site id. */
  readonly runsBySite: ReadonlyMap<string, DisplayRun>;
}

/** Runs kept decoded per process; a 40-site project fills a tenth of it. */
const RUN_CACHE_CAPACITY = 400;

@Injectable()
export class CorrelationDataService {
  private readonly runs = new RunCache<DisplayRun>(RUN_CACHE_CAPACITY);

  constructor(
    private readonly repository: HypothesesRepository,
    private readonly sites: SitesService,
  ) {}

  /**
   * Sites, event horizons and latest successful runs of a project. Runs are read by id only when
   * this process has not decoded them before: a succeeded run's results never change.
   */
  async load(projectId: string): Promise<ProjectCorrelationData> {
    const [sites, events] = await Promise.all([this.sites.listForProject(projectId), this.repository.listProjectEvents(projectId)]);
    const latest = await this.repository.latestSucceededRunIds(sites.map((site) => site.id));
    const decoded = new Map<string, DisplayRun>();
    for (const { id } of latest) {
      const cached = this.runs.get(id);
      if (cached) decoded.set(id, cached);
    }
    const missing = latest.filter(({ id }) => !decoded.has(id)).map(({ id }) => id);
    for (const row of await this.repository.runsForDisplay(missing)) {
      const run = { row, posteriors: displayPosteriors(row.id, row.results as StoredAgeModelResults | null) };
      this.runs.set(row.id, run);
      decoded.set(row.id, run);
    }
    const runsBySite = new Map<string, DisplayRun>();
    for (const { id, siteId } of latest) {
      const run = decoded.get(id);
      if (run) runsBySite.set(siteId, run);
    }
    return { sites, events, runsBySite };
  }
}

/** An event's posterior from its site's newest successful run, if the run has one for it. */
export function posteriorOf(data: ProjectCorrelationData, event: ProjectEventRow): DisplayPosterior | undefined {
  return data.runsBySite.get(event.site.id)?.posteriors.get(event.eventHorizon.id);
}

/** One loaded event as the correlation checks take it. */
export function toProjectEvent(event: ProjectEventRow, posterior: DisplayPosterior | undefined): ProjectEvent {
  return {
    id: event.eventHorizon.id,
    name: event.eventHorizon.name,
    siteId: event.site.id,
    siteName: event.site.name,
    alongStrikeKm: event.site.alongStrikeKm,
    orderIndexFromBase: event.unitBelowPosition,
    posterior: posterior?.density ?? null,
  };
}

/** The project's events with their latest posteriors, as the correlation checks take them. */
export function projectEvents(data: ProjectCorrelationData): ProjectEvent[] {
  return data.events.map((event) => toProjectEvent(event, posteriorOf(data, event)));
}
