/**
 * Simulated multi-site records with known shared events, for validating the joint age model from
 * outside (issue 13, item 8). The generator is deliberately not the model's prior:
 * - true event ages: the oldest uniform in 3,000-5,000 cal BP, then lognormal intervals
 *   (median 400 years, log-sd 0.5), not uniform order statistics between boundaries; a record
 *   whose youngest event would be younger than 400 cal BP is moved older as a whole to 400 cal BP;
 * - each site records each event with probability 0.75 (sites miss events), from its own start;
 * - the units below the oldest and above the youngest event span 200-400 years; each unit holds
 *   0-3 samples (the base unit 1-3) whatever its duration;
 * - deposition rate varies between units and sites: deposit ages within a unit crowd towards its
 *   base or top by a power law (exponent lognormal, log-sd 0.8), not uniform;
 * - erosion: a third of the units below an event lose the top 20-50 % of their time (a hiatus);
 * - detrital samples (25 %) are older than their deposit by a gamma inheritance (shape 2, mean 60
 *   years; the model assumes exponential), intrusive ones (8 %) younger by a gamma (mean 40);
 * - about 4 % of samples are gross outliers, shifted 300-1,500 years either way;
 * - measurements are calendar ages with Gaussian errors of 30-60 years (luminescence-like).
 * Every event recorded at two or more sites is a regional event whose members are its records.
 * Names and ids are invented.
 */
import { normalDensity } from '../common/density';
import { SeededRandom } from '../common/random';
import type { AgeModelInput, AgeRelation, ColumnEventHorizon, ColumnSample, ColumnUnit } from '../age-model/column';
import type { JointModelInput, JointRegionalEventInput, JointSiteInput } from './types';

export interface SimulatedRecordOptions {
  readonly seed: number;
  readonly siteCount: number;
  readonly eventCount: number;
  /** Probability that a site records an event (default 0.75). */
  readonly recordProbability?: number;
  /** Share of units below an event whose top is eroded (default 1/3). */
  readonly erosionShare?: number;
  /** Share of gross outliers (default 0.04) and of samples offset from their deposit (default 0.33). */
  readonly outlierShare?: number;
  readonly offsetShare?: number;
  /**
   * Log-sd of the power-law exponent that crowds a unit's deposit ages towards its base or top
   * (default 0.8; 0 spreads them uniformly through the unit). For diagnosis.
   */
  readonly depositionLogSd?: number;
  /**
   * If given, each unit holds a Poisson number of samples with mean (unit duration x this), the
   * base unit at least one: dated deposits at a constant rate, as the uniform deposition prior
   * assumes. By default a unit holds 0-3 samples (the base 1-3) whatever its duration, as a
   * trench is sampled. For diagnosis.
   */
  readonly samplesPerYear?: number;
  /**
   * If given, a gross outlier's shift is two-sided exponential (Laplace) with this mean absolute
   * shift, the model's own outlier form, instead of 300-1,500 years either way. For diagnosis.
   */
  readonly outlierLaplaceYears?: number;
}

export interface SimulatedRecord {
  readonly input: JointModelInput;
  /** True age of each regional event, by id. */
  readonly regionalTruth: ReadonlyMap<string, number>;
  /** True age of every site event, by `${siteId}/${eventHorizonId}`. */
  readonly siteEventTruth: ReadonlyMap<string, number>;
}

function gamma2(random: SeededRandom, mean: number): number {
  // Shape 2: the sum of two exponentials of half the mean.
  return random.exponential(mean / 2) + random.exponential(mean / 2);
}

/** One site's column recording `ages` (oldest first), with its samples. */
function siteColumn(
  random: SeededRandom,
  siteId: string,
  ages: readonly number[],
  shares: { erosion: number; outlier: number; offset: number; logSd: number; perYear?: number; laplace?: number },
): AgeModelInput {
  const units: ColumnUnit[] = [];
  const eventHorizons: ColumnEventHorizon[] = [];
  const samples: ColumnSample[] = [];
  const n = ages.length;
  for (let u = 0; u <= n; u++) {
    const older = u === 0 ? ages[0] + 200 + 200 * random.uniform() : ages[u - 1];
    let younger = u === n ? ages[n - 1] - 200 - 200 * random.uniform() : ages[u];
    if (u < n && random.uniform() < shares.erosion) younger += (older - younger) * (0.2 + 0.3 * random.uniform());
    const unitId = `${siteId}-u${u + 1}`;
    units.push({ id: unitId, name: `Unit ${u + 1}`, position: u + 1, topDepthM: null, baseDepthM: null });
    const power = Math.exp(shares.logSd * random.normal());
    // The base unit is always dated (so every event has something dated below it); others 0-3.
    let count = u === 0 ? 1 + random.integer(3) : random.integer(4);
    if (shares.perYear !== undefined) {
      // Poisson with mean duration x rate (unit-mean exponential gaps), the base unit at least 1.
      const mean = (older - younger) * shares.perYear;
      let k = 0;
      for (let t = random.exponential(1); t < mean; t += random.exponential(1)) k++;
      count = u === 0 ? Math.max(1, k) : k;
    }
    for (let s = 0; s < count; s++) {
      const deposit = younger + (older - younger) * random.uniform() ** power;
      let material = deposit;
      let ageRelation: AgeRelation = 'DATES_DEPOSIT';
      const kind = random.uniform() * (0.33 / Math.max(1e-9, shares.offset));
      if (kind < 0.25) {
        ageRelation = 'OLDER_THAN_DEPOSIT';
        material = deposit + gamma2(random, 60);
      } else if (kind < 0.33) {
        ageRelation = 'YOUNGER_THAN_DEPOSIT';
        material = deposit - gamma2(random, 40);
      }
      if (random.uniform() < shares.outlier) {
        const sign = random.uniform() < 0.5 ? -1 : 1;
        material += sign * (shares.laplace !== undefined ? random.exponential(shares.laplace) : 300 + 1200 * random.uniform());
      }
      const error = 30 + 30 * random.uniform();
      samples.push({
        id: `${siteId}-s${u + 1}-${s + 1}`,
        name: `${siteId.toUpperCase()}-${u + 1}${String.fromCharCode(97 + s)}`,
        unitId,
        depthM: null,
        ageRelation,
        likelihood: normalDensity(Math.round(material + error * random.normal()), error),
      });
    }
    if (u < n) {
      eventHorizons.push({ id: `${siteId}-e${u + 1}`, name: `E${n - u}`, unitBelowId: unitId, unitAboveId: `${siteId}-u${u + 2}` });
    }
  }
  return { units, eventHorizons, samples };
}

/**
 * A well-spread 32-bit seed from a small one (the murmur3 finaliser, Appleby 2011 [memory]):
 * xoroshiro128+ seeded with neighbouring small integers gives nearly equal first draws (the first
 * uniform is about 1 for every seed below a few thousand), so records of seeds 1000, 1001, ...
 * would share their oldest event's age.
 */
function spreadSeed(seed: number): number {
  let h = seed | 0;
  h = Math.imul(h ^ (h >>> 16), 0x85ebca6b);
  h = Math.imul(h ^ (h >>> 13), 0xc2b2ae35);
  return (h ^ (h >>> 16)) | 0;
}

/** The youngest true event is at least this old, so its top unit (200-400 years) ends by 0 cal BP. */
export const YOUNGEST_EVENT_CAL_BP = 400;

export function simulateRecord(options: SimulatedRecordOptions): SimulatedRecord {
  const random = new SeededRandom(spreadSeed(options.seed));
  for (let i = 0; i < 16; i++) random.uniform();
  const p = options.recordProbability ?? 0.75;
  const ages: number[] = [3_000 + 2_000 * random.uniform()];
  for (let k = 1; k < options.eventCount; k++) ages.push(ages[k - 1] - 400 * Math.exp(0.5 * random.normal()));
  // No event in the future: the top unit, up to 400 years above the youngest event, must end by
  // 0 cal BP. Without this about 3 % of records (seeds 2024 and 2039 among 2000-2039) put their
  // youngest events after 1950 CE and clamped the top unit to end at 0 cal BP, older than the
  // event below it, so its deposits were dated older than the event they lie above.
  const youngest = ages[ages.length - 1];
  if (youngest < YOUNGEST_EVENT_CAL_BP) for (let k = 0; k < ages.length; k++) ages[k] += YOUNGEST_EVENT_CAL_BP - youngest;
  const sites: JointSiteInput[] = [];
  const members: { siteId: string; eventHorizonId: string }[][] = ages.map(() => []);
  const siteEventTruth = new Map<string, number>();
  for (let s = 0; s < options.siteCount; s++) {
    const siteId = `site${s + 1}`;
    let recorded: number[] = [];
    while (recorded.length < 2) recorded = ages.map((_, k) => k).filter(() => random.uniform() < p);
    const column = siteColumn(random, siteId, recorded.map((k) => ages[k]), {
      erosion: options.erosionShare ?? 1 / 3,
      outlier: options.outlierShare ?? 0.04,
      offset: options.offsetShare ?? 0.33,
      logSd: options.depositionLogSd ?? 0.8,
      perYear: options.samplesPerYear,
      laplace: options.outlierLaplaceYears,
    });
    column.eventHorizons.forEach((horizon, i) => {
      members[recorded[i]].push({ siteId, eventHorizonId: horizon.id });
      siteEventTruth.set(`${siteId}/${horizon.id}`, ages[recorded[i]]);
    });
    sites.push({ siteId, siteName: `Site ${s + 1}`, column, depthModel: 'ORDER_ONLY' });
  }
  const regionalEvents: JointRegionalEventInput[] = [];
  const regionalTruth = new Map<string, number>();
  ages.forEach((age, k) => {
    if (members[k].length < 2) return;
    const regionalEventId = `regional-${k + 1}`;
    regionalEvents.push({ regionalEventId, name: `R${k + 1}`, members: members[k] });
    regionalTruth.set(regionalEventId, age);
  });
  return { input: { sites, regionalEvents }, regionalTruth, siteEventTruth };
}
