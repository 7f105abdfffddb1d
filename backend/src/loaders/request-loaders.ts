import { Injectable } from '@nestjs/common';
import DataLoader from 'dataloader';
import { LatestRunsService, type DisplayRun } from '../age-models/latest-runs.service';
import { SitesRepository } from '../sites/sites.repository';
import { SegmentRow, SegmentsRepository } from '../segments/segments.repository';

/**
 * Per-request batch loaders for fields asked of many parents at once (a ladder of 40 sites asks
 * 40 segments and 40 site revisions for run freshness): each becomes one query per request instead of one
 * per parent. Created fresh for every request, so nothing is cached across requests or users.
 */
export interface RequestLoaders {
  segmentById: DataLoader<string, SegmentRow | null>;
  /** The current column revision of a site (bumped by triggers on its units, horizons and samples). */
  columnRevision: DataLoader<string, number | null>;
  /** A site's age model run used downstream (`downstream-runs.ts`) with its decoded event posteriors. */
  latestRunBySite: DataLoader<string, DisplayRun | null>;
  /** The id of a site's age model run used downstream, without its results. */
  downstreamRunId: DataLoader<string, string | null>;
}

@Injectable()
export class RequestLoadersFactory {
  constructor(
    private readonly segments: SegmentsRepository,
    private readonly sites: SitesRepository,
    private readonly latestRuns: LatestRunsService,
  ) {}

  create(): RequestLoaders {
    return {
      segmentById: new DataLoader(async (ids) => {
        const rows = new Map((await this.segments.findByIds(ids)).map((row) => [row.id, row]));
        return ids.map((id) => rows.get(id) ?? null);
      }),
      columnRevision: new DataLoader(async (siteIds) => {
        const revisions = new Map((await this.sites.findByIds(siteIds)).map((site) => [site.id, site.columnRevision]));
        return siteIds.map((id) => revisions.get(id) ?? null);
      }),
      latestRunBySite: new DataLoader(async (siteIds) => {
        const runs = await this.latestRuns.forSites(siteIds);
        return siteIds.map((id) => runs.get(id) ?? null);
      }),
      downstreamRunId: new DataLoader(async (siteIds) => {
        const ids = await this.latestRuns.idsForSites(siteIds);
        return siteIds.map((id) => ids.get(id) ?? null);
      }),
    };
  }
}
