/**
 * Curves and bins for the recurrence screens: each fitted model's density, survival and hazard
 * on a common time grid, and a histogram of inter-event times scaled as a density so the model
 * curves can be drawn over it. Outputs are plain number arrays because they go straight into
 * stored results and API responses (a Float64Array does not survive JSON).
 */
import type { RenewalDistribution, RenewalModel } from './distributions';

export interface RenewalCurve {
  readonly model: RenewalModel;
  /** Probability density, per year. */
  readonly pdf: readonly number[];
  /** Probability of no event yet, 1 - F. */
  readonly survival: readonly number[];
  /** Events per year, given none so far. */
  readonly hazard: readonly number[];
}

export interface RenewalCurves {
  /** Years since the last event; from `maxYears / pointCount` to `maxYears`. */
  readonly timesYears: readonly number[];
  readonly curves: readonly RenewalCurve[];
}

/**
 * Samples each distribution on `pointCount` evenly spaced times up to `maxYears`. The grid leaves
 * out t = 0, where a Weibull hazard with shape below 1 is infinite; survival there is 1 for every
 * model.
 */
export function renewalCurves(
  distributions: readonly RenewalDistribution[],
  maxYears: number,
  pointCount = 200,
): RenewalCurves {
  if (!(maxYears > 0) || !Number.isFinite(maxYears)) throw new RangeError(`curve span must be positive (got ${maxYears})`);
  if (!Number.isInteger(pointCount) || pointCount < 2) throw new RangeError(`need at least 2 curve points (got ${pointCount})`);
  const step = maxYears / pointCount;
  const timesYears = Array.from({ length: pointCount }, (_, i) => (i + 1) * step);
  return {
    timesYears,
    curves: distributions.map((distribution) => ({
      model: distribution.model,
      pdf: timesYears.map((t) => distribution.pdf(t)),
      survival: timesYears.map((t) => distribution.survival(t)),
      hazard: timesYears.map((t) => distribution.hazard(t)),
    })),
  };
}

export interface HistogramBin {
  /** Bin covers [fromYears, toYears). */
  readonly fromYears: number;
  readonly toYears: number;
  readonly count: number;
  /** count / (total x width): comparable with a model's pdf. */
  readonly density: number;
}

export interface HistogramOptions {
  /** Fixed bin width; by default the Freedman-Diaconis width rounded up to 1, 2 or 5 x 10^n. */
  readonly binWidthYears?: number;
  /** Upper limit on the number of bins (default 200). */
  readonly maxBins?: number;
}

/**
 * Histogram of inter-event times. The default width is the Freedman-Diaconis rule
 * 2 IQR n^(-1/3) (Freedman & Diaconis 1981, Z. Wahrscheinlichkeitstheorie verw. Geb. 57:453-476),
 * rounded up to a 1-2-5 step so bin edges read well [common practice]; bins start at a multiple
 * of the width.
 */
export function intervalHistogram(intervals: ArrayLike<number>, options: HistogramOptions = {}): HistogramBin[] {
  const values = Float64Array.from(intervals).filter(Number.isFinite).sort();
  const n = values.length;
  if (n === 0) return [];
  const maxBins = options.maxBins ?? 200;
  const min = values[0];
  const max = values[n - 1];
  let width = options.binWidthYears ?? freedmanDiaconisWidth(values);
  if (!(width > 0) || !Number.isFinite(width)) width = Math.max(1, niceStep(Math.max(max - min, 1) / 10));
  const span = Math.max(max - min, width);
  if (span / width > maxBins) width = niceStep(span / maxBins);
  const first = Math.floor(min / width) * width;
  const binCount = Math.max(1, Math.floor((max - first) / width) + 1);
  const counts = new Float64Array(binCount);
  for (let i = 0; i < n; i++) {
    counts[Math.min(binCount - 1, Math.floor((values[i] - first) / width))]++;
  }
  return Array.from(counts, (count, i) => ({
    fromYears: first + i * width,
    toYears: first + (i + 1) * width,
    count,
    density: count / (n * width),
  }));
}

function freedmanDiaconisWidth(sorted: Float64Array): number {
  const quartile = (q: number): number => {
    const position = (sorted.length - 1) * q;
    const below = Math.floor(position);
    const above = Math.min(below + 1, sorted.length - 1);
    return sorted[below] + (position - below) * (sorted[above] - sorted[below]);
  };
  const iqr = quartile(0.75) - quartile(0.25);
  return niceStep(2 * iqr * Math.cbrt(1 / sorted.length));
}

/** The smallest of 1, 2, 5 x 10^n that is at least `raw`. */
function niceStep(raw: number): number {
  if (!(raw > 0) || !Number.isFinite(raw)) return Number.NaN;
  const power = Math.pow(10, Math.floor(Math.log10(raw)));
  for (const multiple of [1, 2, 5, 10]) {
    if (multiple * power >= raw * (1 - 1e-12)) return multiple * power;
  }
  return 10 * power;
}
