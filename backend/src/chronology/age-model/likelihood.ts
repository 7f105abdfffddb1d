/**
 * Likelihoods of deposit ages: each sample's calendar-age likelihood turned into a likelihood for
 * the age of the deposit it sits in (the quantity the column orders), with the inheritance or
 * intrusion offset integrated out and the general outlier mixture applied.
 */
import { CalendarDensity } from '../common/density';
import { AgeRelation } from './column';

/**
 * No deposit is younger than the present. The young edge of the model's calendar window stops at
 * -75 cal BP (2025 CE) unless a likelihood itself reaches younger.
 */
export const LATEST_CAL_BP = -75;

/** Years whose effective likelihood falls below this share of its peak are not stored. */
const TAIL_RELATIVE = 1e-12;

/** Years below this share of the total mass do not widen the model's window. */
const WINDOW_RELATIVE = 1e-6;

/** A deposit-age likelihood on whole years, without the outlier term. */
export interface DepositLikelihood {
  /** cal BP of values[0]. */
  readonly startCalBp: number;
  /**
   * L(d): the probability of the sample's measurement given deposit age d, on the scale where the
   * sample's own calendar likelihood sums to 1 over its years. Not normalised over d.
   */
  readonly values: Float64Array;
}

function normalisedProbabilities(density: CalendarDensity): Float64Array {
  let mass = 0;
  for (const p of density.probabilities) mass += p;
  const out = new Float64Array(density.probabilities.length);
  for (let i = 0; i < out.length; i++) out[i] = density.probabilities[i] / mass;
  return out;
}

/**
 * The likelihood of a deposit age d from a sample's calendar-age likelihood L_s(t).
 *
 * DATES_DEPOSIT: L(d) = L_s(d).
 *
 * OLDER_THAN_DEPOSIT (detrital charcoal, reworked shell): the material was already old when it
 * was buried, t = d + delta, with an exponential prior on the inheritance delta >= 0 of scale
 * `scaleYears`, the one-sided form used for the inbuilt age of charcoal (Bronk Ramsey 2009,
 * "Dealing with outliers and offsets in radiocarbon dating", Radiocarbon 51(3):1023-1045
 * [memory for pages]). On whole years the exponential is
 * binned exactly: P(delta = k) = (1 - r) r^k, r = exp(-1/scale), the mass of [k, k + 1). So
 * L(d) = sum_k L_s(d + k) P(k), which obeys L(d) = (1 - r) L_s(d) + r L(d + 1) and is computed
 * in one pass from the old end.
 *
 * YOUNGER_THAN_DEPOSIT (roots, burrow fills): t = d - delta, L(d) = sum_k L_s(d - k) P(k), one pass
 * from the young end.
 *
 * Integrating the offset out is exact because each offset belongs to one sample only.
 */
export function depositLikelihood(
  likelihood: CalendarDensity,
  ageRelation: AgeRelation,
  scaleYears: number,
): DepositLikelihood {
  const own = normalisedProbabilities(likelihood);
  const start = likelihood.startCalBp;
  if (ageRelation === 'DATES_DEPOSIT') return { startCalBp: start, values: own };
  const r = Math.exp(-1 / scaleYears);
  let peak = 0;
  for (const p of own) peak = Math.max(peak, p);
  // The geometric tail beyond the sample's own years decays by r per year from the edge value;
  // it is kept until it falls below TAIL_RELATIVE of the peak (about 27.6 scales at most).
  const tailYears = Math.ceil(Math.log(TAIL_RELATIVE) / Math.log(r));
  const values = new Float64Array(own.length + tailYears);
  if (ageRelation === 'OLDER_THAN_DEPOSIT') {
    // values[i] is year start - tailYears + i; the tail extends younger.
    let running = 0;
    for (let i = values.length - 1; i >= 0; i--) {
      const ownIndex = i - tailYears;
      running = (1 - r) * (ownIndex >= 0 ? own[ownIndex] : 0) + r * running;
      values[i] = running;
    }
    return trimmedTail({ startCalBp: start - tailYears, values }, peak);
  }
  let running = 0;
  for (let i = 0; i < values.length; i++) {
    running = (1 - r) * (i < own.length ? own[i] : 0) + r * running;
    values[i] = running;
  }
  return trimmedTail({ startCalBp: start, values }, peak);
}

function trimmedTail(likelihood: DepositLikelihood, peak: number): DepositLikelihood {
  const v = likelihood.values;
  const cutoff = peak * TAIL_RELATIVE;
  let first = 0;
  while (first < v.length - 1 && v[first] < cutoff) first++;
  let last = v.length - 1;
  while (last > first && v[last] < cutoff) last--;
  return { startCalBp: likelihood.startCalBp + first, values: v.slice(first, last + 1) };
}

/** The span of whole years (cal BP, inclusive) on which the model's ages live. */
export interface CalendarWindow {
  readonly youngCalBp: number;
  readonly oldCalBp: number;
}

/**
 * The model's window: the years where some deposit likelihood holds more than 1e-6 of its mass,
 * widened by `marginYears` on each side so the boundaries and any event with nothing dated on
 * one side have room, but never younger than LATEST_CAL_BP unless a sample's own likelihood is.
 */
export function modelWindow(
  likelihoods: readonly DepositLikelihood[],
  ownLikelihoods: readonly CalendarDensity[],
  marginYears: number,
): CalendarWindow {
  let young = Infinity;
  let old = -Infinity;
  for (const likelihood of likelihoods) {
    const v = likelihood.values;
    let mass = 0;
    for (const p of v) mass += p;
    const cutoff = mass * WINDOW_RELATIVE;
    let first = 0;
    while (first < v.length - 1 && v[first] <= cutoff) first++;
    let last = v.length - 1;
    while (last > first && v[last] <= cutoff) last--;
    young = Math.min(young, likelihood.startCalBp + first);
    old = Math.max(old, likelihood.startCalBp + last);
  }
  let youngestOwn = Infinity;
  for (const own of ownLikelihoods) youngestOwn = Math.min(youngestOwn, own.startCalBp);
  const youngLimit = Math.min(LATEST_CAL_BP, youngestOwn);
  return {
    youngCalBp: Math.max(young - marginYears, Math.min(young, youngLimit)),
    oldCalBp: old + marginYears,
  };
}

/**
 * The likelihood of a deposit age d if the sample is an outlier: its measurement is then read as if
 * the material were offset by an unknown shift delta, so
 *
 *   O(d) = sum_delta L(d + delta) f(delta),
 *
 * the deposit likelihood convolved with the shift's prior f. This is the outlier-as-offset form of
 * Bronk Ramsey (2009, "Dealing with outliers and offsets in radiocarbon dating", Radiocarbon
 * 51(3):1023-1045 [memory for pages]): the shift has a broad prior of stated scale, so the answer
 * depends on that scale and not on how far the model's window happens to reach. Our shift prior is
 * two-sided exponential (Laplace) with mean absolute shift `scaleYears`, binned exactly to whole
 * years: P(delta = k) = (1 - r) / (1 + r) r^|k|, r = exp(-1 / scale). Its tails are heavier than
 * any Gaussian measurement error, so a date off by any amount is explained better as an outlier
 * than by dragging the column, and the convolution is exact in two passes (younger-going and
 * older-going sums A(d) = L(d) + r A(d + 1), B(d) = L(d) + r B(d - 1); O = (1 - r)/(1 + r) (A + B - L)).
 *
 * Returned on the window's years; O sums to at most 1 over d, like L (mass shifted out of the
 * window is lost, which only lowers O where it is tiny).
 */
export function outlierShiftLikelihood(
  likelihood: DepositLikelihood,
  window: CalendarWindow,
  scaleYears: number,
): Float64Array {
  const width = window.oldCalBp - window.youngCalBp + 1;
  const r = Math.exp(-1 / scaleYears);
  // L on the window plus a margin of 40 scales either side, so mass just outside still shifts in.
  const margin = Math.ceil(40 * scaleYears);
  const start = window.youngCalBp - margin;
  const n = width + 2 * margin;
  const own = new Float64Array(n);
  for (let i = 0; i < likelihood.values.length; i++) {
    const k = likelihood.startCalBp + i - start;
    if (k >= 0 && k < n) own[k] = likelihood.values[i];
  }
  const older = new Float64Array(n);
  let running = 0;
  for (let k = n - 1; k >= 0; k--) {
    running = own[k] + r * running;
    older[k] = running;
  }
  const out = new Float64Array(width);
  const norm = (1 - r) / (1 + r);
  running = 0;
  for (let k = 0; k < n; k++) {
    running = own[k] + r * running;
    const i = k - margin;
    if (i >= 0 && i < width) out[i] = norm * (running + older[k] - own[k]);
  }
  return out;
}

/** Which year bin a continuous age falls in: year y holds ages in [y - 0.5, y + 0.5). */
export function yearOf(calBp: number): number {
  return Math.floor(calBp + 0.5);
}

/**
 * Deposit likelihoods on one window with the outlier mixture of Christen (1994, "Summarizing a
 * set of radiocarbon determinations: a robust approach", Applied Statistics 43(3):489-503
 * [memory for pages]): each sample is an outlier with prior probability q, and an outlier's
 * measurement is read through the shifted likelihood O (see `outlierShiftLikelihood`). Summing
 * the indicator out gives
 *
 *   L_q(d) = (1 - q) L(d) + q O(d),
 *
 * so the sampler works on deposit ages alone, and the posterior outlier probability given the
 * rest of the state is q O's share of L_q over the deposit's full conditional, averaged over
 * draws (Rao-Blackwellised, Gelfand & Smith 1990, JASA 85:398-409).
 *
 * Ages are continuous; a likelihood is constant within each whole year (year y holds
 * [y - 0.5, y + 0.5)). `cumulativeAt(x)` integrates L_q from the window's young edge to x, which
 * is what drawing from a conditional between two neighbours and Rao-Blackwellising need.
 */
export class MixtureLikelihoods {
  readonly count: number;
  readonly youngCalBp: number;
  readonly oldCalBp: number;
  /** Years in the window; also its length as a continuous interval. */
  readonly width: number;
  /** Youngest and oldest continuous ages of the window. */
  readonly youngEdge: number;
  readonly oldEdge: number;
  readonly outlierPrior: number;
  readonly shiftScaleYears: number;
  private readonly plainValues: Float64Array[];
  private readonly shiftedValues: Float64Array[];
  /** L_q per year, and its cumulative sum to the end of each year. */
  private readonly mixed: Float64Array[];
  private readonly mixedCumulative: Float64Array[];
  private readonly plainCumulative: Float64Array[];
  private readonly shiftedCumulative: Float64Array[];

  constructor(
    likelihoods: readonly DepositLikelihood[],
    window: CalendarWindow,
    outlierPrior: number,
    shiftScaleYears: number,
  ) {
    this.count = likelihoods.length;
    this.youngCalBp = window.youngCalBp;
    this.oldCalBp = window.oldCalBp;
    this.width = window.oldCalBp - window.youngCalBp + 1;
    this.youngEdge = window.youngCalBp - 0.5;
    this.oldEdge = window.oldCalBp + 0.5;
    this.outlierPrior = outlierPrior;
    this.shiftScaleYears = shiftScaleYears;
    const q = outlierPrior;
    this.plainValues = likelihoods.map((likelihood) => {
      const out = new Float64Array(this.width);
      for (let i = 0; i < likelihood.values.length; i++) {
        const k = likelihood.startCalBp + i - this.youngCalBp;
        if (k >= 0 && k < this.width) out[k] = likelihood.values[i];
      }
      return out;
    });
    this.shiftedValues = likelihoods.map((likelihood) =>
      q > 0 ? outlierShiftLikelihood(likelihood, window, shiftScaleYears) : new Float64Array(this.width),
    );
    const cumulative = (values: Float64Array): Float64Array => {
      const out = new Float64Array(values.length);
      let running = 0;
      for (let i = 0; i < values.length; i++) out[i] = running += values[i];
      return out;
    };
    this.mixed = this.plainValues.map((plain, j) => {
      const shifted = this.shiftedValues[j];
      const out = new Float64Array(this.width);
      for (let i = 0; i < this.width; i++) out[i] = (1 - q) * plain[i] + q * shifted[i];
      return out;
    });
    this.mixedCumulative = this.mixed.map(cumulative);
    this.plainCumulative = this.plainValues.map(cumulative);
    this.shiftedCumulative = this.shiftedValues.map(cumulative);
  }

  /**
   * Take another set's likelihood of `fromSample` (on the same window) as this set's `sample`: how a
   * shared reservoir offset switches a sample to its likelihood at another offset
   * (`reservoir-offsets.ts`). The arrays are shared, not copied.
   */
  adopt(sample: number, from: MixtureLikelihoods, fromSample: number): void {
    if (from.youngCalBp !== this.youngCalBp || from.width !== this.width) throw new Error('adopt needs likelihoods on the same window');
    this.plainValues[sample] = from.plainValues[fromSample];
    this.shiftedValues[sample] = from.shiftedValues[fromSample];
    this.mixed[sample] = from.mixed[fromSample];
    this.mixedCumulative[sample] = from.mixedCumulative[fromSample];
    this.plainCumulative[sample] = from.plainCumulative[fromSample];
    this.shiftedCumulative[sample] = from.shiftedCumulative[fromSample];
  }

  /** L(y) without the outlier term, for a whole year y (0 outside the window). */
  plain(sample: number, year: number): number {
    const i = year - this.youngCalBp;
    return i >= 0 && i < this.width ? this.plainValues[sample][i] : 0;
  }

  /** O(y), the outlier's shifted likelihood. */
  shifted(sample: number, year: number): number {
    const i = year - this.youngCalBp;
    return i >= 0 && i < this.width ? this.shiftedValues[sample][i] : 0;
  }

  /** L_q(y) = (1 - q) L(y) + q O(y). */
  mixture(sample: number, year: number): number {
    const i = year - this.youngCalBp;
    return i >= 0 && i < this.width ? this.mixed[sample][i] : 0;
  }

  /** L_q per year of the window (index year - youngCalBp); a view, not a copy. */
  mixtureValues(sample: number): Float64Array {
    return this.mixed[sample];
  }

  /** L_q at a continuous age. */
  at(sample: number, calBp: number): number {
    return this.mixture(sample, yearOf(calBp));
  }

  /** Sum of L_q over whole years up to and including `year`. */
  cumulativeToYear(sample: number, year: number): number {
    return yearSum(this.mixedCumulative[sample], year - this.youngCalBp);
  }

  /** Integral of L_q from the window's young edge to the continuous age x. */
  cumulativeAt(sample: number, calBp: number): number {
    return continuousSum(this.mixedCumulative[sample], this.mixed[sample], calBp - this.youngEdge);
  }

  /** Integral of L (no outlier term) from the young edge to x. */
  plainCumulativeAt(sample: number, calBp: number): number {
    return continuousSum(this.plainCumulative[sample], this.plainValues[sample], calBp - this.youngEdge);
  }

  /** Integral of q O (the outlier's share of L_q) from the young edge to x. */
  outlierCumulativeAt(sample: number, calBp: number): number {
    return this.outlierPrior * continuousSum(this.shiftedCumulative[sample], this.shiftedValues[sample], calBp - this.youngEdge);
  }

  /** Total mass of L_q over the window. */
  totalMass(sample: number): number {
    return this.mixedCumulative[sample][this.width - 1];
  }

  /** Total mass of L over the window. */
  plainTotalMass(sample: number): number {
    return this.plainCumulative[sample][this.width - 1];
  }

  /** Youngest and oldest year where L (without the outlier term) is positive, or undefined. */
  support(sample: number): { youngCalBp: number; oldCalBp: number } | undefined {
    const v = this.plainValues[sample];
    let first = 0;
    while (first < v.length && !(v[first] > 0)) first++;
    if (first === v.length) return undefined;
    let last = v.length - 1;
    while (last > first && !(v[last] > 0)) last--;
    return { youngCalBp: this.youngCalBp + first, oldCalBp: this.youngCalBp + last };
  }
}

/** Sum of values[0..i] from their running sums (0 before the start, the total after the end). */
function yearSum(cumulative: Float64Array, i: number): number {
  return i < 0 ? 0 : i >= cumulative.length ? cumulative[cumulative.length - 1] : cumulative[i];
}

/** Integral over [0, x] of the step function values[floor(t)], from its running sums. */
function continuousSum(cumulative: Float64Array, values: Float64Array, x: number): number {
  if (x <= 0) return 0;
  if (x >= values.length) return cumulative[cumulative.length - 1];
  const i = Math.floor(x);
  return (i > 0 ? cumulative[i - 1] : 0) + (x - i) * values[i];
}
