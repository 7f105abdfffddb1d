/**
 * The hemipelagic depth model of a turbidite core (issue 12, item 7).
 *
 * Ages follow event-free depth z (true depth with every event bed above removed; `core-depth.ts`).
 * The mud between consecutive beds is one interval, cut into sections of at most 10 cm; section i
 * accumulated at x_i years per metre. Following the autoregressive gamma model of Blaauw & Christen (2011, "Flexible
 * paleoclimate age-depth models using an autoregressive gamma process", Bayesian Analysis
 * 6(3):457-474):
 *
 *   x_1 = a_1,   x_i = w x_(i-1) + (1 - w) a_i,   a_i ~ Gamma(shape k, mean m),   w = r^(s_i / 10 cm),
 *
 * so each section's rate remembers its neighbour's with weight w, s_i the distance between their
 * centres and r the memory across 10 cm with a Beta prior. The age at event-free depth z is
 *
 *   age(z) = top + sum_i x_i |section i within [0, z]| + sum_(contacts c above z) E_c x_(c),
 *
 * where E_c is the thickness of mud eroded at contact c (the base of a bed), x_(c) the rate of the
 * section holding the contact: eroded mud lengthens its interval at the local rate. E_c has a gamma
 * prior with mean the researcher's estimate. Each bed's base is an event: its age is the age just
 * above the contact (the bed is instantaneous). Dated levels enter as likelihoods of the age at
 * their depth (`levels.ts`), with the outlier-and-offset mixture.
 *
 * The prior mean m of the rates is measured from the dated levels (the Theil-Sen slope of their
 * median ages on restored event-free depth; Sen 1968, JASA 63:1379-1389) unless the researcher
 * gives one: hemipelagic rates on active margins vary roughly 5-40 cm per thousand years
 * [common practice], too widely to assume.
 *
 * The sampler works on (age at the shallowest dated level, log a_1..K, logit r, log E_c) by
 * sweeps of Metropolis moves along fixed directions (`direction-sampler.ts`): each coordinate in
 * turn, neighbouring sections' rates in opposite senses, every rate scaled at once, and after
 * burn-in the burn-in's principal axes (the widest three also with long steps); several seeded
 * chains from dispersed starts. Convergence is the split R-hat and bulk ESS of the ordering model
 * (`../convergence.ts`). An iteration is one sweep. (Adaptive Metropolis on all coordinates at once, used before, mixed slowly: on
 * simulated cores a worst split R-hat of 1.12 and a smallest event ESS of 23, see
 * `core-validation.ts`.)
 */
import { CalendarDensity, normalise, summarise } from '../../common/density';
import { SeededRandom } from '../../common/random';
import {
  AgeModelCancelled,
  AgeModelDiagnostics,
  AgeModelHooks,
  AgeModelResult,
  AgeModelSettings,
  AgeModelSettingsError,
  BoundaryPosterior,
  DEFAULT_AGE_MODEL_SETTINGS,
  ESS_MINIMUM,
  EventPosterior,
  offsetScaleOf,
  RHAT_LIMIT,
  SamplePosterior,
} from '../age-model';
import { AgeModelInput, ColumnEventHorizon, ColumnProblemError, isModelled } from '../column';
import { chainDiagnostics } from '../convergence';
import { LATEST_CAL_BP } from '../likelihood';
import { offsetPosterior } from '../offset-posterior';
import { coordinateDirection, Direction, DirectionSampler } from './direction-sampler';
import { coreDepthScale, CoreDepthScale, hemipelagicProblems } from './core-depth';
import { summariseOffset } from '../reservoir-offsets';
import { GridLevelLikelihoods, LevelLikelihoods, SharedLevelLikelihoods } from './levels';

export interface HemipelagicSettings {
  /**
   * Thickest section (m of event-free depth) that carries one accumulation rate: each mud interval
   * between beds is one section, or is cut into equal sections no thicker than this.
   */
  readonly sectionThicknessM: number;
  /** Most sections: a longer core gets thicker sections, which bounds the cost of a run. */
  readonly maxSections: number;
  /** The depth (m of event-free depth) across which the memory r is stated. */
  readonly memoryDepthM: number;
  /** Prior mean accumulation rate (cm per thousand years); null measures it from the dated levels. */
  readonly rateMeanCmPerKyr: number | null;
  /** Shape k of the gamma prior on each section's rate innovation. */
  readonly rateShape: number;
  /** Beta(a, b) prior on the memory r across `memoryDepthM` of event-free depth. */
  readonly memoryPriorA: number;
  readonly memoryPriorB: number;
  /** Shape of the gamma prior on each eroded thickness, whose mean is the researcher's estimate. */
  readonly erosionShape: number;
  /** Spacing (m of true depth) of the age-depth curve's points (contacts are added). */
  readonly ageDepthStepM: number;
}

/**
 * Our defaults, with why:
 * - a rate per mud interval between beds, cut into sections of at most 10 cm: between two beds the
 *   mud is one depositional episode, and 10 cm is some 250-2,000 years at 5-40 cm/kyr, as fine as a
 *   core's few dated levels can resolve; at most 120 sections bound the cost;
 * - rate shape 1 (an exponential innovation): 90 % of an innovation between 0.05 and 3 times its
 *   mean. Shape 2 (0.18 to 2.4 times) was too tight: on simulated cores whose interval rates vary
 *   lognormally (log-sd about 0.45) and independently from bed to bed (`core-validation.ts`), its
 *   95.4 % ranges covered 87.5 % and its 68.3 % ranges 58 % of 48 true event ages, with chains that
 *   disagreed (split R-hat 1.17, ESS 17), where shape 1 covered 94 % and 67 % (R-hat 1.04); the
 *   5-40 cm/kyr spread of active margins [common practice] is a factor of eight, which shape 1
 *   allows between neighbouring intervals;
 * - memory Beta(2, 2) across 10 cm: centred on 0.5, so neighbouring intervals (about 10 cm apart)
 *   share about half their rate while rates a metre apart are free, excluding the degenerate ends
 *   (no memory, or one rate for the whole core); a few dated levels cannot learn the memory, so
 *   this prior sets how far rates may wander between dated levels: the stationary spread of a
 *   section's rate is then about 0.6 of the mean (shape 1), the size of the interval-to-interval changes
 *   of hemipelagic rates [common practice, stated as our assumption];
 * - erosion shape 4: a coefficient of variation of 0.5 about the estimate, as a logged scour
 *   depth is a judgement good to about a factor of two.
 * Outliers take the ordering model's prior and shift scale (`AgeModelSettings`).
 */
export const DEFAULT_HEMIPELAGIC_SETTINGS: HemipelagicSettings = {
  sectionThicknessM: 0.1,
  maxSections: 120,
  memoryDepthM: 0.1,
  rateMeanCmPerKyr: null,
  rateShape: 1,
  memoryPriorA: 2,
  memoryPriorB: 2,
  erosionShape: 4,
  ageDepthStepM: 0.05,
};

/** Run settings of a hemipelagic run: the shared chain settings plus the depth model's own. */
export interface HemipelagicRunSettings extends AgeModelSettings {
  readonly hemipelagic: HemipelagicSettings;
}

/**
 * Chain settings that suit the hemipelagic sampler: an iteration is a sweep of some 2K + d moves
 * (K sections, d coordinates), so a few thousand suffice (on the demo's longest core the smallest
 * event ESS was about 1,600 at these settings, `npm run bench -- hemipelagic`).
 */
export const DEFAULT_HEMIPELAGIC_RUN_SETTINGS: HemipelagicRunSettings = {
  ...DEFAULT_AGE_MODEL_SETTINGS,
  iterations: 4_000,
  burnIn: 1_500,
  thin: 2,
  hemipelagic: DEFAULT_HEMIPELAGIC_SETTINGS,
};

/** A point of the age-depth curve. */
export interface AgeDepthPoint {
  readonly depthM: number;
  readonly eventFreeDepthM: number;
  readonly medianCalBp: number;
  /** 2.5 % quantile (young end), cal BP. */
  readonly low95CalBp: number;
  /** 97.5 % quantile (old end), cal BP. */
  readonly high95CalBp: number;
}

export interface HemipelagicSummary {
  /** The prior mean rate used (cm per thousand years) and where it came from. */
  readonly rateMeanCmPerKyr: number;
  readonly rateMeanSource: 'MEASURED' | 'GIVEN';
  readonly sectionThicknessM: number;
  readonly sections: number;
  /** Posterior median of the memory across one metre. */
  readonly memoryMedian: number;
  /** Posterior median of each eroded thickness, by the id of the unit whose base eroded. */
  readonly erosion: readonly { unitId: string; estimateM: number; medianM: number }[];
}

export interface HemipelagicResult extends AgeModelResult {
  readonly ageDepth: AgeDepthPoint[];
  readonly hemipelagic: HemipelagicSummary;
}

/** Sweeps between polls of `shouldCancel` and progress reports. */
const POLL_STEPS = 100;

/** A depth the model reports or fits: where it sits in the sections and below which gaps. */
interface Probe {
  /** Section index holding it (0-based) and the thickness within that section above it. */
  readonly section: number;
  readonly within: number;
  /** Number of erosion gaps above it (gaps are sorted top down). */
  readonly gapsAbove: number;
}

interface Structure {
  readonly scale: CoreDepthScale;
  /** Event-free depth of each section's top, and one more for the base (sections + 1 values). */
  readonly sectionTops: Float64Array;
  /** Thickness of each section (m). */
  readonly thickness: Float64Array;
  /** Distance between the centres of section i - 1 and i (m); 0 for the first. */
  readonly spacing: Float64Array;
  readonly sections: number;
  /** Gap contacts top down: section index and the estimate. */
  readonly gaps: readonly { section: number; estimateM: number; unitId: string }[];
  readonly events: readonly ColumnEventHorizon[];
  readonly eventProbes: readonly Probe[];
  readonly levelProbes: readonly Probe[];
  readonly curve: readonly { depthM: number; eventFreeDepthM: number; probe: Probe }[];
}

/** The section holding an event-free depth (a section's top belongs to it), and the depth within it. */
function probeAt(eventFreeDepthM: number, gapsAbove: number, sectionTops: Float64Array): Probe {
  let lo = 0;
  let hi = sectionTops.length - 2;
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if (sectionTops[mid] <= eventFreeDepthM + 1e-9) lo = mid;
    else hi = mid - 1;
  }
  return { section: lo, within: Math.max(0, eventFreeDepthM - sectionTops[lo]), gapsAbove };
}

/**
 * Sections of event-free depth: the mud between consecutive beds (and above the first and below
 * the last) is one interval, cut into equal sections no thicker than the setting (thicker when the
 * core would need more than `maxSections`).
 */
function sectionsOf(scale: CoreDepthScale, settings: HemipelagicSettings): Float64Array {
  const length = Math.max(scale.eventFreeLengthM, 1e-3);
  const cuts = [0, ...scale.beds.map((b) => scale.eventFreeDepth(b.topDepthM)), length]
    .filter((z, i, all) => i === 0 || z - all[i - 1] > 1e-6)
    .filter((z) => z <= length);
  if (cuts[cuts.length - 1] < length - 1e-6) cuts.push(length);
  let thickest = settings.sectionThicknessM;
  const count = (limit: number) => cuts.slice(1).reduce((n, z, i) => n + Math.max(1, Math.ceil((z - cuts[i]) / limit - 1e-9)), 0);
  while (count(thickest) > settings.maxSections) thickest *= 1.25;
  const tops: number[] = [];
  for (let i = 1; i < cuts.length; i++) {
    const pieces = Math.max(1, Math.ceil((cuts[i] - cuts[i - 1]) / thickest - 1e-9));
    for (let k = 0; k < pieces; k++) tops.push(cuts[i - 1] + ((cuts[i] - cuts[i - 1]) * k) / pieces);
  }
  tops.push(length);
  return Float64Array.from(tops);
}

function buildStructure(input: AgeModelInput, settings: HemipelagicSettings): Structure {
  const scale = coreDepthScale(input.units);
  const sectionTops = sectionsOf(scale, settings);
  const sections = sectionTops.length - 1;
  const thickness = new Float64Array(sections);
  const spacing = new Float64Array(sections);
  for (let i = 0; i < sections; i++) {
    thickness[i] = sectionTops[i + 1] - sectionTops[i];
    if (i > 0) spacing[i] = (thickness[i - 1] + thickness[i]) / 2;
  }
  const unitsById = new Map(input.units.map((u) => [u.id, u]));
  const gapContacts = scale.contacts.filter((c) => c.erosionEstimateM > 0);
  const gaps = gapContacts.map((c) => ({
    // The eroded mud was the top of the interval below the contact: it accrued at that section's rate.
    section: probeAt(c.eventFreeDepthM, 0, sectionTops).section,
    estimateM: c.erosionEstimateM,
    unitId: c.unitAboveId,
  }));
  /** Gaps above a point of true depth d in the unit at `position` (contacts at d count when the point is below them). */
  const gapsAbove = (depthM: number, position: number): number =>
    gapContacts.filter((c) => c.depthM < depthM || (c.depthM === depthM && position <= c.unitBelowPosition)).length;

  const events = [...input.eventHorizons].sort(
    (a, b) => (unitsById.get(a.unitBelowId)?.position ?? 0) - (unitsById.get(b.unitBelowId)?.position ?? 0),
  );
  const eventProbes = events.map((h) => {
    const above = unitsById.get(h.unitAboveId)!;
    const contactDepth = above.baseDepthM!;
    // The event is the surface the bed buried: the young side of any erosion gap at its base.
    return probeAt(scale.eventFreeDepth(contactDepth), gapsAbove(contactDepth, above.position), sectionTops);
  });
  const levelProbes = input.samples.filter(isModelled).map((s) => {
    const unit = unitsById.get(s.unitId)!;
    return probeAt(scale.eventFreeDepth(s.depthM!), gapsAbove(s.depthM!, unit.position), sectionTops);
  });

  const curve: { depthM: number; eventFreeDepthM: number; probe: Probe }[] = [];
  const step = settings.ageDepthStepM;
  const depths = new Set<number>();
  for (let k = 0; scale.topDepthM + k * step <= scale.baseDepthM + 1e-9; k++) depths.add(round(scale.topDepthM + k * step));
  depths.add(round(scale.baseDepthM));
  for (const c of scale.contacts) depths.add(round(c.depthM));
  const gapCountAt = (d: number, below: boolean) => gapContacts.filter((c) => c.depthM < d || (below && c.depthM === d)).length;
  for (const d of [...depths].sort((a, b) => a - b)) {
    const z = scale.eventFreeDepth(d);
    const young = gapCountAt(d, false);
    curve.push({ depthM: d, eventFreeDepthM: round(z), probe: probeAt(z, young, sectionTops) });
    const old = gapCountAt(d, true);
    if (old !== young) curve.push({ depthM: d, eventFreeDepthM: round(z), probe: probeAt(z, old, sectionTops) });
  }
  return { scale, sectionTops, thickness, spacing, sections, gaps, events, eventProbes, levelProbes, curve };
}

function round(m: number): number {
  return Math.round(m * 1e6) / 1e6;
}

/**
 * The prior mean rate in years per metre: the Theil-Sen slope of the levels' median ages on their
 * restored event-free depth (event-free depth plus the estimated erosion above). Undefined when
 * fewer than two levels sit at different depths or the slope is not positive.
 */
export function measuredYearsPerMetre(
  levels: LevelLikelihoods,
  structure: Pick<Structure, 'levelProbes' | 'gaps' | 'sectionTops'>,
): number | undefined {
  const restored = structure.levelProbes.map((p) => {
    let depth = structure.sectionTops[p.section] + p.within;
    for (let g = 0; g < p.gapsAbove; g++) depth += structure.gaps[g].estimateM;
    return depth;
  });
  const slopes: number[] = [];
  for (let i = 0; i < restored.length; i++) {
    for (let j = i + 1; j < restored.length; j++) {
      const dz = restored[j] - restored[i];
      if (Math.abs(dz) > 1e-6) slopes.push((levels.centreCalBp(j) - levels.centreCalBp(i)) / dz);
    }
  }
  if (slopes.length === 0) return undefined;
  slopes.sort((a, b) => a - b);
  const mid = slopes.length / 2;
  const median = slopes.length % 2 === 1 ? slopes[Math.floor(mid)] : (slopes[mid - 1] + slopes[mid]) / 2;
  return median > 0 ? median : undefined;
}

/** cm per thousand years to years per metre: 100 cm/m x 1000 yr/kyr / rate. */
function yearsPerMetre(cmPerKyr: number): number {
  return 100_000 / cmPerKyr;
}

/** Log of the gamma density with shape k and mean m at x > 0, without its constant. */
function logGammaKernel(x: number, shape: number, mean: number): number {
  return (shape - 1) * Math.log(x) - (shape / mean) * x;
}

/**
 * The unnormalised log posterior and the ages it implies, on the sampler's coordinates
 * (anchor age, log a_1..K, logit r, log E_1..G). The first coordinate is the age at the anchor, a
 * fixed depth (the shallowest dated level), not the age at the core top: top = anchor age - (age
 * at the anchor - top), a shear of (top, rates) whose Jacobian is 1, so the density is the same
 * function of the state. On these coordinates a change of the rates above the anchor moves the
 * top, not the dated levels, which the data pin down.
 */
export class HemipelagicPosterior {
  readonly dimension: number;
  readonly rates: Float64Array;
  readonly cumulative: Float64Array;
  readonly gapYears: Float64Array;
  /** The levels' ages of the state last expanded by `logDensity` (shared offsets only). */
  readonly levelAges: Float64Array;
  /** Index of the first log rate innovation, of the memory and of the first log erosion. */
  readonly rateIndex = 1;
  readonly memoryIndex: number;
  readonly gapIndex: number;
  /** Age at the core top of the state last expanded. */
  top = 0;

  constructor(
    readonly structure: Structure,
    readonly levels: LevelLikelihoods,
    readonly meanYearsPerMetre: number,
    readonly settings: HemipelagicSettings,
    /** The depth whose age is the first coordinate. */
    readonly anchor: Probe,
  ) {
    this.memoryIndex = 1 + structure.sections;
    this.gapIndex = this.memoryIndex + 1;
    this.dimension = this.gapIndex + structure.gaps.length;
    this.rates = new Float64Array(structure.sections);
    this.cumulative = new Float64Array(structure.sections + 1);
    this.gapYears = new Float64Array(structure.gaps.length + 1);
    this.levelAges = new Float64Array(structure.levelProbes.length);
  }

  memory(x: Float64Array): number {
    return 1 / (1 + Math.exp(-x[this.memoryIndex]));
  }

  erosion(x: Float64Array, g: number): number {
    return Math.exp(x[this.gapIndex + g]);
  }

  /** Fill rates, cumulative section ages, cumulative gap years and the top's age from a state. */
  expand(x: Float64Array): void {
    const { sections, thickness, spacing, gaps } = this.structure;
    const logMemory = Math.log(this.memory(x)) / this.settings.memoryDepthM;
    let rate = 0;
    this.cumulative[0] = 0;
    for (let i = 0; i < sections; i++) {
      const innovation = Math.exp(x[this.rateIndex + i]);
      // w = r^(spacing / memoryDepth): memory fades with the distance between section centres.
      const w = i === 0 ? 0 : Math.exp(logMemory * spacing[i]);
      rate = w * rate + (1 - w) * innovation;
      this.rates[i] = rate;
      this.cumulative[i + 1] = this.cumulative[i] + rate * thickness[i];
    }
    this.gapYears[0] = 0;
    for (let g = 0; g < gaps.length; g++) this.gapYears[g + 1] = this.gapYears[g] + this.erosion(x, g) * this.rates[gaps[g].section];
    this.top = 0;
    this.top = x[0] - this.ageAt(this.anchor);
  }

  /** Age at a probe after `expand`. */
  ageAt(probe: Probe): number {
    return this.top + this.cumulative[probe.section] + probe.within * this.rates[probe.section] + this.gapYears[probe.gapsAbove];
  }

  logDensity = (x: Float64Array): number => {
    const { sections, gaps, levelProbes } = this.structure;
    const s = this.settings;
    let lp = 0;
    // Gamma innovations on the log scale, density times the Jacobian a: k log a - (k / m) a.
    const beta = s.rateShape / this.meanYearsPerMetre;
    for (let i = 0; i < sections; i++) lp += s.rateShape * x[this.rateIndex + i] - beta * Math.exp(x[this.rateIndex + i]);
    // Beta memory on the logit scale: density times the Jacobian r (1 - r).
    const r = this.memory(x);
    if (!(r > 0 && r < 1)) return -Infinity;
    lp += s.memoryPriorA * Math.log(r) + s.memoryPriorB * Math.log(1 - r);
    for (let g = 0; g < gaps.length; g++) {
      const e = this.erosion(x, g);
      lp += logGammaKernel(e, s.erosionShape, gaps[g].estimateM) + x[this.gapIndex + g];
    }
    this.expand(x);
    // The top's prior is flat on [LATEST_CAL_BP, infinity).
    if (!(this.top >= LATEST_CAL_BP) || !Number.isFinite(lp)) return -Infinity;
    if (this.levels.jointLogLikelihood) {
      for (let j = 0; j < levelProbes.length; j++) this.levelAges[j] = this.ageAt(levelProbes[j]);
      return lp + this.levels.jointLogLikelihood(this.levelAges);
    }
    for (let j = 0; j < levelProbes.length; j++) lp += this.levels.logLikelihood(j, this.ageAt(levelProbes[j]));
    return lp;
  };
}

/** The dated level nearest the top in event-free depth (the first, on a tie): the anchor. */
function shallowestLevel(structure: Structure): number {
  let best = 0;
  const depth = (p: Probe) => structure.sectionTops[p.section] + p.within;
  structure.levelProbes.forEach((p, j) => {
    if (depth(p) < depth(structure.levelProbes[best])) best = j;
  });
  return best;
}

/**
 * The sweep's directions (`direction-sampler.ts`): the anchor age; each section's log rate alone;
 * each pair of neighbouring sections in opposite senses (moves time from one to the other, keeping
 * their product of rates); all log rates together (the whole curve stretched or squeezed about the
 * anchor: every rate times one factor); the memory; each eroded thickness alone.
 */
export function coreDirections(posterior: HemipelagicPosterior, anchorScaleYears: number): Direction[] {
  const K = posterior.structure.sections;
  const directions: Direction[] = [coordinateDirection('anchor', 0, anchorScaleYears)];
  for (let i = 0; i < K; i++) directions.push(coordinateDirection(`rate:${i}`, posterior.rateIndex + i, 0.3));
  for (let i = 0; i + 1 < K; i++) {
    directions.push({
      name: `pair:${i}`,
      indices: Int32Array.of(posterior.rateIndex + i, posterior.rateIndex + i + 1),
      weights: Float64Array.of(1, -1),
      scale: 0.3,
    });
  }
  directions.push({
    name: 'scale',
    indices: Int32Array.from({ length: K }, (_, i) => posterior.rateIndex + i),
    weights: new Float64Array(K).fill(1),
    scale: 0.1,
  });
  directions.push(coordinateDirection('memory', posterior.memoryIndex, 1));
  posterior.structure.gaps.forEach((_, g) => directions.push(coordinateDirection(`erosion:${g}`, posterior.gapIndex + g, 0.3)));
  return directions;
}

function checkHemipelagicSettings(settings: HemipelagicRunSettings): void {
  const h = settings.hemipelagic;
  const positive = (field: keyof HemipelagicSettings, value: number) => {
    if (!(value > 0) || !Number.isFinite(value)) {
      throw new AgeModelSettingsError('iterations', `The hemipelagic setting ${field} must be a positive number; got ${String(value)}.`);
    }
  };
  positive('sectionThicknessM', h.sectionThicknessM);
  positive('rateShape', h.rateShape);
  positive('memoryPriorA', h.memoryPriorA);
  positive('memoryPriorB', h.memoryPriorB);
  positive('erosionShape', h.erosionShape);
  positive('memoryDepthM', h.memoryDepthM);
  positive('ageDepthStepM', h.ageDepthStepM);
  if (h.rateMeanCmPerKyr !== null) positive('rateMeanCmPerKyr', h.rateMeanCmPerKyr);
  if (!Number.isInteger(h.maxSections) || h.maxSections < 1 || h.maxSections > 500) {
    throw new AgeModelSettingsError('iterations', `maxSections must be a whole number from 1 to 500; got ${String(h.maxSections)}.`);
  }
  if (!Number.isInteger(settings.chains) || settings.chains < 4) {
    throw new AgeModelSettingsError('chains', `The number of chains must be a whole number of at least 4; got ${String(settings.chains)}.`);
  }
  if (!Number.isInteger(settings.thin) || settings.thin < 1) {
    throw new AgeModelSettingsError('thin', `The thinning interval must be a whole number of at least 1; got ${String(settings.thin)}.`);
  }
  if (!Number.isInteger(settings.iterations) || settings.iterations < 8 * settings.thin || settings.iterations > 2_000_000) {
    throw new AgeModelSettingsError('iterations', `The iterations must be a whole number from ${8 * settings.thin} to 2,000,000; got ${String(settings.iterations)}.`);
  }
  if (!Number.isInteger(settings.burnIn) || settings.burnIn < 0 || settings.burnIn > 2_000_000) {
    throw new AgeModelSettingsError('burnIn', `The burn-in must be a whole number from 0 to 2,000,000; got ${String(settings.burnIn)}.`);
  }
  if (!(settings.outlierPrior >= 0 && settings.outlierPrior < 1)) {
    throw new AgeModelSettingsError('outlierPrior', `The outlier prior must be from 0 up to (not including) 1; got ${String(settings.outlierPrior)}.`);
  }
}

/** Bandwidth of the Gaussian kernel density: Silverman's rule of thumb (1986, Density Estimation, eq. 3.31). */
function silvermanBandwidth(sorted: Float64Array, sd: number): number {
  const n = sorted.length;
  const iqr = sorted[Math.floor(0.75 * (n - 1))] - sorted[Math.floor(0.25 * (n - 1))];
  const spread = Math.min(sd, iqr / 1.34) || sd || 1;
  return Math.max(1, 0.9 * spread * Math.pow(n, -0.2));
}

/**
 * A smooth density on the 1-year grid from continuous draws: linear binning onto whole years, then
 * a Gaussian kernel of Silverman's bandwidth (binned kernel density estimation, Wand & Jones 1995,
 * Kernel Smoothing, section 2.4 [memory]). Smoothing keeps Monte Carlo noise from splitting HPD
 * ranges into splinters.
 */
export function kernelDensity(draws: Float64Array): CalendarDensity {
  const sorted = Float64Array.from(draws).sort();
  const n = sorted.length;
  let mean = 0;
  for (const v of sorted) mean += v / n;
  let variance = 0;
  for (const v of sorted) variance += (v - mean) ** 2 / Math.max(1, n - 1);
  const h = silvermanBandwidth(sorted, Math.sqrt(variance));
  const reach = Math.ceil(4 * h);
  const young = Math.floor(sorted[0]) - reach;
  const old = Math.ceil(sorted[n - 1]) + reach;
  const bins = new Float64Array(old - young + 1);
  for (const v of sorted) {
    const x = v - young;
    const i = Math.floor(x);
    const f = x - i;
    bins[i] += 1 - f;
    if (i + 1 < bins.length) bins[i + 1] += f;
  }
  const kernel = new Float64Array(2 * reach + 1);
  for (let k = -reach; k <= reach; k++) kernel[k + reach] = Math.exp(-0.5 * (k / h) ** 2);
  const probabilities = new Float64Array(bins.length);
  for (let i = 0; i < bins.length; i++) {
    if (bins[i] === 0) continue;
    const lo = Math.max(0, i - reach);
    const hi = Math.min(bins.length - 1, i + reach);
    for (let j = lo; j <= hi; j++) probabilities[j] += bins[i] * kernel[j - i + reach];
  }
  return normalise({ startCalBp: young, probabilities });
}

function sortedQuantile(sorted: Float64Array, q: number): number {
  const position = q * (sorted.length - 1);
  const i = Math.floor(position);
  const f = position - i;
  return i + 1 < sorted.length ? sorted[i] * (1 - f) + sorted[i + 1] * f : sorted[i];
}

/**
 * Run the hemipelagic depth model of a core. Throws ColumnProblemError when the column cannot take
 * it (no hemipelagic mud, missing depths, no measurable rate and none given), AgeModelSettingsError
 * for unusable settings, AgeModelCancelled when cancelled through `hooks`.
 */
export function runHemipelagicModel(
  input: AgeModelInput,
  partial: Partial<Omit<HemipelagicRunSettings, 'hemipelagic'>> & { hemipelagic?: Partial<HemipelagicSettings> } = {},
  hooks: AgeModelHooks = {},
  makeLevels?: (samples: AgeModelInput['samples'], settings: HemipelagicRunSettings) => LevelLikelihoods,
): HemipelagicResult {
  const settings: HemipelagicRunSettings = {
    ...DEFAULT_HEMIPELAGIC_RUN_SETTINGS,
    ...partial,
    hemipelagic: { ...DEFAULT_HEMIPELAGIC_SETTINGS, ...partial.hemipelagic },
  };
  checkHemipelagicSettings(settings);
  const problems = hemipelagicProblems(input);
  if (problems.length > 0) {
    throw new ColumnProblemError(problems.map((message) => ({ code: 'NO_DATED_SAMPLE', message, subjectIds: [] })));
  }
  const modelled = input.samples.filter(isModelled);
  if (modelled.length === 0) {
    throw new ColumnProblemError([{ code: 'NO_DATED_SAMPLE', message: 'The core has no modelled dated level.', subjectIds: [] }]);
  }
  const h = settings.hemipelagic;
  const structure = buildStructure(input, h);
  const gridLevels = makeLevels
    ? undefined
    : new GridLevelLikelihoods(modelled, settings.inheritanceScaleYears, {
        prior: settings.outlierPrior,
        shiftScaleYears: settings.outlierShiftScaleYears,
      });
  const sources = input.reservoirSources ?? [];
  const sharedLevels =
    gridLevels && sources.length > 0 && modelled.some((sample) => sample.reservoir)
      ? new SharedLevelLikelihoods(gridLevels, modelled, sources, settings.inheritanceScaleYears, {
          prior: settings.outlierPrior,
          shiftScaleYears: settings.outlierShiftScaleYears,
        })
      : undefined;
  const levels: LevelLikelihoods = makeLevels?.(modelled, settings) ?? sharedLevels ?? gridLevels!;
  const offsetSums = sharedLevels ? Array.from({ length: sharedLevels.sourceCount }, (_, i) => new Float64Array(sources.length > 0 ? sharedLevels.offsetWeights(new Float64Array(modelled.length), i).length : 0)) : [];
  const levelAges = new Float64Array(modelled.length);

  const measured = measuredYearsPerMetre(levels, structure);
  let meanYearsPerMetre: number;
  let rateMeanSource: HemipelagicSummary['rateMeanSource'];
  if (h.rateMeanCmPerKyr !== null) {
    meanYearsPerMetre = yearsPerMetre(h.rateMeanCmPerKyr);
    rateMeanSource = 'GIVEN';
  } else if (measured !== undefined) {
    meanYearsPerMetre = measured;
    rateMeanSource = 'MEASURED';
  } else {
    throw new ColumnProblemError([
      {
        code: 'NO_DATED_SAMPLE',
        message:
          'The accumulation rate cannot be measured: it needs two dated levels at different depths whose ages increase ' +
          'with depth. Give the prior mean rate (cm per thousand years) or date another level.',
        subjectIds: [],
      },
    ]);
  }
  const anchorLevel = shallowestLevel(structure);
  const posterior = new HemipelagicPosterior(structure, levels, meanYearsPerMetre, h, structure.levelProbes[anchorLevel]);
  const d = posterior.dimension;
  const keptPerChain = Math.floor(settings.iterations / settings.thin);
  const E = structure.eventProbes.length;
  const S = structure.levelProbes.length;
  const P = structure.curve.length;
  const quantities = E + S + P + 2; // events, levels, curve, top and base ages
  const series: Float64Array[] = Array.from({ length: settings.chains }, () => new Float64Array(keptPerChain * quantities));
  const outlierSums = new Float64Array(S);
  const memoryDraws = new Float64Array(keptPerChain * settings.chains);
  const erosionDraws = structure.gaps.map(() => new Float64Array(keptPerChain * settings.chains));

  const seeds = new SeededRandom(settings.seed);
  const chainSeeds = Array.from({ length: settings.chains }, () => Math.floor(seeds.uniform() * 2 ** 31));
  const totalSteps = settings.chains * (settings.burnIn + settings.iterations);
  let lastReported = -1;
  const tally = new Map<string, { accepted: number; proposed: number }>();
  const basePoint = probeAt(structure.scale.eventFreeLengthM, structure.gaps.length, structure.sectionTops);
  const directions = coreDirections(posterior, Math.max(20, levels.spreadYears(anchorLevel)));

  for (let c = 0; c < settings.chains; c++) {
    const random = new SeededRandom(chainSeeds[c]);
    // Dispersed starts: the anchor level's centre, rates about the prior mean, erosion about its estimate.
    const start = new Float64Array(d);
    start[0] = levels.centreCalBp(anchorLevel) + Math.max(20, levels.spreadYears(anchorLevel)) * random.normal();
    for (let i = 0; i < structure.sections; i++) start[posterior.rateIndex + i] = Math.log(meanYearsPerMetre) + 0.2 * random.normal();
    start[posterior.memoryIndex] = 0.5 * random.normal();
    structure.gaps.forEach((g, k) => (start[posterior.gapIndex + k] = Math.log(g.estimateM) + 0.2 * random.normal()));
    // Keep the top no younger than the present: move the anchor down if the start would put it there.
    posterior.expand(start);
    if (posterior.top < LATEST_CAL_BP + 1) start[0] += LATEST_CAL_BP + 1 - posterior.top;
    const chain = new DirectionSampler(posterior.logDensity, start, directions, random, { principalAxes: true, burnIn: settings.burnIn });
    const out = series[c];
    let kept = 0;
    const steps = settings.burnIn + settings.iterations;
    for (let step = 0; step < steps; step++) {
      if (step % POLL_STEPS === 0) {
        if (hooks.shouldCancel?.()) throw new AgeModelCancelled();
        const fraction = (c * steps + step) / totalSteps;
        if (hooks.onProgress && fraction - lastReported >= 0.01) {
          hooks.onProgress(fraction);
          lastReported = fraction;
        }
      }
      const burning = step < settings.burnIn;
      chain.sweep(burning);
      const after = step - settings.burnIn + 1;
      if (!burning && after % settings.thin === 0 && kept < keptPerChain) {
        posterior.expand(chain.state);
        const row = kept * quantities;
        for (let k = 0; k < E; k++) out[row + k] = posterior.ageAt(structure.eventProbes[k]);
        for (let j = 0; j < S; j++) {
          const age = posterior.ageAt(structure.levelProbes[j]);
          out[row + E + j] = age;
          levelAges[j] = age;
          outlierSums[j] += levels.outlierShare(j, age);
        }
        // Rao-Blackwellised: each kept state adds each shared offset's conditional over its grid.
        offsetSums.forEach((sums, i) => {
          const w = sharedLevels!.offsetWeights(levelAges, i);
          for (let k = 0; k < w.length; k++) sums[k] += w[k];
        });
        for (let p = 0; p < P; p++) out[row + E + S + p] = posterior.ageAt(structure.curve[p].probe);
        out[row + E + S + P] = posterior.top;
        out[row + E + S + P + 1] = posterior.ageAt(basePoint);
        memoryDraws[c * keptPerChain + kept] = posterior.memory(chain.state);
        erosionDraws.forEach((draws, g) => (draws[c * keptPerChain + kept] = posterior.erosion(chain.state, g)));
        kept++;
      }
    }
    for (const [group, count] of chain.tally) {
      const sum = tally.get(group) ?? { accepted: 0, proposed: 0 };
      tally.set(group, { accepted: sum.accepted + count.accepted, proposed: sum.proposed + count.proposed });
    }
  }
  hooks.onProgress?.(1);

  const perChain = (q: number): Float64Array[] =>
    series.map((values) => {
      const s = new Float64Array(keptPerChain);
      for (let k = 0; k < keptPerChain; k++) s[k] = values[k * quantities + q];
      return s;
    });
  const pooled = (q: number): Float64Array => {
    const all = new Float64Array(keptPerChain * settings.chains);
    perChain(q).forEach((s, c) => all.set(s, c * keptPerChain));
    return all;
  };
  const totalDraws = keptPerChain * settings.chains;

  const events: EventPosterior[] = structure.events.map((horizon, k) => {
    const density = kernelDensity(pooled(k));
    return { eventHorizonId: horizon.id, density, summary: summarise(density), ...chainDiagnostics(perChain(k)) };
  });
  const samples: SamplePosterior[] = modelled.map((sample, j) => {
    const density = kernelDensity(pooled(E + j));
    const summary = summarise(density);
    const q = settings.outlierPrior;
    const offset = gridLevels
      ? offsetPosterior(sample.likelihood, sample.ageRelation, offsetScaleOf(sample, settings), density, (calBp) => {
          const mixed = gridLevels.mixture(j, calBp);
          return mixed > 0 ? (1 - q) / mixed : 0;
        })
      : undefined;
    return {
      ...(offset ? { offset } : {}),
      sampleId: sample.id,
      ageRelation: sample.ageRelation,
      outlierProbability: outlierSums[j] / totalDraws,
      density,
      medianCalBp: summary.medianCalBp,
      summary,
      ...chainDiagnostics(perChain(E + j)),
    };
  });
  const boundary = (q: number): BoundaryPosterior => {
    const density = kernelDensity(pooled(q));
    return { density, summary: summarise(density), ...chainDiagnostics(perChain(q)) };
  };
  const ageDepth: AgeDepthPoint[] = structure.curve.map((point, p) => {
    const sorted = pooled(E + S + p).sort();
    return {
      depthM: point.depthM,
      eventFreeDepthM: point.eventFreeDepthM,
      medianCalBp: sortedQuantile(sorted, 0.5),
      low95CalBp: sortedQuantile(sorted, 0.025),
      high95CalBp: sortedQuantile(sorted, 0.975),
    };
  });

  const stored = Math.min(settings.maxStoredDraws, totalDraws);
  const eventDraws = new Float64Array(stored * E);
  for (let i = 0; i < stored; i++) {
    const index = Math.floor((i * totalDraws) / stored);
    const c = Math.floor(index / keptPerChain);
    const k = index % keptPerChain;
    for (let e = 0; e < E; e++) eventDraws[i * E + e] = series[c][k * quantities + e];
  }
  let young = Infinity;
  let old = -Infinity;
  for (const e of [...events, ...samples]) {
    young = Math.min(young, e.density.startCalBp);
    old = Math.max(old, e.density.startCalBp + e.density.probabilities.length - 1);
  }
  const median = (draws: Float64Array) => sortedQuantile(Float64Array.from(draws).sort(), 0.5);

  return {
    events,
    samples,
    boundaries: { start: boundary(E + S + P + 1), end: boundary(E + S + P) },
    diagnostics: diagnose(structure.events, events, modelled, samples, tally, keptPerChain),
    eventDraws: { eventHorizonIds: structure.events.map((e) => e.id), drawCount: stored, draws: eventDraws },
    window: { youngCalBp: young, oldCalBp: old },
    settings,
    ...(sharedLevels
      ? {
          reservoirOffsets: offsetSums.map((sums, i) => {
            const levelsOf = sharedLevels.levelsOf(i);
            const key = modelled[levelsOf[0]].reservoir!.sourceKey;
            const source = sources.find((candidate) => candidate.key === key)!;
            return summariseOffset(source, sums, levelsOf.map((j) => modelled[j].id));
          }),
        }
      : {}),
    ageDepth,
    hemipelagic: {
      rateMeanCmPerKyr: 100_000 / meanYearsPerMetre,
      rateMeanSource,
      sectionThicknessM: Math.max(...structure.thickness),
      sections: structure.sections,
      memoryMedian: median(memoryDraws),
      erosion: structure.gaps.map((g, k) => ({ unitId: g.unitId, estimateM: g.estimateM, medianM: median(erosionDraws[k]) })),
    },
  };
}

function labelOf(thing: { id: string; name?: string }): string {
  return thing.name !== undefined && thing.name.trim() !== '' ? `"${thing.name}"` : `"${thing.id}"`;
}

function diagnose(
  horizons: readonly ColumnEventHorizon[],
  events: readonly EventPosterior[],
  modelled: readonly { id: string; name?: string }[],
  samples: readonly SamplePosterior[],
  tally: ReadonlyMap<string, { accepted: number; proposed: number }>,
  keptDrawsPerChain: number,
): AgeModelDiagnostics {
  const judged =
    events.length > 0
      ? events.map((e, k) => ({ label: `event ${labelOf(horizons[k])}`, rhat: e.rhat, ess: e.ess }))
      : samples.map((s, j) => ({ label: `sample ${labelOf(modelled[j])}`, rhat: s.rhat, ess: s.ess }));
  const worstRhat = judged.reduce((a, b) => (b.rhat > a.rhat ? b : a));
  const worstEss = judged.reduce((a, b) => (b.ess < a.ess ? b : a));
  const converged = judged.every((q) => q.rhat <= RHAT_LIMIT && q.ess >= ESS_MINIMUM);
  const message = converged
    ? `Converged: the worst split R-hat is ${worstRhat.rhat.toFixed(3)} and the smallest effective sample size ` +
      `${Math.round(worstEss.ess)} (hemipelagic depth model).`
    : `Not converged: worst split R-hat ${worstRhat.rhat.toFixed(3)} (${worstRhat.label}, limit ${RHAT_LIMIT}), smallest ` +
      `effective sample size ${Math.round(worstEss.ess)} (${worstEss.label}, at least ${ESS_MINIMUM} needed). Run the ` +
      'model again with more iterations before using these ages.';
  const rate = (...groups: string[]) => {
    let accepted = 0;
    let proposed = 0;
    for (const g of groups) {
      accepted += tally.get(g)?.accepted ?? 0;
      proposed += tally.get(g)?.proposed ?? 0;
    }
    return proposed > 0 ? accepted / proposed : 0;
  };
  return {
    converged,
    maxRhat: worstRhat.rhat,
    minEss: worstEss.ess,
    message,
    // Joint moves of the whole curve (scale, principal axes), the anchor age, and single-section moves.
    acceptance: { blockShift: rate('scale', 'axis'), boundaries: rate('anchor'), paths: rate('rate', 'pair', 'memory', 'erosion') },
    keptDrawsPerChain,
  };
}
