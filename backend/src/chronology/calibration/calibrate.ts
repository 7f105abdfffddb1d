/**
 * Radiocarbon calibration: a conventional 14C age (Stuiver & Polach 1977, Radiocarbon
 * 19(3):355-363) turned into a calendar-age density on the 1-year grid of a calibration curve
 * (IntCal20, Reimer et al. 2020, Radiocarbon 62(4):725-757; Marine20, Heaton et al. 2020,
 * Radiocarbon 62(4):779-820; SHCal20, Hogg et al. 2020, Radiocarbon 62(4):759-778).
 *
 * The likelihood of calendar age t for a measured age x +- s is the normal density
 *
 *   L(t) = N(x; mu(t) + DeltaR, S(t)),  S(t)^2 = s^2 + sigma(t)^2 + sigma_DeltaR^2
 *
 * with mu, sigma the curve on its 1-year grid and DeltaR the local marine reservoir offset
 * (Stuiver, Pearson & Braziunas 1986, Radiocarbon 28(2B), for the Delta-R convention [memory for pages]).
 * The 1/S(t) factor of the normal density is kept because S(t) changes along the curve. With a
 * uniform calendar prior the density is L(t) normalised over the grid.
 */
import { CalendarDensity, HpdRange, summariseNormalised, totalMass, trim } from '../common/density';
import { CalibrationCurve } from './curve';
import { requireBoundedAge, requireBoundedError } from './bounds';
import { CalibrationInputError, formatYears } from './errors';

/** A calendar age from any dating method, in the form the rest of Stratochron consumes. */
export interface CalibrationResult {
  /** Normalised, with leading and trailing years below 1e-6 of the total mass trimmed. */
  readonly density: CalendarDensity;
  readonly medianCalBp: number;
  readonly meanCalBp: number;
  readonly sdYears: number;
  /** Highest-density ranges at 68.3 % (68.27 %), oldest first. */
  readonly hpd68: HpdRange[];
  /** Highest-density ranges at 95.4 % (95.45 %), oldest first. */
  readonly hpd95: HpdRange[];
  /** Things the researcher should know about the result; never a substitute for an error. */
  readonly warnings: string[];
  /**
   * Radiocarbon only: the sum over years of the unnormalised likelihood (Gaussian densities of the
   * 14C age, up to a constant) before normalising, so likelihoods at different Delta-R values can
   * be weighed against each other (shared reservoir offsets).
   */
  readonly likelihoodMass?: number;
}

export interface RadiocarbonInput {
  /** Conventional 14C age, 14C yr BP. */
  readonly c14Age: number;
  /** Its 1-sigma laboratory error, 14C yr; must be positive. */
  readonly c14Error: number;
  readonly curve: CalibrationCurve;
  /** Local reservoir offset from the marine curve, 14C yr. Required on a marine curve, refused on any other. */
  readonly deltaR?: number | null;
  /** 1-sigma of Delta-R, 14C yr; required with Delta-R, zero allowed. */
  readonly deltaRError?: number | null;
  /** Sampling latitude (degrees, WGS84), used only to warn about Marine20 in polar waters. */
  readonly latitude?: number | null;
}

/** Years holding less than this share of the total mass are trimmed from both ends of a result. */
export const TRIM_RELATIVE_THRESHOLD = 1e-6;

/**
 * Calendar years further than this many combined sigmas from the measured age are not evaluated:
 * there the likelihood is below e^-32 (about 1e-14) of its peak, far under the trimming threshold.
 */
const WINDOW_SIGMAS = 8;

/**
 * A 14C age may lie beyond the curve's span of 14C ages by up to this many combined sigmas (the
 * measurement scatters around the curve); further out the curve cannot place it and we refuse.
 */
const OUT_OF_RANGE_SIGMAS = 2;

/** Marine20 is a non-polar curve (Heaton et al. 2020); the 60 degree line is common practice. */
const POLAR_LATITUDE = 60;

/** Calendar years per block of the window index: small enough to skip plateaus, large enough to stay cheap. */
const BLOCK_YEARS = 16;

/**
 * Per-curve summary that finds the calendar years worth evaluating for an age without scanning
 * the whole curve. The curve is not monotonic (wiggles and plateaus), so each block of years keeps
 * its 14C extent widened by WINDOW_SIGMAS curve sigmas, and two running envelopes over the blocks
 * (the highest reach so far from the young end, the lowest reach so far from the old end) are
 * monotonic, so a binary search finds the first and the last block that can matter.
 */
interface CurveWindowIndex {
  readonly blockMinMu: Float64Array;
  readonly blockMaxMu: Float64Array;
  readonly blockMaxSigma: Float64Array;
  /** max over blocks 0..b of (blockMaxMu + K blockMaxSigma); non-decreasing in b. */
  readonly reachAboveFromYoung: Float64Array;
  /** min over blocks b..end of (blockMinMu - K blockMaxSigma); non-decreasing in b. */
  readonly reachBelowFromOld: Float64Array;
  readonly c14Min: number;
  readonly c14Max: number;
  readonly sigmaAtC14Min: number;
  readonly sigmaAtC14Max: number;
}

// Curves are immutable once built, so the index is computed once per curve object.
const windowIndexes = new WeakMap<CalibrationCurve, CurveWindowIndex>();

function windowIndexFor(curve: CalibrationCurve): CurveWindowIndex {
  const cached = windowIndexes.get(curve);
  if (cached) return cached;
  const { mu, sigma } = curve;
  const blocks = Math.ceil(mu.length / BLOCK_YEARS);
  const blockMinMu = new Float64Array(blocks);
  const blockMaxMu = new Float64Array(blocks);
  const blockMaxSigma = new Float64Array(blocks);
  let c14Min = Infinity;
  let c14Max = -Infinity;
  let sigmaAtC14Min = 0;
  let sigmaAtC14Max = 0;
  for (let b = 0; b < blocks; b++) {
    let lo = Infinity;
    let hi = -Infinity;
    let sig = 0;
    const end = Math.min(mu.length, (b + 1) * BLOCK_YEARS);
    for (let i = b * BLOCK_YEARS; i < end; i++) {
      if (mu[i] < lo) lo = mu[i];
      if (mu[i] > hi) hi = mu[i];
      if (sigma[i] > sig) sig = sigma[i];
      if (mu[i] < c14Min) {
        c14Min = mu[i];
        sigmaAtC14Min = sigma[i];
      }
      if (mu[i] > c14Max) {
        c14Max = mu[i];
        sigmaAtC14Max = sigma[i];
      }
    }
    blockMinMu[b] = lo;
    blockMaxMu[b] = hi;
    blockMaxSigma[b] = sig;
  }
  const reachAboveFromYoung = new Float64Array(blocks);
  const reachBelowFromOld = new Float64Array(blocks);
  let above = -Infinity;
  for (let b = 0; b < blocks; b++) {
    above = Math.max(above, blockMaxMu[b] + WINDOW_SIGMAS * blockMaxSigma[b]);
    reachAboveFromYoung[b] = above;
  }
  let below = Infinity;
  for (let b = blocks - 1; b >= 0; b--) {
    below = Math.min(below, blockMinMu[b] - WINDOW_SIGMAS * blockMaxSigma[b]);
    reachBelowFromOld[b] = below;
  }
  const index: CurveWindowIndex = {
    blockMinMu,
    blockMaxMu,
    blockMaxSigma,
    reachAboveFromYoung,
    reachBelowFromOld,
    c14Min,
    c14Max,
    sigmaAtC14Min,
    sigmaAtC14Max,
  };
  windowIndexes.set(curve, index);
  return index;
}

/** First index of a non-decreasing array whose value is >= `value` (the length if none). */
function firstAtLeast(values: Float64Array, value: number): number {
  let lo = 0;
  let hi = values.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (values[mid] >= value) hi = mid;
    else lo = mid + 1;
  }
  return lo;
}

/** Last index of a non-decreasing array whose value is <= `value` (-1 if none). */
function lastAtMost(values: Float64Array, value: number): number {
  let lo = 0;
  let hi = values.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (values[mid] <= value) lo = mid + 1;
    else hi = mid;
  }
  return lo - 1;
}

function isGiven(value: number | null | undefined): value is number {
  return value !== null && value !== undefined;
}

function requireFinite(field: string, value: number, what: string): void {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new CalibrationInputError(field, `${what} must be a finite number; got ${String(value)}.`);
  }
}

function curveCoverage(curve: CalibrationCurve, index: CurveWindowIndex): string {
  return (
    `The curve spans ${formatYears(index.c14Min)} to ${formatYears(index.c14Max)} 14C yr BP ` +
    `over ${formatYears(curve.startCalBp)} to ${formatYears(curve.endCalBp)} cal BP`
  );
}

/**
 * Validate a radiocarbon determination against a curve and return the Delta-R terms to use.
 * Throws CalibrationInputError naming the field at fault.
 */
function checkRadiocarbonInput(input: RadiocarbonInput): { deltaR: number; deltaRError: number } {
  const { c14Age, c14Error, curve } = input;
  requireFinite('c14Age', c14Age, 'The 14C age');
  requireFinite('c14Error', c14Error, 'The 14C age error');
  if (!(c14Error > 0)) {
    throw new CalibrationInputError(
      'c14Error',
      `The 14C age error must be a positive 1-sigma in 14C years; got ${c14Error}.`,
    );
  }
  requireBoundedAge('c14Age', c14Age, 'A 14C age');
  requireBoundedError('c14Error', c14Error, 'A 14C age error');
  let deltaR = 0;
  let deltaRError = 0;
  if (curve.marine) {
    if (!isGiven(input.deltaR)) {
      throw new CalibrationInputError(
        'deltaR',
        `${curve.name} is a marine curve: give the local reservoir offset Delta-R (0 if none applies).`,
      );
    }
    requireFinite('deltaR', input.deltaR, 'Delta-R');
    requireBoundedAge('deltaR', input.deltaR, 'A Delta-R');
    if (!isGiven(input.deltaRError)) {
      throw new CalibrationInputError(
        'deltaRError',
        'Give the 1-sigma error of Delta-R in 14C years (0 if it is taken as exact).',
      );
    }
    requireFinite('deltaRError', input.deltaRError, 'The Delta-R error');
    if (input.deltaRError < 0) {
      throw new CalibrationInputError(
        'deltaRError',
        `The Delta-R error is a 1-sigma and cannot be negative; got ${input.deltaRError}.`,
      );
    }
    requireBoundedError('deltaRError', input.deltaRError, 'A Delta-R error');
    deltaR = input.deltaR;
    deltaRError = input.deltaRError;
  } else {
    if (isGiven(input.deltaR)) {
      throw new CalibrationInputError(
        'deltaR',
        `${curve.name} is not a marine curve and takes no Delta-R; use a marine curve for marine material, ` +
          'or leave Delta-R empty.',
      );
    }
    if (isGiven(input.deltaRError)) {
      throw new CalibrationInputError(
        'deltaRError',
        `${curve.name} is not a marine curve and takes no Delta-R error; leave it empty.`,
      );
    }
  }
  if (isGiven(input.latitude)) {
    requireFinite('latitude', input.latitude, 'The latitude');
    if (Math.abs(input.latitude) > 90) {
      throw new CalibrationInputError('latitude', `Latitude must lie between -90 and 90 degrees; got ${input.latitude}.`);
    }
  }
  return { deltaR, deltaRError };
}

/**
 * Calibrate a conventional 14C age on a curve (see the module comment for the likelihood).
 *
 * Refuses, with a CalibrationInputError naming the field: a non-positive or non-finite error; a
 * negative (post-bomb) age; an age (after Delta-R) more than two combined sigmas beyond the curve's
 * span of 14C ages; a Delta-R on a terrestrial curve or none on a marine curve (a Delta-R error of
 * 0 is allowed, a negative one is not); an age that the curve cannot explain anywhere.
 *
 * Warns (in `warnings`) when a marine curve is used above 60 degrees latitude and when the 95.4 %
 * range reaches either end of the curve, where the density is cut off.
 */
export function calibrateRadiocarbon(input: RadiocarbonInput): CalibrationResult {
  const { c14Age, c14Error, curve } = input;
  const { deltaR, deltaRError } = checkRadiocarbonInput(input);
  const index = windowIndexFor(curve);
  const ageText = `14C age ${formatYears(c14Age)} ± ${formatYears(c14Error)} yr BP`;

  if (c14Age < 0) {
    throw new CalibrationInputError(
      'c14Age',
      `The ${ageText} is negative: the sample grew after the bomb tests (F14C above 1), and ` +
        `${curve.name} cannot calibrate post-bomb ages. ${curveCoverage(curve, index)}.`,
    );
  }

  // The age as it would read on the curve itself: a marine sample's offset removed.
  const x = c14Age - deltaR;
  const varianceBesidesCurve = c14Error * c14Error + deltaRError * deltaRError;
  const afterDeltaR = curve.marine ? ` (${formatYears(x)} yr BP after Delta-R ${formatYears(deltaR)})` : '';
  const youngLimit = index.c14Min - OUT_OF_RANGE_SIGMAS * Math.sqrt(varianceBesidesCurve + index.sigmaAtC14Min ** 2);
  const oldLimit = index.c14Max + OUT_OF_RANGE_SIGMAS * Math.sqrt(varianceBesidesCurve + index.sigmaAtC14Max ** 2);
  if (x < youngLimit || x > oldLimit) {
    throw new CalibrationInputError(
      'c14Age',
      `The ${ageText}${afterDeltaR} is ${x < youngLimit ? 'younger' : 'older'} than ${curve.name} can calibrate. ` +
        `${curveCoverage(curve, index)}; an age more than ${OUT_OF_RANGE_SIGMAS} standard errors beyond ` +
        'that span cannot be placed on it.',
    );
  }

  const density = likelihoodOnCurve(curve, index, x, varianceBesidesCurve);
  if (density === undefined) {
    throw new CalibrationInputError(
      'c14Age',
      `The ${ageText}${afterDeltaR} matches no calendar year of ${curve.name}: within its errors ` +
        `the curve never reaches that 14C age. ${curveCoverage(curve, index)}.`,
    );
  }

  const warnings: string[] = [];
  if (curve.marine && isGiven(input.latitude) && Math.abs(input.latitude) > POLAR_LATITUDE) {
    const label = curve.code === 'MARINE20' ? 'Marine20' : curve.name;
    warnings.push(
      `${label} is not meant for polar waters (latitude above ${POLAR_LATITUDE} degrees): ` +
        `the sample at ${input.latitude} degrees may carry a reservoir age the curve does not model, ` +
        'so its calibrated ranges may be wrong.',
    );
  }
  const likelihoodMass = totalMass(density);
  const result = { ...calibrationResult(density, warnings), likelihoodMass };
  if (result.hpd95.some((range) => range.youngerCalBp <= curve.startCalBp)) {
    warnings.push(
      `The 95.4 % range reaches ${formatYears(curve.startCalBp)} cal BP, the young end of ${curve.name}: ` +
        'the density is cut off there, so the sample may be younger than its ranges show.',
    );
  }
  if (result.hpd95.some((range) => range.olderCalBp >= curve.endCalBp)) {
    warnings.push(
      `The 95.4 % range reaches ${formatYears(curve.endCalBp)} cal BP, the old end of ${curve.name}: ` +
        'the density is cut off there, so the sample may be older than its ranges show.',
    );
  }
  return result;
}

/**
 * The unnormalised likelihood over the blocks of years that can matter, or undefined when no year
 * carries any (the age is nowhere within WINDOW_SIGMAS of the curve).
 */
function likelihoodOnCurve(
  curve: CalibrationCurve,
  index: CurveWindowIndex,
  x: number,
  varianceBesidesCurve: number,
): CalendarDensity | undefined {
  const { mu, sigma } = curve;
  const sdBesidesCurve = Math.sqrt(varianceBesidesCurve);
  // sqrt(a^2 + b^2) <= a + b, so these envelopes never exclude a year that matters.
  const firstCandidate = firstAtLeast(index.reachAboveFromYoung, x - WINDOW_SIGMAS * sdBesidesCurve);
  const lastCandidate = lastAtMost(index.reachBelowFromOld, x + WINDOW_SIGMAS * sdBesidesCurve);

  const blockMatters = (b: number): boolean => {
    const reach = WINDOW_SIGMAS * Math.sqrt(varianceBesidesCurve + index.blockMaxSigma[b] ** 2);
    return x >= index.blockMinMu[b] - reach && x <= index.blockMaxMu[b] + reach;
  };
  let firstBlock = firstCandidate;
  while (firstBlock <= lastCandidate && !blockMatters(firstBlock)) firstBlock++;
  let lastBlock = lastCandidate;
  while (lastBlock >= firstBlock && !blockMatters(lastBlock)) lastBlock--;
  if (firstBlock > lastBlock) return undefined;

  const firstYear = firstBlock * BLOCK_YEARS;
  const endYear = Math.min(mu.length, (lastBlock + 1) * BLOCK_YEARS);
  const probabilities = new Float64Array(endYear - firstYear);
  const limit = WINDOW_SIGMAS * WINDOW_SIGMAS;
  let mass = 0;
  for (let b = firstBlock; b <= lastBlock; b++) {
    if (!blockMatters(b)) continue; // a wiggle or plateau elsewhere in 14C: leave its years at zero
    const end = Math.min(mu.length, (b + 1) * BLOCK_YEARS);
    for (let i = b * BLOCK_YEARS; i < end; i++) {
      const deviation = x - mu[i];
      const variance = varianceBesidesCurve + sigma[i] * sigma[i];
      const z2 = (deviation * deviation) / variance;
      if (z2 > limit) continue;
      const p = Math.exp(-0.5 * z2) / Math.sqrt(variance);
      probabilities[i - firstYear] = p;
      mass += p;
    }
  }
  if (!(mass > 0) || !Number.isFinite(mass)) return undefined;
  return { startCalBp: curve.startCalBp + firstYear, probabilities };
}

/**
 * Normalise, trim and summarise a calendar density into a CalibrationResult (used by every dating
 * method, so all results are held to the same normalisation and trimming).
 */
export function calibrationResult(density: CalendarDensity, warnings: string[] = []): CalibrationResult {
  const trimmed = trim(density, TRIM_RELATIVE_THRESHOLD);
  // trim hands back a fresh array, so it can be normalised in place (one copy less per calibration).
  const mass = totalMass(trimmed);
  if (!(mass > 0) || !Number.isFinite(mass)) throw new RangeError('density has no mass to normalise');
  const p = trimmed.probabilities;
  for (let i = 0; i < p.length; i++) p[i] /= mass;
  const summary = summariseNormalised(trimmed);
  return {
    density: trimmed,
    medianCalBp: summary.medianCalBp,
    meanCalBp: summary.meanCalBp,
    sdYears: summary.sdYears,
    hpd68: summary.hpd68,
    hpd95: summary.hpd95,
    warnings,
  };
}
