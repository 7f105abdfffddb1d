/**
 * How a joint age model run's input, its chains' draws and its results are stored (JSON columns)
 * and read back, in the site runs' formats (`age-models/age-model-results.ts`): densities trimmed
 * to plain arrays, ages to a tenth of a year, joint draws row-major. Pure functions, shared by the
 * API and workers.
 */
import { loadDensity, loadInput, storeDensity, storeInput, type StoredAgeModelInput, type StoredDensity, type StoredEventPosterior, type StoredSamplePosterior } from '../../age-models/age-model-results';
import type { DensitySummary } from '../../chronology/common/density';
import type { JointAgeModelResult, JointChainDraws, JointDepthModel, JointModelInput } from '../../chronology/joint-age-model/types';

export interface StoredJointModelInput {
  sites: { siteId: string; siteName: string; depthModel: JointDepthModel; column: StoredAgeModelInput }[];
  regionalEvents: { regionalEventId: string; name: string; members: { siteId: string; eventHorizonId: string }[] }[];
}

export interface StoredJointChainDraws {
  chainIndex: number;
  drawCount: number;
  regionalEventIds: string[];
  regionalEvents: number[];
  siteEvents: { siteId: string; eventHorizonId: string }[];
  siteEventDraws: number[];
  samples: { siteId: string; sampleId: string }[];
  sampleDraws: number[];
  outlierShare: number[];
  acceptance: Record<string, number>;
  /** The chain's Rao-Blackwellised density of each site event, when the computation gave them (trimmed as site runs store densities). */
  siteEventDensities?: StoredDensity[];
}

export interface StoredRegionalPosterior {
  regionalEventId: string;
  /** The member event horizons, as the run's input named them. */
  memberIds: string[];
  summary: DensitySummary;
  rhat: number;
  ess: number;
  density: StoredDensity;
}

export interface StoredJointResults {
  regionalEvents: StoredRegionalPosterior[];
  siteEvents: (StoredEventPosterior & { siteId: string })[];
  samples: (StoredSamplePosterior & { siteId: string })[];
  /** Joint draws of the regional events, row-major drawCount x regionalEventIds (what a segment recurrence analysis draws from). */
  regionalEventDraws: { regionalEventIds: string[]; drawCount: number; draws: number[] };
}

/** Ages to a tenth of a year, as site runs store theirs. */
const tenth = (values: ArrayLike<number>) => Array.from(values, (v) => Math.round(v * 10) / 10);

export function storeJointInput(input: JointModelInput): StoredJointModelInput {
  return {
    sites: input.sites.map((s) => ({ siteId: s.siteId, siteName: s.siteName, depthModel: s.depthModel, column: storeInput(s.column) })),
    regionalEvents: input.regionalEvents.map((r) => ({ regionalEventId: r.regionalEventId, name: r.name, members: r.members.map((m) => ({ ...m })) })),
  };
}

export function loadJointInput(stored: StoredJointModelInput): JointModelInput {
  return {
    sites: stored.sites.map((s) => ({ siteId: s.siteId, siteName: s.siteName, depthModel: s.depthModel, column: loadInput(s.column) })),
    regionalEvents: stored.regionalEvents,
  };
}

export function storeChainDraws(draws: JointChainDraws): StoredJointChainDraws {
  return {
    chainIndex: draws.chainIndex,
    drawCount: draws.drawCount,
    regionalEventIds: [...draws.regionalEventIds],
    regionalEvents: tenth(draws.regionalEvents),
    siteEvents: draws.siteEvents.map((e) => ({ ...e })),
    siteEventDraws: tenth(draws.siteEventDraws),
    samples: draws.samples.map((s) => ({ ...s })),
    sampleDraws: tenth(draws.sampleDraws),
    outlierShare: Array.from(draws.outlierShare),
    acceptance: { ...draws.acceptance },
    ...(draws.siteEventDensities ? { siteEventDensities: draws.siteEventDensities.map(storeDensity) } : {}),
  };
}

export function loadChainDraws(stored: StoredJointChainDraws): JointChainDraws {
  const { siteEventDensities, ...rest } = stored;
  return {
    ...rest,
    ...(siteEventDensities ? { siteEventDensities: siteEventDensities.map(loadDensity) } : {}),
    regionalEvents: Float64Array.from(stored.regionalEvents),
    siteEventDraws: Float64Array.from(stored.siteEventDraws),
    sampleDraws: Float64Array.from(stored.sampleDraws),
    outlierShare: Float64Array.from(stored.outlierShare),
  };
}

export function storeJointResults(result: JointAgeModelResult, input: Pick<JointModelInput, 'regionalEvents'>): StoredJointResults {
  const members = new Map(input.regionalEvents.map((r) => [r.regionalEventId, r.members.map((m) => m.eventHorizonId)]));
  return {
    regionalEvents: result.regionalEvents.map((r) => ({
      regionalEventId: r.regionalEventId,
      memberIds: members.get(r.regionalEventId) ?? [],
      summary: r.summary,
      rhat: r.rhat,
      ess: r.ess,
      density: storeDensity(r.density),
    })),
    siteEvents: result.siteEvents.map((e) => ({
      siteId: e.siteId,
      eventHorizonId: e.eventHorizonId,
      summary: e.summary,
      rhat: e.rhat,
      ess: e.ess,
      density: storeDensity(e.density),
    })),
    samples: result.samples.map((s) => ({
      siteId: s.siteId,
      sampleId: s.sampleId,
      outlierProbability: s.outlierProbability,
      medianCalBp: s.medianCalBp,
      hpd95: s.summary.hpd95,
    })),
    regionalEventDraws: {
      regionalEventIds: [...result.regionalEventDraws.regionalEventIds],
      drawCount: result.regionalEventDraws.drawCount,
      draws: tenth(result.regionalEventDraws.draws),
    },
  };
}

/**
 * The columns of `wanted` regional events from a run's stored joint draws, row-major drawCount x
 * wanted, each row one joint draw (so order and correlation between events are kept); null when
 * the run did not model one of them.
 */
export function regionalDrawsOf(
  stored: StoredJointResults['regionalEventDraws'],
  wanted: readonly string[],
): { eventCount: number; drawCount: number; draws: Float64Array } | null {
  const column = new Map(stored.regionalEventIds.map((id, k) => [id, k]));
  const columns = wanted.map((id) => column.get(id));
  if (columns.some((k) => k === undefined)) return null;
  const width = stored.regionalEventIds.length;
  const draws = new Float64Array(stored.drawCount * wanted.length);
  for (let r = 0; r < stored.drawCount; r++) {
    for (let k = 0; k < wanted.length; k++) draws[r * wanted.length + k] = stored.draws[r * width + (columns[k] as number)];
  }
  return { eventCount: wanted.length, drawCount: stored.drawCount, draws };
}
