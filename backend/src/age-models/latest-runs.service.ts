import { Injectable } from '@nestjs/common';
import type { CalendarDensity, DensitySummary } from '../chronology/common/density';
import { thinToGrid, type DensityGrid } from '../chronology/common/density-views';
import { loadDensity, type StoredAgeModelResults } from './age-model-results';
import { AgeModelRunRow, AgeModelRunsRepository } from './age-model-runs.repository';
import { RunCache } from './run-cache';

/** An event's posterior from one run, ready for the checks (density) and for drawing (grid). */
export interface DisplayPosterior {
  readonly runId: string;
  readonly summary: DensitySummary;
  readonly rhat: number;
  readonly ess: number;
  readonly density: CalendarDensity;
  /** `density` thinned for drawing by `thinToGrid`. */
  readonly grid: DensityGrid;
}

/** Every event posterior of a run's stored results, by event horizon id. */
export function displayPosteriors(runId: string, results: Pick<StoredAgeModelResults, 'events'> | null): Map<string, DisplayPosterior> {
  const posteriors = new Map<string, DisplayPosterior>();
  for (const event of results?.events ?? []) {
    const density = loadDensity(event.density);
    posteriors.set(event.eventHorizonId, { runId, summary: event.summary, rhat: event.rhat, ess: event.ess, density, grid: thinToGrid(density) });
  }
  return posteriors;
}

/** A successful run with its event posteriors decoded once (its results without the joint draws). */
export interface DisplayRun {
  readonly row: AgeModelRunRow;
  readonly posteriors: ReadonlyMap<string, DisplayPosterior>;
}

/** Runs kept decoded per process; a 40-site project fills a tenth of it. */
const RUN_CACHE_CAPACITY = 400;

/**
 * The one way to read the age model runs sites use downstream (`downstream-runs.ts`: the chosen
 * run, else the newest successful one) and their event posteriors (the ladder, correlation
 * checks, segment recurrence, `EventHorizon.latestPosterior`). Ids are read
 * first; a run's results are read and decoded only when this process has not decoded them before,
 * since a succeeded run's results never change.
 */
@Injectable()
export class LatestRunsService {
  private readonly runs = new RunCache<DisplayRun>(RUN_CACHE_CAPACITY);

  constructor(private readonly repository: AgeModelRunsRepository) {}

  /** The id of each site's run used downstream, by site id, without reading results; sites without one are absent. */
  async idsForSites(siteIds: readonly string[]): Promise<Map<string, string>> {
    return new Map((await this.repository.latestSucceededRunIds([...siteIds])).map(({ id, siteId }) => [siteId, id]));
  }

  /** Each site's run used downstream, by site id; sites without one are absent. */
  async forSites(siteIds: readonly string[]): Promise<Map<string, DisplayRun>> {
    const latest = await this.repository.latestSucceededRunIds([...siteIds]);
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
    const bySite = new Map<string, DisplayRun>();
    for (const { id, siteId } of latest) {
      const run = decoded.get(id);
      if (run) bySite.set(siteId, run);
    }
    return bySite;
  }

  /** Every event posterior of the sites' runs used downstream, by event horizon id. */
  async posteriorsForSites(siteIds: readonly string[]): Promise<Map<string, DisplayPosterior>> {
    const posteriors = new Map<string, DisplayPosterior>();
    for (const run of (await this.forSites(siteIds)).values()) {
      for (const [eventId, posterior] of run.posteriors) posteriors.set(eventId, posterior);
    }
    return posteriors;
  }
}
