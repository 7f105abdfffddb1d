import { Injectable } from '@nestjs/common';
import DataLoader from 'dataloader';
import { AgeModelRunsRepository } from '../age-models/age-model-runs.repository';
import { SegmentRow, SegmentsRepository } from '../segments/segments.repository';

/**
 * Per-request batch loaders for fields asked of many parents at once (a ladder of 40 sites asks
 * 40 segments and 40 run freshness checks): each becomes one query per request instead of one
 * per parent. Created fresh for every request, so nothing is cached across requests or users.
 */
export interface RequestLoaders {
  segmentById: DataLoader<string, SegmentRow | null>;
  /** The current column fingerprint of a site (see AgeModelRunsRepository.columnFingerprints). */
  columnFingerprint: DataLoader<string, string>;
}

@Injectable()
export class RequestLoadersFactory {
  constructor(
    private readonly segments: SegmentsRepository,
    private readonly runs: AgeModelRunsRepository,
  ) {}

  create(): RequestLoaders {
    return {
      segmentById: new DataLoader(async (ids) => {
        const rows = new Map((await this.segments.findByIds(ids)).map((row) => [row.id, row]));
        return ids.map((id) => rows.get(id) ?? null);
      }),
      columnFingerprint: new DataLoader(async (siteIds) => {
        const fingerprints = await this.runs.columnFingerprints(siteIds);
        return siteIds.map((id) => fingerprints.get(id)!);
      }),
    };
  }
}
