import { Injectable } from '@nestjs/common';
import { LatestRunsService, type DisplayPosterior, type DisplayRun } from '../age-models/latest-runs.service';
import type { SiteRow } from '../sites/sites.repository';
import { SitesService } from '../sites/sites.service';
import type { ProjectEvent } from './correlation-adapter';
import { HypothesesRepository, type ProjectEventRow } from './hypotheses.repository';
import { LadderRevisionRepository } from './ladder-cache/ladder-revision.repository';

/** Projects whose loaded data this process keeps (least recently used dropped first). */
const KEPT_PROJECTS = 16;

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
  /** Loaded data by project, with the project revision read before loading them. */
  private readonly kept = new Map<string, { revision: string; data: ProjectCorrelationData }>();

  constructor(
    private readonly repository: HypothesesRepository,
    private readonly sites: SitesService,
    private readonly latestRuns: LatestRunsService,
    private readonly revisions: LadderRevisionRepository,
  ) {}

  /**
   * Sites, event horizons and latest successful runs of a project. Kept per process while the
   * project revision (`project_revisions`, moved by triggers on any change to the project's rows)
   * stays where it was when they were read: one small query instead of loading 600 events again.
   * The revision is read first, so a write during the load leaves data that are never reused.
   * Callers must not change what they get.
   */
  async load(projectId: string): Promise<ProjectCorrelationData> {
    const revision = await this.revisions.projectRevision(projectId);
    const kept = this.kept.get(projectId);
    if (kept && revision !== '' && kept.revision === revision) {
      this.kept.delete(projectId);
      this.kept.set(projectId, kept);
      return kept.data;
    }
    const [sites, events] = await Promise.all([this.sites.listForProject(projectId), this.repository.listProjectEvents(projectId)]);
    const runsBySite = await this.latestRuns.forSites(sites.map((site) => site.id));
    const data = { sites, events, runsBySite };
    if (revision !== '') {
      this.kept.delete(projectId);
      this.kept.set(projectId, { revision, data });
      for (const oldest of this.kept.keys()) {
        if (this.kept.size <= KEPT_PROJECTS) break;
        this.kept.delete(oldest);
      }
    }
    return data;
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
