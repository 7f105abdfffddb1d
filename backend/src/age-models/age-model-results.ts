/**
 * How an age model run's inputs and results are stored (JSON columns) and read back: densities as
 * plain number arrays, joint event draws row-major. Pure functions, shared by the API and workers.
 */
import { AgeModelResult } from '../chronology/age-model/age-model';
import { AgeModelInput } from '../chronology/age-model/column';
import { AgeDepthPoint, HemipelagicSummary } from '../chronology/age-model/hemipelagic/hemipelagic-model';
import { CalendarDensity, DensitySummary, normalise, trim } from '../chronology/common/density';
import { ReservoirOffsetPosterior, ReservoirSource } from '../chronology/age-model/reservoir-offsets';

export interface StoredDensity {
  startCalBp: number;
  probabilities: number[];
}

export interface StoredAgeModelInput {
  units: AgeModelInput['units'];
  eventHorizons: AgeModelInput['eventHorizons'];
  samples: (Omit<AgeModelInput['samples'][number], 'likelihood' | 'reservoir'> & {
    likelihood: StoredDensity;
    reservoir?: { sourceKey: string; gridLikelihoods: StoredDensity[] };
  })[];
  orderSamplesByDepth: boolean;
  reservoirSources?: ReservoirSource[];
}

export interface StoredEventPosterior {
  eventHorizonId: string;
  summary: DensitySummary;
  rhat: number;
  ess: number;
  density: StoredDensity;
}

export interface StoredSamplePosterior {
  sampleId: string;
  outlierProbability: number;
  medianCalBp: number;
  hpd95: DensitySummary['hpd95'];
  /** Inherited and intruded samples: sample age minus deposit age (years), given not an outlier. */
  offset?: { scaleYears: number; medianYears: number; low95Years: number; high95Years: number };
}

export interface StoredAgeModelResults {
  events: StoredEventPosterior[];
  samples: StoredSamplePosterior[];
  eventDraws: { eventHorizonIds: string[]; drawCount: number; draws: number[] };
  /** HEMIPELAGIC_RATE runs only. */
  ageDepth?: AgeDepthPoint[];
  hemipelagic?: HemipelagicSummary;
  /** Runs with marine samples sharing a Delta-R source. */
  reservoirOffsets?: ReservoirOffsetPosterior[];
}

/** A density trimmed of its negligible tails (below 1e-6 of the mass per year) and renormalised to unit mass. */
export function storeDensity(density: CalendarDensity): StoredDensity {
  const trimmed = normalise(trim(density, 1e-6));
  return { startCalBp: trimmed.startCalBp, probabilities: Array.from(trimmed.probabilities, (p) => Number(p.toPrecision(6))) };
}

export function loadDensity(stored: StoredDensity): CalendarDensity {
  return { startCalBp: stored.startCalBp, probabilities: Float64Array.from(stored.probabilities) };
}

export function storeInput(input: AgeModelInput): StoredAgeModelInput {
  return {
    units: input.units,
    eventHorizons: input.eventHorizons,
    samples: input.samples.map(({ reservoir, ...s }) => ({
      ...s,
      likelihood: { startCalBp: s.likelihood.startCalBp, probabilities: Array.from(s.likelihood.probabilities) },
      ...(reservoir ? { reservoir: { sourceKey: reservoir.sourceKey, gridLikelihoods: reservoir.gridLikelihoods.map((d) => storeDensity(d)) } } : {}),
    })),
    orderSamplesByDepth: input.orderSamplesByDepth ?? false,
    ...(input.reservoirSources && input.reservoirSources.length > 0 ? { reservoirSources: [...input.reservoirSources] } : {}),
  };
}

export function loadInput(stored: StoredAgeModelInput): AgeModelInput {
  return {
    ...stored,
    samples: stored.samples.map(({ reservoir, ...s }) => ({
      ...s,
      likelihood: loadDensity(s.likelihood),
      ...(reservoir ? { reservoir: { sourceKey: reservoir.sourceKey, gridLikelihoods: reservoir.gridLikelihoods.map(loadDensity) } } : {}),
    })),
  };
}

export function storeResults(result: AgeModelResult & { ageDepth?: AgeDepthPoint[]; hemipelagic?: HemipelagicSummary }): StoredAgeModelResults {
  const year = (v: number) => Math.round(v * 10) / 10;
  return {
    ...(result.ageDepth
      ? {
          ageDepth: result.ageDepth.map((p) => ({
            depthM: p.depthM, eventFreeDepthM: p.eventFreeDepthM, medianCalBp: year(p.medianCalBp), low95CalBp: year(p.low95CalBp), high95CalBp: year(p.high95CalBp),
          })),
        }
      : {}),
    ...(result.hemipelagic ? { hemipelagic: result.hemipelagic } : {}),
    ...(result.reservoirOffsets ? { reservoirOffsets: result.reservoirOffsets.map((r) => ({ ...r, sampleIds: [...r.sampleIds] })) } : {}),
    events: result.events.map((e) => ({
      eventHorizonId: e.eventHorizonId,
      summary: e.summary,
      rhat: e.rhat,
      ess: e.ess,
      density: storeDensity(e.density),
    })),
    samples: result.samples.map((s) => ({
      sampleId: s.sampleId,
      outlierProbability: s.outlierProbability,
      medianCalBp: s.medianCalBp,
      hpd95: s.summary.hpd95,
      ...(s.offset
        ? {
            offset: {
              scaleYears: s.offset.scaleYears,
              medianYears: Math.round(s.offset.medianYears * 10) / 10,
              low95Years: Math.round(s.offset.low95Years * 10) / 10,
              high95Years: Math.round(s.offset.high95Years * 10) / 10,
            },
          }
        : {}),
    })),
    eventDraws: {
      eventHorizonIds: [...result.eventDraws.eventHorizonIds],
      drawCount: result.eventDraws.drawCount,
      draws: Array.from(result.eventDraws.draws, (v) => Math.round(v * 10) / 10),
    },
  };
}
