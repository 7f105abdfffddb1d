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
 * Deposit likelihoods on one window with the general outlier mixture of Christen (1994, "Summarizing
 * a set of radiocarbon determinations: a robust approach", Applied Statistics 43(3):489-503
 * [memory for pages]): each sample is an outlier with prior probability q, and an outlier's
 * measurement says nothing about its deposit. Christen's outlier carries a shift of vague prior;
 * with a shift uniform over the window (width W years) its likelihood is flat at 1/W on the scale
 * of L. Integrating the indicator out gives
 *
 *   L_q(d) = (1 - q) L(d) + q / W,
 *
 * so the sampler works on deposit ages alone, and the posterior outlier probability given the
 * rest of the state is the flat term's share, averaged over draws (Rao-Blackwellised, Gelfand &
 * Smith 1990, JASA 85:398-409). A flat alternative lets a bad date drop out completely rather
 * than pull the events by a heavy-tailed amount; the cost is that an isolated sample keeps a
 * share q of its mass spread between its neighbours in the order.
 *
 * Cumulative sums of L are kept per sample so that the full conditional of a deposit age between
 * its neighbours can be sampled by bisection on F(x) = (1 - q) C(x) + q (x - young + 1) / W.
 */
export class MixtureLikelihoods {
  readonly count: number;
  readonly youngCalBp: number;
  readonly oldCalBp: number;
  readonly width: number;
  readonly outlierPrior: number;
  /** q / W, the flat outlier term. */
  readonly flat: number;
  private readonly starts: Int32Array;
  private readonly lengths: Int32Array;
  private readonly offsets: Int32Array;
  private readonly values: Float64Array;
  private readonly cumulative: Float64Array;
  private readonly totals: Float64Array;

  constructor(likelihoods: readonly DepositLikelihood[], window: CalendarWindow, outlierPrior: number) {
    this.count = likelihoods.length;
    this.youngCalBp = window.youngCalBp;
    this.oldCalBp = window.oldCalBp;
    this.width = window.oldCalBp - window.youngCalBp + 1;
    this.outlierPrior = outlierPrior;
    this.flat = outlierPrior / this.width;
    this.starts = new Int32Array(this.count);
    this.lengths = new Int32Array(this.count);
    this.offsets = new Int32Array(this.count + 1);
    const clipped = likelihoods.map((likelihood) => {
      const first = Math.max(likelihood.startCalBp, window.youngCalBp);
      const last = Math.min(likelihood.startCalBp + likelihood.values.length - 1, window.oldCalBp);
      return last < first
        ? { start: first, values: new Float64Array(0) }
        : {
            start: first,
            values: likelihood.values.subarray(first - likelihood.startCalBp, last - likelihood.startCalBp + 1),
          };
    });
    clipped.forEach((c, j) => {
      this.starts[j] = c.start;
      this.lengths[j] = c.values.length;
      this.offsets[j + 1] = this.offsets[j] + c.values.length;
    });
    this.values = new Float64Array(this.offsets[this.count]);
    this.cumulative = new Float64Array(this.offsets[this.count]);
    this.totals = new Float64Array(this.count);
    clipped.forEach((c, j) => {
      let running = 0;
      const base = this.offsets[j];
      for (let i = 0; i < c.values.length; i++) {
        running += c.values[i];
        this.values[base + i] = c.values[i];
        this.cumulative[base + i] = running;
      }
      this.totals[j] = running;
    });
  }

  /** L(d) without the outlier term (0 outside the sample's years). */
  plain(sample: number, calBp: number): number {
    const i = calBp - this.starts[sample];
    return i >= 0 && i < this.lengths[sample] ? this.values[this.offsets[sample] + i] : 0;
  }

  /** L_q(d) = (1 - q) L(d) + q / W. */
  mixture(sample: number, calBp: number): number {
    return (1 - this.outlierPrior) * this.plain(sample, calBp) + this.flat;
  }

  /** C(x): the sum of L (without the outlier term) over the window's years up to and including x. */
  plainCumulativeTo(sample: number, calBp: number): number {
    const i = calBp - this.starts[sample];
    return i < 0 ? 0 : i >= this.lengths[sample] ? this.totals[sample] : this.cumulative[this.offsets[sample] + i];
  }

  /** F(x): the sum of L_q over the window's years up to and including x. */
  cumulativeTo(sample: number, calBp: number): number {
    return (1 - this.outlierPrior) * this.plainCumulativeTo(sample, calBp) + this.flat * (calBp - this.youngCalBp + 1);
  }

  /** Mass of L_q over younger..older inclusive. */
  massBetween(sample: number, youngerCalBp: number, olderCalBp: number): number {
    return this.cumulativeTo(sample, olderCalBp) - this.cumulativeTo(sample, youngerCalBp - 1);
  }

  /** Total mass of L_q over the window. */
  totalMass(sample: number): number {
    return this.cumulativeTo(sample, this.oldCalBp);
  }

  /** Youngest and oldest year where L (without the outlier term) is positive, or undefined. */
  support(sample: number): { youngCalBp: number; oldCalBp: number } | undefined {
    const n = this.lengths[sample];
    if (n === 0) return undefined;
    return { youngCalBp: this.starts[sample], oldCalBp: this.starts[sample] + n - 1 };
  }
}
