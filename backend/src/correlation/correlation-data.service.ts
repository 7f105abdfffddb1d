import { Injectable } from '@nestjs/common';
import { LatestRunsService, type DisplayPosterior, type DisplayRun } from '../age-models/latest-runs.service';
import type { SiteRow } from '../sites/sites.repository';
import { SitesService } from '../sites/sites.service';
import type { ProjectEvent } from './correlation-adapter';
import { HypothesesRepository, type ProjectEventRow } from './hypotheses.repository';

/** Everything correlation and the ladder need of a project, loaded in a few queries. */
export interface ProjectCorrelationData {
  /** Ordered along strike, then by name. */
  readonly sites: readonly SiteRow[];
  /** Ordered by site along strike, then oldest first within a site. */
  readonly events: readonly ProjectEventRow[];
  /** Each site's newest successful run, by site id. */
  readonly runsBySite: ReadonlyMap<string, DisplayRun>;
}

@Injectable()
export class CorrelationDataService {
  constructor(
    private readonly repository: HypothesesRepository,
    private readonly sites: SitesService,
    private readonly latestRuns: LatestRunsService,
  ) {}

  /** Sites, event horizons and latest successful runs of a project. */
  async load(projectId: string): Promise<ProjectCorrelationData> {
    const [sites, events] = await Promise.all([this.sites.listForProject(projectId), this.repository.listProjectEvents(projectId)]);
    const runsBySite = await this.latestRuns.forSites(sites.map((site) => site.id));
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
